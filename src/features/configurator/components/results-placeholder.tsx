/** Stands where the checks and figures will be while the first evaluation is computed, so nothing jumps. */
export function ResultsPlaceholder({ failed, onRetry }: { failed?: string | null; onRetry?: () => void }) {
  return (
    <section
      aria-label="Checks and figures"
      className="rounded-lg border border-dashed border-steel-300 bg-white p-4"
    >
      <h2 className="text-xl">Checks</h2>
      {failed ? (
        <div className="mt-2 space-y-2">
          <p className="text-fault-700">{failed}</p>
          {onRetry ? (
            <button type="button" onClick={onRetry} className="font-semibold text-spark-700 underline">
              Try again
            </button>
          ) : null}
        </div>
      ) : (
        <div className="mt-3 space-y-2" aria-hidden="true">
          <div className="h-10 animate-pulse rounded bg-steel-100 motion-reduce:animate-none" />
          <div className="h-10 animate-pulse rounded bg-steel-100 motion-reduce:animate-none" />
          <div className="h-24 animate-pulse rounded bg-steel-100 motion-reduce:animate-none" />
        </div>
      )}
    </section>
  );
}
