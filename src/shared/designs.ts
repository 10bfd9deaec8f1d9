import { z } from "zod";
import { profileNameSchema, strictFields, unitPreferenceSchema } from "./profiles";

/**
 * The saved designs and share links contract, shared by client and server.
 *
 * A design is a template configuration someone kept: the template id, the template version it was
 * saved against (pinned, so re-opening it gives the same part even after the template changes), the
 * parameter values, and the unit system the user was working in.
 *
 * `parameters` hold values in the template's own units (what the evaluate API takes); `units` is the
 * user's display choice for the configurator and the drawings, not the unit of the stored values.
 */

export const designNotesMaxLength = 2000;
export const maxDesignParameters = 200;
export const designParameterTextMaxLength = 200;
/** How many designs one account may keep (deleted ones awaiting purge not counted). */
export const maxDesignsPerUser = 500;
/** How long a deleted design can be brought back (`POST /api/designs/:id/restore`) before it is purged. */
export const designUndoWindowHours = 24;

/** Same rule as a template's id (src/engine/template/schema.ts `idSchema`): lower case, digits, hyphens. */
export const templateIdSchema = z
  .string({ error: "Template id is required." })
  .trim()
  .min(1, { error: "Template id is required." })
  .max(60, { error: "Template id must be at most 60 characters." })
  .regex(/^[a-z][a-zA-Z0-9-]*$/, {
    error: "Template id is lower-case letters, digits and hyphens, starting with a letter.",
  });

/** Same rule as a template's parameter key: lower camel case, letters and digits, at most 40. */
export const parameterKeySchema = z
  .string()
  .max(40)
  .regex(/^[a-z][a-zA-Z0-9]*$/);

/** One parameter value: a finite number, a short text (a choice or a material key) or true/false. */
export const designParameterValueSchema = z.union(
  [z.number(), z.string().max(designParameterTextMaxLength), z.boolean()],
  {
    error: `A parameter value must be a finite number, true/false, or a text of at most ${designParameterTextMaxLength} characters.`,
  },
);
export type DesignParameterValue = z.infer<typeof designParameterValueSchema>;

const badParameterName = "A parameter name is lower camel case (e.g. jawWidth), at most 40 characters.";

/** Parameter name → value; a bad name is reported at its own path, a bad value likewise. */
export const designParametersSchema = z
  .record(parameterKeySchema, designParameterValueSchema, {
    error: (issue) =>
      issue.code === "invalid_key"
        ? badParameterName
        : issue.code === "invalid_type"
          ? "Parameters must be an object of name → value."
          : undefined,
  })
  .refine((p) => Object.keys(p).length <= maxDesignParameters, {
    error: `A design holds at most ${maxDesignParameters} parameters.`,
  });
export type DesignParameters = z.infer<typeof designParametersSchema>;

export const designNotesSchema = z
  .string({ error: "Notes must be text." })
  .max(designNotesMaxLength, { error: `Notes must be at most ${designNotesMaxLength} characters.` });

/** `POST /api/designs` body: saves a configuration, pinned to the template's current version. */
export const createDesignBodySchema = strictFields({
  templateId: templateIdSchema,
  parameters: designParametersSchema,
  units: unitPreferenceSchema,
  name: profileNameSchema,
  notes: designNotesSchema.default(""),
});
export type CreateDesignBody = z.input<typeof createDesignBodySchema>;

/**
 * `PATCH /api/designs/:id` body: rename, change notes, parameters or units. The template stays pinned at
 * the saved version unless `useCurrentTemplateVersion: true` moves the pin to the catalogue's current one
 * (what "open on the newer version" does when the user saves).
 */
export const updateDesignBodySchema = strictFields({
  name: profileNameSchema.optional(),
  notes: designNotesSchema.optional(),
  parameters: designParametersSchema.optional(),
  units: unitPreferenceSchema.optional(),
  useCurrentTemplateVersion: z
    .literal(true, { error: "useCurrentTemplateVersion can only be true." })
    .optional(),
}).refine((v) => Object.values(v).some((x) => x !== undefined), {
  error: "Send at least one field to change.",
});
export type UpdateDesignBody = z.infer<typeof updateDesignBodySchema>;

/** `POST /api/designs/:id/duplicate` body (optional): the copy's name; default "Copy of <name>". */
export const duplicateDesignBodySchema = strictFields({ name: profileNameSchema.optional() });
export type DuplicateDesignBody = z.infer<typeof duplicateDesignBodySchema>;

