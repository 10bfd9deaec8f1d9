import type { LengthUnit } from "@/engine/units";
import { cn } from "@/components/ui/cn";

const options: Array<{ value: LengthUnit; label: string; spoken: string }> = [
  { value: "mm", label: "mm", spoken: "millimetres" },
  { value: "in", label: "inch", spoken: "inches" },
];

/** Millimetres or inches for every length on the page; a pair of radio buttons (arrow keys move between them). */
export function UnitSwitch({
  value,
  onChange,
}: {
  value: LengthUnit;
  onChange: (units: LengthUnit) => void;
}) {
  return (
    <fieldset className="flex items-center gap-3">
      <legend className="sr-only">Length units</legend>
      <span aria-hidden="true" className="font-semibold text-steel-700">
        Lengths in
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
              name="configurator-units"
              value={o.value}
              checked={value === o.value}
              onChange={() => onChange(o.value)}
              className="sr-only"
            />
            <span className="figure">{o.label}</span>
            <span className="sr-only"> ({o.spoken})</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
