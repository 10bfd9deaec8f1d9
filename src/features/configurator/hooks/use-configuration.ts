import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { useForm, useWatch, type Resolver } from "react-hook-form";
import { useSearchParams } from "react-router";
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { useSearchState } from "@/lib/use-search-state";
import type { TemplateDetail } from "../api/template-detail";
import { buildFormSchema, numericProblem } from "../model/form-schema";
import {
  convertFormState,
  fillLengthsMm,
  formStateFromTemplateValues,
  parameterValues,
  type ExactLengths,
  type FormState,
  type FormValues,
} from "../model/form-values";
import { isNumericKind } from "../model/parameter-spec";
import { readUrlConfiguration, writeUrlConfiguration } from "../model/url-state";

/**
 * The configurator's form: react-hook-form over a zod schema built from the template's parameters, the
 * user's unit system, the exact lengths behind converted values, and the address bar kept in step (every
 * valid configuration is written to the URL, and an address changed from outside is read back in).
 */
export function useConfiguration(template: TemplateDetail) {
  const specs = template.parameters;
  const [searchParams] = useSearchParams();
  const initial = useMemo(() => {
    const url = readUrlConfiguration(searchParams, specs);
    const units = url.units ?? template.units;
    return { units, state: formStateFromTemplateValues(specs, url.values, template.units, units) };
    // Only the first render's address seeds the form; later changes come through useSearchState below.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [template]);

  const [units, setUnits] = useState<LengthUnit>(initial.units);
  const exactRef = useRef<ExactLengths>(initial.state.exact);
  const schema = useMemo(
    () => buildFormSchema(specs, template.units, units, () => exactRef.current),
    [specs, template.units, units],
  );
  const schemaRef = useRef(schema);
  schemaRef.current = schema;

  const resolver = useCallback<Resolver<FormValues>>(async (values) => {
    const parsed = schemaRef.current.safeParse(values);
    if (parsed.success) return { values, errors: {} };
    const errors: Record<string, { type: string; message: string }> = {};
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? "");
      if (key && !errors[key]) errors[key] = { type: "validate", message: issue.message };
    }
    return { values: {}, errors };
  }, []);

  const form = useForm<FormValues>({ defaultValues: initial.state.values, resolver, mode: "onChange" });
  const values = useWatch({ control: form.control }) as FormValues;

  const state: FormState = useMemo(
    () => ({ values: { ...initial.state.values, ...values }, exact: exactRef.current }),
    [values, initial],
  );

  /** Field key → its problem (the same rule the schema applies), for deciding whether to send. */
  const problems = useMemo(() => {
    const out: Record<string, string> = {};
    for (const spec of specs) {
      if (!isNumericKind(spec.kind)) continue;
      const problem = numericProblem(spec, state, template.units, units);
      if (problem) out[spec.key] = problem;
    }
    return out;
  }, [specs, state, template.units, units]);
  const valid = Object.keys(problems).length === 0;

  // A value from the address outside its limits (a bookmark, a saved design opened on a newer version)
  // is shown with its message at once, not only after the person touches the field.
  useEffect(() => {
    if (!valid) void form.trigger();
    // Only on arrival; later problems show as the person types.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);

  const userParameters = useMemo(
    () => (valid ? parameterValues(specs, state, units, units) : null),
    [valid, specs, state, units],
  );
  const templateParameters = useMemo(
    () => (valid ? parameterValues(specs, state, units, template.units) : null),
    [valid, specs, state, units, template.units],
  );

  /** Replaces every field (after a unit switch or a fill) and re-checks them in the current units. */
  const applyState = useCallback(
    (next: FormState) => {
      exactRef.current = next.exact;
      form.reset(next.values, { keepDefaultValues: true });
      void form.trigger();
    },
    [form],
  );

  const switchUnits = useCallback(
    (to: LengthUnit) => {
      if (to === units) return;
      const current: FormState = {
        values: { ...initial.state.values, ...form.getValues() },
        exact: exactRef.current,
      };
      const next = convertFormState(specs, current, units, to);
      setUnits(to);
      applyState(next);
    },
    [units, initial, form, specs, applyState],
  );

  /** Fills lengths given in mm (a vise profile); returns the keys it filled. */
  const fillFromMm = useCallback(
    (lengthsMm: Record<string, number>) => {
      const current: FormState = {
        values: { ...initial.state.values, ...form.getValues() },
        exact: exactRef.current,
      };
      const { state: next, filled } = fillLengthsMm(specs, current, lengthsMm, units);
      applyState(next);
      return filled;
    },
    [initial, form, specs, units, applyState],
  );

  // The address bar follows every valid configuration; an address changed from outside (a link to
  // another configuration of this template) is read back in.
  const wanted = templateParameters
    ? writeUrlConfiguration(specs, templateParameters, units, searchParams).toString()
    : null;
  useSearchState(wanted, (params) => {
    const url = readUrlConfiguration(params, specs);
    const nextUnits = url.units ?? units;
    setUnits(nextUnits);
    applyState(formStateFromTemplateValues(specs, url.values, template.units, nextUnits));
  });

  /** Puts the server's per-parameter problems (`parameters.<key>`) on their fields. */
  const showServerProblems = useCallback(
    (details: ReadonlyArray<{ path: string; message: string }>) => {
      let placed = 0;
      for (const d of details) {
        const key = d.path.replace(/^parameters\./, "");
        if (specs.some((s) => s.key === key)) {
          form.setError(key, { type: "server", message: d.message });
          placed += 1;
        }
      }
      return placed;
    },
    [form, specs],
  );

  return {
    form,
    specs,
    units,
    switchUnits,
    fillFromMm,
    problems,
    valid,
    /** In the user's units (for the evaluate and model routes), null while a field has a problem. */
    userParameters,
    /** In the template's own units (for saving and the address), null while a field has a problem. */
    templateParameters: templateParameters as Record<string, ParameterValue> | null,
    showServerProblems,
  };
}

export type Configuration = ReturnType<typeof useConfiguration>;
