/**
 * ISO 286-1:2010 limits for holes and shafts: standard tolerance grades and fundamental deviations.
 *
 * A tolerance class is a letter (position of the zone) and a grade (width of the zone), e.g. "H7", "g6".
 * For a shaft: es = upper deviation, ei = lower deviation; for a hole: ES, EI. One of the two is the
 * fundamental deviation from ISO 286-1 Table 2 (shafts) or Table 3 (holes); the other follows from the
 * standard tolerance IT of the grade (ISO 286-1 Table 1): es − ei = ES − EI = IT.
 *
 * Hole rules (ISO 286-1 §4.3.2, Table 3):
 *  - A…H: EI = −es of the same shaft letter (the general rule).
 *  - JS / js: ±IT/2 (ISO 286-1:2010; the 1988 edition allowed rounding odd IT7–IT11 values down).
 *  - K, M, N up to IT8 and P…ZC up to IT7: the special rule ES = −ei + Δ with Δ = ITn − IT(n−1), so that a
 *    hole-basis and the equivalent shaft-basis fit give the same clearances. Δ = 0 up to 3 mm.
 *  - K above IT8 is only defined up to 3 mm; N above IT8 has ES = 0 (−4 µm up to 3 mm) and is not used up to 1 mm.
 *  - Special case: M6 above 250 up to 315 mm has ES = −9 µm (not −11).
 * Grades IT14–IT18 are not used for nominal sizes up to 1 mm.
 */
import { CalculatorInputError } from "../types";
import {
  INTERMEDIATE_RANGE_UPPER_MM,
  IT_UM,
  MAIN_RANGE_UPPER_MM,
  SHAFT_FD_INTERMEDIATE_UM,
  SHAFT_FD_MAIN_UM,
  SHAFT_K_IT4_TO_IT7_UM,
} from "./iso286-tables";

export const MAX_SIZE_MM = 500;
export const HOLE_LETTERS = ["D", "E", "F", "G", "H", "JS", "K", "M", "N", "P", "R", "S"] as const;
export const SHAFT_LETTERS = ["d", "e", "f", "g", "h", "js", "k", "m", "n", "p", "r", "s"] as const;
export type HoleLetter = (typeof HOLE_LETTERS)[number];
export type ShaftLetter = (typeof SHAFT_LETTERS)[number];

/** Limits of one tolerance class at one nominal size, all in mm. */
export interface ToleranceLimits {
  /** The class as normalised, e.g. "H7", "js6". */
  toleranceClass: string;
  letter: string;
  grade: number;
  nominalMm: number;
  /** Upper deviation (ES or es), mm. */
  upper: number;
  /** Lower deviation (EI or ei), mm. */
  lower: number;
  /** Upper limit of size = nominal + upper, mm. */
  max: number;
  /** Lower limit of size = nominal + lower, mm. */
  min: number;
  /** Standard tolerance IT of the grade at this size, mm. */
  itMm: number;
}

/** Rounds to 0.01 µm so sums of tabulated µm values print cleanly in mm. */
function roundMm(valueMm: number): number {
  return Math.round(valueMm * 1e5) / 1e5;
}

function checkSize(sizeMm: number): void {
  if (!Number.isFinite(sizeMm) || sizeMm <= 0 || sizeMm > MAX_SIZE_MM) {
    throw new CalculatorInputError(
      `Nominal size ${sizeMm} mm is outside ISO 286 as covered here: above 0 up to and including ${MAX_SIZE_MM} mm.`,
      "size",
    );
  }
}

function rangeIndex(sizeMm: number, uppers: readonly number[]): number {
  const index = uppers.findIndex((upper) => sizeMm <= upper);
  if (index < 0) throw new CalculatorInputError(`Nominal size ${sizeMm} mm is above ${MAX_SIZE_MM} mm.`, "size");
  return index;
}

/** Value of a per-range table at a size. */
function atSize(table: readonly number[], sizeMm: number, uppers: readonly number[] = MAIN_RANGE_UPPER_MM): number {
  const value = table[rangeIndex(sizeMm, uppers)];
  if (value === undefined) throw new Error("ISO 286 table is shorter than its size ranges.");
  return value;
}

function itUm(sizeMm: number, grade: number): number {
  checkSize(sizeMm);
  const row = IT_UM[grade];
  if (!Number.isInteger(grade) || !row) {
    throw new CalculatorInputError(`Tolerance grade IT${grade} is not covered: use IT1 to IT18.`, "grade");
  }
  if (grade >= 14 && sizeMm <= 1) {
    throw new CalculatorInputError(`ISO 286-1: grades IT14 to IT18 are not used for nominal sizes up to 1 mm.`, "grade");
  }
  return atSize(row, sizeMm);
}

