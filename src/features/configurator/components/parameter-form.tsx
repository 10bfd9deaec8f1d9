import type { UseFormReturn } from "react-hook-form";
import type { LengthUnit } from "@/engine/units";
import type { FormValues } from "../model/form-values";
import { groupParameters, type ParameterSpecView } from "../model/parameter-spec";
import { ParameterField } from "./parameter-field";

/** The form generated from the template: one fieldset per group, in the template's order. */
export function ParameterForm({
  specs,
  form,
  templateUnits,
  units,
  materialNames,
}: {
  specs: readonly ParameterSpecView[];
  form: UseFormReturn<FormValues>;
  templateUnits: LengthUnit;
  units: LengthUnit;
  materialNames?: Readonly<Record<string, string>>;
}) {
  return (
    <form noValidate onSubmit={(e) => e.preventDefault()} aria-label="Parameters" className="space-y-5">
      {groupParameters(specs).map((group) => (
        <fieldset key={group.name} className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm">
          <legend className="px-1 text-lg font-semibold text-steel-950">{group.name}</legend>
          <div className="mt-1 grid gap-4">
            {group.parameters.map((spec) => (
              <ParameterField
                key={spec.key}
                spec={spec}
                form={form}
                templateUnits={templateUnits}
                units={units}
                {...(materialNames ? { materialNames } : {})}
              />
            ))}
          </div>
        </fieldset>
      ))}
    </form>
  );
}
