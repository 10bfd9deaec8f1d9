/**
 * Geometry and statics of a circular eccentric cam pressing on a flat face: plain functions, radians inside.
 *
 * Frame (drawn in the cam's plane, pivot O at the origin, the face below the pivot, normal n = +y pointing
 * from the face toward the pivot). The cam is a disc of radius R whose geometric centre C sits at distance
 * e (the eccentricity) from the pivot. The rotation φ is measured from the lowest point — C straight above
 * O, farthest from the face — so C = e·(sin φ, cos φ) and turning the cam to clamp increases φ.
 *
 *  - reach (pivot to face along the normal)  r(φ) = R − e·cos φ
 *  - lift                                    h(φ) = r(φ) − r(0) = e·(1 − cos φ), throw = h(π) = 2e
 *  - the disc touches the face at P = C − R·n, straight below C, so the face's normal force N acts on the
 *    vertical line x = e·sin φ: it turns the cam back (toward φ = 0) with the moment N·e·sin φ about O
 *  - rise (wedge) angle α, the angle at P between the face normal and the line P→O:
 *    tan α = e·sin φ / (R − e·cos φ); by the sine rule in triangle O-P-C, sin α = (e/R)·sin∠O ≤ e/R, so
 *    α is largest (sin α_max = e/R) where ∠O = 90°, i.e. cos φ = e/R
 *  - friction at the face, tangential at P, at distance R − e·cos φ from O: moment ≤ μc·N·(R − e·cos φ)
 *  - friction in the pivot: the pin carries the resultant of the contact force, N·√(1 + μc²); a pin of
 *    diameter d resists turning with that force times the friction-circle radius ρ = (d/2)·sin(atan μp)
 *    = (d/2)·μp/√(1 + μp²) (≈ μp·d/2 for small μp)
 *
 * Moment balance about O (the hand force on the lever is left out of the pin reaction: it is a few per cent
 * of N for a usable lever, and leaving it out understates the pivot friction, the safe side for locking):
 *  - to clamp, the hand must supply   T = N·[e·sin φ + μc·(R − e·cos φ) + ρ·√(1 + μc²)]
 *  - left alone, the cam stays put when  N·e·sin φ ≤ N·[μc·(R − e·cos φ) + ρ·√(1 + μc²)]  (self-locking)
 * Both friction moments oppose whichever way the cam turns, so the same arms appear in both.
 *
 * The lock ratio (resisting arm / driving arm) over φ ∈ (0, π) is (a − b·cos φ)/(e·sin φ) with
 * a = μc·R + ρ·√(1 + μc²) and b = μc·e; its derivative vanishes where cos φ = b/a, its only minimum. With no
 * pivot friction that minimum is tan α_max ≤ μc, the classic wedge condition: e/√(R² − e²) ≤ μc, i.e.
 * D/e ≥ 2·√(1 + μc²)/μc ≈ 20 for μc = 0.1 and ≈ 13.5 for μc = 0.15 — the handbook rule of thumb of a
 * diameter-to-eccentricity ratio of about 14–20 for self-locking circular cams.
 *
 * Sources: Meriam & Kraige, "Engineering Mechanics: Statics", friction chapter (dry friction, wedges,
 * journal bearings and the friction circle) — textbook, from memory; jig and fixture design handbooks,
 * circular eccentric cams (D/e ≈ 14–20 for self-locking depending on friction) — from memory.
 */

/** The cam's fixed dimensions and friction. Lengths in mm. */
export interface CamGeometry {
  radiusMm: number;
  eccentricityMm: number;
  pivotDiameterMm: number;
  /** Friction coefficient between the cam's rim and the face. */
  muContact: number;
  /** Friction coefficient in the pivot pin. */
  muPivot: number;
}

/** The three moment arms (mm) that multiply the normal force N at rotation φ. */
export interface CamArms {
  /** e·sin φ — the load's arm, turning the cam back toward its lowest point. */
  drivingMm: number;
  /** μc·(R − e·cos φ) — friction at the face. */
  contactFrictionMm: number;
  /** ρ·√(1 + μc²) — friction in the pivot pin. */
  pivotFrictionMm: number;
}

export const degToRad = (deg: number): number => (deg * Math.PI) / 180;
export const radToDeg = (rad: number): number => (rad * 180) / Math.PI;

/** Reach r(φ) = R − e·cos φ, pivot centre to the face along its normal (mm). */
export function reachMm(cam: CamGeometry, phiRad: number): number {
  return cam.radiusMm - cam.eccentricityMm * Math.cos(phiRad);
}

