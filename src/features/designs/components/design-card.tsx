import { useState } from "react";
import { Link } from "react-router";
import { Button, buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { Design } from "@/shared/designs";
import { useDuplicateDesign } from "../api/duplicate-design";
import { useUpdateDesign } from "../api/update-design";
import { configuratorHref } from "../model/configurator-link";
import { formatWhen } from "../model/present";
import { DesignDownloads, type MachineChoice } from "./design-downloads";
import { DetailsForm } from "./details-form";
import { ParameterList } from "./parameter-list";
import { SharePanel } from "./share-panel";
import { UpgradePanel } from "./upgrade-panel";
import { VersionNote } from "./version-note";

/**
 * One saved design: what it is, its values, and what can be done with it — open in the configurator,
 * rename, duplicate, share, delete (the page offers the undo).
 */
export function DesignCard({
  design,
  onDelete,
  deleting,
  onDuplicated,
  machines,
}: {
  design: Design;
  onDelete: (design: Design) => void;
  deleting: boolean;
  onDuplicated: (copy: Design) => void;
  machines: readonly MachineChoice[];
}) {
  const [editing, setEditing] = useState(false);
  const [sharing, setSharing] = useState(false);
  const [downloading, setDownloading] = useState(false);
  const [comparing, setComparing] = useState(false);
  const update = useUpdateDesign();
  const duplicate = useDuplicateDesign();
  const headingId = `design-${design.id}-name`;
  const canOpen = design.templateName !== null;
  // A design on an older version opens on the new one only through the comparison (its values may need
  // a decision first); one on the current version opens directly, ready to be saved back.
  const opensDirectly = canOpen && !design.newerVersion;

  return (
    <article
      aria-labelledby={headingId}
      className="space-y-4 rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
      data-design-id={design.id}
    >
      {editing ? (
        <DetailsForm
          initial={{ name: design.name, notes: design.notes }}
          onCancel={() => setEditing(false)}
          onSave={async (details) => {
            await update.mutateAsync({ id: design.id, changes: details });
            setEditing(false);
          }}
        />
      ) : (
        <header className="space-y-1">
          <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
            <h3 id={headingId} className="text-xl">
              {design.name}
            </h3>
            {design.share ? (
              <span className="rounded bg-holds-50 px-2 py-0.5 text-xs font-semibold uppercase tracking-wide text-holds-700 ring-1 ring-inset ring-holds-600/40">
                Shared
              </span>
            ) : null}
          </div>
          <p className="text-sm text-steel-600">
            Changed {formatWhen(design.updatedAt)} · works in <span className="figure">{design.units}</span>
          </p>
          {design.notes ? <p className="whitespace-pre-wrap text-steel-800">{design.notes}</p> : null}
        </header>
      )}

      <VersionNote
        templateId={design.templateId}
        templateName={design.templateName}
        templateVersion={design.templateVersion}
        newerVersion={design.newerVersion}
        action={
          design.newerVersion ? (
            <Button variant="secondary" aria-expanded={comparing} onClick={() => setComparing((c) => !c)}>
              {comparing ? "Hide the differences" : `What changes in version ${design.newerVersion}?`}
            </Button>
          ) : null
        }
      />
      {comparing && design.newerVersion ? <UpgradePanel design={design} /> : null}

      <details className="group">
        <summary className="cursor-pointer font-semibold text-steel-800">
          Values ({Object.keys(design.parameters).length})
        </summary>
        <ParameterList
          parameters={design.parameters}
          className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm"
        />
      </details>

      <div className="flex flex-wrap gap-2">
        {opensDirectly ? (
          <Link
            to={configuratorHref(design.templateId, design.units, design.parameters, {
              savedDesignId: design.id,
            })}
            className={buttonClasses("primary")}
          >
            Open in the configurator
          </Link>
        ) : null}
        <Button
          variant="secondary"
          onClick={() => setEditing(true)}
          disabled={editing}
          aria-label={`Rename ${design.name}`}
        >
          Rename
        </Button>
        <Button
          variant="secondary"
          disabled={duplicate.isPending}
          onClick={() => duplicate.mutate(design.id, { onSuccess: onDuplicated })}
          aria-label={`Duplicate ${design.name}`}
        >
          {duplicate.isPending ? "Duplicating…" : "Duplicate"}
        </Button>
        {canOpen ? (
          <Button
            variant="secondary"
            aria-expanded={downloading}
            onClick={() => setDownloading((d) => !d)}
            aria-label={`Download files of ${design.name}`}
          >
            Download…
          </Button>
        ) : null}
        <Button
          variant="secondary"
          aria-expanded={sharing}
          onClick={() => setSharing((s) => !s)}
          aria-label={`Share ${design.name}`}
        >
          Share…
        </Button>
        <Button
          variant="quiet"
          disabled={deleting}
          onClick={() => onDelete(design)}
          aria-label={`Delete ${design.name}`}
        >
          {deleting ? "Deleting…" : "Delete"}
        </Button>
      </div>
      {downloading ? <DesignDownloads design={design} machines={machines} /> : null}
      {sharing ? <SharePanel design={design} /> : null}
      {update.isError && !editing ? <Notice tone="fault">{update.error.message}</Notice> : null}
      {duplicate.isError ? <Notice tone="fault">{duplicate.error.message}</Notice> : null}
    </article>
  );
}
