/**
 * Parameter resolution: the user's values (in the user's units) → the template's values.
 *
 * Every problem is collected (not just the first) and names the parameter, the value received and the
 * allowed range or list in the USER'S units. A missing value takes the default. Lengths are converted
 * user units → mm (the engine's internal unit) → the template's own units for its expressions.
 */
import type { ParameterSpec, UnitSystem } from "../template/schema";
import { convertLength, formatLength, formatNumber, lengthToMm } from "../units";
import { ParameterIssue, ParameterResolutionError } from "./errors";

export type ParameterValue = number | string | boolean;

export interface ResolvedParameters {
  /** Values in the template's own units: what its expressions see. */
  values: Record<string, ParameterValue>;
  /** Values with lengths in millimetres: the normalised form (cache keys, saved designs). */
  valuesMm: Record<string, ParameterValue>;
  /** Values in the user's units, for display. */
  display: Record<string, ParameterValue>;
  /** Keys that took their default. */
  defaulted: string[];
}

export interface ResolveOptions {
  templateUnits: UnitSystem;
  userUnits: UnitSystem;
}

/** Allowed choice values of a choice parameter. */
export function choiceValues(spec: Extract<ParameterSpec, { kind: "choice" }>): string[] {
  return spec.choices.map((c) => (typeof c === "string" ? c : c.value));
}

/** Relative slack when comparing a converted value with a limit, so 1.181102362205 in is not "above" 30 mm. */
const SLACK = 1e-9;

function describe(value: unknown): string {
  if (typeof value === "string") return `"${value}"`;
  if (value === null) return "null";
  if (Array.isArray(value)) return "a list";
  if (typeof value === "object") return "an object";
  return String(value);
}

function unitWord(spec: ParameterSpec, userUnits: UnitSystem): string {
  switch (spec.kind) {
    case "length":
      return `a length in ${userUnits}`;
    case "angle":
      return "an angle in degrees";
    case "force":
      return "a force in N";
    case "ratio":
      return "a number";
    case "count":
      return "a whole number";
    default:
      return "a value";
  }
}

/** "6–30 mm" in the user's units, for a numeric parameter. */
export function allowedRange(spec: ParameterSpec, templateUnits: UnitSystem, userUnits: UnitSystem): string | undefined {
  switch (spec.kind) {
    case "length":
      return `${formatLength(spec.min, templateUnits, userUnits, userUnits === "in" ? 4 : 3).replace(/ \w+$/, "")}–${formatLength(spec.max, templateUnits, userUnits, userUnits === "in" ? 4 : 3)}`;
    case "angle":
      return `${formatNumber(spec.min)}–${formatNumber(spec.max)}°`;
    case "force":
      return `${formatNumber(spec.min)}–${formatNumber(spec.max)} N`;
    case "ratio":
    case "count":
      return `${formatNumber(spec.min, 6)}–${formatNumber(spec.max, 6)}`;
    default:
      return undefined;
  }
}

function suggest(key: string, known: readonly string[]): string | undefined {
  let best: { name: string; d: number } | undefined;
  for (const name of known) {
    const d = editDistance(key.toLowerCase(), name.toLowerCase());
    if (d <= Math.max(2, Math.floor(name.length / 4)) && (!best || d < best.d)) best = { name, d };
  }
  return best?.name;
}

function editDistance(a: string, b: string): number {
  if (Math.abs(a.length - b.length) > 3) return 99;
  const row = Array.from({ length: b.length + 1 }, (_, i) => i);
  for (let i = 1; i <= a.length; i++) {
    let prev = row[0]!;
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const tmp = row[j]!;
      row[j] = Math.min(row[j]! + 1, row[j - 1]! + 1, prev + (a[i - 1] === b[j - 1] ? 0 : 1));
      prev = tmp;
    }
  }
  return row[b.length]!;
}

/** Records one refused parameter (a module function: no closure is made per parameter). */
function bad(issues: ParameterIssue[], key: string, received: unknown, message: string, allowed?: string): void {
  issues.push({ key, path: `parameters.${key}`, message, received, ...(allowed ? { allowed } : {}) });
}

/**
 * Resolves user input against the template's parameter list.
 * @throws ParameterResolutionError listing every bad parameter.
 */
