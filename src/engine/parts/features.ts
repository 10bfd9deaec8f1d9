/**
 * The part and feature vocabulary: the closed list of things a template may ask the workshop to make.
 *
 * One factory builds two schemas from the same declaration:
 *  - the **template** form, as written in YAML: every numeric field is a number or an expression string
 *    (`"jawThickness + 2"`), every text field is literal text or an expression when it starts with `=`
 *    (`"=bodyMaterial"`), every `when` is a condition expression;
 *  - the **resolved** form, after the engine has evaluated the expressions: plain finite numbers and text.
 * Downstream consumers (analytic volume, solid builders, drawings, cut list, operation sheet) only ever see
 * the resolved form.
 *
 * Frames (all lengths in mm, part-local):
 *  - a `block` base occupies [0, size.x] × [0, size.y] × [0, size.z];
 *  - a `turned` base lies on the +z axis, starting at z = 0, centred on x = y = 0; its steps stack upward.
 * `direction` on a cutting feature is the way the tool travels into the material; `at` is the point where
 * it enters (the centre of a hole, the first end-centre of a slot, the centre of a pocket) on that face.
 *
 * Exact meaning (the analytic volume in analytic.ts, the solid builders and the drawings all follow it):
 *  - `through` runs from `at` to the far side of the base's box along `direction`; otherwise `depth` is
 *    measured from `at`. On a block, `at` may lie on the entry face or inside (a hole from a recess floor).
 *  - A hole's counterbore is concentric and starts at `at`; a countersink is a cone of `angleDeg`
 *    (default 90°) from `diameter` at the face down to the hole; `chamfer` is a 45° cone of that leg on the
 *    entry edge of the outermost diameter (the counterbore when there is one). A hole has a counterbore or
 *    a countersink, not both, and a countersink carries no extra chamfer.
 *  - On a turned part, ±z holes are axial (at any x, y inside the face); ±x / ±y holes are radial cross
 *    holes whose axis is the line through `at` parallel to `direction`; they enter at the outside diameter
 *    of the step they cross (the along-direction coordinate of `at` is not used) and `depth` is measured at
 *    the hole's axis from that surface; the hole is open to the outside across its whole width (an offset
 *    cross hole reaches the curved surface everywhere). Radial holes carry no counterbore, countersink or
 *    chamfer.
 *  - An internal thread is modelled as a plain hole of `boreDiameter` (the tap drill, filled in from the
 *    designation) to `drillDepth`; the thread itself is cosmetic. An external thread is cosmetic on its
 *    step (the step's diameter is the major diameter).
 *  - Slots, pockets, steps and V-grooves are for blocks; a V-groove runs the block's whole length along
 *    `along`. Chamfers act on the base's outside edges (on a turned part only the two end faces, ±z).
 *  - Eccentric bores are for turned parts: parallel to the axis, offset by `eccentricity` toward
 *    `angleDeg`, entering from the top (z = overall length, default) or the bottom (z = 0).
 *  - Pattern copies are translated by `spacing` (linear) or turned about the axis through `centre`
 *    (circular, axis parallel to the feature's direction); copy 0 is the feature itself.
 */
import { z } from "zod";

export const DIRECTIONS = ["+x", "-x", "+y", "-y", "+z", "-z"] as const;
export const directionSchema = z.enum(DIRECTIONS);
export type Direction = z.infer<typeof directionSchema>;

export const AXES = ["x", "y", "z"] as const;
export const axisSchema = z.enum(AXES);
export type Axis = z.infer<typeof axisSchema>;

export const MAX_EXPRESSION_LENGTH = 500;

/** An expression as written in a template (parsed and evaluated by the engine's expression sandbox). */
export const expressionSchema = z
  .string()
  .trim()
  .min(1, "An expression may not be empty.")
  .max(MAX_EXPRESSION_LENGTH, `An expression may be at most ${MAX_EXPRESSION_LENGTH} characters long.`);

interface FieldKinds<N extends z.ZodType, S extends z.ZodType, B extends z.ZodType> {
  num: N;
  text: S;
  bool: B;
}

