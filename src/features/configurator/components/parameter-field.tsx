import type { UseFormReturn } from "react-hook-form";
import { cn } from "@/components/ui/cn";
import { newtonToLbf, type LengthUnit } from "@/engine/units";
import { fieldUnit, trimNumber } from "../model/field-units";
import { rangeText } from "../model/form-schema";
import { formatForInput, parseDecimal, type FormValues } from "../model/form-values";
import { isNumericKind, optionsOf, type ParameterSpecView } from "../model/parameter-spec";

/** The DOM id of a parameter's input, so checks can link to it. */
export const fieldId = (key: string) => `field-${key}`;

export interface ParameterFieldProps {
  spec: ParameterSpecView;
  form: UseFormReturn<FormValues>;
  templateUnits: LengthUnit;
  units: LengthUnit;
  materialNames?: Readonly<Record<string, string>>;
}

const inputBox =
  "flex min-h-11 items-stretch overflow-hidden rounded-md border bg-white shadow-inner has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-spark-500";

/**
 * One parameter's input, chosen by its kind: a number with its unit beside it (arrow keys step it), a
 * list for choices and materials, a tick box for yes/no. Label, limits, help and the field's problem are
 * all tied to the input for screen readers.
 */
export function ParameterField({ spec, form, templateUnits, units, materialNames }: ParameterFieldProps) {
  const id = fieldId(spec.key);
  const error = form.formState.errors[spec.key]?.message;
  const helpId = spec.help ? `${id}-help` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const rangeId = `${id}-range`;

  if (spec.kind === "boolean") {
    return (
      <div className="flex flex-col gap-1">
        <label
          htmlFor={id}
          className="flex min-h-11 cursor-pointer items-center gap-3 font-semibold text-steel-900"
        >
          <input
            id={id}
            type="checkbox"
            className="size-5 accent-spark-600"
            aria-describedby={helpId}
            {...form.register(spec.key)}
          />
          {spec.label}
        </label>
        {spec.help ? (
          <p id={helpId} className="text-sm text-steel-600">
            {spec.help}
          </p>
        ) : null}
      </div>
    );
  }

  if (!isNumericKind(spec.kind)) {
    const options = optionsOf(spec, materialNames);
    return (
      <div className="flex flex-col gap-1">
        <label htmlFor={id} className="font-semibold text-steel-900">
          {spec.label}
        </label>
        <div className={cn(inputBox, error ? "border-fault-700" : "border-steel-300 hover:border-steel-400")}>
          <select
            id={id}
            className="w-full min-w-0 bg-transparent px-3 text-base text-steel-950 outline-none"
            aria-invalid={error ? true : undefined}
            aria-describedby={[errorId, helpId].filter(Boolean).join(" ") || undefined}
            {...form.register(spec.key)}
          >
            {options.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        </div>
        <FieldProblem id={errorId} message={error} />
        {spec.help ? (
          <p id={helpId} className="text-sm text-steel-600">
            {spec.help}
          </p>
        ) : null}
      </div>
    );
  }

  const unit = fieldUnit(spec, units);
  const range = rangeText(spec, templateUnits, units);
  const registered = form.register(spec.key);
  const text = form.watch(spec.key);
  const typed = typeof text === "string" ? parseDecimal(text) : null;
  const step =
    spec.kind === "length" && units === "in"
      ? spec.step
        ? spec.step / 25.4
        : 0.01
      : (spec.step ?? (spec.kind === "count" ? 1 : 0.1));
  return (
    <div className="grid grid-cols-[minmax(0,1fr)_minmax(7.5rem,9.5rem)] items-center gap-x-3 gap-y-1">
      <label htmlFor={id} className="font-semibold leading-tight text-steel-900">
        {spec.label}
        {unit ? <span className="sr-only"> ({unit.spoken})</span> : null}
      </label>
      <div className={cn(inputBox, error ? "border-fault-700" : "border-steel-300 hover:border-steel-400")}>
        <input
          id={id}
          type="text"
          inputMode={spec.kind === "count" ? "numeric" : "decimal"}
          autoComplete="off"
          spellCheck={false}
          aria-invalid={error ? true : undefined}
          aria-describedby={
            [errorId, range ? rangeId : undefined, helpId].filter(Boolean).join(" ") || undefined
          }
          className="figure w-full min-w-0 bg-transparent px-2.5 text-right text-lg text-steel-950 outline-none"
          {...registered}
          onKeyDown={(e) => {
            // Arrow keys nudge the value by one step, as a spin box would.
            if ((e.key !== "ArrowUp" && e.key !== "ArrowDown") || typed === null) return;
            e.preventDefault();
            const next = typed + (e.key === "ArrowUp" ? step : -step);
            form.setValue(spec.key, formatForInput(spec, next, units), {
              shouldValidate: true,
              shouldDirty: true,
            });
          }}
        />
        {unit ? (
          <span
            aria-hidden="true"
            className="figure flex min-w-11 items-center justify-center border-l border-steel-200 bg-steel-100 px-2 text-sm text-steel-700"
          >
            {unit.symbol}
          </span>
        ) : null}
      </div>
      <div className="col-span-2 space-y-0.5">
        <FieldProblem id={errorId} message={error} />
        <p className="text-sm text-steel-600">
          {range ? (
            <span id={rangeId} className="figure whitespace-nowrap text-steel-700">
              {range}
            </span>
          ) : null}
          {spec.kind === "force" && units === "in" && typed !== null ? (
            <span className="figure"> (≈ {trimNumber(newtonToLbf(typed), 1)} lbf)</span>
          ) : null}
          {range && spec.help ? <span aria-hidden="true"> · </span> : null}
          {spec.help ? <span id={helpId}>{spec.help}</span> : null}
        </p>
      </div>
    </div>
  );
}

function FieldProblem({ id, message }: { id: string | undefined; message: string | undefined }) {
  if (!message) return null;
  return (
    <p id={id} className="flex items-start gap-1 text-sm font-medium text-fault-700">
      <span aria-hidden="true">▲</span>
      {message}
    </p>
  );
}