/** An active share link of a design, as its owner sees it. */
export const shareLinkSchema = z.object({
  token: z.string(),
  /** Absolute address of the read-only page, `<origin>/shared/<token>`. */
  url: z.string(),
  createdAt: z.string(),
});
export type ShareLink = z.infer<typeof shareLinkSchema>;

/** What the catalogue says about a design's template, compared with the pinned version. */
const templateStatusShape = {
  templateVersion: z.string(),
  /** The template's name in the catalogue, or null if the catalogue no longer lists it. */
  templateName: z.string().nullable(),
  /** The catalogue's current version when it is newer than the pinned one; otherwise null. */
  newerVersion: z.string().nullable(),
};

/** A design as its owner sees it. Times are ISO 8601 strings. */
export const designSchema = z.object({
  id: z.number().int().positive(),
  name: z.string(),
  notes: z.string(),
  templateId: z.string(),
  ...templateStatusShape,
  parameters: z.record(z.string(), designParameterValueSchema),
  units: unitPreferenceSchema,
  share: shareLinkSchema.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Design = z.infer<typeof designSchema>;

/** `GET /api/designs` → `{ designs }`, most recently changed first. */
export const designListResponseSchema = z.object({ designs: z.array(designSchema) });
/** `POST` (201), `GET/PATCH /:id`, `/duplicate` (201), `/restore` → `{ design }`. */
export const designResponseSchema = z.object({ design: designSchema });

/**
 * `DELETE /api/designs/:id` → 200 `{ deleted: { id, restoreUntil } }`: the design is hidden at once (its
 * share link stops working) and can be restored until `restoreUntil`, then it is purged.
 */
export const deleteDesignResponseSchema = z.object({
  deleted: z.object({ id: z.number().int().positive(), restoreUntil: z.string() }),
});
export type DeleteDesignResponse = z.infer<typeof deleteDesignResponseSchema>;

/** `POST /api/designs/:id/share` → `{ token, url, createdAt }` (201 new, 200 when a link was already active). */
export const shareResponseSchema = shareLinkSchema;
export type ShareResponse = ShareLink;

/** Path parameter of the public page. Tokens are 32 base64url characters (24 random bytes). */
export const shareTokenParamsSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, { error: "That is not a share link token." }),
});

/**
 * `GET /api/shared/:token` (public, read-only) → `{ design }`: what the owner chose to share and nothing
 * about the owner (no e-mail, no account id, no name, no design id).
 */
export const sharedDesignSchema = z.object({
  name: z.string(),
  notes: z.string(),
  templateId: z.string(),
  ...templateStatusShape,
  parameters: z.record(z.string(), designParameterValueSchema),
  units: unitPreferenceSchema,
  updatedAt: z.string(),
  sharedAt: z.string(),
});
export type SharedDesign = z.infer<typeof sharedDesignSchema>;
export const sharedDesignResponseSchema = z.object({ design: sharedDesignSchema });

/**
 * The download formats of a saved design, the same as a template's (server/exporters/build-export.ts
 * `EXPORT_FORMATS`; a unit test keeps the two lists equal).
 */
export const designExportFormats = ["pdf", "svg", "dxf", "step", "stl", "csv", "zip"] as const;

/**
 * `GET /api/designs/:id/export?format=…&units=…&projection=…&part=…&machine=…` → the file
 * (Content-Disposition: attachment). `units` defaults to the design's, `projection` to first angle for mm
 * and third angle for inches, `machine` (one of your machine profiles) puts its top spindle speed on the
 * operation sheet.
 */
export const designExportQuerySchema = strictFields({
  format: z.enum(designExportFormats, { error: `format must be one of ${designExportFormats.join(", ")}.` }),
  units: unitPreferenceSchema.optional(),
  projection: z.enum(["first", "third"], { error: 'projection must be "first" or "third".' }).optional(),
  part: z
    .string()
    .max(60, { error: "part is a part id of at most 60 characters." })
    .regex(/^[a-z][a-zA-Z0-9-]*$/, { error: "part must be a part id (or assembly)." })
    .optional(),
  machine: z.coerce
    .number({ error: "machine must be the id of one of your machines." })
    .int({ error: "machine must be the id of one of your machines." })
    .positive({ error: "machine must be the id of one of your machines." })
    .max(4_294_967_295, { error: "machine must be the id of one of your machines." })
    .optional(),
});
export type DesignExportQuery = z.infer<typeof designExportQuerySchema>;
