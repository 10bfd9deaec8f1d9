import type { Shape3D } from "replicad";
import type { ChamferFeature, Direction, PatternableFeature, Point3, ResolvedFeature, ResolvedPart } from "@/engine/parts/features";
import type { BaseGeometry } from "@/engine/parts/frame";
import type { LoadedKernel } from "../oc";
import type { Vec3 } from "../frame";

/**
 * The part's base as the builders see it, with its axis-aligned extent (part-local mm) as vectors, and the
 * engine's own {@link BaseGeometry} so builders can call the engine's geometry helpers (the analytic volume
 * uses the same ones, which keeps solids and numbers in step).
 */
export type BaseInfo =
  | { kind: "block"; size: Point3; min: Vec3; max: Vec3; geometry: BaseGeometry }
  | { kind: "turned"; steps: { diameter: number; length: number }[]; lengthMm: number; min: Vec3; max: Vec3; geometry: BaseGeometry };

/**
 * A thread recorded for the drawings (ISO 6410 shows threads conventionally, not modelled as helices).
 * Internal: the solid has a hole at the minor diameter; external: the step stays at the major diameter.
 */
export interface CosmeticThread {
  featureIndex: number;
  featureId?: string;
  form: "internal" | "external";
  designation: string;
  nominalDiameterMm: number;
  minorDiameterMm: number;
  pitchMm: number;
  /** Length of full thread. */
  lengthMm: number;
  /** Where the thread starts (on the entry face, or at the chosen end of the step). */
  origin: Point3;
  /** Unit vector along which the thread runs from `origin`. */
  direction: Point3;
  through: boolean;
}

/** What a builder gets besides its feature. */
export interface BuildContext {
  kernel: LoadedKernel;
  part: ResolvedPart;
  base: BaseInfo;
  /** Index of the feature being built in `part.features` (patterns pass their own index to the inner one). */
  featureIndex: number;
  /**
   * Builds the tool of a patternable feature (patterns call it for each copy); `base` overrides the base
   * extent used for "through" depths.
   */
  buildTool(feature: PatternableFeature, base?: BaseInfo): ToolResult;
}

/** Material to remove, plus any cosmetic threads that go with it. */
export interface ToolResult {
  tools: Shape3D[];
  threads: CosmeticThread[];
}

export type FeatureOf<K extends ResolvedFeature["kind"]> = Extract<ResolvedFeature, { kind: K }>;

/** Creates the first solid of a part, with the part's base modifiers (chamfers) already applied. */
export interface BaseBuilder<K extends ResolvedFeature["kind"] = ResolvedFeature["kind"]> {
  kind: K;
  role: "base";
  create(feature: FeatureOf<K>, ctx: BuildContext, chamfers: ChamferFeature[]): Shape3D;
}

/**
 * A feature the base builder folds into the base solid (it only trims the base's outside edges, so it
 * commutes with every cut); the registry entry marks the kind as handled.
 */
export interface BaseModifierBuilder<K extends ResolvedFeature["kind"] = ResolvedFeature["kind"]> {
  kind: K;
  role: "base-modifier";
}

/** Cuts tools out of the current solid (the cut itself is done by the part builder). */
export interface ToolBuilder<K extends ResolvedFeature["kind"] = ResolvedFeature["kind"]> {
  kind: K;
  role: "tool";
  tool(feature: FeatureOf<K>, ctx: BuildContext): ToolResult;
}

/** Changes the current solid itself (chamfers) or only records information (external threads). */
export interface ModifyBuilder<K extends ResolvedFeature["kind"] = ResolvedFeature["kind"]> {
  kind: K;
  role: "modify";
  /** Returns the new solid (or the same one) and any threads; must not delete `shape`. */
  apply(shape: Shape3D, feature: FeatureOf<K>, ctx: BuildContext): { shape: Shape3D; threads: CosmeticThread[] };
}

export type FeatureBuilder = BaseBuilder | ToolBuilder | ModifyBuilder | BaseModifierBuilder;

/** A little slack so tools start just outside their entry face and never leave a sliver face behind. */
export const ENTRY_CLEARANCE_MM = 0.1;

export interface DirectionalFeature {
  at: Point3;
  direction: Direction;
}
