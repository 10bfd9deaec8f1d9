/**
 * Reaming allowance (stock left on the diameter for the reamer) by reamer size and method.
 * Common practice, as the reamer makers' catalogue tables and workshop handbooks give it (from memory):
 * machine reaming about 0.1 mm up to Ø4, 0.2 mm up to Ø11, 0.3 mm up to Ø20, 0.4 mm up to Ø32 and
 * 0.5 mm up to Ø50; hand reaming takes less, about 0.1 mm up to Ø20 and 0.2 mm above.
 */
export const REAM_METHODS = ["machine", "hand"] as const;
export type ReamMethod = (typeof REAM_METHODS)[number];

export interface AllowanceBand {
  /** Band covers diameters over the previous band's limit up to and including this, mm. */
  upToMm: number;
  allowanceMm: number;
  /** The range the tables give, mm, as text. */
  range: string;
}

export const MAX_REAM_DIAMETER_MM = 50;
export const MIN_REAM_DIAMETER_MM = 1;

export const ALLOWANCE: Readonly<Record<ReamMethod, readonly AllowanceBand[]>> = {
  machine: [
    { upToMm: 4, allowanceMm: 0.1, range: "0.05–0.1" },
    { upToMm: 11, allowanceMm: 0.2, range: "0.15–0.2" },
    { upToMm: 20, allowanceMm: 0.3, range: "0.2–0.3" },
    { upToMm: 32, allowanceMm: 0.4, range: "0.3–0.4" },
    { upToMm: 50, allowanceMm: 0.5, range: "0.4–0.5" },
  ],
  hand: [
    { upToMm: 20, allowanceMm: 0.1, range: "0.05–0.15" },
    { upToMm: 50, allowanceMm: 0.2, range: "0.15–0.25" },
  ],
};

export function allowanceBand(diameterMm: number, method: ReamMethod): AllowanceBand | undefined {
  return ALLOWANCE[method].find((band) => diameterMm <= band.upToMm);
}
