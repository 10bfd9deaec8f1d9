import { useEffect, useMemo, useState } from "react";
import { useSearchParams } from "react-router";
import type { EccentricCamInput } from "@/engine/calculators/eccentric-cam/schema";
import { ApiError } from "@/lib/api-error";
import { useDebouncedValue } from "@/lib/use-debounced-value";
import { useSearchState } from "@/lib/use-search-state";
import type { CamResult } from "../api/cam-result-schema";
import { useCamResult } from "../api/evaluate-cam";
import { camFields, type CamFieldKey } from "../model/fields";
import type { CamFieldErrors } from "../model/parse-inputs";
import { readCamUrl, writeCamUrl } from "../model/url-state";
import { useCamForm } from "./use-cam-form";

export const camDebounceMs = 300;

const fieldKeys = new Set<string>(camFields.map((f) => f.key));

/** A server problem's field: `"eccentricity"`, or the last part of `"input.eccentricity"`. */
function fieldOf(path: string): CamFieldKey | null {
  const last = path.split(".").pop() ?? "";
  return fieldKeys.has(last) ? (last as CamFieldKey) : null;
}

export type CamStatus =
  | { kind: "first-load" }
  | { kind: "current" }
  | { kind: "updating" }
  | { kind: "input-problem" }
  | { kind: "server-problem"; message: string };

/**
 * The whole cam check: the form, a debounced request for each complete input, and the last good answer,
 * which stays on screen while the next is computed or while the input has a problem.
 */
export function useCamCheck() {
  const [searchParams] = useSearchParams();
  const [fromUrl] = useState(() => readCamUrl(searchParams));
  const form = useCamForm(fromUrl);
  /** What the address held that could not be used (shown until dismissed or the address changes). */
  const [urlNotes, setUrlNotes] = useState<string[]>(fromUrl.notes);
  const input = form.parsed.input;
  // The address follows every whole cam; a link to another cam opened on this page is read back in.
  useSearchState(input ? writeCamUrl(form.system, form.texts).toString() : null, (params) => {
    const next = readCamUrl(params, form.system);
    form.load(next.system, next.texts);
    setUrlNotes(next.notes);
  });
  // Debounce on the text of the input so an equal object does not restart the timer.
  const inputKey = input ? JSON.stringify(input) : null;
  const settledKey = useDebouncedValue(inputKey, camDebounceMs);
  const settledInput = useMemo(
    () => (settledKey ? (JSON.parse(settledKey) as EccentricCamInput) : null),
    [settledKey],
  );
  const query = useCamResult(settledInput);

  const [lastGood, setLastGood] = useState<{ input: EccentricCamInput; result: CamResult } | null>(null);
  useEffect(() => {
    if (query.data && !query.isPlaceholderData && settledInput)
      setLastGood({ input: settledInput, result: query.data });
  }, [query.data, query.isPlaceholderData, settledInput]);

  const serverError = query.isError && settledKey === inputKey ? query.error : null;
  const fieldErrors: CamFieldErrors = { ...(form.parsed.errors ?? {}) };
  let serverMessage: string | null = null;
  if (serverError) {
    let placed = false;
    if (serverError instanceof ApiError) {
      for (const d of serverError.details) {
        const key = fieldOf(d.path);
        if (key && !fieldErrors[key]) {
          fieldErrors[key] = d.message;
          placed = true;
        }
      }
    }
    if (!placed) serverMessage = serverError.message;
  }

  let status: CamStatus;
  if (form.parsed.errors || (serverError && !serverMessage)) status = { kind: "input-problem" };
  else if (serverMessage) status = { kind: "server-problem", message: serverMessage };
  else if (!lastGood) status = { kind: "first-load" };
  else if (inputKey !== settledKey || query.isFetching) status = { kind: "updating" };
  else status = { kind: "current" };

  return { form, fieldErrors, status, shown: lastGood, urlNotes, dismissUrlNotes: () => setUrlNotes([]) };
}
