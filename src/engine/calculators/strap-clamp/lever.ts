/**
 * A strap (toe) clamp as a beam on two supports: the work at one end, the heel block at the other, and the
 * stud pulling the strap down between them.
 *
 *           F_work            F_stud            F_heel
 *  work ──────▲──────── a ──────▼──────── b ───────▲────── heel
 *
 * Equilibrium of the strap (a rigid body: ΣF = 0, ΣM = 0):
 *   moments about the heel:  F_work·(a + b) = F_stud·b   →  F_work = F_stud·b / (a + b)
 *   moments about the work:  F_heel·(a + b) = F_stud·a   →  F_heel = F_stud·a / (a + b)
 * so the stud's pull divides in the inverse ratio of the distances: the nearer support takes the larger
 * share. Bending is largest under the stud: M = F_work·a = F_heel·b = F_stud·a·b / (a + b).
 * The section there is cut by the stud's slot: Z = (w − s)·t²/6 for a strap w wide and t thick with a slot s
 * wide, and σ = M / Z (flexure formula).
 * Tilt: with the strap resting on the work at height h_w and on the heel at h_h, a + b apart, it slopes
 * atan((h_h − h_w)/(a + b)); positive = tipped down toward the work, which makes it bear on the work at its
 * toe end (common practice: heel level with the work or a little higher).
 *
 * Sources: Meriam & Kraige, Engineering Mechanics: Statics, equilibrium of rigid bodies (moments about each
 * support) — the lever rule; Gere & Timoshenko, Mechanics of Materials, the flexure formula and Z = b·h²/6
 * of a rectangle (both from memory).
 */

/** F_work = F_stud·b/(a + b). */
export function workForceN(studForceN: number, studToWorkMm: number, studToHeelMm: number): number {
  return (studForceN * studToHeelMm) / (studToWorkMm + studToHeelMm);
}

/** F_heel = F_stud·a/(a + b). */
export function heelForceN(studForceN: number, studToWorkMm: number, studToHeelMm: number): number {
  return (studForceN * studToWorkMm) / (studToWorkMm + studToHeelMm);
}

/** Section modulus of a rectangle w × t with a slot s wide through it, bending about the width: (w − s)·t²/6. */
export function slottedSectionModulusMm3(widthMm: number, thicknessMm: number, slotWidthMm: number): number {
  return ((widthMm - slotWidthMm) * thicknessMm ** 2) / 6;
}

/** Slope of the strap, degrees; positive = down toward the work. */
export function strapTiltDeg(heelHeightMm: number, workHeightMm: number, spanMm: number): number {
  return (Math.atan2(heelHeightMm - workHeightMm, spanMm) * 180) / Math.PI;
}
