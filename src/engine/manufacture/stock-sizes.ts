/**
 * Standard stock a small shop can buy: common metric and imperial bar and plate sizes.
 *
 * These are the sizes general stockholders commonly list (bright and black round bar, flat bar, hexagon,
 * plate) — common practice, not a standard; any one supplier stocks a subset, and not every width of flat
 * bar comes in every thickness. Imperial sizes are the fractional inch series, stored here in mm
 * (exactly 25.4 mm per inch).
 */
import type { Source } from "../calculators/types";

export type StockSystem = "metric" | "imperial";
export type StockForm = "round" | "flat" | "plate" | "hex";

const IN = 25.4;
const inches = (...values: number[]): number[] => values.map((v) => v * IN);

/** Round bar diameters, mm. */
export const ROUND_BAR_MM: Readonly<Record<StockSystem, readonly number[]>> = {
  metric: [3, 4, 5, 6, 8, 10, 12, 14, 15, 16, 18, 20, 22, 25, 28, 30, 32, 35, 38, 40, 45, 50, 55, 60, 65, 70, 75, 80, 90, 100, 110, 120, 130, 140, 150],
  imperial: inches(1 / 8, 3 / 16, 1 / 4, 5 / 16, 3 / 8, 7 / 16, 1 / 2, 9 / 16, 5 / 8, 3 / 4, 7 / 8, 1, 1.125, 1.25, 1.375, 1.5, 1.75, 2, 2.25, 2.5, 2.75, 3, 3.5, 4, 4.5, 5, 6),
};

/** Hexagon bar sizes across flats, mm. */
export const HEX_BAR_MM: Readonly<Record<StockSystem, readonly number[]>> = {
  metric: [5.5, 7, 8, 10, 11, 13, 14, 16, 17, 19, 22, 24, 27, 30, 32, 36, 41, 46, 50],
  imperial: inches(1 / 4, 5 / 16, 3 / 8, 7 / 16, 1 / 2, 9 / 16, 5 / 8, 3 / 4, 7 / 8, 1, 1.125, 1.25, 1.5, 2),
};

/** Flat bar widths and thicknesses, mm (a width is offered in the thicknesses not greater than it). */
export const FLAT_BAR_MM: Readonly<Record<StockSystem, { widths: readonly number[]; thicknesses: readonly number[] }>> = {
  metric: {
    widths: [10, 12, 15, 16, 20, 25, 30, 32, 35, 40, 45, 50, 60, 65, 70, 75, 80, 90, 100, 120, 150],
    thicknesses: [3, 4, 5, 6, 8, 10, 12, 15, 16, 20, 25, 30, 35, 40, 50],
  },
  imperial: {
    widths: inches(3 / 8, 1 / 2, 5 / 8, 3 / 4, 1, 1.25, 1.5, 1.75, 2, 2.5, 3, 3.5, 4, 5, 6),
    thicknesses: inches(1 / 8, 3 / 16, 1 / 4, 5 / 16, 3 / 8, 1 / 2, 5 / 8, 3 / 4, 1, 1.25, 1.5, 2),
  },
};

/** Plate thicknesses, mm (plate is cut to width and length to order). */
export const PLATE_MM: Readonly<Record<StockSystem, readonly number[]>> = {
  metric: [1, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 12, 15, 16, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100],
  imperial: inches(1 / 16, 1 / 8, 3 / 16, 1 / 4, 5 / 16, 3 / 8, 1 / 2, 5 / 8, 3 / 4, 1, 1.25, 1.5, 2, 2.5, 3, 4),
};

export const stockSizeSources: Source[] = [
  {
    title: "Stockholders' common ranges of round, hexagon and flat bar and plate (metric and fractional-inch)",
    kind: "common practice",
    note: "Availability varies by supplier and material; check before ordering.",
  },
];

/** Smallest listed size not below `requiredMm` (with a 1 µm tolerance for exact matches), or undefined. */
export function nextSizeUp(sizesMm: readonly number[], requiredMm: number): number | undefined {
  let best: number | undefined;
  for (const s of sizesMm) if (s >= requiredMm - 1e-6 && (best === undefined || s < best)) best = s;
  return best;
}

/** A size in the system's customary words: "25 mm" or `1 1/4"`. */
export function formatStockSize(sizeMm: number, system: StockSystem): string {
  if (system === "metric") return `${Number(sizeMm.toFixed(2))} mm`;
  const totalSixteenths = Math.round((sizeMm / IN) * 16);
  const whole = Math.floor(totalSixteenths / 16);
  let num = totalSixteenths % 16;
  let den = 16;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  if (num === 0) return `${whole}"`;
  return whole > 0 ? `${whole} ${num}/${den}"` : `${num}/${den}"`;
}
