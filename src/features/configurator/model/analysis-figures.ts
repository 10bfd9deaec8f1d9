/**
 * The headline figures of each calculator's result, in shop words and the user's units. A calculator the
 * configurator does not know yet gets every plain figure of its result (see figure-format.ts).
 */
import { convertLength, formatNumber, type LengthUnit } from "@/engine/units";
import { describeFigure } from "./figure-format";

export interface Figure {
  label: string;
  text: string;
}

type Result = Record<string, unknown>;
const num = (r: Result, key: string) => (typeof r[key] === "number" ? (r[key] as number) : null);
const str = (r: Result, key: string) => (typeof r[key] === "string" ? (r[key] as string) : null);

const length = (mm: number, units: LengthUnit, mmDecimals = 3) =>
  units === "in"
    ? `${formatNumber(convertLength(mm, "mm", "in"), mmDecimals + 1)} in`
    : `${formatNumber(mm, mmDecimals)} mm`;

function collect(pairs: Array<[string, string | null]>): Figure[] {
  return pairs.filter((p): p is [string, string] => p[1] !== null).map(([label, text]) => ({ label, text }));
}

const headlines: Record<string, (r: Result, units: LengthUnit) => Figure[]> = {
  beam: (r, u) =>
    collect([
      ["Deflection at the load", num(r, "deflectionMm") === null ? null : length(num(r, "deflectionMm")!, u)],
      [
        "Bending stress",
        num(r, "stressMpa") === null ? null : `${formatNumber(num(r, "stressMpa")!, 1)} MPa`,
      ],
      [
        "Safety factor on yield",
        num(r, "yieldSafetyFactor") === null ? null : formatNumber(num(r, "yieldSafetyFactor")!, 1),
      ],
    ]),
  fit: (r, u) => {
    const lo = num(r, "clearanceMin");
    const hi = num(r, "clearanceMax");
    return collect([
      ["Fit", str(r, "designation")],
      ["Clearance", lo === null || hi === null ? null : `${length(lo, u)} to ${length(hi, u)}`],
      ["Kind", str(r, "kind")],
    ]);
  },
  // Metric thread data stays in millimetres: it is how the thread is named and gauged.
  thread: (r) =>
    collect([
      [
        "Thread",
        str(r, "designation") && num(r, "pitch") !== null
          ? `${str(r, "designation")} × ${formatNumber(num(r, "pitch")!, 2)}`
          : str(r, "designation"),
      ],
      ["Tap drill", num(r, "tapDrill") === null ? null : `Ø${formatNumber(num(r, "tapDrill")!, 2)} mm`],
      [
        "Minor diameter of the nut",
        num(r, "minorDiameterInternal") === null
          ? null
          : `${formatNumber(num(r, "minorDiameterInternal")!, 3)} mm`,
      ],
      [
        "Engagement length",
        num(r, "recommendedEngagementMm") === null
          ? null
          : `${formatNumber(num(r, "recommendedEngagementMm")!, 1)} mm`,
      ],
    ]),
  "general-tolerance": (r, u) =>
    collect([
      ["Class", str(r, "designation")],
      ["Size", num(r, "sizeMm") === null ? null : length(num(r, "sizeMm")!, u, 2)],
      ["Tolerance", num(r, "plusMinusMm") === null ? null : `±${length(num(r, "plusMinusMm")!, u, 2)}`],
    ]),
};

/** Headline figures of a calculator result; unknown calculators list their plain top-level figures. */
export function analysisFigures(calculator: string | undefined, result: Result, units: LengthUnit): Figure[] {
  const curated = calculator ? headlines[calculator] : undefined;
  if (curated) {
    const figures = curated(result, units);
    if (figures.length > 0) return figures;
  }
  return Object.entries(result)
    .filter(
      (e): e is [string, number | string | boolean] =>
        ["number", "string", "boolean"].includes(typeof e[1]) && e[0] !== "explanation",
    )
    .map(([key, value]) => {
      const d = describeFigure(key, value, units);
      return { label: d.words.charAt(0).toUpperCase() + d.words.slice(1), text: d.text };
    });
}
