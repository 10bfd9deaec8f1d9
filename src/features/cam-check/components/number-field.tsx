import { useId } from "react";
import { cn } from "@/components/ui/cn";
import { readNumber } from "../model/parse-inputs";
import { trimNumber } from "../model/units";

const decimalsOf = (step: number) => (String(step).split(".")[1] ?? "").length;

/** A number input (arrow keys step it) with its unit beside it, its help text and its problem, all linked for screen readers. */
export function NumberField({
  name,
  label,
  symbol,
  unit,
  help,
  value,
  error,
  step,
  onChange,
}: {
  name: string;
  label: string;
  symbol?: string;
  unit: string;
  help: string;
  value: string;
  error?: string;
  step: number;
  onChange: (text: string) => void;
}) {
  const id = useId();
  const helpId = `${id}-help`;
  const errorId = `${id}-error`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="flex items-baseline justify-between gap-2 font-semibold text-steel-900">
        <span>{label}</span>
        {symbol ? <span className="figure text-sm font-normal text-steel-600">{symbol}</span> : null}
      </label>
      <div
        className={cn(
          "flex min-h-11 items-stretch overflow-hidden rounded-md border bg-white shadow-inner has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-spark-500",
          error ? "border-fault-700" : "border-steel-300 hover:border-steel-400",
        )}
      >
        <input
          id={id}
          name={name}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          onKeyDown={(e) => {
            // Arrow keys nudge the value by one step, as a spin box would.
            if (e.key !== "ArrowUp" && e.key !== "ArrowDown") return;
            const current = readNumber(value);
            if (current === null) return;
            e.preventDefault();
            const next = current + (e.key === "ArrowUp" ? step : -step);
            onChange(trimNumber(next, decimalsOf(step)));
          }}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${errorId} ${helpId}` : helpId}
          className="figure w-full min-w-0 bg-transparent px-3 text-right text-lg text-steel-950 outline-none"
        />
        {unit ? (
          <span className="figure flex items-center border-l border-steel-200 bg-steel-100 px-3 text-steel-700">
            {unit}
          </span>
        ) : null}
      </div>
      {error ? (
        <p id={errorId} className="text-sm font-medium text-fault-700">
          <span aria-hidden="true">▲ </span>
          {error}
        </p>
      ) : null}
      <p id={helpId} className="text-sm text-steel-600">
        {help}
      </p>
    </div>
  );
}
