import type { CamResult } from "../api/cam-result-schema";

/** Where the calculation comes from, each marked as standard, handbook, textbook, common practice or from memory. */
export function Sources({ sources, zoneBasis }: { sources: CamResult["sources"]; zoneBasis: string }) {
  return (
    <section aria-labelledby="sources-heading" className="text-sm text-steel-700">
      <h2 id="sources-heading" className="text-base">
        Sources of this calculation
      </h2>
      <ul className="mt-2 space-y-1">
        {sources.map((s) => (
          <li key={s.title}>
            <span className="mr-2 rounded bg-steel-200 px-1.5 py-0.5 text-xs font-semibold uppercase text-steel-700">
              {s.kind}
            </span>
            {s.title}
            {s.note ? <span className="text-steel-600"> — {s.note}</span> : null}
          </li>
        ))}
      </ul>
      <p className="mt-2">{zoneBasis}</p>
    </section>
  );
}
