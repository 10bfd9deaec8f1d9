import { z } from "zod";

/**
 * The parts of the `eccentric-cam` answer this page shows (see src/engine/calculators/eccentric-cam).
 * Checked on arrival, so a change in the calculator shows up as a clear error, not as NaN on screen.
 */
const curvePoint = z.object({
  angleDeg: z.number(),
  liftMm: z.number(),
  riseAngleDeg: z.number(),
  clampForceN: z.number().nullable(),
  selfLocking: z.boolean(),
  engaged: z.boolean(),
});

const suggestion = z.object({
  parameter: z.enum(["eccentricity", "diameter", "leverLength", "pivotDiameter", "muContact"]),
  from: z.number(),
  to: z.number(),
  selfLockMargin: z.number().nullable(),
  selfLockMarginOverZone: z.number().nullable(),
  clampForceN: z.number().nullable(),
  engageAngleDeg: z.number().nullable(),
  message: z.string(),
});

const source = z.object({ title: z.string(), kind: z.string(), note: z.string().optional() });

export const camResultSchema = z.object({
  throwMm: z.number(),
  engageAngleDeg: z.number(),
  riseAngleDeg: z.number(),
  maxRiseAngleDeg: z.number(),
  maxRiseAtAngleDeg: z.number(),
  selfLocking: z.boolean(),
  selfLockMargin: z.number(),
  selfLockingOverZone: z.boolean(),
  selfLockMarginOverZone: z.number(),
  workingZone: z.object({
    startDeg: z.number(),
    endDeg: z.number(),
    engagementInZone: z.boolean(),
    worstAngleDeg: z.number(),
    basis: z.string(),
  }),
  torqueNm: z.number(),
  clampForceN: z.number(),
  ratioDiameterToEccentricity: z.number(),
  contactOnlyMinRatio: z.number().nullable(),
  maxSelfLockingEccentricityMm: z.number(),
  armsAtEngagement: z.object({
    drivingMm: z.number(),
    contactFrictionMm: z.number(),
    pivotFrictionMm: z.number(),
  }),
  leverAngleDeg: z.number(),
  leverEndAngleDeg: z.number(),
  leverReleasedAngleDeg: z.number(),
  curve: z.array(curvePoint),
  explanation: z.string(),
  suggestions: z.array(suggestion),
  cautions: z.array(z.string()),
  sources: z.array(source),
});

export type CamResult = z.infer<typeof camResultSchema>;
export type CamCurvePoint = z.infer<typeof curvePoint>;
export type CamSuggestion = z.infer<typeof suggestion>;
