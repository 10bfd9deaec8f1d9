import { z } from "zod";
import { decodeFloat32, decodeUint32 } from "@/shared/model";

/**
 * The 3D preview data of `GET/POST /api/templates/:id/model` (contract: src/shared/model.ts), read
 * leniently so the preview keeps working if fields are added: typed arrays may arrive as plain number lists
 * or as base64 of little-endian Float32 / Uint32 data (decoded with the contract's own decoders). Matrices are 4 × 4 column-major
 * (three.js `Matrix4.fromArray`), lengths in millimetres, assembly coordinates.
 */
const numbers = z.union([z.array(z.number()), z.string()]);
const matrix = z.array(z.number()).length(16);
const point = z.object({ x: z.number(), y: z.number(), z: z.number() });

const partSchema = z.object({
  id: z.string(),
  name: z.string().optional(),
  material: z.string().optional(),
  materialName: z.string().optional(),
  colour: z.string().optional(),
  color: z.string().optional(),
  mesh: z.object({
    positions: numbers,
    normals: numbers.optional(),
    indices: numbers,
    edges: numbers.optional(),
  }),
  assembly: matrix.optional(),
  exploded: matrix.optional(),
});

const fixtureSchema = z.object({
  id: z.string(),
  label: z.string().optional(),
  positionMm: point,
  sizeMm: point,
});

export const modelResponseSchema = z.object({
  parts: z.array(partSchema),
  fixtures: z.array(fixtureSchema).default([]),
});
export type ModelResponse = z.infer<typeof modelResponseSchema>;

export interface PreviewPart {
  id: string;
  name: string;
  colour: string;
  positions: Float32Array;
  normals: Float32Array | null;
  indices: Uint32Array;
  edges: Float32Array | null;
  assembly: number[];
  exploded: number[];
}

export interface PreviewFixture {
  id: string;
  label: string;
  positionMm: { x: number; y: number; z: number };
  sizeMm: { x: number; y: number; z: number };
}

export interface PreviewModel {
  parts: PreviewPart[];
  fixtures: PreviewFixture[];
}

const IDENTITY = [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1];

const floats = (v: number[] | string) => (typeof v === "string" ? decodeFloat32(v) : Float32Array.from(v));
const uints = (v: number[] | string) => (typeof v === "string" ? decodeUint32(v) : Uint32Array.from(v));

/** Steel-grey for a part whose colour the server did not give. */
const fallbackColour = "#9aa5ae";

/** The server's answer as typed arrays ready for three.js. */
export function decodeModel(response: ModelResponse): PreviewModel {
  return {
    parts: response.parts.map((p) => ({
      id: p.id,
      name: p.name ?? p.id,
      colour: p.colour ?? p.color ?? fallbackColour,
      positions: floats(p.mesh.positions),
      normals: p.mesh.normals ? floats(p.mesh.normals) : null,
      indices: uints(p.mesh.indices),
      edges: p.mesh.edges ? floats(p.mesh.edges) : null,
      assembly: p.assembly ?? IDENTITY,
      exploded: p.exploded ?? p.assembly ?? IDENTITY,
    })),
    fixtures: response.fixtures.map((f) => ({
      id: f.id,
      label: f.label ?? f.id,
      positionMm: f.positionMm,
      sizeMm: f.sizeMm,
    })),
  };
}
