/**
 * `thread` calculator: ISO metric threads M1.6–M24, coarse and common fine pitches.
 *
 * Output (mm): `pitch, majorDiameter, pitchDiameter, minorDiameterExternal (d3), minorDiameterInternal (D1),
 * tapDrill` plus `designation`, `series`, `fundamentalTriangleHeight`, `stressAreaMm2`, `clearanceHole`
 * (ISO 273 medium) with `clearanceHoles` (fine/medium/coarse), `engagementMm` by the material tapped, and
 * `recommendedEngagementMm` when a material is given.
 */
import { z } from "zod";
import { getMaterial, materialKeySchema, type MaterialKey } from "../../materials";
import { CalculatorInputError, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { ENGAGEMENT_FACTOR, ENGAGEMENT_GROUPS, engagementGroupOf, type EngagementGroup } from "./engagement";
import { basicProfile, CLEARANCE_HOLES_MM, COARSE_PITCH_MM, FINE_PITCHES_MM } from "./iso-metric";

export { basicProfile } from "./iso-metric";
export { ENGAGEMENT_FACTOR, ENGAGEMENT_GROUPS, engagementGroupOf, type EngagementGroup } from "./engagement";

export const threadInputSchema = z.strictObject({
  designation: z
    .string({ error: 'Thread designation must be text such as "M6" or "M8x1".' })
    .trim()
    .min(2, 'Thread designation must be text such as "M6" or "M8x1".')
    .max(20),
  material: materialKeySchema.optional(),
});
export type ThreadInput = z.infer<typeof threadInputSchema>;

export interface ThreadSpec {
  designation: string;
  series: "coarse" | "fine";
  majorDiameter: number;
  pitch: number;
}

export interface ThreadResult extends CalculatorResultMeta, ThreadSpec {
  pitchDiameter: number;
  minorDiameterExternal: number;
  minorDiameterInternal: number;
  fundamentalTriangleHeight: number;
  stressAreaMm2: number;
  /** Tap drill, mm: d − P taken to the drill series (common practice; matches workshop tap-drill tables). */
  tapDrill: number;
  /** d − P before choosing a drill, mm. */
  tapDrillExact: number;
  /** ISO 273 medium series clearance hole, mm. */
  clearanceHole: number;
  clearanceHoles: { fine: number; medium: number; coarse: number };
  /** Recommended engagement length by the material the hole is tapped in, mm. */
  engagementMm: Record<EngagementGroup, number>;
  recommendedEngagementMm?: number;
  engagementMaterial?: { material: MaterialKey; group: EngagementGroup; factor: number; range: string };
}

const sources: Source[] = [
  { title: "ISO 261:1998, ISO general purpose metric screw threads — general plan (pitches)", kind: "standard", note: "from memory" },
  { title: "ISO 724:1993, basic dimensions: d2 = d − 0.649519P, D1 = d − 1.082532P", kind: "standard" },
  { title: "ISO 965-1 / ISO 898-1: d3 = d − 1.226869P and stress area As = π/4·((d2 + d3)/2)²", kind: "standard" },
  { title: "ISO 273:1979, clearance holes for bolts and screws (fine, medium, coarse)", kind: "standard", note: "from memory" },
  { title: "Tap drill = d − P for cut taps, to the 0.1 mm drill series (matches workshop tap-drill tables)", kind: "common practice" },
  { title: "Engagement length rule of thumb: steel 1·d, cast iron/bronze/brass 1.25–1.5·d, aluminium 2·d, plastics 2–2.5·d", kind: "common practice", note: "machine-design handbooks, from memory" },
];

const key = (n: number) => String(n);

/**
 * Tap drill for a cut tap: the common-practice rule D = d − P, taken to the drill series (0.1 mm steps; 0.05 mm
 * up to M3). Where d − P falls midway between two drills the workshop tap-drill tables pick the even tenth
 * (M8 → 6.8, M12 → 10.2, M6×0.75 → 5.2, M10×1.25 → 8.8), i.e. they round half to even; so does this.
 */
export function tapDrillMm(majorDiameterMm: number, pitchMm: number): number {
  const hundredths = Math.round((majorDiameterMm - pitchMm) * 100);
  const step = majorDiameterMm <= 3 ? 5 : 10;
  const low = Math.floor(hundredths / step);
  const remainder = hundredths - low * step;
  const steps = remainder * 2 < step ? low : remainder * 2 > step ? low + 1 : low % 2 === 0 ? low : low + 1;
  return (steps * step) / 100;
}

/** Parses "M6", "M6x0.75", "M6×0.75", "m8 x 1" into a known ISO thread; throws CalculatorInputError otherwise. */
export function parseThread(designation: string): ThreadSpec {
  const match = /^\s*M\s*(\d+(?:\.\d+)?)\s*(?:[x×X*]\s*(\d+(?:\.\d+)?))?\s*$/i.exec(designation);
  if (!match || !match[1]) {
    throw new CalculatorInputError(
      `"${designation}" is not an ISO metric thread designation: write e.g. "M6" (coarse) or "M8x1" (fine).`,
      "designation",
    );
  }
  const d = Number(match[1]);
  const coarse = COARSE_PITCH_MM[key(d)];
  if (coarse === undefined) {
    throw new CalculatorInputError(
      `M${d} is not covered: sizes are ${Object.keys(COARSE_PITCH_MM).map((s) => `M${s}`).join(", ")}.`,
      "designation",
    );
  }
  if (match[2] === undefined) return { designation: `M${d}`, series: "coarse", majorDiameter: d, pitch: coarse };
  const p = Number(match[2]);
  if (p === coarse) return { designation: `M${d}`, series: "coarse", majorDiameter: d, pitch: p };
  const fine = FINE_PITCHES_MM[key(d)] ?? [];
  if (!fine.includes(p)) {
    const allowed = [coarse, ...fine].map((x) => `M${d}x${x}`).join(", ");
    throw new CalculatorInputError(`M${d}x${p} is not an ISO 261 pitch covered here; for M${d} use ${allowed}.`, "designation");
  }
  return { designation: `M${d}x${p}`, series: "fine", majorDiameter: d, pitch: p };
}

function compute(input: ThreadInput): ThreadResult {
  const spec = parseThread(input.designation);
  const profile = basicProfile(spec.majorDiameter, spec.pitch);
  const holes = CLEARANCE_HOLES_MM[key(spec.majorDiameter)];
  if (!holes) throw new Error(`ISO 273 table lacks M${spec.majorDiameter}.`);
  const engagementMm = Object.fromEntries(
    ENGAGEMENT_GROUPS.map((g) => [g, Math.round(spec.majorDiameter * ENGAGEMENT_FACTOR[g].factor * 10) / 10]),
  ) as Record<EngagementGroup, number>;
  const result: ThreadResult = {
    ...spec,
    ...profile,
    tapDrill: tapDrillMm(spec.majorDiameter, spec.pitch),
    tapDrillExact: Math.round((spec.majorDiameter - spec.pitch) * 1000) / 1000,
    clearanceHole: holes.medium,
    clearanceHoles: { ...holes },
    engagementMm,
    cautions: [
      "Check tapped and external threads with thread gauges (6H/6g by default).",
      "The tap drill d − P suits cut taps in ductile metals; forming (roll) taps need a larger drill — follow the tap maker's table.",
      "Engagement lengths are rules of thumb, not a strength calculation; load-bearing or safety-relevant joints need one.",
    ],
    sources,
  };
  if (input.material) {
    const material = getMaterial(input.material);
    const group = engagementGroupOf(material.cuttingGroup);
    result.recommendedEngagementMm = engagementMm[group];
    result.engagementMaterial = { material: material.key, group, ...ENGAGEMENT_FACTOR[group] };
  }
  return result;
}

export const threadCalculator: Calculator<typeof threadInputSchema, ThreadResult> = {
  kind: "thread",
  label: "Metric thread (ISO 261/724)",
  summary: "Pitch, basic diameters, tap drill, clearance hole and engagement length for an ISO metric thread M1.6–M24.",
  inputSchema: threadInputSchema,
  compute,
  sources,
};
