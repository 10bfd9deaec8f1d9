/**
 * Formatting numbers for people: lengths in the user's units (mm to 2 decimals, decimal inches to 3 — the
 * usual drawing precision of each system), angles in degrees, forces in N with lbf beside for inch users.
 * Trailing zeros are trimmed in running text ("12.5 mm", not "12.50 mm").
 */
import { convertLength, newtonToLbf } from "./convert";
import type { LengthUnit } from "./types";

/** Fixed decimals, trailing zeros trimmed, no "-0". */
export function formatNumber(value: number, decimals = 3): string {
  if (!Number.isFinite(value)) return String(value);
  const text = value.toFixed(decimals);
  const trimmed = text.includes(".") ? text.replace(/\.?0+$/, "") : text;
  return trimmed === "-0" ? "0" : trimmed;
}

/** Default decimals shown for a length in each system. */
export function lengthDecimals(unit: LengthUnit): number {
  return unit === "mm" ? 2 : 3;
}

/** A length given in `from` units, shown in `to` units with its symbol: "12.5 mm", "0.492 in". */
export function formatLength(value: number, from: LengthUnit, to: LengthUnit, decimals?: number): string {
  return `${formatNumber(convertLength(value, from, to), decimals ?? lengthDecimals(to))} ${to}`;
}

export function formatAngle(valueDeg: number, decimals = 1): string {
  return `${formatNumber(valueDeg, decimals)}°`;
}

/** "245 N", or for inch users "245 N (55.1 lbf)". */
export function formatForce(valueN: number, units: LengthUnit, decimals = 0): string {
  const n = `${formatNumber(valueN, decimals)} N`;
  return units === "in" ? `${n} (${formatNumber(newtonToLbf(valueN), 1)} lbf)` : n;
}

export function formatPercent(ratio: number, decimals = 0): string {
  return `${formatNumber(ratio * 100, decimals)} %`;
}
