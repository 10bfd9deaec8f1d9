/**
 * Where a round bar sits in a V: plane geometry of a circle tangent to two straight lines.
 *
 * Set-up (a section square to the V's length): the apex A at the origin, the V opening upward, symmetric
 * about the vertical axis, included angle θ, so each flank makes the half angle α = θ/2 with the axis.
 * A round of radius r = d/2 that touches both flanks has its centre C on the axis (it is equidistant from
 * both lines, and the bisector of the angle is the locus of such points).
 *
 *  1. Centre height. The distance from C = (0, h) to a flank through A at angle α to the axis is h·sin α
 *     (the flank's unit normal makes angle α with the horizontal). Tangency means that distance is r:
 *         h = r / sin α                                                     (centre above the apex)
 *  2. Contact point. The contact T is the foot of the perpendicular from C to the flank, so A–T–C is a
 *     right triangle with hypotenuse AC = h and the right angle at T. Along the flank:
 *         s = AT = h·cos α = r·cos α / sin α = r / tan α                     (contact along the flank)
 *     and T's height and its offset from the axis follow from the flank's direction (sin α, cos α):
 *         z_T = s·cos α = r·cos²α / sin α = h − r·sin α                      (contact above the apex)
 *         y_T = s·sin α = r·cos α                                           (contact off the axis)
 *     (h − r·sin α: from C go down the radius CT, which is the flank normal, tilted α from horizontal,
 *     so it drops r·sin α.)
 *  3. Top of the round above the apex: h + r = r·(1 + 1/sin α).
 *
 * For a V of depth D (apex to the block's top face), flank length D / cos α and width at the top 2·D·tan α:
 *  - the round touches both flanks only while its contact lies on the flank, z_T ≤ D, i.e.
 *        d ≤ d_max,flank = 2·D·sin α / cos²α;
 *  - an apex relief of width w (a slot below the apex) takes the flanks away for |y| < w/2, so the contact
 *    needs y_T ≥ w/2, i.e. d ≥ w / cos α;
 *  - the round stands proud of the top face by p or more when h + r − D ≥ p, i.e.
 *        d ≥ 2·(D + p) / (1 + 1/sin α).
 *
 * Source: Euclid's Elements, Book III Prop. 18 (a tangent is perpendicular to the radius at the point of
 * contact) with right-triangle trigonometry — any plane geometry text.
 * All lengths in mm, angles in degrees at the surface (radians inside).
 */

const DEG = Math.PI / 180;

export interface RoundInV {
  /** h = r / sin α. */
  centreAboveApexMm: number;
  /** s = r / tan α, measured along each flank from the apex. */
  contactAlongFlankMm: number;
  /** z_T = r·cos²α / sin α = h − r·sin α. */
  contactAboveApexMm: number;
  /** y_T = r·cos α, each side of the axis. */
  contactOffsetMm: number;
  /** h + r. */
  topAboveApexMm: number;
}

/** Where a round of diameter `diameterMm` sits in a V of included angle `angleDeg` (0° < θ < 180°). */
export function roundInV(diameterMm: number, angleDeg: number): RoundInV {
  const r = diameterMm / 2;
  const alpha = (angleDeg / 2) * DEG;
  const sin = Math.sin(alpha);
  const cos = Math.cos(alpha);
  const h = r / sin;
  return {
    centreAboveApexMm: h,
    contactAlongFlankMm: (r * cos) / sin,
    contactAboveApexMm: h - r * sin,
    contactOffsetMm: r * cos,
    topAboveApexMm: h + r,
  };
}

/** Largest round whose contact still lies on a flank of a V `depthMm` deep: 2·D·sin α / cos²α. */
export function maxDiameterOnFlanksMm(angleDeg: number, depthMm: number): number {
  const alpha = (angleDeg / 2) * DEG;
  return (2 * depthMm * Math.sin(alpha)) / Math.cos(alpha) ** 2;
}

/** Smallest round that stands at least `proudMm` above the top face of a V `depthMm` deep: 2(D + p)/(1 + 1/sin α). */
export function minDiameterProudMm(angleDeg: number, depthMm: number, proudMm: number): number {
  const alpha = (angleDeg / 2) * DEG;
  return (2 * (depthMm + proudMm)) / (1 + 1 / Math.sin(alpha));
}

/** Smallest round that reaches the flanks past an apex relief `reliefWidthMm` wide: w / cos α. */
export function minDiameterPastReliefMm(angleDeg: number, reliefWidthMm: number): number {
  return reliefWidthMm / Math.cos((angleDeg / 2) * DEG);
}
