/**
 * ISO 2768-1:1989 general tolerances for linear and angular dimensions without individual tolerance
 * indications, tolerance classes f (fine), m (medium), c (coarse), v (very coarse). Values from memory.
 *
 * Ranges read "over lower up to and including upper"; the first linear range is 0.5 up to 3 mm inclusive.
 * `null` marks a cell the standard leaves empty ("—"): there the tolerance must be written beside the size.
 */
export const TOLERANCE_CLASSES = ["f", "m", "c", "v"] as const;
export type ToleranceClass2768 = (typeof TOLERANCE_CLASSES)[number];

export interface Band {
  /** Lower end of the range, mm (exclusive except for the first band, where it is inclusive). */
  overMm: number;
  /** Upper end of the range, mm (inclusive); Infinity when open. */
  upToMm: number;
  values: Readonly<Record<ToleranceClass2768, number | null>>;
}

/** ISO 2768-1 Table 1: permissible deviations for linear dimensions except broken edges, ± mm. */
export const LINEAR: readonly Band[] = [
  { overMm: 0.5, upToMm: 3, values: { f: 0.05, m: 0.1, c: 0.2, v: null } },
  { overMm: 3, upToMm: 6, values: { f: 0.05, m: 0.1, c: 0.3, v: 0.5 } },
  { overMm: 6, upToMm: 30, values: { f: 0.1, m: 0.2, c: 0.5, v: 1 } },
  { overMm: 30, upToMm: 120, values: { f: 0.15, m: 0.3, c: 0.8, v: 1.5 } },
  { overMm: 120, upToMm: 400, values: { f: 0.2, m: 0.5, c: 1.2, v: 2.5 } },
  { overMm: 400, upToMm: 1000, values: { f: 0.3, m: 0.8, c: 2, v: 4 } },
  { overMm: 1000, upToMm: 2000, values: { f: 0.5, m: 1.2, c: 3, v: 6 } },
  { overMm: 2000, upToMm: 4000, values: { f: null, m: 2, c: 4, v: 8 } },
];

/** ISO 2768-1 Table 2: permissible deviations for broken edges (external radii and chamfer heights), ± mm. */
export const BROKEN_EDGES: readonly Band[] = [
  { overMm: 0.5, upToMm: 3, values: { f: 0.2, m: 0.2, c: 0.4, v: 0.4 } },
  { overMm: 3, upToMm: 6, values: { f: 0.5, m: 0.5, c: 1, v: 1 } },
  { overMm: 6, upToMm: Infinity, values: { f: 1, m: 1, c: 2, v: 2 } },
];

/** ISO 2768-1 Table 3: permissible deviations of angular dimensions by the length of the shorter leg, ± arc minutes. */
export const ANGULAR: readonly Band[] = [
  { overMm: 0, upToMm: 10, values: { f: 60, m: 60, c: 90, v: 180 } },
  { overMm: 10, upToMm: 50, values: { f: 30, m: 30, c: 60, v: 120 } },
  { overMm: 50, upToMm: 120, values: { f: 20, m: 20, c: 30, v: 60 } },
  { overMm: 120, upToMm: 400, values: { f: 10, m: 10, c: 15, v: 30 } },
  { overMm: 400, upToMm: Infinity, values: { f: 5, m: 5, c: 10, v: 20 } },
];

/** The band holding a size, or undefined when the size is outside the table. */
export function bandFor(table: readonly Band[], sizeMm: number): Band | undefined {
  return table.find((band, i) => (i === 0 ? sizeMm >= band.overMm : sizeMm > band.overMm) && sizeMm <= band.upToMm);
}

/** "±0°30′" style text for a deviation in arc minutes. */
export function formatArcMinutes(minutes: number): string {
  const deg = Math.floor(minutes / 60);
  const min = minutes - deg * 60;
  return `±${deg}°${min > 0 ? `${min}′` : ""}`;
}
