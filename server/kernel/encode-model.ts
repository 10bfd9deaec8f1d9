import { getMaterial, isMaterialKey } from "@/engine/materials";
import { partMassKgOrUndefined } from "@/engine/parts/analytic";
import type { ResolvedPart } from "@/engine/parts/features";
import { materialColour, type ModelPart } from "@/shared/model";
import type { BuiltPart } from "./build-part";
import type { MeshData } from "./mesh";
import { assemblyMatrix, explodedMatrix } from "./placement";

const b64 = (a: Float32Array | Uint32Array) => Buffer.from(a.buffer, a.byteOffset, a.byteLength).toString("base64");

/** One part of the 3D preview answer (src/shared/model.ts), from the exact solid and its mesh. */
export function modelPart(part: ResolvedPart, built: BuiltPart, mesh: MeshData): ModelPart {
  const massKg = partMassKgOrUndefined(part, built.volumeMm3);
  return {
    id: part.id,
    name: part.name,
    material: part.material,
    ...(isMaterialKey(part.material) ? { materialName: getMaterial(part.material).name } : {}),
    colour: materialColour(part.material),
    quantity: Math.max(1, Math.round(part.quantity ?? 1)),
    bboxMm: built.bbox,
    volumeMm3: built.volumeMm3,
    massKg: massKg ?? null,
    valid: true,
    mesh: {
      positions: b64(mesh.positions),
      normals: b64(mesh.normals),
      indices: b64(mesh.indices),
      edges: b64(mesh.edges),
      vertexCount: mesh.positions.length / 3,
      triangleCount: mesh.indices.length / 3,
    },
    assembly: assemblyMatrix(part),
    exploded: explodedMatrix(part),
    threads: built.threads,
  };
}

/** The part as UTF-8 JSON bytes, ready to splice into the answer without touching the web thread's heap. */
export function encodeModelPart(part: ResolvedPart, built: BuiltPart, mesh: MeshData): Uint8Array {
  const buf = Buffer.from(JSON.stringify(modelPart(part, built, mesh)), "utf8");
  // A fresh, exactly sized ArrayBuffer (Buffer.from may use a shared pool), so it can be transferred.
  const out = new Uint8Array(buf.byteLength);
  out.set(buf);
  return out;
}