/**
 * Standard tolerance ITn at a nominal size, in mm (ISO 286-1:2010 Table 1).
 * Based on the tolerance factor i = 0.45·∛D + 0.001·D µm (D = geometric mean of the size range) times the
 * grade's multiplier (IT5 = 7i, IT6 = 10i, IT7 = 16i, … IT11 = 100i), rounded as the standard tabulates.
 */
export function toleranceGrade(sizeMm: number, grade: number): number {
  return roundMm(itUm(sizeMm, grade) / 1000);
}

/** Δ = ITn − IT(n−1) in µm for the special hole rule (ISO 286-1 Table 3); 0 up to 3 mm. */
export function deltaUm(sizeMm: number, grade: number): number {
  checkSize(sizeMm);
  if (sizeMm <= 3) return 0;
  if (grade < 3 || grade > 8) {
    throw new CalculatorInputError(`ISO 286-1 defines Δ only for grades IT3 to IT8 (asked IT${grade}).`, "grade");
  }
  return itUm(sizeMm, grade) - itUm(sizeMm, grade - 1);
}

interface ParsedClass {
  letter: string;
  grade: number;
}

function parseClass(text: string, kind: "hole" | "shaft"): ParsedClass {
  const match = /^\s*([A-Za-z]{1,2})\s*(\d{1,2})\s*$/.exec(text);
  const example = kind === "hole" ? "H7" : "g6";
  if (!match || !match[1] || !match[2]) {
    throw new CalculatorInputError(
      `"${text}" is not an ISO 286 tolerance class: write a letter and a grade, e.g. "${example}".`,
      kind,
    );
  }
  const raw = match[1];
  const grade = Number(match[2]);
  const isUpper = raw === raw.toUpperCase();
  const isLower = raw === raw.toLowerCase();
  // "Js"/"jS" are accepted as JS/js by their first letter's case.
  const letter = raw.length === 2 && !isUpper && !isLower ? (raw[0] === "J" ? "JS" : "js") : raw;
  const holeLike = letter === letter.toUpperCase();
  if (kind === "hole" && !holeLike) {
    throw new CalculatorInputError(`"${text}" is a shaft class (lower case); hole classes use capitals, e.g. "H7".`, kind);
  }
  if (kind === "shaft" && holeLike) {
    throw new CalculatorInputError(`"${text}" is a hole class (capitals); shaft classes use lower case, e.g. "g6".`, kind);
  }
  const known: readonly string[] = kind === "hole" ? HOLE_LETTERS : SHAFT_LETTERS;
  if (!known.includes(letter)) {
    throw new CalculatorInputError(
      `Fundamental deviation "${letter}" is not covered for ${kind}s; available: ${known.join(", ")}.`,
      kind,
    );
  }
  if (grade < 1 || grade > 18) {
    throw new CalculatorInputError(`Grade ${grade} in "${text}" is not an ISO 286 grade: use 1 to 18.`, kind);
  }
  return { letter, grade };
}

/** Shaft lower deviation ei for k…s, µm. */
function shaftEiUm(letter: ShaftLetter, grade: number, sizeMm: number): number {
  switch (letter) {
    case "k":
      return grade >= 4 && grade <= 7 ? atSize(SHAFT_K_IT4_TO_IT7_UM, sizeMm) : 0;
    case "m":
    case "n":
    case "p":
      return atSize(SHAFT_FD_MAIN_UM[letter], sizeMm);
    case "r":
    case "s":
      return atSize(SHAFT_FD_INTERMEDIATE_UM[letter], sizeMm, INTERMEDIATE_RANGE_UPPER_MM);
    default:
      throw new Error(`shaftEiUm called for "${letter}".`);
  }
}

function limits(cls: string, letter: string, grade: number, sizeMm: number, upperUm: number, itUmValue: number): ToleranceLimits {
  const upper = roundMm(upperUm / 1000);
  const lower = roundMm((upperUm - itUmValue) / 1000);
  if (sizeMm + lower <= 0) {
    throw new CalculatorInputError(
      `${cls} at ${sizeMm} mm would give a lower limit of size of ${roundMm(sizeMm + lower)} mm: choose a larger size or another class.`,
      "size",
    );
  }
  return {
    toleranceClass: cls,
    letter,
    grade,
    nominalMm: sizeMm,
    upper,
    lower,
    max: roundMm(sizeMm + upper),
    min: roundMm(sizeMm + lower),
    itMm: roundMm(itUmValue / 1000),
  };
}

