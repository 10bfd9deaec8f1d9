/**
 * Annotation requests: what each feature asks the drawing to say about it, in part space, before any view
 * or sheet position is chosen. Feature annotators produce them; the view assigner picks the view that shows
 * each one best; the view layout draws them (ISO 129-1) around the view.
 */
import type { Axis, Point3, ResolvedPart } from "../../parts/features";
import type { Formatter } from "../format";
import type { SignedAxis } from "../projection";

/** A box in part space (a point when min = max) where an extension line may start. */
export interface OriginRegion {
  min: Point3;
  max: Point3;
  /** Distance from the region to where the extension line starts, model mm (e.g. a hole's radius). */
  clearanceMm?: number;
}

/** A linear dimension along a part axis between two coordinates. */
export interface LinearRequest {
  kind: "linear";
  /** The feature it belongs to (for coverage checks and messages). */
  feature: string;
  role: "overall" | "size" | "location";
  axis: Axis;
  /** Coordinates along `axis`, model mm. */
  a: number;
  b: number;
  originA: OriginRegion;
  originB: OriginRegion;
  text: string;
  /** Toward-viewer axes of the views that show this best, best first. */
  prefer: SignedAxis[];
}

/** A leader note pointing at a feature: hole sizes, thread, slot width, chamfer. */
export interface CalloutRequest {
  kind: "callout";
  feature: string;
  /** Where the arrow touches when no circle is seen: a point on the feature's outline. */
  anchor: Point3;
  /** For round features: centre, axis and the radius the leader ends on when seen end-on. */
  round?: { centre: Point3; axis: Axis; radiusMm: number };
  lines: string[];
  prefer: SignedAxis[];
}

/** Cosmetic thread lines (ISO 6410-1), drawn by the view layout in views that show the thread. */
export interface ThreadMarkRequest {
  kind: "thread-mark";
  feature: string;
  form: "internal" | "external";
  /** Thread axis, the point where the thread starts and the direction it runs. */
  start: Point3;
  direction: SignedAxis;
  lengthMm: number;
  majorMm: number;
  minorMm: number;
}

/**
 * An angular dimension (ISO 129-1): the angle at `vertex`, in the plane across `axis`, between the nearest
 * principal centre line of the view and the line from the vertex through `through` (a bore's centre). Drawn
 * in a view that looks along `axis`; where no such view is drawn, `fallbackLine` joins the feature's
 * callout so the angle is still stated.
 */
export interface AngularRequest {
  kind: "angular";
  feature: string;
  vertex: Point3;
  axis: Axis;
  through: Point3;
  /** The outline the arc must clear (the part's outer radius about the vertex), model mm. */
  outlineRadiusMm: number;
  fallbackLine: string;
  prefer: SignedAxis[];
}

export type AnnotationRequest = LinearRequest | CalloutRequest | ThreadMarkRequest | AngularRequest;

/** ISO metric thread data an annotator needs (from the thread calculator). */
export interface ThreadInfo {
  designation: string;
  nominalMm: number;
  pitchMm: number;
  /** Internal thread minor diameter D1 (ISO 724), mm. */
  internalMinorMm: number;
  /** External thread minor diameter d3 (ISO 724), mm. */
  externalMinorMm: number;
  /** Usual tap drill, mm. */
  tapDrillMm: number;
  coarse: boolean;
}

export type ThreadLookup = (designation: string) => ThreadInfo;

/** Hole tolerance limits from ISO 286 (deviations in mm), or undefined when the class is unknown. */
export type FitLookup = (nominalMm: number, toleranceClass: string, kind: "hole" | "shaft") => { upper: number; lower: number } | undefined;

export interface AnnotateContext {
  part: ResolvedPart;
  baseKind: "block" | "turned";
  /** The part's bounding box (the base's), model mm. */
  bbox: { min: Point3; max: Point3 };
  /** Coordinate of the datum plane along an axis (a turned part's x and y datum is its axis). */
  datum(axis: Axis): number;
  fmt: Formatter;
  threads: ThreadLookup;
  fits: FitLookup;
  /** Whether fit callouts show their limits, "Ø5 H7 (+0.012/0)". */
  showFitLimits: boolean;
}
