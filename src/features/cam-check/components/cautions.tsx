/** The safety cautions that go with these figures, as the calculator gives them. */
export function Cautions({ cautions }: { cautions: string[] }) {
  return (
    <aside
      aria-labelledby="cautions-heading"
      className="rounded-lg border-l-4 border-caution-700 bg-caution-50 p-4"
    >
      <h2 id="cautions-heading" className="flex items-center gap-2 text-lg text-caution-700">
        <svg viewBox="0 0 24 24" className="size-5" aria-hidden="true">
          <path d="M12 2 1 21h22L12 2z" fill="currentColor" />
          <path d="M12 9v6M12 17.5v.5" stroke="white" strokeWidth="2.2" strokeLinecap="round" />
        </svg>
        Before you rely on it
      </h2>
      <ul className="mt-2 list-disc space-y-2 pl-5 text-sm text-steel-800">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