/** Lift h(φ) = e·(1 − cos φ) above the lowest point (mm). */
export function liftMm(cam: CamGeometry, phiRad: number): number {
  return cam.eccentricityMm * (1 - Math.cos(phiRad));
}

/** Rise (wedge) angle α(φ) = atan(e·sin φ / (R − e·cos φ)) in radians. */
export function riseAngleRad(cam: CamGeometry, phiRad: number): number {
  return Math.atan2(cam.eccentricityMm * Math.sin(phiRad), reachMm(cam, phiRad));
}

/** Largest rise angle, α_max = asin(e/R), reached where cos φ = e/R. */
export function maxRiseAngleRad(cam: CamGeometry): number {
  return Math.asin(cam.eccentricityMm / cam.radiusMm);
}

/**
 * Rotation from the lowest point at which a cam set with gap g first touches the face:
 * e·(1 − cos φe) = g ⇒ φe = acos(1 − g/e). Returns undefined when the cam never reaches (g ≥ 2e) or g ≤ 0.
 */
export function engagementAngleRad(eccentricityMm: number, gapMm: number): number | undefined {
  if (!(gapMm > 0) || !(gapMm < 2 * eccentricityMm)) return undefined;
  return Math.acos(1 - gapMm / eccentricityMm);
}

/** Friction-circle radius of the pivot pin, ρ = (d/2)·μp/√(1 + μp²) (mm). */
export function pivotFrictionRadiusMm(cam: CamGeometry): number {
  return ((cam.pivotDiameterMm / 2) * cam.muPivot) / Math.sqrt(1 + cam.muPivot * cam.muPivot);
}

/** The moment arms at rotation φ (see the module comment). */
export function camArms(cam: CamGeometry, phiRad: number): CamArms {
  return {
    drivingMm: cam.eccentricityMm * Math.sin(phiRad),
    contactFrictionMm: cam.muContact * reachMm(cam, phiRad),
    pivotFrictionMm: pivotFrictionRadiusMm(cam) * Math.sqrt(1 + cam.muContact * cam.muContact),
  };
}

/** T/N while clamping: e·sin φ + μc·(R − e·cos φ) + ρ·√(1 + μc²) (mm). */
export function clampingArmMm(cam: CamGeometry, phiRad: number): number {
  const a = camArms(cam, phiRad);
  return a.drivingMm + a.contactFrictionMm + a.pivotFrictionMm;
}

/**
 * Normal (clamping) force N = T / (e·sin φ + μc·(R − e·cos φ) + ρ·√(1 + μc²)) for a lever torque T (N·mm).
 * Returns undefined where the arm is zero (frictionless cam at its lowest or highest point: no finite force).
 */
export function clampForceN(cam: CamGeometry, torqueNmm: number, phiRad: number): number | undefined {
  const arm = clampingArmMm(cam, phiRad);
  return arm > 1e-12 ? torqueNmm / arm : undefined;
}

/**
 * Lock ratio at φ: resisting arm / driving arm = [μc·(R − e·cos φ) + ρ·√(1 + μc²)] / (e·sin φ).
 * ≥ 1 self-locks. Infinity where the load has no arm (φ = 0 or π).
 */
export function lockRatio(cam: CamGeometry, phiRad: number): number {
  const a = camArms(cam, phiRad);
  const resisting = a.contactFrictionMm + a.pivotFrictionMm;
  if (a.drivingMm <= 1e-12 * cam.radiusMm) return Number.POSITIVE_INFINITY;
  return resisting / a.drivingMm;
}

/** Self-locking margin at φ: lock ratio − 1 (0.25 = friction holds with 25 % to spare; negative slips back). */
export function lockMargin(cam: CamGeometry, phiRad: number): number {
  return lockRatio(cam, phiRad) - 1;
}

/**
 * The angle where the lock ratio is smallest, within [fromRad, toRad] ⊂ [0, π]: the ratio's only minimum on
 * (0, π) is at cos φ* = b/a (module comment); it falls on either side of that, so the worst angle is φ*
 * when it lies inside the interval, else the nearer end. A frictionless cam (a = 0) has ratio 0 everywhere
 * but the ends; the middle of the interval is returned.
 */
export function worstLockAngleRad(cam: CamGeometry, fromRad: number, toRad: number): number {
  const arms0 = camArms(cam, 0);
  const a = cam.muContact * cam.radiusMm + arms0.pivotFrictionMm;
  const b = cam.muContact * cam.eccentricityMm;
  if (a <= 0) return (fromRad + toRad) / 2;
  const phiStar = Math.acos(Math.min(1, b / a));
  if (phiStar < fromRad) return fromRad;
  if (phiStar > toRad) return toRad;
  return phiStar;
}