/** Shaft limits for a class such as "g6" at a nominal size (ISO 286-1 Table 2). Deviations in mm. */
export function shaftLimits(sizeMm: number, toleranceClass: string): ToleranceLimits {
  checkSize(sizeMm);
  const { letter, grade } = parseClass(toleranceClass, "shaft");
  const l = letter as ShaftLetter;
  const it = itUm(sizeMm, grade);
  const cls = `${l}${grade}`;
  let esUm: number;
  switch (l) {
    case "d":
    case "e":
    case "f":
    case "g":
      esUm = atSize(SHAFT_FD_MAIN_UM[l], sizeMm);
      break;
    case "h":
      esUm = 0;
      break;
    case "js":
      esUm = it / 2;
      break;
    default:
      esUm = shaftEiUm(l, grade, sizeMm) + it;
  }
  return limits(cls, l, grade, sizeMm, esUm, it);
}

/** Hole limits for a class such as "H7" at a nominal size (ISO 286-1 Table 3 with the Δ rule). Deviations in mm. */
export function holeLimits(sizeMm: number, toleranceClass: string): ToleranceLimits {
  checkSize(sizeMm);
  const { letter, grade } = parseClass(toleranceClass, "hole");
  const l = letter as HoleLetter;
  const it = itUm(sizeMm, grade);
  const cls = `${l}${grade}`;
  let esUm: number;
  switch (l) {
    case "D":
    case "E":
    case "F":
    case "G": {
      const eiUm = -atSize(SHAFT_FD_MAIN_UM[l.toLowerCase() as "d" | "e" | "f" | "g"], sizeMm);
      esUm = eiUm + it;
      break;
    }
    case "H":
      esUm = it;
      break;
    case "JS":
      esUm = it / 2;
      break;
    case "K":
      if (grade <= 8) {
        esUm = -atSize(SHAFT_K_IT4_TO_IT7_UM, sizeMm) + deltaUm(sizeMm, grade);
      } else if (sizeMm <= 3) {
        esUm = 0;
      } else {
        throw new CalculatorInputError(`ISO 286-1 defines K coarser than IT8 only up to 3 mm (asked ${cls} at ${sizeMm} mm).`, "hole");
      }
      break;
    case "M":
      if (grade === 6 && sizeMm > 250 && sizeMm <= 315) {
        esUm = -9; // ISO 286-1 Table 3, special case for M6 above 250 up to 315 mm.
      } else {
        esUm = -atSize(SHAFT_FD_MAIN_UM.m, sizeMm) + (grade <= 8 ? deltaUm(sizeMm, grade) : 0);
      }
      break;
    case "N":
      if (grade <= 8) {
        esUm = -atSize(SHAFT_FD_MAIN_UM.n, sizeMm) + deltaUm(sizeMm, grade);
      } else if (sizeMm <= 1) {
        throw new CalculatorInputError(`ISO 286-1: N coarser than IT8 is not used for sizes up to 1 mm (asked ${cls}).`, "hole");
      } else {
        esUm = sizeMm <= 3 ? -4 : 0;
      }
      break;
    case "P":
    case "R":
    case "S": {
      const eiShaft = shaftEiUm(l.toLowerCase() as "p" | "r" | "s", grade, sizeMm);
      esUm = -eiShaft + (grade <= 7 ? deltaUm(sizeMm, grade) : 0);
      break;
    }
  }
  return limits(cls, l, grade, sizeMm, esUm, it);
}

export type FitKind = "clearance" | "transition" | "interference";

/** The fit of a hole and a shaft at the same nominal size; clearance = hole − shaft, negative = interference. */
export interface FitLimits {
  /** Smallest clearance, mm = EI − es (negative: interference). */
  clearanceMin: number;
  /** Largest clearance, mm = ES − ei (negative: interference). */
  clearanceMax: number;
  kind: FitKind;
}

/**
 * ISO 286-1 §3.4 fit kinds: clearance when the smallest clearance is ≥ 0, interference when the largest
 * clearance is ≤ 0 (the smallest interference is ≥ 0), transition otherwise.
 */
export function fitBetween(hole: ToleranceLimits, shaft: ToleranceLimits): FitLimits {
  const clearanceMin = roundMm(hole.lower - shaft.upper);
  const clearanceMax = roundMm(hole.upper - shaft.lower);
  const kind: FitKind = clearanceMin >= 0 ? "clearance" : clearanceMax <= 0 ? "interference" : "transition";
  return { clearanceMin, clearanceMax, kind };
}
