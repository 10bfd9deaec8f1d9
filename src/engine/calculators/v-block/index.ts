/**
 * `v-block`: where a round of diameter d sits in a V of included angle θ — centre, contact and top heights
 * above the apex (and above the base when the block height is given), and for a V of given depth whether
 * the round touches both flanks, how far it stands proud of the top, and the usable diameter range.
 * Geometry and its derivation: ./geometry.
 */
import { z } from "zod";
import { CalculatorInputError, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { maxDiameterOnFlanksMm, minDiameterPastReliefMm, minDiameterProudMm, roundInV, type RoundInV } from "./geometry";

export * from "./geometry";

const positiveMm = (what: string) => z.number({ error: `${what} must be a number (mm).` }).positive(`${what} must be greater than 0 mm.`);
const nonNegativeMm = (what: string) => z.number({ error: `${what} must be a number (mm).` }).min(0, `${what} cannot be negative.`);

export const vBlockInputSchema = z.strictObject({
  /** Diameter of the round. */
  diameter: positiveMm("Diameter"),
  /** Included angle of the V (90° is the usual V-block). */
  angleDeg: z
    .number({ error: "V angle must be a number (degrees)." })
    .gt(10, "A V angle of 10° or less is not a V-block.")
    .lt(170, "A V angle of 170° or more is nearly flat; use a flat support."),
  /** Depth of the V from the block's top face to the apex; enables the flank and proud results. */
  depth: positiveMm("V depth").optional(),
  /** Width of the relief slot below the apex (0 = a sharp apex). */
  reliefWidth: nonNegativeMm("Relief width").default(0),
  /** How far the round should stand above the top face, at least. */
  proud: nonNegativeMm("Proud amount").default(0),
  /** Height of the block from its base to the top face (for heights above the base). */
  blockHeight: positiveMm("Block height").optional(),
});
export type VBlockInput = z.infer<typeof vBlockInputSchema>;

export interface VBlockResult extends RoundInV, CalculatorResultMeta {
  diameterMm: number;
  angleDeg: number;
  /** With a depth: the V's flank length D/cos α and width at the top 2·D·tan α. */
  flankLengthMm: number | null;
  widthAtTopMm: number | null;
  /** Round's top above the block's top face (negative = below it). */
  standsProudMm: number | null;
  /** Contact on both flanks: above the relief and not past the top edge. */
  touchesBothFlanks: boolean | null;
  /** Stands at least `proud` above the top face. */
  standsProudEnough: boolean | null;
  /** Usable range for this V: max(relief limit, proud limit) … flank limit. */
  minDiameterMm: number | null;
  maxDiameterMm: number | null;
  /** Which limit sets the smallest diameter. */
  minDiameterLimit: "proud" | "relief" | null;
  inRange: boolean | null;
  /** With a block height: centre, contact and top heights above the base. */
  centreAboveBaseMm: number | null;
  contactAboveBaseMm: number | null;
  topAboveBaseMm: number | null;
}

export const vBlockSources: Source[] = [
  {
    title: "Plane geometry: a tangent is perpendicular to the radius at the point of contact (Euclid, Elements III.18), with right-triangle trigonometry",
    kind: "textbook",
    note: "h = (d/2)/sin(θ/2); contact along the flank (d/2)/tan(θ/2); contact height h − (d/2)·sin(θ/2).",
  },
];

function compute(input: VBlockInput): VBlockResult {
  const { diameter, angleDeg, depth, reliefWidth, proud, blockHeight } = input;
  if (depth !== undefined && blockHeight !== undefined && depth >= blockHeight) {
    throw new CalculatorInputError(`The V (${depth} mm deep) must be shallower than the block (${blockHeight} mm high).`, "depth");
  }
  const g = roundInV(diameter, angleDeg);
  const alpha = ((angleDeg / 2) * Math.PI) / 180;
  const eps = 1e-9;
  let flankLengthMm: number | null = null;
  let widthAtTopMm: number | null = null;
  let standsProudMm: number | null = null;
  let touchesBothFlanks: boolean | null = null;
  let standsProudEnough: boolean | null = null;
  let minDiameterMm: number | null = null;
  let maxDiameterMm: number | null = null;
  let minDiameterLimit: VBlockResult["minDiameterLimit"] = null;
  let inRange: boolean | null = null;
  if (depth !== undefined) {
    flankLengthMm = depth / Math.cos(alpha);
    widthAtTopMm = 2 * depth * Math.tan(alpha);
    if (reliefWidth >= widthAtTopMm) {
      throw new CalculatorInputError(`The apex relief (${reliefWidth} mm) is as wide as the V at the top (${widthAtTopMm.toFixed(2)} mm).`, "reliefWidth");
    }
    standsProudMm = g.topAboveApexMm - depth;
    touchesBothFlanks = g.contactAboveApexMm <= depth + eps && g.contactOffsetMm >= reliefWidth / 2 - eps;
    standsProudEnough = standsProudMm >= proud - eps;
    const byProud = minDiameterProudMm(angleDeg, depth, proud);
    const byRelief = minDiameterPastReliefMm(angleDeg, reliefWidth);
    minDiameterMm = Math.max(byProud, byRelief);
    minDiameterLimit = byProud >= byRelief ? "proud" : "relief";
    maxDiameterMm = maxDiameterOnFlanksMm(angleDeg, depth);
    inRange = touchesBothFlanks && standsProudEnough;
  }
  const apexAboveBase = blockHeight !== undefined && depth !== undefined ? blockHeight - depth : undefined;
  const cautions = [
    "Heights assume a true V and a round bar that is round and straight; measure the V with a test bar before relying on a height for a setup.",
  ];
  if (touchesBothFlanks === false) {
    cautions.push(
      g.contactAboveApexMm > (depth ?? Infinity)
        ? "The round is too large for this V: it rests on the V's top edges, not on its flanks, and is not located."
        : "The round is too small for this V: it drops into the apex relief and is not located by the flanks.",
    );
  }
  if (standsProudEnough === false) cautions.push("The round does not stand proud of the block enough for a clamp to bear on it.");
  return {
    diameterMm: diameter,
    angleDeg,
    ...g,
    flankLengthMm,
    widthAtTopMm,
    standsProudMm,
    touchesBothFlanks,
    standsProudEnough,
    minDiameterMm,
    maxDiameterMm,
    minDiameterLimit,
    inRange,
    centreAboveBaseMm: apexAboveBase !== undefined ? apexAboveBase + g.centreAboveApexMm : null,
    contactAboveBaseMm: apexAboveBase !== undefined ? apexAboveBase + g.contactAboveApexMm : null,
    topAboveBaseMm: apexAboveBase !== undefined ? apexAboveBase + g.topAboveApexMm : null,
    cautions,
    sources: vBlockSources,
  };
}

export const vBlockCalculator: Calculator<typeof vBlockInputSchema, VBlockResult> = {
  kind: "v-block",
  label: "Round in a V-block",
  summary:
    "Where a round bar sits in a V of a given angle: centre, contact and top heights above the apex and the base, whether it touches both flanks and stands proud, and the usable diameter range.",
  inputSchema: vBlockInputSchema,
  compute,
  sources: vBlockSources,
};
