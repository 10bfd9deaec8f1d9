import { useEffect, type ReactNode } from "react";
import { Link, useSearchParams } from "react-router";
import { Button, buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useTemplates, type TemplateSummary } from "../api/get-templates";
import { familiesOf, familyLabel, filterTemplates } from "../model/filter";
import { CatalogueFilters } from "./catalogue-filters";
import { TemplateCard, TemplateCardSkeleton } from "./template-card";

export interface CataloguePageProps {
  /** The card picture (composed in by the route, so the 3D code stays out of this page's bundle). */
  renderPicture: (template: TemplateSummary) => ReactNode;
  templateHref: (id: string) => string;
  camCheckHref: string;
}

/**
 * The catalogue: every published template as a card, filtered by family and searched by words. The
 * search and family live in the address, so a filtered list can be bookmarked.
 */
export function CataloguePage({ renderPicture, templateHref, camCheckHref }: CataloguePageProps) {
  const templates = useTemplates();
  const [params, setParams] = useSearchParams();
  const query = params.get("q") ?? "";
  const family = params.get("family");
  useEffect(() => {
    document.title = "Templates · Jigwright";
  }, []);

  const update = (next: { q?: string; family?: string | null }) => {
    const p = new URLSearchParams(params);
    if (next.q) p.set("q", next.q);
    else if (next.q !== undefined) p.delete("q");
    if (next.family) p.set("family", next.family);
    else if (next.family !== undefined) p.delete("family");
    setParams(p, { replace: true, preventScrollReset: true });
  };

  const list = templates.data ?? [];
  const shown = filterTemplates(list, family, query);
  return (
    <div className="mx-auto max-w-6xl px-4 py-8">
      <h1 className="text-3xl sm:text-4xl">Templates</h1>
      <p className="mt-2 max-w-3xl text-lg text-steel-700">
        Accessories to size to your own machine. Pick one, enter your vise or machine measurements, and see
        the checks, figures and drawings before you cut metal.
      </p>

      {templates.isPending ? (
        <>
          <p role="status" className="sr-only">
            Loading the templates…
          </p>
          <ul className="mt-8 grid gap-5 sm:grid-cols-2 lg:grid-cols-3">
            <TemplateCardSkeleton />
            <TemplateCardSkeleton />
            <TemplateCardSkeleton />
          </ul>
        </>
      ) : templates.isError ? (
        <div className="mt-8 max-w-2xl">
          <Notice tone="fault" title="The templates could not be loaded">
            {templates.error.message}
          </Notice>
          <div className="mt-4 flex flex-wrap gap-3">
            <Button onClick={() => void templates.refetch()}>Try again</Button>
            <Link to={camCheckHref} className={buttonClasses("secondary")}>
              Use the cam check meanwhile
            </Link>
          </div>
        </div>
      ) : list.length === 0 ? (
        <div className="mt-8 max-w-2xl rounded-lg border border-dashed border-steel-300 bg-white p-6">
          <h2 className="text-xl">No templates are published yet</h2>
          <p className="mt-2 text-steel-700">
            Templates appear here once a designer publishes one and a reviewer approves it. The cam check
            works without one.
          </p>
          <Link to={camCheckHref} className={buttonClasses("primary", "mt-4")}>
            Open the cam check
          </Link>
        </div>
      ) : (
        <>
          <div className="mt-6">
            <CatalogueFilters
              query={query}
              onQuery={(q) => update({ q })}
              family={family}
              onFamily={(f) => update({ family: f })}
              families={familiesOf(list)}
              total={list.length}
            />
          </div>
          <p role="status" className="mt-4 text-steel-700">
            {shown.length === list.length
              ? `${list.length} template${list.length > 1 ? "s" : ""}`
              : `${shown.length} of ${list.length} templates${family ? ` in ${familyLabel(family).toLowerCase()}` : ""}${query.trim() ? ` matching “${query.trim()}”` : ""}`}
          </p>
          {shown.length === 0 ? (
            <div className="mt-4 max-w-2xl rounded-lg border border-dashed border-steel-300 bg-white p-6">
              <h2 className="text-xl">Nothing matches</h2>
              <p className="mt-2 text-steel-700">Try fewer or shorter words, or another family.</p>
              <Button variant="secondary" className="mt-4" onClick={() => update({ q: "", family: null })}>
                Show all templates
              </Button>
            </div>
          ) : (
            <ul className="mt-4 grid gap-5 sm:grid-cols-2 lg:grid-cols-3" aria-label="Templates">
              {shown.map((t) => (
                <TemplateCard key={t.id} template={t} href={templateHref(t.id)} picture={renderPicture(t)} />
              ))}
            </ul>
          )}
        </>
      )}
    </div>
  );
}
