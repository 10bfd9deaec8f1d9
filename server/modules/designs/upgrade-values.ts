/**
 * Saved values against a newer template version: which parameters were added, dropped, left outside the
 * new limits or no longer offered, which defaults and limits moved, and what the configurator should be
 * opened with (`carried`). Plain data in and out; the upgrade service adds the check comparison.
 *
 * Saved values are in the template's own units (what the evaluate API takes). When the old version is
 * known and its unit system differs from the new one's, lengths are converted (1 in = 25.4 mm exactly);
 * when it is not known, the saved lengths are taken to be in the new version's units — the only
 * reading available, which the report says by marking the old version as not held.
 */
import {
  choiceValues,
  type CompiledTemplate,
  type ParameterSpec,
  type ParameterValue,
  type UnitSystem,
} from "@/engine";
import { getMaterial, isMaterialKey } from "@/engine/materials";
import { convertLength, formatAngle, formatForce, formatLength, formatNumber } from "@/engine/units";
import type { ParameterChange, ShownValue } from "@/shared/design-upgrade";
import type { DesignParameters } from "@/shared/designs";

type NumericSpec = Extract<ParameterSpec, { min: number }>;

const isNumeric = (spec: ParameterSpec): spec is NumericSpec => "min" in spec;

/** Relative slack when comparing with a limit, as parameter resolution does (src/engine/parameters). */
const SLACK = 1e-9;

/** The JavaScript type a saved value of `spec` has: a number, a string (choice, material) or a boolean. */
function valueType(spec: ParameterSpec): "number" | "string" | "boolean" {
  if (spec.kind === "boolean") return "boolean";
  return isNumeric(spec) ? "number" : "string";
}

function offeredValues(spec: ParameterSpec): string[] {
  if (spec.kind === "choice") return choiceValues(spec);
  if (spec.kind === "material") return spec.materials ?? [];
  return [];
}

function optionText(spec: ParameterSpec, value: string): string {
  if (spec.kind === "choice") {
    const option = spec.choices.find((c) => (typeof c === "string" ? c : c.value) === value);
    return option && typeof option !== "string" ? option.label : value;
  }
  if (spec.kind === "material") return isMaterialKey(value) ? getMaterial(value).name : value;
  return value;
}

/** A value of `spec` (in `templateUnits`) as the person reads it, in `units`. */
export function shownValue(
  spec: ParameterSpec | undefined,
  value: ParameterValue,
  templateUnits: UnitSystem,
  units: UnitSystem,
): ShownValue {
  let text: string;
  if (typeof value === "boolean") text = value ? "yes" : "no";
  else if (typeof value === "string") text = spec ? optionText(spec, value) : value;
  else if (spec?.kind === "length") text = formatLength(value, templateUnits, units);
  else if (spec?.kind === "angle") text = formatAngle(value);
  else if (spec?.kind === "force") text = formatForce(value, units);
  else if (spec?.kind === "count") text = formatNumber(value, 0);
  else text = formatNumber(value, 4);
  return { value, text };
}

export interface ValueComparison {
  changes: ParameterChange[];
  /** What to open the configurator with, in the new version's units. */
  carried: DesignParameters;
  /** True when a carried value lies outside the new limits (the new version cannot be evaluated yet). */
  outOfRange: boolean;
}

/**
 * Compares saved values with the new version's parameters (and, when `from` is given, with the old
 * version's), in the new version's parameter order; dropped parameters come last.
 */
