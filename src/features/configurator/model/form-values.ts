/**
 * The configurator's form values and how they move between unit systems.
 *
 * Fields hold text (what the person sees and types). A length the configurator wrote itself — after a unit
 * switch or a fill from a vise profile — also keeps its exact value in millimetres beside the text, so
 * 100 mm switched to inches shows "3.93701" but is sent, and switched back, as exactly 100 mm
 * (1 in = 25.4 mm exactly, src/engine/units). Once the person edits the field, their text is the value.
 */
import { convertLength, type LengthUnit } from "@/engine/units";
import type { ParameterValue } from "@/engine/parameters";
import { inputDecimals, trimNumber } from "./field-units";
import { isNumericKind, type ParameterSpecView } from "./parameter-spec";

export type FormValues = Record<string, string | boolean>;
/** Key → the text the configurator wrote and the exact length behind it. */
export type ExactLengths = Record<string, { text: string; mm: number }>;

export interface FormState {
  values: FormValues;
  exact: ExactLengths;
}

const decimalPattern = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)$/;

/** A number typed by a person: "12.5", "12,5" (comma decimal), " .5 ". Anything else is null. */
export function parseDecimal(text: string): number | null {
  const cleaned = text.trim().replace(",", ".");
  if (!decimalPattern.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}

/** Text for a number the configurator writes into a field. */
export function formatForInput(spec: ParameterSpecView, value: number, units: LengthUnit): string {
  return trimNumber(value, inputDecimals(spec, units));
}

/** The value of a numeric field in the user's units, or null when the text is not a number. */
export function numericValue(spec: ParameterSpecView, state: FormState, units: LengthUnit): number | null {
  const text = state.values[spec.key];
  if (typeof text !== "string") return null;
  const exact = state.exact[spec.key];
  if (spec.kind === "length" && exact && exact.text === text) return convertLength(exact.mm, "mm", units);
  return parseDecimal(text);
}

/** A length field's value in millimetres (exact when the configurator wrote it). */
function lengthMm(spec: ParameterSpecView, state: FormState, units: LengthUnit): number | null {
  const text = state.values[spec.key];
  const exact = state.exact[spec.key];
  if (exact && exact.text === text) return exact.mm;
  const value = typeof text === "string" ? parseDecimal(text) : null;
  return value === null ? null : convertLength(value, units, "mm");
}

/**
 * Form state from values in the template's own units (defaults, a bookmarked URL, a saved design).
 * Missing or unusable values take the default.
 */
export function formStateFromTemplateValues(
  specs: readonly ParameterSpecView[],
  given: Readonly<Record<string, ParameterValue>>,
  templateUnits: LengthUnit,
  userUnits: LengthUnit,
): FormState {
  const values: FormValues = {};
  const exact: ExactLengths = {};
  for (const spec of specs) {
    const raw = given[spec.key];
    if (spec.kind === "boolean") {
      values[spec.key] = typeof raw === "boolean" ? raw : spec.default === true;
    } else if (isNumericKind(spec.kind)) {
      const value = typeof raw === "number" && Number.isFinite(raw) ? raw : Number(spec.default);
      if (spec.kind === "length") {
        const mm = convertLength(value, templateUnits, "mm");
        const text = formatForInput(spec, convertLength(mm, "mm", userUnits), userUnits);
        values[spec.key] = text;
        exact[spec.key] = { text, mm };
      } else {
        values[spec.key] = formatForInput(spec, value, userUnits);
      }
    } else {
      values[spec.key] = typeof raw === "string" ? raw : String(spec.default);
    }
  }
  return { values, exact };
}

/**
 * Switches every length field from `from` to `to` in place. Lengths that do not parse are left as typed
 * (the field keeps its message); everything else is unchanged.
 */
export function convertFormState(
  specs: readonly ParameterSpecView[],
  state: FormState,
  from: LengthUnit,
  to: LengthUnit,
): FormState {
  if (from === to) return state;
  const values: FormValues = { ...state.values };
  const exact: ExactLengths = {};
  for (const spec of specs) {
    if (spec.kind !== "length") continue;
    const mm = lengthMm(spec, state, from);
    if (mm === null) continue;
    const text = formatForInput(spec, convertLength(mm, "mm", to), to);
    values[spec.key] = text;
    exact[spec.key] = { text, mm };
  }
  return { values, exact };
}

/** Writes lengths given in millimetres (a vise profile) into their fields, exactly. Unknown keys are skipped. */
export function fillLengthsMm(
  specs: readonly ParameterSpecView[],
  state: FormState,
  lengthsMm: Readonly<Record<string, number>>,
  units: LengthUnit,
): { state: FormState; filled: string[] } {
  const values: FormValues = { ...state.values };
  const exact: ExactLengths = { ...state.exact };
  const filled: string[] = [];
  for (const spec of specs) {
    const mm = lengthsMm[spec.key];
    if (spec.kind !== "length" || mm === undefined) continue;
    const text = formatForInput(spec, convertLength(mm, "mm", units), units);
    values[spec.key] = text;
    exact[spec.key] = { text, mm };
    filled.push(spec.key);
  }
  return { state: { values, exact }, filled };
}

/**
 * Parameter values in `target` units (the user's for the evaluate API, the template's own for the URL
 * and saved designs). Null when a numeric field does not hold a number.
 */
export function parameterValues(
  specs: readonly ParameterSpecView[],
  state: FormState,
  userUnits: LengthUnit,
  target: LengthUnit,
): Record<string, ParameterValue> | null {
  const out: Record<string, ParameterValue> = {};
  for (const spec of specs) {
    const raw = state.values[spec.key];
    if (spec.kind === "boolean") {
      out[spec.key] = raw === true;
    } else if (spec.kind === "length") {
      const mm = lengthMm(spec, state, userUnits);
      if (mm === null) return null;
      out[spec.key] = convertLength(mm, "mm", target);
    } else if (isNumericKind(spec.kind)) {
      const value = numericValue(spec, state, userUnits);
      if (value === null) return null;
      out[spec.key] = value;
    } else {
      out[spec.key] = typeof raw === "string" ? raw : String(spec.default);
    }
  }
  return out;
}
