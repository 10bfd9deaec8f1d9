/** API contract of the calculator routes. */
import { z } from "zod";

/** `POST /api/calculators/:kind` body: the calculator's own input (validated by its schema on the server). */
export const calculatorRequestSchema = z.record(z.string(), z.unknown(), { error: "Send the calculator's inputs as a JSON object." });

export const calculatorKindSchema = z.string().regex(/^[a-z][a-z0-9-]*$/).max(60);
