import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { api } from "@/lib/api-client";
import { decodeModel, modelResponseSchema, type PreviewModel } from "./model-schema";
import { createSerialQueue } from "./one-at-a-time";

/** Catalogue pictures ask for their models one at a time (the kernel is the busiest part of a small server). */
const pictureQueue = createSerialQueue();

export const modelKeys = {
  all: ["templates", "model"] as const,
  defaults: (id: string) => ["templates", "model", id, "defaults"] as const,
  configured: (id: string, units: LengthUnit, parameters: unknown) =>
    ["templates", "model", id, units, parameters] as const,
};

/** `POST /api/templates/:id/model` with `{ parameters, units }`: the triangulated parts of one configuration. */
export async function getModel(
  id: string,
  request: { parameters: Record<string, ParameterValue>; units: LengthUnit },
  signal?: AbortSignal,
): Promise<PreviewModel> {
  const data = await api.post(`/api/templates/${encodeURIComponent(id)}/model`, {
    body: request,
    schema: modelResponseSchema,
    signal,
  });
  return decodeModel(data);
}

/** `GET /api/templates/:id/model`: the template at its defaults (catalogue pictures). */
export async function getDefaultModel(id: string, signal?: AbortSignal): Promise<PreviewModel> {
  const data = await pictureQueue(
    () => api.get(`/api/templates/${encodeURIComponent(id)}/model`, { schema: modelResponseSchema, signal }),
    signal,
  );
  return decodeModel(data);
}

export const defaultModelQueryOptions = (id: string) =>
  queryOptions({
    queryKey: modelKeys.defaults(id),
    queryFn: ({ signal }) => getDefaultModel(id, signal),
    staleTime: Infinity,
    retry: false,
  });

/** The model for a settled configuration; the previous one stays in `data` while the next is built. */
export function useModel(
  id: string,
  request: { parameters: Record<string, ParameterValue>; units: LengthUnit } | null,
) {
  return useQuery({
    queryKey: modelKeys.configured(id, request?.units ?? "mm", request?.parameters ?? null),
    queryFn: ({ signal }) => getModel(id, request!, signal),
    enabled: request !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });
}
