import type { AnyShape, Shape3D } from "replicad";
import type { LoadedKernel } from "./oc";

/** Triangles of one part for the 3D preview and STL, in part-local millimetres. */
export interface MeshData {
  /** x, y, z per vertex. */
  positions: Float32Array;
  /** Unit normal per vertex (vertices are not shared between faces, so flat faces shade flat). */
  normals: Float32Array;
  /** Three vertex indices per triangle, counter-clockwise seen from outside. */
  indices: Uint32Array;
  /** Sharp edges as line segments: x0, y0, z0, x1, y1, z1 per segment (for crisp outlines in the preview). */
  edges: Float32Array;
}

export interface MeshOptions {
  /** Chordal deviation in mm. */
  toleranceMm: number;
  /** Angular deviation in radians. */
  angularTolerance: number;
}

export const DEFAULT_MESH_OPTIONS: MeshOptions = { toleranceMm: 0.01, angularTolerance: 0.1 };

/** Copies `size` elements at `pointer` out of the WASM heap into a fresh (transferable) typed array. */
function copyOut<T extends Float32Array | Uint32Array>(Ctor: { new (buffer: ArrayBufferLike): T; BYTES_PER_ELEMENT: number }, buffer: ArrayBufferLike, pointer: number, size: number): T {
  const heap = new Ctor(buffer);
  const start = (pointer >>> 0) / Ctor.BYTES_PER_ELEMENT;
  return (heap.subarray(start, start + size) as T).slice() as T;
}

/**
 * Triangulates the exact solid (BRepMesh through replicad's extractor) and copies the arrays straight out of
 * the kernel's heap. Adjacent faces share their edge discretisation, so the mesh is closed.
 */
export function meshShape(kernel: LoadedKernel, shape: Shape3D, options: MeshOptions = DEFAULT_MESH_OPTIONS): MeshData {
  const { oc } = kernel;
  const raw = oc.ReplicadMeshExtractor.extract(shape.wrapped, options.toleranceMm, options.angularTolerance, false);
  let positions: Float32Array, normals: Float32Array, indices: Uint32Array;
  try {
    const buffer = (oc.wasmMemory as WebAssembly.Memory).buffer;
    positions = copyOut(Float32Array, buffer, raw.getVerticesPtr(), raw.getVerticesSize());
    normals = copyOut(Float32Array, buffer, raw.getNormalsPtr(), raw.getNormalsSize());
    indices = copyOut(Uint32Array, buffer, raw.getTrianglesPtr(), raw.getTrianglesSize());
  } finally {
    raw.delete();
  }
  const rawEdges = oc.ReplicadEdgeMeshExtractor.extract(shape.wrapped, options.toleranceMm, options.angularTolerance);
  let lines: Float32Array;
  try {
    const buffer = (oc.wasmMemory as WebAssembly.Memory).buffer;
    lines = copyOut(Float32Array, buffer, rawEdges.getLinesPtr(), rawEdges.getLinesSize());
  } finally {
    rawEdges.delete();
  }
  return { positions, normals, indices, edges: polylinesToSegments(lines) };
}

/**
 * Only the triangles (positions and indices, no normals or edge lines) of the exact solid: for work that
 * needs the surface but never shows it (which part the viewer sees where on an assembly drawing).
 */
export function meshTriangles(kernel: LoadedKernel, shape: Pick<AnyShape, "wrapped">, options: MeshOptions): Pick<MeshData, "positions" | "indices"> {
  const { oc } = kernel;
  const raw = oc.ReplicadMeshExtractor.extract(shape.wrapped, options.toleranceMm, options.angularTolerance, false);
  try {
    const buffer = (oc.wasmMemory as WebAssembly.Memory).buffer;
    return {
      positions: copyOut(Float32Array, buffer, raw.getVerticesPtr(), raw.getVerticesSize()),
      indices: copyOut(Uint32Array, buffer, raw.getTrianglesPtr(), raw.getTrianglesSize()),
    };
  } finally {
    raw.delete();
  }
}

/**
 * replicad's edge extractor returns each edge as consecutive segment pairs already (p0 p1 p1 p2 …); keep
 * the array as is when its length is a multiple of 6, which is the line-segment layout three.js expects.
 */
function polylinesToSegments(lines: Float32Array): Float32Array {
  return lines.length % 6 === 0 ? lines : lines.slice(0, lines.length - (lines.length % 6));
}
