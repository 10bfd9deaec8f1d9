/**
 * The `eccentric-cam` result: engagement, self-locking, clamping force, lever placement and a 5° curve,
 * assembled from the plain formulas in ./model (see there for the derivation and sources).
 */
import { CalculatorInputError } from "../types";
import type { EccentricCamInput } from "./schema";
import {
  camArms,
  clampForceN,
  degToRad,
  engagementAngleRad,
  liftMm,
  lockMargin,
  maxRiseAngleRad,
  radToDeg,
  reachMm,
  riseAngleRad,
  worstLockAngleRad,
  type CamArms,
  type CamGeometry,
} from "./model";

/** One row of the curve, every 5° from the lowest point (0°) to the highest (180°). */
export interface CamCurvePoint {
  angleDeg: number;
  liftMm: number;
  riseAngleDeg: number;
  /** Clamping force if the cam bore on the face at this angle; null where no finite force exists. */
  clampForceN: number | null;
  selfLocking: boolean;
  /** True from the engagement angle on: the cam has taken up the gap and presses on the face. */
  engaged: boolean;
}

export interface CamWorkingZone {
  startDeg: number;
  endDeg: number;
  engagementInZone: boolean;
  /** The angle inside the zone where the cam is closest to slipping back. */
  worstAngleDeg: number;
  basis: string;
}

/** The numbers of one cam; `suggestions`, `explanation` and meta are added by the calculator. */
export interface CamCore {
  throwMm: number;
  engageAngleDeg: number;
  /** Rise angle at engagement. */
  riseAngleDeg: number;
  maxRiseAngleDeg: number;
  /** Rotation where the rise angle is largest (cos φ = e/R). */
  maxRiseAtAngleDeg: number;
  selfLocking: boolean;
  /** Resisting / driving moment − 1 at engagement; ≥ 0 locks. */
  selfLockMargin: number;
  selfLockingOverZone: boolean;
  /** Smallest margin anywhere in the working zone. */
  selfLockMarginOverZone: number;
  workingZone: CamWorkingZone;
  torqueNm: number;
  /** Clamping force at engagement. */
  clampForceN: number;
  ratioDiameterToEccentricity: number;
  /** D/e a cam needs to lock on face friction alone at the worst angle: 2·√(1 + μc²)/μc (null for μc = 0). */
  contactOnlyMinRatio: number | null;
  /** Largest eccentricity that still self-locks over the whole working zone, everything else unchanged. */
  maxSelfLockingEccentricityMm: number;
  /** Moment arms at engagement (N times each arm is a moment in N·mm). */
  armsAtEngagement: CamArms;
  reachAtEngagementMm: number;
  minReachMm: number;
  /** Angle from the eccentric direction (pivot → disc centre) to the lever, counted in the clamping rotation. */
  leverAngleDeg: number;
  /** The lever's angle above the face at engagement (the input target). */
  leverEndAngleDeg: number;
  /** The lever's angle above the face with the cam at its lowest point (fully released). */
  leverReleasedAngleDeg: number;
  curve: CamCurvePoint[];
}

export const WORKING_ZONE_BASIS =
  "Common practice: the working part of a circular cam's rise is taken around the middle of its travel " +
  "(about 45°–135° from the lowest point), where lift per degree is steady and wear can still be taken up.";

/** Normalises an angle to (−180°, 180°]. */
function normaliseDeg(deg: number): number {
  let a = deg % 360;
  if (a <= -180) a += 360;
  if (a > 180) a -= 360;
  return a;
}

/** Geometry from the input, refusing what the schema cannot express. */
export function camGeometry(input: EccentricCamInput): CamGeometry {
  const radiusMm = input.diameter / 2;
  if (input.eccentricity >= radiusMm) {
    throw new CalculatorInputError(
      `Eccentricity ${input.eccentricity} mm must be smaller than the cam radius ${radiusMm} mm (diameter ${input.diameter} mm).`,
      "eccentricity",
    );
  }
  if (input.eccentricity + input.pivotDiameter / 2 >= radiusMm) {
    throw new CalculatorInputError(
      `A Ø${input.pivotDiameter} mm pivot offset ${input.eccentricity} mm breaks out of a Ø${input.diameter} mm cam: ` +
        `eccentricity + pivot radius (${input.eccentricity + input.pivotDiameter / 2} mm) must stay below the cam radius ${radiusMm} mm.`,
      "pivotDiameter",
    );
  }
  return {
    radiusMm,
    eccentricityMm: input.eccentricity,
    pivotDiameterMm: input.pivotDiameter,
    muContact: input.muContact,
    muPivot: input.muPivot,
  };
}

/**
 * Largest eccentricity that self-locks at every angle of [from, to]: ratio ≥ 1 at φ ⇔
 * e ≤ (μc·R + ρ·√(1 + μc²)) / (sin φ + μc·cos φ); the denominator √(1 + μc²)·sin(φ + atan μc) peaks at
 * φ = 90° − atan μc, so the bound is taken there when it lies in the zone, else at the nearer zone end.
 * Capped where the pivot pin would break out (e < R − d/2).
 */
