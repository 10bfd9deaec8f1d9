import { useState } from "react";
import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { QueryStatus } from "@/components/ui/query-status";
import type { Design } from "@/shared/designs";
import { useDeleteDesign } from "../api/delete-design";
import { useDesigns } from "../api/get-designs";
import { useRestoreDesign } from "../api/restore-design";
import { DesignCard } from "./design-card";
import type { MachineChoice } from "./design-downloads";

type Status =
  | { kind: "deleted"; design: Design }
  | { kind: "restored"; design: Design }
  | { kind: "duplicated"; design: Design }
  | { kind: "fault"; text: string }
  | null;

/**
 * "Saved designs": every design of the signed-in user, newest change first. Delete acts at once and
 * offers Undo (the server keeps a deleted design restorable for a day).
 */
export function DesignsPage({
  catalogueHref,
  machines = [],
}: {
  catalogueHref: string;
  machines?: readonly MachineChoice[];
}) {
  const designs = useDesigns();
  const remove = useDeleteDesign();
  const restore = useRestoreDesign();
  const [status, setStatus] = useState<Status>(null);

  const onDelete = (design: Design) =>
    remove.mutate(design.id, {
      onSuccess: () => setStatus({ kind: "deleted", design }),
      onError: (e) => setStatus({ kind: "fault", text: `“${design.name}” was not deleted: ${e.message}` }),
    });
  const onUndo = (design: Design) =>
    restore.mutate(design.id, {
      onSuccess: (back) => setStatus({ kind: "restored", design: back }),
      onError: (e) =>
        setStatus({ kind: "fault", text: `“${design.name}” could not be brought back: ${e.message}` }),
    });

  return (
    <div className="space-y-4">
      <div aria-live="polite">
        {status?.kind === "deleted" ? (
          <Notice tone="info">
            <div className="flex flex-wrap items-center gap-3">
              <span>Deleted “{status.design.name}”.</span>
              <Button variant="secondary" onClick={() => onUndo(status.design)} disabled={restore.isPending}>
                {restore.isPending ? "Bringing it back…" : "Undo"}
              </Button>
            </div>
          </Notice>
        ) : null}
        {status?.kind === "restored" ? <Notice tone="holds">“{status.design.name}” is back.</Notice> : null}
        {status?.kind === "duplicated" ? (
          <Notice tone="holds">Saved a copy: “{status.design.name}”.</Notice>
        ) : null}
        {status?.kind === "fault" ? <Notice tone="fault">{status.text}</Notice> : null}
      </div>

      <QueryStatus query={designs} loading="Loading your designs" failed="Your designs could not be loaded" />
      {designs.data && designs.data.length === 0 ? (
        <div className="rounded-lg border border-dashed border-steel-300 bg-white px-4 py-8 text-center">
          <p className="text-lg font-semibold">
            {status?.kind === "deleted" ? "No saved designs left." : "No saved designs yet."}
          </p>
          <p className="mt-1 text-steel-700">
            Open a template, set it up for your vise, and save it: it will wait here, pinned to the version
            you used.
          </p>
          <Link to={catalogueHref} className="mt-3 inline-block font-semibold text-spark-700 underline">
            Browse the templates
          </Link>
        </div>
      ) : null}
      {designs.data && designs.data.length > 0 ? (
        <ul className="grid gap-4 lg:grid-cols-2">
          {designs.data.map((d) => (
            <li key={d.id}>
              <DesignCard
                design={d}
                onDelete={onDelete}
                deleting={remove.isPending && remove.variables === d.id}
                onDuplicated={(copy) => setStatus({ kind: "duplicated", design: copy })}
                machines={machines}
              />
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
