/**
 * What the solid kernel hands to the drawing generator: each view of a part projected by the exact
 * hidden-line algorithm, as plain 2D geometry in the view's own frame (mm, model scale, +x right, +y up as
 * seen by the viewer). The drawing generator places, scales, dimensions and exports it; it never calls the
 * kernel itself.
 */

export type ViewName = "front" | "top" | "right" | "left" | "bottom" | "rear";

/** A point in a view's 2D frame, model millimetres (not yet on the sheet). */
export interface ViewPoint {
  x: number;
  y: number;
}

export type ViewCurve =
  | { type: "line"; from: ViewPoint; to: ViewPoint }
  | { type: "circle"; centre: ViewPoint; radius: number }
  /** Counter-clockwise from startDeg to endDeg. */
  | { type: "arc"; centre: ViewPoint; radius: number; startDeg: number; endDeg: number }
  | { type: "polyline"; points: ViewPoint[] };

export interface ViewEdge {
  visibility: "visible" | "hidden";
  curve: ViewCurve;
}

/** A centre line from a cylindrical face: a cross where the axis points at the viewer, else a line. */
export type CentreMark =
  | { type: "cross"; centre: ViewPoint; radius: number }
  | { type: "axis"; from: ViewPoint; to: ViewPoint };

export interface ProjectedView {
  name: ViewName;
  /** Unit vector from the part toward the viewer, in part coordinates. */
  towardViewer: { x: number; y: number; z: number };
  /** Part x/y/z axis that appears as the view's +x (right) and +y (up), e.g. "+x", "-y". */
  right: string;
  up: string;
  edges: ViewEdge[];
  centreMarks: CentreMark[];
  /** Bounding box of the edges in the view frame. */
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
}

export interface ProjectedPart {
  partId: string;
  views: ProjectedView[];
}
