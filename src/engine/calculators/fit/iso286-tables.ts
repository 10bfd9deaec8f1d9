/**
 * ISO 286-1:2010 tables, in micrometres, as recalled (from memory) and cross-checked in the tests against the
 * standard's own formula for the tolerance factor i = 0.45·∛D + 0.001·D and against ISO 286-2 limit values.
 *
 * Size ranges are "above lower, up to and including upper" (ISO 286-1 Table 1); the first range is above 0 up
 * to and including 3 mm.
 */

/** Upper bounds of the main size ranges, mm (ISO 286-1 Table 1). */
export const MAIN_RANGE_UPPER_MM = [3, 6, 10, 18, 30, 50, 80, 120, 180, 250, 315, 400, 500] as const;

/**
 * Upper bounds of the intermediate size ranges, mm (ISO 286-1 Tables 2 and 3), used by the letters whose
 * deviations change inside a main range (r and s here). Below 50 mm they coincide with the main ranges for
 * the letters tabulated in this module.
 */
export const INTERMEDIATE_RANGE_UPPER_MM = [
  3, 6, 10, 18, 30, 50, 65, 80, 100, 120, 140, 160, 180, 200, 225, 250, 280, 315, 355, 400, 450, 500,
] as const;

/** Standard tolerance values IT1…IT18 in µm, one row per grade, one column per main size range (Table 1). */
export const IT_UM: Readonly<Record<number, readonly number[]>> = {
  1: [0.8, 1, 1, 1.2, 1.5, 1.5, 2, 2.5, 3.5, 4.5, 6, 7, 8],
  2: [1.2, 1.5, 1.5, 2, 2.5, 2.5, 3, 4, 5, 7, 8, 9, 10],
  3: [2, 2.5, 2.5, 3, 4, 4, 5, 6, 8, 10, 12, 13, 15],
  4: [3, 4, 4, 5, 6, 7, 8, 10, 12, 14, 16, 18, 20],
  5: [4, 5, 6, 8, 9, 11, 13, 15, 18, 20, 23, 25, 27],
  6: [6, 8, 9, 11, 13, 16, 19, 22, 25, 29, 32, 36, 40],
  7: [10, 12, 15, 18, 21, 25, 30, 35, 40, 46, 52, 57, 63],
  8: [14, 18, 22, 27, 33, 39, 46, 54, 63, 72, 81, 89, 97],
  9: [25, 30, 36, 43, 52, 62, 74, 87, 100, 115, 130, 140, 155],
  10: [40, 48, 58, 70, 84, 100, 120, 140, 160, 185, 210, 230, 250],
  11: [60, 75, 90, 110, 130, 160, 190, 220, 250, 290, 320, 360, 400],
  12: [100, 120, 150, 180, 210, 250, 300, 350, 400, 460, 520, 570, 630],
  13: [140, 180, 220, 270, 330, 390, 460, 540, 630, 720, 810, 890, 970],
  14: [250, 300, 360, 430, 520, 620, 740, 870, 1000, 1150, 1300, 1400, 1550],
  15: [400, 480, 580, 700, 840, 1000, 1200, 1400, 1600, 1850, 2100, 2300, 2500],
  16: [600, 750, 900, 1100, 1300, 1600, 1900, 2200, 2500, 2900, 3200, 3600, 4000],
  17: [1000, 1200, 1500, 1800, 2100, 2500, 3000, 3500, 4000, 4600, 5200, 5700, 6300],
  18: [1400, 1800, 2200, 2700, 3300, 3900, 4600, 5400, 6300, 7200, 8100, 8900, 9700],
};

/**
 * Shaft fundamental deviations by main size range, µm (ISO 286-1 Table 2).
 * d…g give the upper deviation es (negative); m, n, p give the lower deviation ei (positive).
 */
export const SHAFT_FD_MAIN_UM: Readonly<Record<"d" | "e" | "f" | "g" | "m" | "n" | "p", readonly number[]>> = {
  d: [-20, -30, -40, -50, -65, -80, -100, -120, -145, -170, -190, -210, -230],
  e: [-14, -20, -25, -32, -40, -50, -60, -72, -85, -100, -110, -125, -135],
  f: [-6, -10, -13, -16, -20, -25, -30, -36, -43, -50, -56, -62, -68],
  g: [-2, -4, -5, -6, -7, -9, -10, -12, -14, -15, -17, -18, -20],
  m: [2, 4, 6, 7, 8, 9, 11, 13, 15, 17, 20, 21, 23],
  n: [4, 8, 10, 12, 15, 17, 20, 23, 27, 31, 34, 37, 40],
  p: [6, 12, 15, 18, 22, 26, 32, 37, 43, 50, 56, 62, 68],
};

/** Shaft k, lower deviation ei for grades IT4 to IT7, µm (ISO 286-1 Table 2); 0 for ≤ IT3 and > IT7. */
export const SHAFT_K_IT4_TO_IT7_UM: readonly number[] = [0, 1, 1, 1, 2, 2, 2, 3, 3, 4, 4, 4, 5];

/** Shaft r and s, lower deviation ei by intermediate size range, µm (ISO 286-1 Table 2). */
export const SHAFT_FD_INTERMEDIATE_UM: Readonly<Record<"r" | "s", readonly number[]>> = {
  r: [10, 15, 19, 23, 28, 34, 41, 43, 51, 54, 63, 65, 68, 77, 80, 84, 94, 98, 108, 114, 126, 132],
  s: [14, 19, 23, 28, 35, 43, 53, 59, 71, 79, 92, 100, 108, 122, 130, 140, 158, 170, 190, 208, 232, 252],
};
