/**
 * Tool choice for the operation sheet: common metric cutter sizes and the rules a machinist uses to pick one.
 * All rules here are common practice (no published source), chosen to be cautious for small machines.
 */

/** Common metric end-mill diameters (mm). */
export const END_MILLS_MM = [1, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 12, 14, 16, 18, 20, 25] as const;

/** Common 90° spot-drill diameters (mm). */
export const SPOT_DRILLS_MM = [3, 4, 6, 8, 10, 12, 16] as const;

/** Common chamfer / V-cutter diameters (mm). */
export const V_CUTTERS_MM = [6, 10, 12, 16, 20, 25] as const;

/** Largest listed size not above `limitMm`, or the smallest listed size if none fits. */
export function largestNotAbove(sizes: readonly number[], limitMm: number): number {
  let best: number | undefined;
  for (const s of sizes) if (s <= limitMm + 1e-9 && (best === undefined || s > best)) best = s;
  return best ?? sizes[0]!;
}

/** Smallest listed size not below `minMm`, or the largest listed size. */
export function smallestNotBelow(sizes: readonly number[], minMm: number): number {
  let best: number | undefined;
  for (const s of sizes) if (s >= minMm - 1e-9 && (best === undefined || s < best)) best = s;
  return best ?? sizes[sizes.length - 1]!;
}

/**
 * Spot drill for a hole: the smallest 90° spot drill at least as big as the hole, so the spot leaves a small
 * chamfer and the drill starts true (common practice); capped at 16 mm.
 */
export function spotDrillFor(holeDiameterMm: number): number {
  return smallestNotBelow(SPOT_DRILLS_MM, holeDiameterMm);
}

/** Holes above this are pilot drilled first (common practice for small machines). */
export const PILOT_ABOVE_MM = 12;

/** Pilot drill for a large hole: about 0.4 × the final size, whole mm, at least 4 mm (common practice). */
export function pilotDrillFor(holeDiameterMm: number): number {
  return Math.max(4, Math.round(holeDiameterMm * 0.4));
}

/** End mill for a slot: the largest listed cutter not wider than the slot. */
export function slotMillFor(widthMm: number): number {
  return largestNotAbove(END_MILLS_MM, widthMm);
}

/**
 * End mill for a pocket: not above half the pocket's smaller side (room to clear chips and step over),
 * and not above twice the corner radius when one is given (the cutter forms the corner).
 */
export function pocketMillFor(smallerSideMm: number, cornerRadiusMm?: number): number {
  const limit = cornerRadiusMm !== undefined && cornerRadiusMm > 0 ? Math.min(smallerSideMm / 2, 2 * cornerRadiusMm) : smallerSideMm / 2;
  return largestNotAbove(END_MILLS_MM, limit);
}

/** End mill for a step: Ø16 where the step is big enough, else the largest that fits its biggest extent. */
export function stepMillFor(largestExtentMm: number): number {
  return largestNotAbove(END_MILLS_MM, Math.min(16, largestExtentMm));
}