/** Builds every feature and part schema over the given field kinds. */
function vocabulary<N extends z.ZodType, S extends z.ZodType, B extends z.ZodType>(k: FieldKinds<N, S, B>) {
  const { num, text, bool } = k;
  const point = z.strictObject({ x: num, y: num, z: num });
  const common = { id: z.string().regex(/^[a-z][a-zA-Z0-9-]*$/).max(60).optional(), when: bool.optional(), label: text.optional() };

  const block = z.strictObject({ kind: z.literal("block"), ...common, size: point });
  /** One diameter of a turned part; `fit` is its ISO 286 shaft tolerance class (e.g. "g6"), drawn after the size. */
  const turnedStep = z.strictObject({ diameter: num, length: num, label: text.optional(), fit: text.optional() });
  const turned = z.strictObject({ kind: z.literal("turned"), ...common, steps: z.array(turnedStep).min(1).max(20) });

  const counterbore = z.strictObject({ diameter: num, depth: num });
  const countersink = z.strictObject({ diameter: num, angleDeg: num.optional() });
  const hole = z.strictObject({
    kind: z.literal("hole"),
    ...common,
    at: point,
    direction: directionSchema,
    diameter: num,
    /** Depth of the full diameter (drill point not modelled); omitted when `through`. */
    depth: num.optional(),
    through: z.boolean().optional(),
    /** ISO 286 hole tolerance class, e.g. "H7". */
    fit: text.optional(),
    finish: z.enum(["drilled", "reamed", "bored"]).optional(),
    /** 45° chamfer on the entry edge, leg length. */
    chamfer: num.optional(),
    counterbore: counterbore.optional(),
    countersink: countersink.optional(),
  });

  const internalThread = z.strictObject({
    kind: z.literal("thread"),
    ...common,
    form: z.literal("internal"),
    at: point,
    direction: directionSchema,
    /** ISO metric designation, "M6" (coarse) or "M6x0.75" (fine). */
    designation: text,
    /** Length of full thread. */
    depth: num.optional(),
    /** Depth of the tap-drill hole; defaults to thread depth plus a tap run-out allowance. */
    drillDepth: num.optional(),
    through: z.boolean().optional(),
    chamfer: num.optional(),
    /** Diameter of the modelled (tap-drill) hole; the engine fills it in from the designation when omitted. */
    boreDiameter: num.optional(),
    /** Thread pitch; the engine fills it in from the designation. */
    pitch: num.optional(),
  });
  const externalThread = z.strictObject({
    kind: z.literal("thread"),
    ...common,
    form: z.literal("external"),
    /** Index (0-based) of the turned step that carries the thread; its diameter is the major diameter. */
    step: z.number().int().min(0),
    designation: text,
    /** Thread length measured from the chosen end of the step. */
    length: num,
    from: z.enum(["start", "end"]).optional(),
    /** Thread pitch; the engine fills it in from the designation. */
    pitch: num.optional(),
    /** Minor diameter of the external thread (ISO 724), for the drawing's thin line; filled in by the engine. */
    minorDiameter: num.optional(),
  });

  const slot = z.strictObject({
    kind: z.literal("slot"),
    ...common,
    /** Centre of the first rounded end, on the entry face. */
    at: point,
    direction: directionSchema,
    /** Axis along which the slot runs (must be perpendicular to `direction`). */
    along: axisSchema,
    /** Centre-to-centre length of the slot along `along` (the slot spans length + width overall). */
    length: num,
    width: num,
    depth: num.optional(),
    through: z.boolean().optional(),
  });

  const rectShape = z.strictObject({ kind: z.literal("rect"), u: num, v: num, cornerRadius: num.optional() });
  const roundShape = z.strictObject({ kind: z.literal("round"), diameter: num });
  const pocket = z.strictObject({
    kind: z.literal("pocket"),
    ...common,
    /** Centre of the pocket on the entry face. */
    at: point,
    direction: directionSchema,
    /** `u` and `v` are the face's two axes in x, y, z order (for ±z: u = x, v = y; ±x: y, z; ±y: x, z). */
    shape: z.discriminatedUnion("kind", [rectShape, roundShape]),
    depth: num,
  });

  /** Removes the axis-aligned box between two corners; the box must reach at least one outside face. */
  const step = z.strictObject({ kind: z.literal("step"), ...common, from: point, to: point });

  /** A V-groove cut along an axis, symmetric about `at` (a point on the groove's centre line on the face). */
  const vGroove = z.strictObject({
    kind: z.literal("v-groove"),
    ...common,
    at: point,
    direction: directionSchema,
    along: axisSchema,
    /** Included angle of the V. */
    angleDeg: num,
    depth: num,
  });

  /** 45° chamfers of the given leg on every outside edge of the listed faces of the base. */
  const chamfer = z.strictObject({ kind: z.literal("chamfer"), ...common, size: num, faces: z.array(directionSchema).min(1).max(6) });

  /** A bore parallel to a turned part's axis, offset from it by `eccentricity` (held in a four-jaw chuck). */
  const eccentricBore = z.strictObject({
    kind: z.literal("eccentric-bore"),
    ...common,
    eccentricity: num,
    /** Direction of the offset in the xy plane, measured from +x toward +y. */
    angleDeg: num.optional(),
    diameter: num,
    depth: num.optional(),
    through: z.boolean().optional(),
    from: z.enum(["top", "bottom"]).optional(),
    fit: text.optional(),
    finish: z.enum(["drilled", "reamed", "bored"]).optional(),
    counterbore: counterbore.optional(),
  });

  const patternable = z.discriminatedUnion("kind", [hole, internalThread, slot, pocket]);
  const linearPattern = z.strictObject({
    kind: z.literal("pattern-linear"),
    ...common,
    count: num,
    /** Vector from one copy to the next. */
    spacing: point,
    feature: patternable,
  });
  const circularPattern = z.strictObject({
    kind: z.literal("pattern-circular"),
    ...common,
    count: num,
    centre: point,
    axis: axisSchema,
    /** Angle between copies; defaults to 360° / count. */
    angleDeg: num.optional(),
    feature: patternable,
  });

  const base = z.discriminatedUnion("kind", [block, turned]);
  const thread = z.discriminatedUnion("form", [internalThread, externalThread]);
  const cutting = z.union([hole, thread, slot, pocket, step, vGroove, chamfer, eccentricBore, linearPattern, circularPattern]);
  const feature = z.union([block, turned, cutting]);

  const rotation = z.strictObject({ axis: axisSchema, angleDeg: num });
  const placement = z.strictObject({ position: point, rotations: z.array(rotation).max(3).optional() });

  const part = z.strictObject({
    id: z.string().regex(/^[a-z][a-zA-Z0-9-]*$/, "A part id is lower camel or kebab case.").max(60),
    name: text,
    quantity: num.optional(),
    /** A materials catalogue key (`"mild-steel"`) or an expression naming one (`"=bodyMaterial"`). */
    material: text,
    stock: z.strictObject({ form: z.enum(["round", "flat", "plate", "hex"]).optional(), allowance: num.optional() }).optional(),
    /** Faces the part is measured and machined from; dimensions are drawn from these. */
    datums: z.strictObject({ x: z.enum(["min", "max"]).optional(), y: z.enum(["min", "max"]).optional(), z: z.enum(["min", "max"]).optional() }).optional(),
    when: bool.optional(),
    /** The first feature is the base (block or turned); the rest cut it, in order. */
    features: z.array(feature).min(1).max(200),
    placement: placement.optional(),
    /** Offset added to the placement in the exploded assembly. */
    explode: point.optional(),
    finish: text.optional(),
    heatTreatment: text.optional(),
    drawing: z
      .strictObject({
        views: z.array(z.enum(["front", "top", "right", "left", "bottom", "rear"])).min(1).max(6).optional(),
        notes: z.array(text).max(20).optional(),
      })
      .optional(),
  });

  return { point, block, turned, hole, internalThread, externalThread, thread, slot, pocket, step, vGroove, chamfer, eccentricBore, linearPattern, circularPattern, base, cutting, feature, part, placement };
}

