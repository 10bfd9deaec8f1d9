import { z } from "zod";

/**
 * API contract of the 3D preview: `GET /api/templates/:id/model?units=mm|in&<param>=<value>…` and
 * `POST /api/templates/:id/model` with `{ parameters, units }` (the same body as `/evaluate`).
 *
 * Encoding (compact JSON):
 *  - Typed arrays travel as **base64 of their little-endian bytes**: `positions`, `normals` and `edges` are
 *    Float32 (x, y, z per vertex; `edges` is line segments, 6 floats per segment), `indices` is Uint32
 *    (3 per triangle, counter-clockwise seen from outside). Decode with {@link decodeFloat32} /
 *    {@link decodeUint32}. Vertices are not shared between faces, so flat faces shade flat.
 *  - Lengths are millimetres whatever `units` says (`units` only echoes the user's choice for labels).
 *  - Meshes are in the part's own frame (features.ts: a block occupies [0,x]×[0,y]×[0,z]; a turned part
 *    stands on +z from z = 0). `assembly` places the part: a 4 × 4 matrix, column-major (three.js
 *    `Matrix4.fromArray`), M = T(position) · Rₙ · … · R₁ where each Rᵢ is a rotation about the fixed
 *    assembly x, y or z axis in the order the template lists them. `exploded` = T(explode) · `assembly`.
 *  - `fixtures` are ghost boxes of the user's machine (e.g. the vise jaws) in assembly coordinates:
 *    `positionMm` is the minimum corner, `sizeMm` the extents.
 *  - `volumeMm3` and `valid` come from the exact solid (OpenCascade B-rep), `massKg` from it and the
 *    catalogue density (null for a material outside the catalogue).
 *  - `threads` are cosmetic thread records (ISO 6410: drawn, not modelled): an internal thread's hole is
 *    its tap-drill bore, an external thread's step stays at the major diameter.
 * Errors use the common `{ error: { code, message, details } }` body: 400 when the parameters are bad or
 * give a part the kernel cannot build (`details[].path` like `parts.stop-body.features.3`), 503 when the
 * kernel is busy, timed out or not running.
 */

const base64 = z.string().regex(/^[A-Za-z0-9+/]*={0,2}$/, "base64");
const point = z.object({ x: z.number(), y: z.number(), z: z.number() });
const matrix4 = z.array(z.number()).length(16);
const vec3 = z.tuple([z.number(), z.number(), z.number()]);

export const modelMeshSchema = z.object({
  positions: base64,
  normals: base64,
  indices: base64,
  edges: base64,
  vertexCount: z.number().int().nonnegative(),
  triangleCount: z.number().int().nonnegative(),
});
export type ModelMesh = z.infer<typeof modelMeshSchema>;

export const modelThreadSchema = z.object({
  form: z.enum(["internal", "external"]),
  designation: z.string(),
  nominalDiameterMm: z.number(),
  minorDiameterMm: z.number(),
  pitchMm: z.number(),
  lengthMm: z.number(),
  /** Part-local start point and unit direction of the thread. */
  origin: point,
  direction: point,
  through: z.boolean(),
  featureIndex: z.number().int(),
  featureId: z.string().optional(),
});
export type ModelThread = z.infer<typeof modelThreadSchema>;

export const modelPartSchema = z.object({
  id: z.string(),
  name: z.string(),
  /** Materials catalogue key, e.g. "mild-steel". */
  material: z.string(),
  materialName: z.string().optional(),
  /** "#rrggbb" by material ({@link materialColour}). */
  colour: z.string().regex(/^#[0-9a-f]{6}$/),
  quantity: z.number().int().positive(),
  /** Part-local bounding box of the solid, mm. */
  bboxMm: z.object({ min: vec3, max: vec3 }),
  volumeMm3: z.number().positive(),
  massKg: z.number().nonnegative().nullable(),
  valid: z.literal(true),
  mesh: modelMeshSchema,
  assembly: matrix4,
  exploded: matrix4,
  threads: z.array(modelThreadSchema),
});
export type ModelPart = z.infer<typeof modelPartSchema>;

export const modelFixtureSchema = z.object({
  id: z.string(),
  label: z.string(),
  positionMm: point,
  sizeMm: point,
});
export type ModelFixture = z.infer<typeof modelFixtureSchema>;

export const modelResponseSchema = z.object({
  template: z.object({ id: z.string(), version: z.string() }),
  units: z.enum(["mm", "in"]),
  /** SHA-256 of the canonical (template id, version, parameters in mm): the same on every server. */
  cacheKey: z.string().regex(/^[0-9a-f]{64}$/),
  parts: z.array(modelPartSchema),
  fixtures: z.array(modelFixtureSchema),
});
export type ModelResponse = z.infer<typeof modelResponseSchema>;

/** Display colours by material (steel greys, bronze and brass yellows, light aluminium, off-white acetal). */
export const MATERIAL_COLOURS: Readonly<Record<string, string>> = {
  "mild-steel": "#8d99a3",
  "free-cutting-steel": "#96a0a8",
  "tool-steel": "#6f7b86",
  "stainless-303": "#c2c8cc",
  "stainless-304": "#c8cdd1",
  "leaded-bronze": "#b07a45",
  "phosphor-bronze": "#b98a50",
  brass: "#c9a640",
  "aluminium-6061": "#d5d9dd",
  "aluminium-6082": "#d0d5da",
  "cast-iron": "#5e6368",
  acetal: "#ebe7dc",
};

/** Colour of a material key; a neutral grey for anything not listed. */
export function materialColour(material: string): string {
  return MATERIAL_COLOURS[material] ?? "#9aa5ae";
}

function bytesOf(b64: string): Uint8Array {
  const binary = atob(b64);
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}

/** Decodes a base64 little-endian Float32 array (positions, normals, edges). */
export function decodeFloat32(b64: string): Float32Array {
  const bytes = bytesOf(b64);
  const view = new DataView(bytes.buffer);
  const out = new Float32Array(bytes.length / 4);
  for (let i = 0; i < out.length; i++) out[i] = view.getFloat32(i * 4, true);
  return out;
}

/** Decodes a base64 little-endian Uint32 array (indices). */
export function decodeUint32(b64: string): Uint32Array {
  const bytes = bytesOf(b64);
  const view = new DataView(bytes.buffer);
  const out = new Uint32Array(bytes.length / 4);
  for (let i = 0; i < out.length; i++) out[i] = view.getUint32(i * 4, true);
  return out;
}