function maxSelfLockingEccentricityMm(cam: CamGeometry, fromRad: number, toRad: number): number {
  const numerator = cam.muContact * cam.radiusMm + camArms(cam, 0).pivotFrictionMm;
  const peak = Math.PI / 2 - Math.atan(cam.muContact);
  const phi = Math.min(Math.max(peak, fromRad), toRad);
  const denominator = Math.sin(phi) + cam.muContact * Math.cos(phi);
  const bound = denominator > 1e-12 ? numerator / denominator : Number.POSITIVE_INFINITY;
  return Math.min(bound, cam.radiusMm - cam.pivotDiameterMm / 2);
}

/** Every number of the cam for one input (no suggestions: those re-run this with changed inputs). */
export function computeCamCore(input: EccentricCamInput): CamCore {
  const cam = camGeometry(input);
  const phiE = engagementAngleRad(input.eccentricity, input.gap);
  if (phiE === undefined) {
    throw new CalculatorInputError(
      `The cam never engages: its throw is ${2 * input.eccentricity} mm (2 × eccentricity), so the gap must be ` +
        `greater than 0 and smaller than ${2 * input.eccentricity} mm; got ${input.gap} mm.`,
      "gap",
    );
  }
  if (!(input.workingZoneStartDeg < input.workingZoneEndDeg)) {
    throw new CalculatorInputError(
      `The working zone must start before it ends (got ${input.workingZoneStartDeg}° to ${input.workingZoneEndDeg}°).`,
      "workingZoneEndDeg",
    );
  }
  const zoneFrom = degToRad(input.workingZoneStartDeg);
  const zoneTo = degToRad(input.workingZoneEndDeg);
  const torqueNmm = input.handForce * input.leverLength;

  const forceAtEngagement = clampForceN(cam, torqueNmm, phiE);
  const worstZone = worstLockAngleRad(cam, zoneFrom, zoneTo);
  const engageAngleDeg = radToDeg(phiE);
  const selfLockMargin = lockMargin(cam, phiE);
  const selfLockMarginOverZone = lockMargin(cam, worstZone);

  const curve: CamCurvePoint[] = [];
  for (let angleDeg = 0; angleDeg <= 180; angleDeg += 5) {
    const phi = degToRad(angleDeg);
    curve.push({
      angleDeg,
      liftMm: liftMm(cam, phi),
      riseAngleDeg: radToDeg(riseAngleRad(cam, phi)),
      clampForceN: clampForceN(cam, torqueNmm, phi) ?? null,
      selfLocking: lockMargin(cam, phi) >= 0,
      engaged: phi >= phiE - 1e-12,
    });
  }

  // Lever placement, angles in the fixed frame counted from "straight away from the face" in the clamping
  // rotation: the eccentric direction points at φ; a lever fixed β ahead of it points at φ + β. At engagement
  // it should lie (90° − leverEndAngle) round, so β = 90° − leverEndAngle − φe.
  const leverAngleDeg = normaliseDeg(90 - input.leverEndAngleDeg - engageAngleDeg);
  const ratio = input.diameter / input.eccentricity;

  return {
    throwMm: 2 * input.eccentricity,
    engageAngleDeg,
    riseAngleDeg: radToDeg(riseAngleRad(cam, phiE)),
    maxRiseAngleDeg: radToDeg(maxRiseAngleRad(cam)),
    maxRiseAtAngleDeg: radToDeg(Math.acos(cam.eccentricityMm / cam.radiusMm)),
    selfLocking: selfLockMargin >= 0,
    selfLockMargin,
    selfLockingOverZone: selfLockMarginOverZone >= 0,
    selfLockMarginOverZone,
    workingZone: {
      startDeg: input.workingZoneStartDeg,
      endDeg: input.workingZoneEndDeg,
      engagementInZone: phiE >= zoneFrom - 1e-12 && phiE <= zoneTo + 1e-12,
      worstAngleDeg: radToDeg(worstZone),
      basis: WORKING_ZONE_BASIS,
    },
    torqueNm: torqueNmm / 1000,
    // At engagement sin φe > 0, so the arm is positive and the force finite.
    clampForceN: forceAtEngagement ?? 0,
    ratioDiameterToEccentricity: ratio,
    contactOnlyMinRatio: input.muContact > 0 ? (2 * Math.sqrt(1 + input.muContact ** 2)) / input.muContact : null,
    maxSelfLockingEccentricityMm: maxSelfLockingEccentricityMm(cam, zoneFrom, zoneTo),
    armsAtEngagement: camArms(cam, phiE),
    reachAtEngagementMm: reachMm(cam, phiE),
    minReachMm: cam.radiusMm - cam.eccentricityMm,
    leverAngleDeg,
    leverEndAngleDeg: input.leverEndAngleDeg,
    leverReleasedAngleDeg: normaliseDeg(input.leverEndAngleDeg + engageAngleDeg),
    curve,
  };
}

