/**
 * The view cameras of a part: for each principal view, the direction toward the viewer and the part axes
 * that appear as the view's right and up. These are our own cameras (not a kernel's named views, some of
 * which are mirrored), shared by the kernel (which projects with them) and the drawing (which places
 * dimensions with them).
 *
 * A part's "front" frame is chosen from its base: a block is seen from −y with x right and z up; a turned
 * part is drawn the way a lathe hand reads it, axis horizontal (+z right) and +x up, seen from +y.
 * The other five views follow from the front frame by the rules of orthographic projection
 * (ISO 5456-2 §4): the view from the right looks along the front view's right axis, the view from above
 * along its up axis, and each view's right × up points toward its viewer.
 */
import type { ResolvedPart } from "../parts/features";
import { axisVector, signedAxisOf, type SignedAxis, type ViewName } from "./projection";

export interface ViewFrame {
  name: ViewName;
  towardViewer: SignedAxis;
  right: SignedAxis;
  up: SignedAxis;
}

type Vec = { x: number; y: number; z: number };

const cross = (a: Vec, b: Vec): Vec => ({ x: a.y * b.z - a.z * b.y, y: a.z * b.x - a.x * b.z, z: a.x * b.y - a.y * b.x });
const neg = (a: Vec): Vec => ({ x: -a.x, y: -a.y, z: -a.z });

/** The front frame of a part from its base feature. */
export function frontFrame(baseKind: "block" | "turned"): ViewFrame {
  return baseKind === "turned"
    ? { name: "front", towardViewer: "+y", right: "+z", up: "+x" }
    : { name: "front", towardViewer: "-y", right: "+x", up: "+z" };
}

/** The frame of any principal view, derived from the front frame (right × up = toward the viewer). */
export function viewFrame(baseKind: "block" | "turned", name: ViewName): ViewFrame {
  const f = frontFrame(baseKind);
  const T = axisVector(f.towardViewer);
  const R = axisVector(f.right);
  const U = axisVector(f.up);
  let t: Vec;
  let r: Vec;
  let u: Vec;
  switch (name) {
    case "front":
      return f;
    case "rear":
      t = neg(T);
      u = U;
      r = cross(u, t);
      break;
    case "right":
      t = R;
      u = U;
      r = cross(u, t);
      break;
    case "left":
      t = neg(R);
      u = U;
      r = cross(u, t);
      break;
    case "top":
      t = U;
      r = R;
      u = cross(t, r);
      break;
    case "bottom":
      t = neg(U);
      r = R;
      u = cross(t, r);
      break;
  }
  return { name, towardViewer: signedAxisOf(t), right: signedAxisOf(r), up: signedAxisOf(u) };
}

/** The base kind of a part (its first feature). */
export function baseKindOf(part: ResolvedPart): "block" | "turned" {
  const base = part.features[0];
  if (!base || (base.kind !== "block" && base.kind !== "turned")) {
    throw new Error(`Part "${part.id}" does not start with a block or turned base.`);
  }
  return base.kind;
}

/** The views drawn when neither the part nor the template chooses: see {@link viewsForPart}. */
export function defaultViewNames(kind: "block" | "turned"): ViewName[] {
  return kind === "turned" ? ["front", "right"] : ["front", "top", "right"];
}

/**
 * The views drawn for a part: the part's own choice (`parts[].drawing.views`), else the template's
 * (`drawing.views`, "views for parts that do not list their own"), else front, top and right for a block
 * (three views fix every prismatic feature) and front and right (the end view) for a turned part.
 * The front view is always drawn (it is the principal view, ISO 5456-2 §5), first when it was left out.
 */
export function viewsForPart(part: ResolvedPart, templateViews?: readonly ViewName[]): ViewFrame[] {
  const kind = baseKindOf(part);
  const names: readonly ViewName[] = part.drawing?.views ?? (templateViews && templateViews.length > 0 ? templateViews : defaultViewNames(kind));
  const unique = [...new Set(names)];
  if (!unique.includes("front")) unique.unshift("front");
  return unique.map((n) => viewFrame(kind, n));
}
