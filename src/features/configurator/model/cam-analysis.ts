import { z } from "zod";

/**
 * The part of an `eccentric-cam` result the analysis panel shows (src/engine/calculators/eccentric-cam).
 * An analysis that parses as this is drawn as a cam; anything else gets the general figure list.
 */
export const camAnalysisSchema = z.object({
  throwMm: z.number(),
  engageAngleDeg: z.number(),
  riseAngleDeg: z.number(),
  selfLocking: z.boolean(),
  selfLockMargin: z.number(),
  selfLockingOverZone: z.boolean(),
  selfLockMarginOverZone: z.number(),
  workingZone: z.object({ startDeg: z.number(), endDeg: z.number(), engagementInZone: z.boolean() }),
  torqueNm: z.number(),
  clampForceN: z.number(),
  ratioDiameterToEccentricity: z.number(),
  curve: z.array(
    z.object({
      angleDeg: z.number(),
      liftMm: z.number(),
      clampForceN: z.number().nullable(),
      selfLocking: z.boolean(),
      engaged: z.boolean(),
    }),
  ),
  explanation: z.string().default(""),
  cautions: z.array(z.string()).default([]),
});
export type CamAnalysis = z.infer<typeof camAnalysisSchema>;

export type AnalysisView =
  | { id: string; kind: "cam"; cam: CamAnalysis }
  | { id: string; kind: "failed"; reason: string }
  | {
      id: string;
      kind: "figures";
      calculator: string | undefined;
      result: Record<string, unknown>;
      cautions: string[];
    };

/** Reads each analysis of an evaluation into what the panel can draw. */
export function readAnalyses(
  analyses: Readonly<Record<string, Record<string, unknown>>>,
  calculatorOf: (id: string) => string | undefined = () => undefined,
): AnalysisView[] {
  return Object.entries(analyses).map(([id, result]): AnalysisView => {
    if (typeof result.error === "string") return { id, kind: "failed", reason: result.error };
    const calculator = calculatorOf(id);
    if (calculator === "eccentric-cam" || calculator === undefined) {
      const cam = camAnalysisSchema.safeParse(result);
      if (cam.success) return { id, kind: "cam", cam: cam.data };
    }
    const cautions = Array.isArray(result.cautions)
      ? result.cautions.filter((c): c is string => typeof c === "string")
      : [];
    return { id, kind: "figures", calculator, result, cautions };
  });
}