/** Template (YAML) form. */
export const templateVocabulary = vocabulary({
  num: z.union([z.number(), expressionSchema]),
  text: z.string().max(MAX_EXPRESSION_LENGTH),
  bool: z.union([z.boolean(), expressionSchema]),
});

/** Resolved form: what every consumer after the engine sees. */
export const resolvedVocabulary = vocabulary({
  num: z.number().finite(),
  text: z.string(),
  bool: z.boolean(),
});

export type TemplatePart = z.infer<typeof templateVocabulary.part>;
export type TemplateFeature = z.infer<typeof templateVocabulary.feature>;

export type ResolvedPart = z.infer<typeof resolvedVocabulary.part>;
export type ResolvedFeature = z.infer<typeof resolvedVocabulary.feature>;
export type BlockFeature = z.infer<typeof resolvedVocabulary.block>;
export type TurnedFeature = z.infer<typeof resolvedVocabulary.turned>;
export type HoleFeature = z.infer<typeof resolvedVocabulary.hole>;
export type ThreadFeature = z.infer<typeof resolvedVocabulary.thread>;
export type InternalThreadFeature = z.infer<typeof resolvedVocabulary.internalThread>;
export type ExternalThreadFeature = z.infer<typeof resolvedVocabulary.externalThread>;
export type SlotFeature = z.infer<typeof resolvedVocabulary.slot>;
export type PocketFeature = z.infer<typeof resolvedVocabulary.pocket>;
export type StepFeature = z.infer<typeof resolvedVocabulary.step>;
export type VGrooveFeature = z.infer<typeof resolvedVocabulary.vGroove>;
export type ChamferFeature = z.infer<typeof resolvedVocabulary.chamfer>;
export type EccentricBoreFeature = z.infer<typeof resolvedVocabulary.eccentricBore>;
export type LinearPatternFeature = z.infer<typeof resolvedVocabulary.linearPattern>;
export type CircularPatternFeature = z.infer<typeof resolvedVocabulary.circularPattern>;
export type PatternableFeature = HoleFeature | InternalThreadFeature | SlotFeature | PocketFeature;
export type FeatureKind = ResolvedFeature["kind"];
export type Point3 = { x: number; y: number; z: number };
