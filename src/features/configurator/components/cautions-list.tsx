/** The safety cautions that go with a set of figures, in a box beside them. */
export function CautionsList({ cautions, headingId }: { cautions: readonly string[]; headingId: string }) {
  if (cautions.length === 0) return null;
  return (
    <aside aria-labelledby={headingId} className="rounded-lg border-l-4 border-caution-700 bg-caution-50 p-4">
      <h3 id={headingId} className="flex items-center gap-2 text-base text-caution-700">
        <svg viewBox="0 0 24 24" className="size-5 shrink-0" aria-hidden="true">
          <path d="M12 2 1 21h22L12 2z" fill="currentColor" />
          <path d="M12 9v6M12 17.5v.5" stroke="white" strokeWidth="2.2" strokeLinecap="round" />
        </svg>
        Before you rely on these figures
      </h3>
      <ul className="mt-2 list-disc space-y-1.5 pl-5 text-sm text-steel-800">
        {[...new Set(cautions)].map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
