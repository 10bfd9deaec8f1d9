import {
  BufferAttribute,
  BufferGeometry,
  Matrix4,
  Vector3,
  Box3,
  Sphere,
  type PerspectiveCamera,
} from "three";
import type { PreviewFixture, PreviewPart } from "../api/model-schema";

/** A part's triangles as a three.js geometry (normals computed when the server sent none). */
export function partGeometry(part: PreviewPart): BufferGeometry {
  const g = new BufferGeometry();
  g.setAttribute("position", new BufferAttribute(part.positions, 3));
  if (part.normals && part.normals.length === part.positions.length)
    g.setAttribute("normal", new BufferAttribute(part.normals, 3));
  g.setIndex(new BufferAttribute(part.indices, 1));
  if (!g.getAttribute("normal")) g.computeVertexNormals();
  g.computeBoundingSphere();
  return g;
}

/** A part's sharp edges as line segments, or null when the server sent none. */
export function edgeGeometry(part: PreviewPart): BufferGeometry | null {
  if (!part.edges || part.edges.length < 6) return null;
  const g = new BufferGeometry();
  g.setAttribute("position", new BufferAttribute(part.edges, 3));
  return g;
}

export const matrixOf = (elements: readonly number[]) => new Matrix4().fromArray(elements as number[]);

/** Centre of a ghost fixture box (its position is the minimum corner). */
export function fixtureCentre(f: PreviewFixture): [number, number, number] {
  return [f.positionMm.x + f.sizeMm.x / 2, f.positionMm.y + f.sizeMm.y / 2, f.positionMm.z + f.sizeMm.z / 2];
}

/** View directions (from the target towards the camera) in assembly coordinates, z up. */
export const viewDirections = {
  iso: new Vector3(1, -1.3, 0.9).normalize(),
  front: new Vector3(0, -1, 0),
  side: new Vector3(1, 0, 0),
  top: new Vector3(0, -0.0001, 1).normalize(),
} as const;
export type ViewName = keyof typeof viewDirections;

/**
 * Places a perspective camera so the box fills the view from `direction`, whatever the canvas shape:
 * distance = radius / sin(half the narrower field of view), plus a margin.
 */
export function fitCamera(
  camera: PerspectiveCamera,
  box: Box3,
  direction: Vector3,
  margin = 1.12,
): Vector3 | null {
  if (box.isEmpty()) return null;
  const sphere = box.getBoundingSphere(new Sphere());
  const vertical = (camera.fov * Math.PI) / 180;
  const horizontal = 2 * Math.atan(Math.tan(vertical / 2) * camera.aspect);
  const half = Math.min(vertical, horizontal) / 2;
  const distance = (sphere.radius / Math.sin(half)) * margin;
  camera.position.copy(sphere.center).addScaledVector(direction.clone().normalize(), distance);
  camera.near = Math.max(0.1, distance / 100);
  camera.far = distance * 100;
  camera.lookAt(sphere.center);
  camera.updateProjectionMatrix();
  return sphere.center.clone();
}
