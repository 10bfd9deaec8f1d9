/**
 * The configuration in the address bar, so it can be bookmarked and shared: `units` (the user's system)
 * and every parameter that differs from its default, in the TEMPLATE's own units, so the address does not
 * change (or lose exactness) when the person switches between mm and inches.
 */
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { readUnitsParam } from "@/lib/use-search-state";
import { isNumericKind, type ParameterSpecView } from "./parameter-spec";

export interface UrlConfiguration {
  units: LengthUnit | null;
  values: Record<string, ParameterValue>;
}

/** Reads what the address holds; values that do not fit their parameter are left out (the default is used). */
export function readUrlConfiguration(
  params: URLSearchParams,
  specs: readonly ParameterSpecView[],
): UrlConfiguration {
  const units: LengthUnit | null = readUnitsParam(params);
  const values: Record<string, ParameterValue> = {};
  for (const spec of specs) {
    const text = params.get(spec.key);
    if (text === null) continue;
    if (spec.kind === "boolean") {
      if (text === "true" || text === "false") values[spec.key] = text === "true";
    } else if (isNumericKind(spec.kind)) {
      const value = Number(text);
      if (text.trim() !== "" && Number.isFinite(value)) values[spec.key] = value;
    } else {
      values[spec.key] = text;
    }
  }
  return { units, values };
}

/** A parameter key's shape (src/engine/template/schema.ts `keySchema`): lower camel case, no hyphens. */
const parameterKeyShape = /^[a-z][a-zA-Z0-9]*$/;

/**
 * The search string for a configuration: units first, then the changed parameters in the template's
 * order, then whatever entries of `carry` could never be a parameter (a key with a hyphen, such as the
 * `saved-design` a page composed around the configurator put there), so they survive the rewrite.
 */
export function writeUrlConfiguration(
  specs: readonly ParameterSpecView[],
  values: Readonly<Record<string, ParameterValue>>,
  units: LengthUnit,
  carry?: URLSearchParams,
): URLSearchParams {
  const params = new URLSearchParams();
  params.set("units", units);
  for (const spec of specs) {
    const value = values[spec.key];
    if (value === undefined || value === spec.default) continue;
    params.set(spec.key, String(value));
  }
  for (const [key, value] of carry ?? []) {
    if (key !== "units" && !parameterKeyShape.test(key)) params.append(key, value);
  }
  return params;
}
