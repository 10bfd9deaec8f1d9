/**
 * The "made to suit" line of an assembly sheet: the user's own machine measurements the design was sized
 * from (a template's parameters grouped under "Your …", e.g. "Your vise"), so a drawing that leaves the
 * shop still says which vise or table it fits.
 */
import type { Template } from "../template/schema";

type Parameter = Template["parameters"][number];

/** Whether a parameter describes the user's own machine (group "Your vise", "Your table", …). */
export function isMachineMeasurement(p: Parameter): boolean {
  return /^your\b/i.test(p.group ?? "");
}

function formatNumber(value: number, units: "mm" | "in"): string {
  const digits = units === "in" ? 4 : 3;
  return String(Number(value.toFixed(digits)));
}

function formatValue(p: Parameter, value: unknown, units: "mm" | "in"): string | undefined {
  if (value === undefined || value === null) return undefined;
  if (typeof value === "number") {
    if (p.kind === "length") return `${formatNumber(value, units)} ${units === "in" ? "in" : "mm"}`;
    if (p.kind === "angle") return `${formatNumber(value, "mm")}°`;
    if (p.kind === "force") return `${formatNumber(value, "mm")} N`;
    return formatNumber(value, "mm");
  }
  if (typeof value === "boolean") return value ? "yes" : "no";
  return String(value);
}

/**
 * "Made to suit: Jaw width 127 mm, Jaw height 38.1 mm." from the template's machine-measurement parameters
 * and the values entered (in the user's units), or undefined when the template has none.
 */
export function madeToSuitNote(parameters: readonly Parameter[], values: Record<string, unknown>, units: "mm" | "in"): string | undefined {
  const items = parameters
    .filter(isMachineMeasurement)
    .map((p) => {
      const shown = formatValue(p, values[p.key], units);
      return shown === undefined ? undefined : `${p.label} ${shown}`;
    })
    .filter((s): s is string => s !== undefined);
  return items.length > 0 ? `Made to suit: ${items.join(", ")}.` : undefined;
}
