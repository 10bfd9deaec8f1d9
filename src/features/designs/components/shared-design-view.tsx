import { useEffect, useState } from "react";
import { Link } from "react-router";
import { Button, buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { isApiError } from "@/lib/api-error";
import { useCreateDesign } from "../api/create-design";
import { useSharedDesign } from "../api/get-shared-design";
import { configuratorHref } from "../model/configurator-link";
import { formatWhen } from "../model/present";
import { ParameterList } from "./parameter-list";
import { VersionNote } from "./version-note";

/**
 * The read-only page behind a share link. Anyone can open it; a signed-in visitor can keep a copy in
 * their own designs (a new design of theirs, pinned to the template's current version).
 */
export function SharedDesignView({
  token,
  signedIn,
  designsHref,
}: {
  token: string;
  signedIn: boolean;
  designsHref: string;
}) {
  const shared = useSharedDesign(token);
  const copy = useCreateDesign();
  const [copied, setCopied] = useState<string | null>(null);
  const name = shared.data?.name;
  useEffect(() => {
    document.title = `${name ?? "Shared design"} · Jigwright`;
  }, [name]);

  const heading = <h1 className="mb-4 text-3xl sm:text-4xl">Shared design</h1>;
  if (shared.isPending) {
    return (
      <>
        {heading}
        <Spinner label="Opening the shared design" />
      </>
    );
  }
  if (shared.isError) {
    const gone = isApiError(shared.error) && (shared.error.status === 404 || shared.error.status === 400);
    return (
      <>
        {heading}
        {gone ? (
          <Notice tone="caution" title="This link does not open a design">
            The link is mistyped, or its owner has revoked it or deleted the design. Ask them for a new link.
          </Notice>
        ) : (
          <Notice tone="fault" title="The shared design could not be loaded">
            <p>{shared.error.message}</p>
            <Button variant="secondary" className="mt-2" onClick={() => shared.refetch()}>
              Try again
            </Button>
          </Notice>
        )}
      </>
    );
  }
  const d = shared.data;
  return (
    <article className="space-y-6" aria-labelledby="shared-design-name">
      <header className="space-y-1">
        <p className="text-sm font-semibold uppercase tracking-wide text-spark-700">
          Shared design · read only
        </p>
        <h1 id="shared-design-name" className="text-3xl sm:text-4xl">
          {d.name}
        </h1>
        <p className="text-sm text-steel-600">
          Shared {formatWhen(d.sharedAt)} · last changed {formatWhen(d.updatedAt)} · works in{" "}
          <span className="figure">{d.units}</span>
        </p>
      </header>
      <VersionNote
        templateId={d.templateId}
        templateName={d.templateName}
        templateVersion={d.templateVersion}
        newerVersion={d.newerVersion}
      />
      {d.notes ? (
        <section aria-labelledby="shared-notes" className="space-y-1">
          <h3 id="shared-notes" className="text-lg">
            Notes
          </h3>
          <p className="whitespace-pre-wrap text-steel-800">{d.notes}</p>
        </section>
      ) : null}
      <section aria-labelledby="shared-values" className="space-y-2">
        <h3 id="shared-values" className="text-lg">
          Values
        </h3>
        <p className="text-sm text-steel-600">Lengths are in the template's own units.</p>
        <ParameterList
          parameters={d.parameters}
          className="grid max-w-xl grid-cols-[auto_1fr] gap-x-6 gap-y-1 rounded-lg border border-steel-200 bg-white p-4"
        />
      </section>
      <div className="flex flex-wrap gap-2">
        {d.templateName !== null ? (
          <Link
            to={configuratorHref(d.templateId, d.units, d.parameters)}
            className={buttonClasses("primary")}
          >
            Try these values in the configurator
          </Link>
        ) : null}
        {signedIn && d.templateName !== null ? (
          <Button
            variant="secondary"
            disabled={copy.isPending || copied !== null}
            onClick={() =>
              copy.mutate(
                {
                  templateId: d.templateId,
                  parameters: d.parameters,
                  units: d.units,
                  name: d.name,
                  notes: d.notes,
                },
                { onSuccess: (mine) => setCopied(mine.name) },
              )
            }
          >
            {copy.isPending ? "Saving a copy…" : "Save a copy to my designs"}
          </Button>
        ) : null}
      </div>
      <div aria-live="polite">
        {copied ? (
          <Notice tone="holds">
            Saved “{copied}” to{" "}
            <Link to={designsHref} className="font-semibold underline">
              your designs
            </Link>
            .
          </Notice>
        ) : null}
        {copy.isError ? <Notice tone="fault">{copy.error.message}</Notice> : null}
      </div>
      <p className="text-sm text-steel-600">
        A design is a starting point, not a checked drawing: open it in the configurator, read its checks and
        cautions, and follow your machine maker's guidance before cutting.
      </p>
    </article>
  );
}
