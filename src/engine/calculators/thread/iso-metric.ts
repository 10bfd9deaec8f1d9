/**
 * ISO general-purpose metric screw threads M1.6–M24: the pitches of ISO 261:1998 (coarse, and the common
 * fine pitches) and the basic profile dimensions of ISO 724:1993. Table values from memory.
 */

/** Coarse pitch by nominal diameter, mm (ISO 261 Table 1; includes the second-choice sizes M3.5, M14, M18, M22 and the third-choice M7). */
export const COARSE_PITCH_MM: Readonly<Record<string, number>> = {
  "1.6": 0.35,
  "2": 0.4,
  "2.5": 0.45,
  "3": 0.5,
  "3.5": 0.6,
  "4": 0.7,
  "5": 0.8,
  "6": 1,
  "7": 1,
  "8": 1.25,
  "10": 1.5,
  "12": 1.75,
  "14": 2,
  "16": 2,
  "18": 2.5,
  "20": 2.5,
  "22": 2.5,
  "24": 3,
};

/** Fine pitches by nominal diameter, mm (ISO 261 Table 1, the common ones up to M24). */
export const FINE_PITCHES_MM: Readonly<Record<string, readonly number[]>> = {
  "2": [0.25],
  "2.5": [0.35],
  "3": [0.35],
  "4": [0.5],
  "5": [0.5],
  "6": [0.75],
  "8": [1, 0.75],
  "10": [1.25, 1, 0.75],
  "12": [1.5, 1.25, 1],
  "14": [1.5, 1.25, 1],
  "16": [1.5, 1],
  "18": [2, 1.5, 1],
  "20": [2, 1.5, 1],
  "22": [2, 1.5, 1],
  "24": [2, 1.5, 1],
};

/** Clearance holes for bolts and screws, ISO 273:1979 series fine / medium / coarse, mm (from memory). */
export const CLEARANCE_HOLES_MM: Readonly<Record<string, { fine: number; medium: number; coarse: number }>> = {
  "1.6": { fine: 1.7, medium: 1.8, coarse: 2 },
  "2": { fine: 2.2, medium: 2.4, coarse: 2.6 },
  "2.5": { fine: 2.7, medium: 2.9, coarse: 3.1 },
  "3": { fine: 3.2, medium: 3.4, coarse: 3.6 },
  "3.5": { fine: 3.7, medium: 3.9, coarse: 4.2 },
  "4": { fine: 4.3, medium: 4.5, coarse: 4.8 },
  "5": { fine: 5.3, medium: 5.5, coarse: 5.8 },
  "6": { fine: 6.4, medium: 6.6, coarse: 7 },
  "7": { fine: 7.4, medium: 7.6, coarse: 8 },
  "8": { fine: 8.4, medium: 9, coarse: 10 },
  "10": { fine: 10.5, medium: 11, coarse: 12 },
  "12": { fine: 13, medium: 13.5, coarse: 14.5 },
  "14": { fine: 15, medium: 15.5, coarse: 16.5 },
  "16": { fine: 17, medium: 17.5, coarse: 18.5 },
  "18": { fine: 19, medium: 20, coarse: 21 },
  "20": { fine: 21, medium: 22, coarse: 24 },
  "22": { fine: 23, medium: 24, coarse: 26 },
  "24": { fine: 25, medium: 26, coarse: 28 },
};

const SQRT3 = Math.sqrt(3);

/** Basic dimensions of a metric thread, mm. */
export interface BasicProfile {
  /** Height of the fundamental triangle H = (√3/2)·P = 0.866025·P (ISO 68-1). */
  fundamentalTriangleHeight: number;
  /** Pitch diameter d2 = D2 = d − 0.649519·P (ISO 724). */
  pitchDiameter: number;
  /** Minor diameter of the internal thread D1 = d1 = d − 1.082532·P (ISO 724). */
  minorDiameterInternal: number;
  /** Minor diameter of the external thread d3 = d − 1.226869·P (ISO 965-1 / ISO 898-1, root radius H/6). */
  minorDiameterExternal: number;
  /** Tensile stress area As = (π/4)·((d2 + d3)/2)² (ISO 898-1), mm². */
  stressAreaMm2: number;
}

const round = (value: number, places: number) => Math.round(value * 10 ** places) / 10 ** places;

/**
 * ISO 724 basic profile: with H = √3/2·P, d2 = d − ¾H, D1 = d − 5⁄4H, and d3 = d − 17⁄12H; diameters are
 * rounded to 0.001 mm as ISO 724 tabulates them.
 */
export function basicProfile(majorDiameterMm: number, pitchMm: number): BasicProfile {
  const h = (SQRT3 / 2) * pitchMm;
  const d2 = majorDiameterMm - 0.75 * h;
  const d3 = majorDiameterMm - (17 / 12) * h;
  return {
    fundamentalTriangleHeight: round(h, 6),
    pitchDiameter: round(d2, 3),
    minorDiameterInternal: round(majorDiameterMm - 1.25 * h, 3),
    minorDiameterExternal: round(d3, 3),
    stressAreaMm2: round((Math.PI / 4) * ((d2 + d3) / 2) ** 2, 1),
  };
}
