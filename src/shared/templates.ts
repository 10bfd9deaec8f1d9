/**
 * API contract of the template routes (request schemas; the answers are described beside each route in
 * server/modules/templates). Used by the server to validate and by the client to build requests.
 */
import { z } from "zod";

export const unitsSchema = z.enum(["mm", "in"], { error: 'units must be "mm" or "in".' });

/** A parameter value as sent: a number, text (choice or material key) or true/false. */
export const parameterValueSchema = z.union([z.number(), z.string(), z.boolean()], {
  error: "Each parameter value must be a number, text or true/false.",
});

/** `POST /api/templates/:id/evaluate` body. Parameters are in the given units; missing ones take defaults. */
export const evaluateRequestSchema = z.strictObject({
  parameters: z.record(z.string(), parameterValueSchema).default({}),
  units: unitsSchema.optional(),
});
export type EvaluateRequest = z.infer<typeof evaluateRequestSchema>;

/** `GET /api/templates/:id?units=in` shows lengths (defaults, limits, steps) in the chosen units. */
export const templateDetailQuerySchema = z.strictObject({ units: unitsSchema.optional() });

/** Template ids as the URL carries them. */
export const templateIdSchema = z.string().regex(/^[a-z][a-zA-Z0-9-]*$/).max(60);
