import { useRouteError } from "react-router";

/**
 * The last line of defence: the shell itself failed, so this page uses no app component at all.
 */
export function AppCrash() {
  const error = useRouteError();
  return (
    <div className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-3xl">Jigwright could not start</h1>
      <p className="mt-3 text-steel-700">
        Reload the page. If it keeps happening, the server may be restarting; try again in a minute.
      </p>
      {error instanceof Error ? (
        <pre className="figure mt-4 overflow-x-auto rounded bg-steel-100 p-3 text-sm">{error.message}</pre>
      ) : null}
      <a href="/" className="mt-6 inline-block font-semibold text-spark-700 underline">
        Reload Jigwright
      </a>
    </div>
  );
}
