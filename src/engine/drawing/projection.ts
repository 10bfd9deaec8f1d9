/**
 * What the solid kernel hands to the drawing generator: each view of a part projected by the exact
 * hidden-line algorithm, as plain 2D geometry in the view's own frame (mm, model scale, +x right, +y up as
 * seen by the viewer). The drawing generator places, scales, dimensions and exports it; it never calls the
 * kernel itself.
 */

export type ViewName = "front" | "top" | "right" | "left" | "bottom" | "rear";
export const VIEW_NAMES: readonly ViewName[] = ["front", "top", "right", "left", "bottom", "rear"];

/** A part axis with a sign, e.g. "+x" or "-z". Every view of a part is axis-aligned. */
export type SignedAxis = "+x" | "-x" | "+y" | "-y" | "+z" | "-z";

/** A point in a view's 2D frame, model millimetres (not yet on the sheet). */
export interface ViewPoint {
  x: number;
  y: number;
}

export type ViewCurve =
  | { type: "line"; from: ViewPoint; to: ViewPoint }
  | { type: "circle"; centre: ViewPoint; radius: number }
  /** Counter-clockwise from startDeg to endDeg (endDeg > startDeg, at most 360° apart). */
  | { type: "arc"; centre: ViewPoint; radius: number; startDeg: number; endDeg: number }
  | { type: "polyline"; points: ViewPoint[] };

export interface ViewEdge {
  visibility: "visible" | "hidden";
  curve: ViewCurve;
}

/**
 * A centre line from a cylindrical face: a cross where the axis points at the viewer, else a line.
 * Extents are exact (the cylinder's radius, the face's extent along the axis); the drawing adds the
 * overshoot beyond the outline in sheet millimetres.
 */
export type CentreMark =
  | { type: "cross"; centre: ViewPoint; radius: number }
  | { type: "axis"; from: ViewPoint; to: ViewPoint };

export interface ProjectedView {
  name: ViewName;
  /** Unit vector from the part toward the viewer, in part coordinates. */
  towardViewer: { x: number; y: number; z: number };
  /** Part axis that appears as the view's +x (right) and +y (up). */
  right: SignedAxis;
  up: SignedAxis;
  edges: ViewEdge[];
  centreMarks: CentreMark[];
  /** Bounding box of the edges in the view frame. */
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
}

export interface ProjectedPart {
  partId: string;
  views: ProjectedView[];
}

/**
 * Where a part's balloon leader points in an assembly view: a point on the part's visible faces, deepest
 * inside its visible patch (assemblyAnchors.ts); for a part hidden in that view, the projected centre of
 * its placed box with `visibleShare` 0.
 */
export interface AssemblyAnchor {
  partId: string;
  view: ViewName;
  point: ViewPoint;
  /** How far the point lies inside the part's visible patch, model mm (0 or absent: hidden). */
  clearanceMm?: number;
  /** The part's visible fraction of its own outline area in this view (0 = hidden). */
  visibleShare?: number;
}

/** The assembly projected as one body (parts at their placements), with an anchor per part and view. */
export interface ProjectedAssembly {
  views: ProjectedView[];
  anchors: AssemblyAnchor[];
}

/** The unit vector of a signed axis. */
export function axisVector(axis: SignedAxis): { x: number; y: number; z: number } {
  const s = axis[0] === "-" ? -1 : 1;
  return { x: axis[1] === "x" ? s : 0, y: axis[1] === "y" ? s : 0, z: axis[1] === "z" ? s : 0 };
}

/** The signed axis of an axis-aligned unit vector (components within 1e-9 of 0 or ±1). */
export function signedAxisOf(v: { x: number; y: number; z: number }): SignedAxis {
  const entries: [number, "x" | "y" | "z"][] = [
    [v.x, "x"],
    [v.y, "y"],
    [v.z, "z"],
  ];
  const major = entries.filter(([c]) => Math.abs(c) > 1e-9);
  if (major.length !== 1) throw new Error(`Vector (${v.x}, ${v.y}, ${v.z}) is not along a part axis.`);
  const [c, name] = major[0]!;
  return `${c > 0 ? "+" : "-"}${name}` as SignedAxis;
}

/**
 * Where a part-space point lands in a view: its components along the view's right and up axes.
 * Orthographic projection drops the component toward the viewer.
 */
export function projectToView(view: Pick<ProjectedView, "right" | "up">, p: { x: number; y: number; z: number }): ViewPoint {
  return { x: component(p, view.right), y: component(p, view.up) };
}

/** The depth of a point toward the viewer (larger = nearer). */
export function depthInView(view: Pick<ProjectedView, "towardViewer">, p: { x: number; y: number; z: number }): number {
  const t = view.towardViewer;
  return p.x * t.x + p.y * t.y + p.z * t.z;
}

function component(p: { x: number; y: number; z: number }, axis: SignedAxis): number {
  const v = p[axis[1] as "x" | "y" | "z"];
  return axis[0] === "-" ? -v : v;
}
