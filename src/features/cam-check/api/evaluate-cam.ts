import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { EccentricCamInput } from "@/engine/calculators/eccentric-cam/schema";
import { api } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import { camResultSchema, type CamResult } from "./cam-result-schema";

export const camCalculatorKind = "eccentric-cam";

/** `POST /api/calculators/eccentric-cam`: the calculator is pure, so its answers are cached per input. */
export async function evaluateCam(input: EccentricCamInput, signal?: AbortSignal): Promise<CamResult> {
  return api.post(`/api/calculators/${camCalculatorKind}`, { body: input, schema: camResultSchema, signal });
}

export const camResultQueryOptions = (input: EccentricCamInput) =>
  queryOptions({
    queryKey: queryKeys.calculators.result(camCalculatorKind, input),
    queryFn: ({ signal }) => evaluateCam(input, signal),
    staleTime: Infinity,
    retry: false,
  });

/**
 * The cam's result for `input` (null: the form is not complete, nothing is sent). While a new input is
 * being computed the previous answer stays in `data` (`isPlaceholderData` is true).
 */
export function useCamResult(input: EccentricCamInput | null) {
  return useQuery({
    ...camResultQueryOptions(input ?? ({} as EccentricCamInput)),
    enabled: input !== null,
    placeholderData: keepPreviousData,
  });
}
