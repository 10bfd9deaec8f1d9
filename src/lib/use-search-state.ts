import { useEffect, useRef } from "react";
import { useSearchParams } from "react-router";

/** How long the address waits for typing to pause before it follows (the form itself never waits). */
export const searchWriteDelayMs = 250;

/**
 * Keeps a page's state in the address bar's query, so a configuration can be bookmarked and shared and
 * Back/Forward bring it back:
 * - `wanted` is the query the current state makes (null while the state has a problem: the address
 *   keeps the last good one). It is written a moment after typing pauses, with `replace`, so Back leaves
 *   the page instead of undoing keystrokes one by one.
 * - an address changed from outside (a link to another configuration of the same page, Back/Forward
 *   between two of them) is handed to `onExternal` to be read back in. Addresses this hook wrote are
 *   remembered, because the router applies a write a moment later and that arrival is not from outside.
 *
 * The page seeds its state from `useSearchParams()` on its first render itself.
 */
export function useSearchState(wanted: string | null, onExternal: (params: URLSearchParams) => void) {
  const [searchParams, setSearchParams] = useSearchParams();
  const written = useRef<string[]>([searchParams.toString()]);
  const remember = (text: string) => {
    written.current = [...written.current.slice(-19), text];
  };

  useEffect(() => {
    if (wanted === null || wanted === searchParams.toString()) return;
    const timer = setTimeout(() => {
      remember(wanted);
      setSearchParams(new URLSearchParams(wanted), { replace: true, preventScrollReset: true });
    }, searchWriteDelayMs);
    return () => clearTimeout(timer);
  }, [wanted, searchParams, setSearchParams]);

  const searchText = searchParams.toString();
  const onExternalRef = useRef(onExternal);
  onExternalRef.current = onExternal;
  useEffect(() => {
    if (written.current.includes(searchText)) return;
    remember(searchText);
    onExternalRef.current(new URLSearchParams(searchText));
  }, [searchText]);
}

/** The `units` entry of a query, shared by the configurator and the cam check: "mm" or "in", else null. */
export function readUnitsParam(params: URLSearchParams): "mm" | "in" | null {
  const text = params.get("units");
  return text === "mm" || text === "in" ? text : null;
}
