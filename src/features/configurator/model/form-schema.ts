/**
 * The configurator form's zod schema, built from the template's parameter list: one field per parameter,
 * numbers checked against the template's limits, every message in the user's units. The server checks the
 * same limits again (src/engine/parameters/resolve.ts); this gives the message in the field at once.
 */
import { z } from "zod";
import { convertLength, formatNumber, type LengthUnit } from "@/engine/units";
import { fieldUnit } from "./field-units";
import { numericValue, type FormState } from "./form-values";
import { isNumericKind, optionsOf, type ParameterSpecView } from "./parameter-spec";

/** Same relative slack as the engine, so a limit converted to inches and back is not "outside" it. */
const SLACK = 1e-9;

/** A limit shown in the user's units: mm to 3 decimals, inches to 4 (as the engine's messages). */
function shownLimit(
  spec: ParameterSpecView,
  value: number,
  templateUnits: LengthUnit,
  userUnits: LengthUnit,
): string {
  if (spec.kind === "length")
    return formatNumber(convertLength(value, templateUnits, userUnits), userUnits === "in" ? 4 : 3);
  return formatNumber(value, 6);
}

/** "20–250 mm", "0.7874–9.8425 in", "0–90°", "5–400 N", "1–6". */
export function rangeText(
  spec: ParameterSpecView,
  templateUnits: LengthUnit,
  userUnits: LengthUnit,
): string | null {
  if (spec.min === undefined || spec.max === undefined) return null;
  const unit = fieldUnit(spec, userUnits);
  const lo = shownLimit(spec, spec.min, templateUnits, userUnits);
  const hi = shownLimit(spec, spec.max, templateUnits, userUnits);
  if (!unit || spec.kind === "ratio" || spec.kind === "count") return `${lo}–${hi}`;
  return unit.symbol === "°" ? `${lo}–${hi}°` : `${lo}–${hi} ${unit.symbol}`;
}

/** The problem with one numeric field's text, in the user's units, or null when it is fine. */
export function numericProblem(
  spec: ParameterSpecView,
  state: FormState,
  templateUnits: LengthUnit,
  userUnits: LengthUnit,
): string | null {
  const text = state.values[spec.key];
  const range = rangeText(spec, templateUnits, userUnits);
  if (typeof text !== "string" || text.trim() === "")
    return `${spec.label}: enter a number${range ? ` from ${range}` : ""}.`;
  const value = numericValue(spec, state, userUnits);
  if (value === null)
    return `${spec.label} must be a number${range ? ` from ${range}` : ""}; "${text.trim()}" is not one.`;
  if (spec.kind === "count" && !Number.isInteger(value))
    return `${spec.label} must be a whole number${range ? ` from ${range}` : ""}.`;
  if (spec.min === undefined || spec.max === undefined) return null;
  const inTemplate = spec.kind === "length" ? convertLength(value, userUnits, templateUnits) : value;
  const slack = SLACK * Math.max(1, Math.abs(spec.min), Math.abs(spec.max));
  if (inTemplate < spec.min - slack)
    return `${spec.label} must be at least ${shownLimit(spec, spec.min, templateUnits, userUnits)}${unitSuffix(spec, userUnits)} (allowed ${range}).`;
  if (inTemplate > spec.max + slack)
    return `${spec.label} must be at most ${shownLimit(spec, spec.max, templateUnits, userUnits)}${unitSuffix(spec, userUnits)} (allowed ${range}).`;
  return null;
}

function unitSuffix(spec: ParameterSpecView, units: LengthUnit): string {
  const unit = fieldUnit(spec, units);
  if (!unit || spec.kind === "ratio" || spec.kind === "count") return "";
  return unit.symbol === "°" ? "°" : ` ${unit.symbol}`;
}

/**
 * The form's schema for the current unit system. It validates the whole state (text plus exact lengths)
 * so a value the configurator converted is judged by its exact size, not by its rounded text.
 */
export function buildFormSchema(
  specs: readonly ParameterSpecView[],
  templateUnits: LengthUnit,
  userUnits: LengthUnit,
  getExact: () => FormState["exact"],
) {
  const shape: Record<string, z.ZodType> = {};
  for (const spec of specs) {
    if (spec.kind === "boolean") {
      shape[spec.key] = z.boolean();
    } else if (isNumericKind(spec.kind)) {
      shape[spec.key] = z.string().superRefine((text, ctx) => {
        const problem = numericProblem(
          spec,
          { values: { [spec.key]: text }, exact: getExact() },
          templateUnits,
          userUnits,
        );
        if (problem) ctx.addIssue({ code: "custom", message: problem });
      });
    } else {
      const allowed = optionsOf(spec).map((o) => o.value);
      shape[spec.key] = z.string().refine((v) => allowed.length === 0 || allowed.includes(v), {
        message: `${spec.label}: choose one of the listed options.`,
      });
    }
  }
  return z.object(shape);
}
