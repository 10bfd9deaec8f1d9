/**
 * Unit conversions with exact defining constants.
 *
 * - 1 in = 25.4 mm exactly (international yard and pound agreement, 1959; NIST SP 811 Appendix B).
 * - 1 lbf = 4.4482216152605 N exactly (standard gravity 9.80665 m/s² × 0.45359237 kg; NIST SP 811 App. B).
 *
 * Results lose the last-place noise of binary arithmetic (see {@link snap}), so that a value converted there
 * and back comes home exactly (10 mm → in → mm is 10, not 10.000000000000002).
 */
import { asInch, asMm, asNewton, asPoundForce, type Inch, type LengthUnit, type Mm, type Newton, type PoundForce } from "./types";

export const MM_PER_INCH = 25.4;
export const NEWTON_PER_LBF = 4.4482216152605;

/**
 * Removes binary conversion noise: when the value lies within a few units in the last place of a number
 * with 12 significant digits, that number is returned (10.000000000000002 → 10); any other value is
 * returned unchanged, so no precision is ever thrown away (4.4482216152605 stays as it is).
 */
export function snap(value: number): number {
  if (value === 0 || !Number.isFinite(value)) return value === 0 ? 0 : value;
  const near = Number(value.toPrecision(12));
  return Math.abs(near - value) <= 4 * Number.EPSILON * Math.abs(value) ? near : value;
}

export function inchToMm(value: Inch | number): Mm {
  return asMm(snap(value * MM_PER_INCH));
}

export function mmToInch(value: Mm | number): Inch {
  return asInch(snap(value / MM_PER_INCH));
}

export function newtonToLbf(value: Newton | number): PoundForce {
  return asPoundForce(snap(value / NEWTON_PER_LBF));
}

export function lbfToNewton(value: PoundForce | number): Newton {
  return asNewton(snap(value * NEWTON_PER_LBF));
}

/** Millimetres per unit of the given length system. */
export function mmPerUnit(unit: LengthUnit): number {
  return unit === "mm" ? 1 : MM_PER_INCH;
}

/** A length in `from` units expressed in `to` units (identity, not even snapped, when they agree). */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  if (from === to) return value;
  return from === "in" ? inchToMm(value) : mmToInch(value);
}

export function lengthToMm(value: number, unit: LengthUnit): Mm {
  return asMm(convertLength(value, unit, "mm"));
}

export function lengthFromMm(valueMm: Mm | number, unit: LengthUnit): number {
  return convertLength(valueMm, "mm", unit);
}
