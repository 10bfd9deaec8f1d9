/**
 * Bolt preload and the friction it buys.
 *
 *  - Preload from tightening torque: T = K·F·d (T in N·mm, d the nominal diameter in mm), so F = T / (K·d).
 *    K, the nut factor, lumps thread and under-head friction together; K ≈ 0.2 for plain, dry steel
 *    fasteners when nothing better is known (Shigley's Mechanical Engineering Design, bolted joints chapter,
 *    from memory; common practice). Lubricated threads give less K — more preload for the same torque.
 *  - Holding against sliding: a part pressed onto a table by a normal force N can take a sideways force up
 *    to μ·N before it slides (Coulomb dry friction; any statics text, e.g. Meriam & Kraige, friction chapter).
 *    With n bolts each preloaded to F, N = n·F.
 *  - Bolt stress F / A_s against the proof stress of the property class (ISO 898-1, from memory):
 *    4.6 → 225 MPa, 5.6 → 280, 8.8 → 580 (d ≤ 16 mm) / 600 (d > 16 mm), 10.9 → 830, 12.9 → 970.
 */

export const PROPERTY_CLASSES = ["4.6", "5.6", "8.8", "10.9", "12.9"] as const;
export type PropertyClass = (typeof PROPERTY_CLASSES)[number];

/** ISO 898-1 proof stress Sp (MPa) for a property class and nominal diameter (from memory). */
export function proofStressMpa(propertyClass: PropertyClass, nominalMm: number): number {
  switch (propertyClass) {
    case "4.6":
      return 225;
    case "5.6":
      return 280;
    case "8.8":
      return nominalMm <= 16 ? 580 : 600;
    case "10.9":
      return 830;
    case "12.9":
      return 970;
  }
}

/** Preload from torque: F = T / (K·d), with T in N·m and d in mm (N). */
export function preloadFromTorqueN(torqueNm: number, nutFactor: number, nominalMm: number): number {
  return (torqueNm * 1000) / (nutFactor * nominalMm);
}

/** Torque for a preload: T = K·F·d (N·m). */
export function torqueForPreloadNm(preloadN: number, nutFactor: number, nominalMm: number): number {
  return (nutFactor * preloadN * nominalMm) / 1000;
}

/** Friction a normal force can hold against sliding: μ·N (N). */
export function frictionHoldN(mu: number, normalForceN: number): number {
  return mu * normalForceN;
}

/** Preload as a share of the proof load above which a caution is shown (common practice: 70–75 % for reused bolts). */
export const PRELOAD_CAUTION_FRACTION = 0.75;
