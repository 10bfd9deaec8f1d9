import type { LengthUnit } from "@/engine/units";
import { ChoiceSwitch, type ChoiceOption } from "@/components/ui/choice-switch";

const options: ReadonlyArray<ChoiceOption<LengthUnit>> = [
  { value: "mm", label: "mm", spoken: "millimetres" },
  { value: "in", label: "inch", spoken: "inches" },
];

/** Millimetres or inches for every length on the configurator page. */
export function UnitSwitch({
  value,
  onChange,
}: {
  value: LengthUnit;
  onChange: (units: LengthUnit) => void;
}) {
  return (
    <ChoiceSwitch
      name="configurator-units"
      legend="Length units"
      heading="Lengths in"
      options={options}
      value={value}
      onChange={onChange}
    />
  );
}
