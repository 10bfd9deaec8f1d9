import { useEffect, useMemo, useState } from "react";
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { ApiError } from "@/lib/api-error";
import { useDebouncedValue } from "@/lib/use-debounced-value";
import { useEvaluation, type EvaluationRequest, type EvaluationView } from "../api/evaluate";

/** Typing pauses this long before a request goes out. */
export const evaluateDebounceMs = 250;

export type EvaluationStatus =
  | { kind: "first-load" }
  | { kind: "current" }
  | { kind: "updating" }
  | { kind: "input-problem" }
  | { kind: "server-problem"; message: string };

/**
 * Evaluates the configuration as the person types: requests are debounced, the last good evaluation stays
 * on screen while the next is computed (or while a field has a problem), and a server refusal that names
 * parameters is handed back so it can be shown in those fields.
 */
export function useLiveEvaluation(
  templateId: string,
  parameters: Record<string, ParameterValue> | null,
  units: LengthUnit,
  onServerProblems: (details: ReadonlyArray<{ path: string; message: string }>) => number,
) {
  const requestKey = parameters ? JSON.stringify({ parameters, units }) : null;
  const settledKey = useDebouncedValue(requestKey, evaluateDebounceMs);
  const settled = useMemo(
    () => (settledKey ? (JSON.parse(settledKey) as EvaluationRequest) : null),
    [settledKey],
  );
  const query = useEvaluation(templateId, settled);

  const [lastGood, setLastGood] = useState<{ request: EvaluationRequest; evaluation: EvaluationView } | null>(
    null,
  );
  useEffect(() => {
    if (query.data && !query.isPlaceholderData && settled)
      setLastGood({ request: settled, evaluation: query.data });
  }, [query.data, query.isPlaceholderData, settled]);

  const error = query.isError && settledKey === requestKey ? query.error : null;
  const [placedOnFields, setPlacedOnFields] = useState(false);
  useEffect(() => {
    if (!error) {
      setPlacedOnFields(false);
      return;
    }
    setPlacedOnFields(error instanceof ApiError && onServerProblems(error.details) > 0);
  }, [error, onServerProblems]);

  let status: EvaluationStatus;
  if (!parameters || (error && placedOnFields)) status = { kind: "input-problem" };
  else if (error) status = { kind: "server-problem", message: error.message };
  else if (!lastGood) status = { kind: "first-load" };
  else if (requestKey !== settledKey || query.isFetching) status = { kind: "updating" };
  else status = { kind: "current" };

  return { status, shown: lastGood, settled };
}
