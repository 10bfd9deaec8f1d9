import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { ApiError } from "@/lib/api-error";
import { designNotesMaxLength } from "@/shared/designs";
import { profileNameMaxLength } from "@/shared/profiles";
import { useSaveDesign } from "../api/save-design";

/** Keeps the configuration as a saved design, with a name and notes; pinned to the template's version. */
export function SaveDesignForm({
  templateId,
  templateName,
  parameters,
  units,
  asNew = false,
}: {
  /** True beside a panel that saves onto an existing design: this one then makes another. */
  asNew?: boolean;
  templateId: string;
  templateName: string;
  /** In the template's own units; null while a field has a problem. */
  parameters: Record<string, ParameterValue> | null;
  units: LengthUnit;
}) {
  const [name, setName] = useState("");
  const [notes, setNotes] = useState("");
  const [nameProblem, setNameProblem] = useState<string | undefined>();
  const save = useSaveDesign();

  function submit(event: React.FormEvent) {
    event.preventDefault();
    if (!parameters) return;
    const trimmed = name.trim();
    if (!trimmed) {
      setNameProblem("Give the design a name, e.g. the vise it is for.");
      return;
    }
    setNameProblem(undefined);
    save.mutate(
      { templateId, parameters, units, name: trimmed, notes },
      {
        onError: (error) => {
          if (error instanceof ApiError && error.fieldErrors.name) setNameProblem(error.fieldErrors.name);
        },
      },
    );
  }

  return (
    <section
      aria-labelledby="save-heading"
      className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
    >
      <h2 id="save-heading" className="text-xl">
        {asNew ? "Save as a new design" : "Save this design"}
      </h2>
      <form noValidate onSubmit={submit} className="mt-2 space-y-3">
        <TextField
          label="Design name"
          value={name}
          maxLength={profileNameMaxLength}
          placeholder={`${templateName} for …`}
          onChange={(e) => setName(e.target.value)}
          error={nameProblem}
        />
        <div className="flex flex-col gap-1">
          <label htmlFor="design-notes" className="font-semibold text-steel-900">
            Notes <span className="font-normal text-steel-600">(optional)</span>
          </label>
          <textarea
            id="design-notes"
            rows={3}
            value={notes}
            maxLength={designNotesMaxLength}
            onChange={(e) => setNotes(e.target.value)}
            className="rounded-md border border-steel-300 bg-white px-3 py-2 text-base text-steel-950 shadow-inner hover:border-steel-400"
          />
        </div>
        <Button type="submit" disabled={!parameters || save.isPending}>
          {save.isPending ? "Saving…" : "Save design"}
        </Button>
        {!parameters ? <p className="text-sm text-steel-600">Fix the marked fields to save.</p> : null}
      </form>
      <div aria-live="polite" className="mt-2">
        {save.isSuccess ? (
          <Notice tone="holds" title={`Saved as “${save.data.name}”`}>
            Pinned to version {save.data.templateVersion} of the template, in{" "}
            {save.data.units === "in" ? "inches" : "millimetres"}.
          </Notice>
        ) : null}
        {save.isError && !(save.error instanceof ApiError && save.error.fieldErrors.name) ? (
          <Notice tone="fault" title="Not saved">
            {save.error.message}
          </Notice>
        ) : null}
      </div>
    </section>
  );
}
