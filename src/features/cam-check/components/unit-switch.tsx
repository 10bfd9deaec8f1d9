import { ChoiceSwitch, type ChoiceOption } from "@/components/ui/choice-switch";
import type { UnitSystem } from "../model/units";

const options: ReadonlyArray<ChoiceOption<UnitSystem>> = [
  { value: "mm", label: "mm", spoken: "millimetres, newtons" },
  { value: "inch", label: "inch", spoken: "inches, pounds-force" },
];

/** Millimetres or inches for the cam check's lengths and forces. */
export function UnitSwitch({
  value,
  onChange,
}: {
  value: UnitSystem;
  onChange: (system: UnitSystem) => void;
}) {
  return (
    <ChoiceSwitch
      name="unit-system"
      legend="Units"
      heading="Units"
      options={options}
      value={value}
      onChange={onChange}
    />
  );
}
