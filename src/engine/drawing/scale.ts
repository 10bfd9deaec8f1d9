/**
 * Drawing scales from the ISO 5455 series: enlargement 5:1, 2:1; full size 1:1; reduction 1:2, 1:5,
 * 1:10, 1:20, 1:50 (the series continues with ×10 multiples; workshop accessories never need them).
 * 10:1 and larger are left out: at those sizes a workshop part is better shown at 5:1 with a detail view.
 */
export interface DrawingScale {
  /** Sheet mm per model mm. */
  factor: number;
  /** As printed: "2:1", "1:1", "1:5". */
  label: string;
}

export const ISO_5455_SCALES: readonly DrawingScale[] = [
  { factor: 5, label: "5:1" },
  { factor: 2, label: "2:1" },
  { factor: 1, label: "1:1" },
  { factor: 0.5, label: "1:2" },
  { factor: 0.2, label: "1:5" },
  { factor: 0.1, label: "1:10" },
  { factor: 0.05, label: "1:20" },
  { factor: 0.02, label: "1:50" },
];

/**
 * The largest scale of the series for which `fits` says the drawing fits, trying from `maxFactor` down;
 * undefined when even the smallest does not fit.
 */
export function chooseScale(fits: (scale: DrawingScale) => boolean, maxFactor = 5): DrawingScale | undefined {
  return ISO_5455_SCALES.filter((s) => s.factor <= maxFactor).find(fits);
}
