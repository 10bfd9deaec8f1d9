import type { MeshData } from "./mesh";
import { transformPoint, type Matrix4 } from "./placement";

/**
 * Binary STL (the de-facto format: an 80-byte header, a little-endian uint32 triangle count, then per
 * triangle a float32 normal, three float32 vertices and a uint16 attribute, 50 bytes). Units are mm.
 * Several meshes (an assembly) are written into one file, each moved by its matrix.
 */
export function binaryStl(meshes: { mesh: MeshData; matrix?: Matrix4 }[], header = "Jigwright STL, units mm"): Uint8Array {
  const count = meshes.reduce((s, m) => s + m.mesh.indices.length / 3, 0);
  const bytes = new Uint8Array(84 + 50 * count);
  const view = new DataView(bytes.buffer);
  const head = new TextEncoder().encode(header.slice(0, 80));
  bytes.set(head.subarray(0, 80), 0);
  view.setUint32(80, count, true);
  let o = 84;
  for (const { mesh, matrix } of meshes) {
    const p = mesh.positions;
    const idx = mesh.indices;
    for (let t = 0; t < idx.length; t += 3) {
      const v = [idx[t]!, idx[t + 1]!, idx[t + 2]!].map((i) => {
        const x = p[i * 3]!, y = p[i * 3 + 1]!, z = p[i * 3 + 2]!;
        return matrix ? transformPoint(matrix, x, y, z) : ([x, y, z] as [number, number, number]);
      }) as [number, number, number][];
      const [a, b, c] = v as [[number, number, number], [number, number, number], [number, number, number]];
      const u = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
      const w = [c[0] - a[0], c[1] - a[1], c[2] - a[2]];
      let n = [u[1]! * w[2]! - u[2]! * w[1]!, u[2]! * w[0]! - u[0]! * w[2]!, u[0]! * w[1]! - u[1]! * w[0]!];
      const len = Math.hypot(n[0]!, n[1]!, n[2]!);
      n = len > 0 ? n.map((x) => x / len) : [0, 0, 0];
      for (const x of [...n, ...v[0]!, ...v[1]!, ...v[2]!]) {
        view.setFloat32(o, x, true);
        o += 4;
      }
      view.setUint16(o, 0, true);
      o += 2;
    }
  }
  return bytes;
}