export function resolveParameters(
  specs: readonly ParameterSpec[],
  input: Readonly<Record<string, unknown>> | undefined,
  options: ResolveOptions,
): ResolvedParameters {
  const { templateUnits, userUnits } = options;
  const issues: ParameterIssue[] = [];
  const given = input ?? {};
  if (typeof given !== "object" || given === null || Array.isArray(given)) {
    throw new ParameterResolutionError([{ key: "", path: "parameters", message: "parameters must be an object of key: value pairs.", received: given }]);
  }
  const byKey = new Map(specs.map((s) => [s.key, s]));
  for (const key of Object.keys(given)) {
    if (!byKey.has(key)) {
      const hint = suggest(key, [...byKey.keys()]);
      issues.push({
        key,
        path: `parameters.${key}`,
        message: `"${key}" is not a parameter of this template${hint ? ` (did you mean ${hint}?)` : ""}.`,
        received: given[key],
        allowed: [...byKey.keys()].join(", "),
      });
    }
  }

  const values: Record<string, ParameterValue> = {};
  const valuesMm: Record<string, ParameterValue> = {};
  const display: Record<string, ParameterValue> = {};
  const defaulted: string[] = [];

  for (const spec of specs) {
    const has = Object.prototype.hasOwnProperty.call(given, spec.key) && given[spec.key] !== undefined;
    const raw = has ? given[spec.key] : undefined;

    if (!has) {
      defaulted.push(spec.key);
      values[spec.key] = spec.default;
      valuesMm[spec.key] = spec.kind === "length" ? lengthToMm(spec.default, templateUnits) : spec.default;
      display[spec.key] = spec.kind === "length" ? convertLength(spec.default, templateUnits, userUnits) : spec.default;
      continue;
    }

    switch (spec.kind) {
      case "length":
      case "angle":
      case "force":
      case "ratio":
      case "count": {
        const range = allowedRange(spec, templateUnits, userUnits)!;
        if (typeof raw !== "number" || !Number.isFinite(raw)) {
          bad(issues, spec.key, raw, `${spec.key} (${spec.label}) must be ${unitWord(spec, userUnits)} between ${range}; got ${describe(raw)}.`, range);
          break;
        }
        if (spec.kind === "count" && !Number.isInteger(raw)) {
          bad(issues, spec.key, raw, `${spec.key} (${spec.label}) must be a whole number between ${range}; got ${raw}.`, range);
          break;
        }
        const inTemplate = spec.kind === "length" ? convertLength(raw, userUnits, templateUnits) : raw;
        const slack = SLACK * Math.max(1, Math.abs(spec.min), Math.abs(spec.max));
        if (inTemplate < spec.min - slack || inTemplate > spec.max + slack) {
          const shown = spec.kind === "length" ? `${formatNumber(raw, 6)} ${userUnits}` : spec.kind === "angle" ? `${formatNumber(raw, 6)}°` : spec.kind === "force" ? `${formatNumber(raw, 6)} N` : formatNumber(raw, 6);
          bad(issues, spec.key, raw, `${spec.key} (${spec.label}) must be between ${range}; got ${shown}.`, range);
          break;
        }
        // A value a hair outside a limit only by conversion noise is the limit itself.
        const clamped = Math.min(spec.max, Math.max(spec.min, inTemplate));
        values[spec.key] = clamped;
        valuesMm[spec.key] = spec.kind === "length" ? lengthToMm(clamped, templateUnits) : clamped;
        display[spec.key] = raw;
        break;
      }
      case "boolean":
        if (typeof raw !== "boolean") {
          bad(issues, spec.key, raw, `${spec.key} (${spec.label}) must be true or false; got ${describe(raw)}.`, "true, false");
          break;
        }
        values[spec.key] = valuesMm[spec.key] = display[spec.key] = raw;
        break;
      case "choice": {
        const allowed = choiceValues(spec);
        if (typeof raw !== "string" || !allowed.includes(raw)) {
          bad(issues, spec.key, raw, `${spec.key} (${spec.label}) must be one of ${allowed.join(", ")}; got ${describe(raw)}.`, allowed.join(", "));
          break;
        }
        values[spec.key] = valuesMm[spec.key] = display[spec.key] = raw;
        break;
      }
      case "material": {
        const allowed = spec.materials ?? [];
        if (typeof raw !== "string" || (allowed.length > 0 && !allowed.includes(raw))) {
          bad(issues, spec.key, raw, `${spec.key} (${spec.label}) must be one of ${allowed.join(", ")}; got ${describe(raw)}.`, allowed.join(", "));
          break;
        }
        values[spec.key] = valuesMm[spec.key] = display[spec.key] = raw;
        break;
      }
    }
  }
  if (issues.length > 0) throw new ParameterResolutionError(issues);
  return { values, valuesMm, display, defaulted };
}
