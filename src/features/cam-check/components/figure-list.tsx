import type { ReactNode } from "react";

/** A grid of labelled figures: the term, the value in mono, and an optional note. */
export function FigureList({
  items,
}: {
  items: Array<{ id: string; term: string; value: ReactNode; note?: ReactNode }>;
}) {
  return (
    <dl className="grid gap-px overflow-hidden rounded-lg border border-steel-200 bg-steel-200 sm:grid-cols-2">
      {items.map((item) => (
        <div key={item.id} className="bg-white px-4 py-3">
          <dt className="text-sm font-semibold uppercase tracking-wide text-steel-600">{item.term}</dt>
          <dd className="figure mt-0.5 text-xl text-steel-950" data-testid={`figure-${item.id}`}>
            {item.value}
          </dd>
          {item.note ? <dd className="mt-0.5 text-sm text-steel-600">{item.note}</dd> : null}
        </div>
      ))}
    </dl>
  );
}
