import { Button } from "./button";
import { Notice } from "./notice";
import { Spinner } from "./spinner";

/** What {@link QueryStatus} reads of a TanStack Query result. */
export interface QueryLike {
  isPending: boolean;
  isError: boolean;
  error: Error | null;
  refetch: () => unknown;
}

/**
 * A query's waiting and failed states: a spinner while it loads; if it fails, the reason and a
 * "Try again" button. Nothing once it has data (the caller shows that).
 */
export function QueryStatus({
  query,
  loading,
  failed,
}: {
  query: QueryLike;
  loading: string;
  failed: string;
}) {
  return (
    <>
      {query.isPending ? <Spinner label={loading} /> : null}
      {query.isError ? (
        <Notice tone="fault" title={failed}>
          <p>{query.error?.message}</p>
          <Button variant="secondary" className="mt-2" onClick={() => query.refetch()}>
            Try again
          </Button>
        </Notice>
      ) : null}
    </>
  );
}
