/**
 * The "made to suit" line of an assembly sheet: the user's own machine measurements the design was sized
 * from (a template's parameters grouped under "Your …", e.g. "Your vise"), so a drawing that leaves the
 * shop still says which vise or table it fits.
 */
import type { Template } from "../template/schema";
import { formatter, type Units } from "./format";

type Parameter = Template["parameters"][number];

/** Whether a parameter describes the user's own machine (group "Your vise", "Your table", …). */
export function isMachineMeasurement(p: Parameter): boolean {
  return /^your\b/i.test(p.group ?? "");
}

function formatNumber(value: number): string {
  return String(Number(value.toFixed(3)));
}

function formatValue(p: Parameter, value: unknown, units: Units): string | undefined {
  if (value === undefined || value === null) return undefined;
  if (typeof value === "number") {
    // Lengths in the sheet's dimension style (".787 in", "20 mm"), with the unit: the note is read on its own.
    if (p.kind === "length") return `${formatter(units).length(value)} ${units === "in" ? "in" : "mm"}`;
    if (p.kind === "angle") return `${formatNumber(value)}°`;
    if (p.kind === "force") return `${formatNumber(value)} N`;
    return formatNumber(value);
  }
  if (typeof value === "boolean") return value ? "yes" : "no";
  return String(value);
}

/**
 * "Made to suit: Jaw width 127 mm, Jaw height 38.1 mm." from the template's machine-measurement parameters
 * and the values entered, lengths in mm (the evaluation's `parametersMm`, whatever units it was worked
 * in), shown in the sheet's units; undefined when the template has none.
 */
export function madeToSuitNote(parameters: readonly Parameter[], valuesMm: Record<string, unknown>, units: Units): string | undefined {
  const items = parameters
    .filter(isMachineMeasurement)
    .map((p) => {
      const shown = formatValue(p, valuesMm[p.key], units);
      return shown === undefined ? undefined : `${p.label} ${shown}`;
    })
    .filter((s): s is string => s !== undefined);
  return items.length > 0 ? `Made to suit: ${items.join(", ")}.` : undefined;
}
