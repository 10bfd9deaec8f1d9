import { cn } from "./cn";

export interface ChoiceOption<T extends string> {
  value: T;
  /** What the button shows. */
  label: string;
  /** Read out after the label by screen readers, e.g. "millimetres". */
  spoken: string;
}

/**
 * A small set of exclusive choices (e.g. mm or inch) as radio buttons styled as one switch; arrow keys move
 * between them, as radio groups do.
 */
export function ChoiceSwitch<T extends string>({
  name,
  legend,
  heading,
  options,
  value,
  onChange,
}: {
  /** The radio group's name; unique on the page. */
  name: string;
  /** The group's accessible name. */
  legend: string;
  /** The visible words before the switch. */
  heading: string;
  options: ReadonlyArray<ChoiceOption<T>>;
  value: T;
  onChange: (value: T) => void;
}) {
  return (
    <fieldset className="flex items-center gap-3">
      <legend className="sr-only">{legend}</legend>
      <span aria-hidden="true" className="font-semibold text-steel-700">
        {heading}
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
              name={name}
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
