import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { ApiError } from "@/lib/api-error";
import type { DesignParameters } from "@/shared/designs";
import type { UnitPreference } from "@/shared/profiles";
import { useDesign } from "../api/get-design";
import { useUpdateDesign } from "../api/update-design";

/**
 * Beside the configurator when it was opened from a saved design: saves the values shown back onto that
 * design, on the template version shown (moving its pin when the design was on an older one). Until this
 * is pressed the saved design is untouched.
 */
export function SaveToDesign({
  designId,
  templateId,
  templateVersion,
  parameters,
  units,
  designsHref,
}: {
  designId: number;
  templateId: string;
  templateVersion: string;
  /** In the template's own units; null while a field has a problem. */
  parameters: DesignParameters | null;
  units: UnitPreference;
  designsHref: string;
}) {
  const design = useDesign(designId);
  const update = useUpdateDesign();

  if (design.isPending) return <Spinner label="Loading the saved design" />;
  if (design.isError || design.data.templateId !== templateId) {
    const missing = design.isError && design.error instanceof ApiError && design.error.status === 404;
    return (
      <Notice tone="info" title="Not linked to a saved design">
        {design.isError && !missing
          ? design.error.message
          : "The saved design named in the address is not one of yours for this template. Save these values as a new design below."}
      </Notice>
    );
  }
  const d = design.data;
  const moving = d.templateVersion !== templateVersion;
  const save = () => {
    if (!parameters) return;
    update.mutate({
      id: d.id,
      changes: { parameters, units, ...(moving ? { useCurrentTemplateVersion: true as const } : {}) },
    });
  };

  return (
    <section
      aria-labelledby="save-to-design-heading"
      className="rounded-lg border border-spark-500 bg-white p-4 shadow-sm"
    >
      <h2 id="save-to-design-heading" className="text-xl">
        Opened from “{d.name}”
      </h2>
      <p className="mt-1 text-steel-700">
        {moving
          ? `Saved on version ${d.templateVersion}; you are looking at version ${templateVersion}. Saving puts the design on ${templateVersion} with these values. Until then it stays as it was.`
          : `Saving replaces its values with the ones shown here.`}
      </p>
      <Button className="mt-3" disabled={!parameters || update.isPending} onClick={save}>
        {update.isPending
          ? "Saving…"
          : moving
            ? `Save “${d.name}” on version ${templateVersion}`
            : `Save changes to “${d.name}”`}
      </Button>
      {!parameters ? <p className="mt-2 text-sm text-steel-600">Fix the marked fields to save.</p> : null}
      <div aria-live="polite" className="mt-2">
        {update.isSuccess ? (
          <Notice tone="holds" title={`Saved “${update.data.name}”`}>
            It is pinned to version {update.data.templateVersion} of the template.{" "}
            <Link to={designsHref} className="font-semibold text-spark-700 underline">
              Back to your saved designs
            </Link>
          </Notice>
        ) : null}
        {update.isError ? (
          <Notice tone="fault" title="Not saved">
            {update.error.message}
            {update.error instanceof ApiError && update.error.details.length > 0 ? (
              <ul className="mt-1 list-disc pl-5">
                {update.error.details.map((detail) => (
                  <li key={detail.path}>{detail.message}</li>
                ))}
              </ul>
            ) : null}
          </Notice>
        ) : null}
      </div>
    </section>
  );
}
