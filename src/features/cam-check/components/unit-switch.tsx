import { cn } from "@/components/ui/cn";
import type { UnitSystem } from "../model/units";

const options: Array<{ value: UnitSystem; label: string; detail: string }> = [
  { value: "mm", label: "mm", detail: "millimetres, newtons" },
  { value: "inch", label: "inch", detail: "inches, pounds-force" },
];

/** Millimetres or inches, as a pair of radio buttons styled as one switch (arrow keys move between them). */
export function UnitSwitch({
  value,
  onChange,
}: {
  value: UnitSystem;
  onChange: (system: UnitSystem) => void;
}) {
  return (
    <fieldset className="flex items-center gap-3">
      <legend className="sr-only">Units</legend>
      <span aria-hidden="true" className="font-semibold text-steel-700">
        Units
      </span>
      <div className="inline-flex rounded-md border border-steel-300 bg-white p-0.5">
        {options.map((o) => (
          <label
            key={o.value}
            className={cn(
              "relative inline-flex min-h-10 cursor-pointer items-center rounded px-4 font-semibold has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-spark-500",
              value === o.value ? "bg-steel-900 text-white" : "text-steel-700 hover:bg-steel-100",
            )}
          >
            <input
              type="radio"
              name="unit-system"
              value={o.value}
              checked={value === o.value}
              onChange={() => onChange(o.value)}
              className="sr-only"
            />
            <span className="figure">{o.label}</span>
            <span className="sr-only"> ({o.detail})</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
