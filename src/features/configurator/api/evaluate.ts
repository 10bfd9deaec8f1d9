import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { api } from "@/lib/api-client";
import { configuratorKeys } from "./keys";

const point = z.object({ x: z.number(), y: z.number(), z: z.number() });
const value = z.union([z.number(), z.string(), z.boolean()]);

export const checkResultSchema = z.object({
  id: z.string(),
  severity: z.enum(["error", "warning", "note"]),
  passed: z.boolean(),
  message: z.string(),
  parameters: z.array(z.string()).default([]),
});

export const partSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  quantity: z.number(),
  material: z.string(),
  materialName: z.string().optional(),
  buildable: z.boolean().default(true),
  bboxMm: point,
  stock: z.object({
    form: z.string(),
    diameterMm: z.number().optional(),
    lengthMm: z.number(),
    widthMm: z.number().optional(),
    thicknessMm: z.number().optional(),
    allowanceMm: z.number().default(0),
  }),
  volumeMm3: z.number().nullable(),
  massKg: z.number().nullable(),
  heatTreatment: z.string().optional(),
  finish: z.string().optional(),
});
export type PartSummaryView = z.infer<typeof partSummarySchema>;

/** `POST /api/templates/:id/evaluate` → the evaluation (src/engine/evaluate.ts `Evaluation`, the parts the page shows). */
export const evaluationSchema = z.object({
  template: z.object({ id: z.string(), version: z.string() }),
  units: z.enum(["mm", "in"]),
  parameters: z.record(z.string(), value),
  derived: z.record(z.string(), value.nullable()).default({}),
  analyses: z.record(z.string(), z.record(z.string(), z.unknown())).default({}),
  checks: z.array(checkResultSchema),
  ok: z.boolean(),
  partSummaries: z.array(partSummarySchema).default([]),
  cautions: z.array(z.string()).default([]),
});
export type EvaluationView = z.infer<typeof evaluationSchema>;

export async function evaluateTemplate(
  id: string,
  parameters: Record<string, ParameterValue>,
  units: LengthUnit,
  signal?: AbortSignal,
): Promise<EvaluationView> {
  return api.post(`/api/templates/${encodeURIComponent(id)}/evaluate`, {
    body: { parameters, units },
    schema: evaluationSchema,
    signal,
  });
}

export interface EvaluationRequest {
  parameters: Record<string, ParameterValue>;
  units: LengthUnit;
}

/**
 * The evaluation for a settled request (null: the form has a problem, nothing is sent). While the next one
 * is computed the last answer stays in `data` (`isPlaceholderData`), so no panel ever empties.
 */
export function useEvaluation(id: string, request: EvaluationRequest | null) {
  return useQuery({
    queryKey: configuratorKeys.evaluation(id, request?.units ?? "mm", request?.parameters ?? null),
    queryFn: ({ signal }) => evaluateTemplate(id, request!.parameters, request!.units, signal),
    enabled: request !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });
}
