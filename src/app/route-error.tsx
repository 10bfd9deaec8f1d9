import { isRouteErrorResponse, Link, useRouteError } from "react-router";
import { buttonClasses } from "@/components/ui/button";
import { Page } from "@/components/layouts/page";
import { NotFound } from "./not-found";

/**
 * Shown in place of a page that failed: a missing route becomes the 404 page, anything else says what
 * happened and offers a way on. It renders inside the shell, so the header still works.
 */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFound />;
  const detail =
    error instanceof Error ? error.message : isRouteErrorResponse(error) ? error.statusText : null;
  return (
    <Page
      title="This page stopped working"
      lead="Something went wrong while showing it. Nothing you entered was sent anywhere new."
    >
      {detail ? (
        <pre className="figure max-w-3xl overflow-x-auto rounded-md bg-steel-100 p-3 text-sm text-steel-800">
          {detail}
        </pre>
      ) : null}
      <div className="mt-6 flex flex-wrap gap-3">
        <button type="button" className={buttonClasses("primary")} onClick={() => window.location.reload()}>
          Load it again
        </button>
        <Link to="/" className={buttonClasses("secondary")}>
          Go to the home page
        </Link>
      </div>
    </Page>
  );
}
