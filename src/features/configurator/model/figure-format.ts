/**
 * Showing a calculator figure whose unit is in its key (`deflectionMm`, `clampForceN`, `angleDeg`,
 * `stressMpa`): the words of the key, and the value in the user's units.
 */
import { convertLength, formatNumber, newtonToLbf, type LengthUnit } from "@/engine/units";

const suffixes: Array<{ suffix: string; format: (v: number, units: LengthUnit) => string }> = [
  { suffix: "Mm3", format: (v) => `${formatNumber(v, 0)} mm³` },
  { suffix: "Mm", format: (v, u) => `${formatNumber(convertLength(v, "mm", u), u === "in" ? 4 : 3)} ${u}` },
  { suffix: "Nm", format: (v) => `${formatNumber(v, 2)} N·m` },
  {
    suffix: "N",
    format: (v, u) =>
      u === "in"
        ? `${formatNumber(v, 0)} N (${formatNumber(newtonToLbf(v), 1)} lbf)`
        : `${formatNumber(v, 0)} N`,
  },
  { suffix: "Deg", format: (v) => `${formatNumber(v, 1)}°` },
  { suffix: "Mpa", format: (v) => `${formatNumber(v, 1)} MPa` },
  { suffix: "Kg", format: (v) => `${formatNumber(v, 3)} kg` },
  { suffix: "Rpm", format: (v) => `${formatNumber(v, 0)} rpm` },
];

/** "maxDeflectionMm" → { words: "max deflection", text: "0.012 mm" }. */
export function describeFigure(
  key: string,
  value: number | string | boolean,
  units: LengthUnit,
): { words: string; text: string } {
  const match =
    typeof value === "number"
      ? suffixes.find((s) => key.endsWith(s.suffix) && key.length > s.suffix.length)
      : undefined;
  const base = match ? key.slice(0, -match.suffix.length) : key;
  const words = base.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase();
  let text: string;
  if (typeof value === "boolean") text = value ? "yes" : "no";
  else if (typeof value === "string") text = value;
  else text = match ? match.format(value, units) : formatNumber(value, 3);
  return { words, text };
}
