/**
 * API contract of the download routes: `GET /api/templates/:id/export?format=…&units=…&projection=…&part=…&<param>=…`
 * and `POST /api/templates/:id/export` with {@link exportRequestSchema}. The answer is the file itself
 * (Content-Disposition: attachment) or the usual `{ error }` body.
 */
import { z } from "zod";
import { parameterValueSchema, unitsSchema } from "./templates";

export const EXPORT_FORMATS = ["pdf", "svg", "dxf", "step", "stl", "csv", "zip"] as const;
export const exportFormatSchema = z.enum(EXPORT_FORMATS, { error: `format must be one of ${EXPORT_FORMATS.join(", ")}.` });
export type ExportFormatName = z.infer<typeof exportFormatSchema>;

export const projectionSchema = z.enum(["first", "third"], { error: 'projection must be "first" or "third".' });

/** A part id, or "assembly" (the assembly sheet, STEP or STL). */
export const exportPartSchema = z.string().regex(/^[a-z][a-zA-Z0-9-]*$/, "part must be a part id.").max(60);

/** The options of an export, as query keys (GET) or body fields (POST). */
export const exportOptionsSchema = z.strictObject({
  format: exportFormatSchema,
  units: unitsSchema.optional(),
  projection: projectionSchema.optional(),
  part: exportPartSchema.optional(),
});

/** `POST /api/templates/:id/export` body. */
export const exportRequestSchema = exportOptionsSchema.extend({
  parameters: z.record(z.string(), parameterValueSchema).default({}),
});
export type ExportRequestBody = z.infer<typeof exportRequestSchema>;

/** Query keys that are export options, not template parameters. */
export const EXPORT_OPTION_KEYS = ["format", "units", "projection", "part"] as const;
