/**
 * What a designer could change, each change worked through the same calculation so its effect is a number,
 * not a hint: smaller eccentricity, bigger diameter, longer lever, bigger pivot pin, oil on the face.
 */
import { CalculatorInputError } from "../types";
import { computeCamCore, type CamCore } from "./compute";
import { fmt, pct } from "./explain";
import type { EccentricCamInput } from "./schema";

export type CamSuggestionParameter = "eccentricity" | "diameter" | "leverLength" | "pivotDiameter" | "muContact";

export interface CamSuggestion {
  parameter: CamSuggestionParameter;
  from: number;
  to: number;
  /** Margin at engagement with the change (null when the changed cam no longer works, see message). */
  selfLockMargin: number | null;
  selfLockMarginOverZone: number | null;
  clampForceN: number | null;
  engageAngleDeg: number | null;
  message: string;
}

const roundTo = (value: number, step: number): number => Math.round(value / step) * step;

interface Change {
  parameter: CamSuggestionParameter;
  to: number;
  label: string;
  unit: string;
}

function candidateChanges(input: EccentricCamInput): Change[] {
  const changes: Change[] = [];
  const smallerE = Math.max(0.05, roundTo(input.eccentricity * 0.8, 0.05));
  if (smallerE < input.eccentricity) changes.push({ parameter: "eccentricity", to: smallerE, label: "eccentricity", unit: "mm" });
  changes.push({ parameter: "diameter", to: Math.max(input.diameter + 1, roundTo(input.diameter * 1.25, 1)), label: "diameter", unit: "mm" });
  changes.push({ parameter: "leverLength", to: Math.max(input.leverLength + 5, roundTo(input.leverLength * 1.5, 5)), label: "lever length", unit: "mm" });
  if (input.pivotDiameter > 0 || input.muPivot > 0) {
    changes.push({ parameter: "pivotDiameter", to: input.pivotDiameter + 2, label: "pivot pin diameter", unit: "mm" });
  }
  if (input.muContact > 0) {
    changes.push({ parameter: "muContact", to: roundTo(input.muContact / 2, 0.01), label: "contact friction (an oily face)", unit: "" });
  }
  return changes;
}

function describe(change: Change, from: number, base: CamCore, next: CamCore): string {
  const head = `${change.label} ${fmt(from, 3)}${change.unit ? ` ${change.unit}` : ""} → ${fmt(change.to, 3)}${change.unit ? ` ${change.unit}` : ""}`;
  if (change.parameter === "leverLength") {
    return `${head}: clamping force ${fmt(base.clampForceN, 0)} → ${fmt(next.clampForceN, 0)} N; locking unchanged (the lever does not enter the lock).`;
  }
  const marginText =
    `margin at engagement ${pct(base.selfLockMargin)} → ${pct(next.selfLockMargin)}, ` +
    `over the working zone ${pct(base.selfLockMarginOverZone)} → ${pct(next.selfLockMarginOverZone)}`;
  const forceText = `clamping force ${fmt(base.clampForceN, 0)} → ${fmt(next.clampForceN, 0)} N`;
  const engageText = `engages at ${fmt(next.engageAngleDeg, 1)}° instead of ${fmt(base.engageAngleDeg, 1)}°`;
  if (change.parameter === "muContact") {
    return `${head}: ${marginText}; ${forceText}. Keep the cam rim and the face clean and dry.`;
  }
  if (change.parameter === "eccentricity") {
    return `${head}: ${marginText}; ${forceText}; ${engageText}, with ${fmt(next.throwMm, 2)} mm throw to cover the gap and wear.`;
  }
  return `${head}: ${marginText}; ${forceText}.`;
}

/** The worked-through changes for one cam (never throws: a change that breaks the cam says why). */
export function suggestCamChanges(input: EccentricCamInput, base: CamCore): CamSuggestion[] {
  return candidateChanges(input).map((change) => {
    const from = input[change.parameter];
    const changed: EccentricCamInput = { ...input, [change.parameter]: change.to };
    try {
      const next = computeCamCore(changed);
      return {
        parameter: change.parameter,
        from,
        to: change.to,
        selfLockMargin: next.selfLockMargin,
        selfLockMarginOverZone: next.selfLockMarginOverZone,
        clampForceN: next.clampForceN,
        engageAngleDeg: next.engageAngleDeg,
        message: describe(change, from, base, next),
      };
    } catch (err) {
      if (!(err instanceof CalculatorInputError)) throw err;
      return {
        parameter: change.parameter,
        from,
        to: change.to,
        selfLockMargin: null,
        selfLockMarginOverZone: null,
        clampForceN: null,
        engageAngleDeg: null,
        message: `${change.label} ${fmt(from, 3)} → ${fmt(change.to, 3)} ${change.unit}: not possible as it stands — ${err.message}`,
      };
    }
  });
}
