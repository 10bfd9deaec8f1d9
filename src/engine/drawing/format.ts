/**
 * Dimension text in the user's units.
 *
 *  - Millimetres (ISO 129-1): the value without trailing zeros, to 0.01 mm ("12", "2.5", "6.35").
 *  - Inches: decimal inches to three places, the usual workshop precision for general dimensions, without a
 *    leading zero below one inch (ASME Y14.5 §1.6.2: ".750", "1.250"); tolerance deviations to four places.
 * Model values are always millimetres; conversion happens only here (1 in = 25.4 mm exactly).
 */
export type Units = "mm" | "in";

export const MM_PER_INCH = 25.4;

export interface Formatter {
  units: Units;
  /** A length: "12.5" / "0.492" → ".492". */
  length(mm: number): string;
  /** A diameter: "Ø12.5". */
  diameter(mm: number): string;
  /** A tolerance deviation with sign: "+0.012", "0", "-0.005"; inches "+.0005". */
  deviation(mm: number): string;
  /** Word for the unit in notes: "mm" or "inches". */
  unitWord: string;
}

function trimZeros(s: string): string {
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}

function noLeadingZero(s: string): string {
  return s.replace(/^(-?)0\./, "$1.");
}

/** Normalises −0 and values within half the last place of zero to "0". */
function isZero(v: number, places: number): boolean {
  return Math.abs(v) < 0.5 * 10 ** -places;
}

export function formatter(units: Units): Formatter {
  if (units === "mm") {
    const length = (mm: number) => (isZero(mm, 2) ? "0" : trimZeros(mm.toFixed(2)));
    return {
      units,
      unitWord: "mm",
      length,
      diameter: (mm) => `Ø${length(mm)}`,
      deviation: (mm) => (isZero(mm, 3) ? "0" : `${mm > 0 ? "+" : "-"}${trimZeros(Math.abs(mm).toFixed(3))}`),
    };
  }
  const length = (mm: number) => (isZero(mm / MM_PER_INCH, 3) ? "0" : noLeadingZero((mm / MM_PER_INCH).toFixed(3)));
  return {
    units,
    unitWord: "inches",
    length,
    diameter: (mm) => `Ø${length(mm)}`,
    deviation: (mm) => {
      const v = mm / MM_PER_INCH;
      return isZero(v, 4) ? "0" : `${v > 0 ? "+" : "-"}${noLeadingZero(Math.abs(v).toFixed(4))}`;
    },
  };
}

/** An angle in degrees: "45°", "7.5°". */
export function formatAngle(deg: number): string {
  return `${trimZeros(deg.toFixed(1))}°`;
}
