import { camFields, camGroups, type CamFieldKey } from "../model/fields";
import type { CamFieldErrors, CamTexts } from "../model/parse-inputs";
import { unitOf, type UnitSystem } from "../model/units";
import { NumberField } from "./number-field";

/** The cam's inputs, grouped, each with its unit in the chosen system. */
export function CamInputs({
  system,
  texts,
  errors,
  onChange,
}: {
  system: UnitSystem;
  texts: CamTexts;
  errors: CamFieldErrors;
  onChange: (key: CamFieldKey, text: string) => void;
}) {
  return (
    <div className="space-y-6">
      {camGroups.map((group) => (
        <fieldset key={group.id} className="space-y-4">
          <legend className="mb-2 border-b border-steel-200 pb-1 text-lg font-semibold text-steel-950">
            {group.title}
          </legend>
          <div className="grid gap-4 sm:grid-cols-2 md:grid-cols-3 lg:grid-cols-1 xl:grid-cols-2">
            {camFields
              .filter((f) => f.group === group.id)
              .map((f) => (
                <NumberField
                  key={f.key}
                  name={f.key}
                  label={f.label}
                  symbol={f.symbol}
                  unit={unitOf(system, f.quantity).symbol}
                  help={f.help}
                  value={texts[f.key]}
                  error={errors[f.key]}
                  step={system === "inch" ? f.inchStep : f.step}
                  onChange={(text) => onChange(f.key, text)}
                />
              ))}
          </div>
        </fieldset>
      ))}
    </div>
  );
}
