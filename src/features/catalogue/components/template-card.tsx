import type { ReactNode } from "react";
import { Link } from "react-router";
import type { TemplateSummary } from "../api/get-templates";
import { familyLabel } from "../model/filter";

/** One template: its picture (rendered from its model), family, name and summary; the whole card opens it. */
export function TemplateCard({
  template,
  href,
  picture,
}: {
  template: TemplateSummary;
  href: string;
  picture: ReactNode;
}) {
  return (
    <li className="group relative flex flex-col overflow-hidden rounded-lg border border-steel-200 bg-white shadow-sm transition-shadow focus-within:shadow-md hover:shadow-md">
      {picture}
      <div className="flex flex-1 flex-col gap-1 border-t border-steel-200 p-4">
        <p className="text-sm font-semibold uppercase tracking-wide text-spark-700">
          {familyLabel(template.family)}
        </p>
        <h2 className="text-xl">
          <Link to={href} className="rounded after:absolute after:inset-0 after:content-[''] hover:underline">
            {template.name}
          </Link>
        </h2>
        <p className="text-steel-700">{template.summary}</p>
        <p className="figure mt-auto pt-2 text-sm text-steel-600">version {template.version}</p>
      </div>
    </li>
  );
}

/** A card-shaped block shown while the list loads. */
export function TemplateCardSkeleton() {
  return (
    <li aria-hidden="true" className="overflow-hidden rounded-lg border border-steel-200 bg-white">
      <div className="aspect-[8/5] animate-pulse bg-steel-100 motion-reduce:animate-none" />
      <div className="space-y-2 p-4">
        <div className="h-3 w-16 rounded bg-steel-100" />
        <div className="h-5 w-2/3 rounded bg-steel-200" />
        <div className="h-3 w-full rounded bg-steel-100" />
        <div className="h-3 w-5/6 rounded bg-steel-100" />
      </div>
    </li>
  );
}