export function compareValues(
  saved: DesignParameters,
  to: CompiledTemplate,
  from: CompiledTemplate | undefined,
  units: UnitSystem,
): ValueComparison {
  const newUnits = to.template.units;
  const oldUnits = from?.template.units ?? newUnits;
  const oldSpecs = new Map((from?.parameters ?? []).map((s) => [s.key, s]));
  const changes: ParameterChange[] = [];
  const carried: DesignParameters = {};
  let outOfRange = false;
  const show = (spec: ParameterSpec, value: ParameterValue) => shownValue(spec, value, newUnits, units);
  const showOld = (spec: ParameterSpec | undefined, value: ParameterValue) =>
    shownValue(spec, value, oldUnits, units);

  for (const spec of to.parameters) {
    const about = { key: spec.key, label: spec.label };
    const old = oldSpecs.get(spec.key);
    const has = Object.prototype.hasOwnProperty.call(saved, spec.key);
    const raw = saved[spec.key];

    if (!has || raw === undefined) {
      // Not among the saved values: new in this version (or, with the old version unknown, a value the
      // design never held). Either way it starts at the new default.
      if (!old) {
        changes.push({ kind: "added", ...about, default: show(spec, spec.default) });
        continue;
      }
    }
    const kindChanged = old !== undefined && old.kind !== spec.kind;
    if (has && raw !== undefined && (kindChanged || typeof raw !== valueType(spec))) {
      changes.push({
        kind: "wrong-type",
        ...about,
        saved: showOld(old, raw),
        replacement: show(spec, spec.default),
      });
      carried[spec.key] = spec.default;
      continue;
    }

    if (has && raw !== undefined) {
      let value: ParameterValue = raw;
      if (spec.kind === "length" && typeof raw === "number" && oldUnits !== newUnits) {
        value = convertLength(raw, oldUnits, newUnits);
      }
      if (isNumeric(spec) && typeof value === "number") {
        const slack = SLACK * Math.max(1, Math.abs(spec.min), Math.abs(spec.max));
        if (value < spec.min - slack || value > spec.max + slack) {
          changes.push({
            kind: "out-of-range",
            ...about,
            saved: show(spec, value),
            limits: { min: show(spec, spec.min), max: show(spec, spec.max) },
          });
          carried[spec.key] = value;
          outOfRange = true;
          continue;
        }
      }
      const offered = offeredValues(spec);
      if (typeof value === "string" && offered.length > 0 && !offered.includes(value)) {
        changes.push({
          kind: "not-offered",
          ...about,
          saved: show(spec, value),
          offered: offered.map((o) => optionText(spec, o)),
          replacement: show(spec, spec.default),
        });
        carried[spec.key] = spec.default;
        continue;
      }
      carried[spec.key] = value;
    }

    if (!old) continue;
    const oldDefault =
      spec.kind === "length" && typeof old.default === "number"
        ? convertLength(old.default, oldUnits, newUnits)
        : old.default;
    if (!sameValue(oldDefault, spec.default)) {
      changes.push({
        kind: "default-changed",
        ...about,
        from: showOld(old, old.default),
        to: show(spec, spec.default),
        affectsDesign: !has,
      });
    }
    if (isNumeric(spec) && isNumeric(old)) {
      const c = (v: number) => (spec.kind === "length" ? convertLength(v, oldUnits, newUnits) : v);
      if (!sameValue(c(old.min), spec.min) || !sameValue(c(old.max), spec.max)) {
        changes.push({
          kind: "limits-changed",
          ...about,
          from: { min: showOld(old, old.min), max: showOld(old, old.max) },
          to: { min: show(spec, spec.min), max: show(spec, spec.max) },
        });
      }
    }
    const before = offeredValues(old);
    const after = offeredValues(spec);
    const added = after.filter((v) => !before.includes(v));
    const removed = before.filter((v) => !after.includes(v));
    if (added.length > 0 || removed.length > 0) {
      changes.push({
        kind: "choices-changed",
        ...about,
        added: added.map((v) => optionText(spec, v)),
        removed: removed.map((v) => optionText(old, v)),
      });
    }
  }

  const newKeys = new Set(to.parameters.map((s) => s.key));
  for (const [key, value] of Object.entries(saved)) {
    if (newKeys.has(key)) continue;
    const old = oldSpecs.get(key);
    changes.push({ kind: "removed", key, label: old?.label ?? key, saved: showOld(old, value) });
  }
  return { changes, carried, outOfRange };
}

function sameValue(a: ParameterValue, b: ParameterValue): boolean {
  if (typeof a === "number" && typeof b === "number") {
    return Math.abs(a - b) <= SLACK * Math.max(1, Math.abs(a), Math.abs(b));
  }
  return a === b;
}
