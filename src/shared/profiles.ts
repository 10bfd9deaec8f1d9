import { z } from "zod";

/**
 * The vise and machine profiles contract ("my vises and machines"), shared by client and server: one
 * schema gives the type, the request validation and the table's inline-edit validation.
 * Every length is millimetres (the `Mm` in each key says so); the client converts for display only.
 */

export const profileNameMaxLength = 80;

/**
 * Upper bounds for a vise's sizes. They only catch typing slips (an extra zero, inches typed as mm):
 * machine vises for small and mid-size mills have jaws of roughly 50–200 mm (common practice), so these
 * leave room for big ones while refusing nonsense.
 */
export const viseLimitsMm = {
  jawWidthMm: 1000,
  jawHeightMm: 500,
  jawThicknessMm: 200,
  maxOpeningMm: 2000,
} as const;
export type ViseSizeKey = keyof typeof viseLimitsMm;

/** Human labels of the vise sizes, used in error messages, table headers and form labels. */
export const viseSizeLabels: Record<ViseSizeKey, string> = {
  jawWidthMm: "Jaw width",
  jawHeightMm: "Jaw height",
  jawThicknessMm: "Jaw thickness",
  maxOpeningMm: "Maximum opening",
};

/** How many vises, and how many machines, one account may keep (a guard against runaway scripts). */
export const maxProfilesPerUser = 100;

/** Spindle speeds above this are typing slips for the machines this product serves (high-speed spindles reach ~60 000 rpm). */
export const maxSpindleRpmLimit = 100_000;

export const unitPreferences = ["mm", "in"] as const;
export const unitPreferenceSchema = z.enum(unitPreferences, { error: "Choose mm or in." });
export type UnitPreference = z.infer<typeof unitPreferenceSchema>;

export const profileNameSchema = z
  .string({ error: "Name is required." })
  .trim()
  .min(1, { error: "Name is required." })
  .max(profileNameMaxLength, { error: `Name must be at most ${profileNameMaxLength} characters.` });

/** A positive, finite length in millimetres, at most `maxMm`. zod 4 numbers already refuse NaN and ±Infinity. */
export function lengthMmSchema(label: string, maxMm: number) {
  return z
    .number({ error: `${label} must be a number of millimetres.` })
    .positive({ error: `${label} must be more than 0 mm.` })
    .max(maxMm, { error: `${label} must be at most ${maxMm} mm.` });
}

const viseSizeShape = {
  jawWidthMm: lengthMmSchema(viseSizeLabels.jawWidthMm, viseLimitsMm.jawWidthMm),
  jawHeightMm: lengthMmSchema(viseSizeLabels.jawHeightMm, viseLimitsMm.jawHeightMm),
  jawThicknessMm: lengthMmSchema(viseSizeLabels.jawThicknessMm, viseLimitsMm.jawThicknessMm),
  maxOpeningMm: lengthMmSchema(viseSizeLabels.maxOpeningMm, viseLimitsMm.maxOpeningMm),
};

/**
 * An object schema that refuses unknown keys with a message naming them, so a misspelt field is reported
 * rather than silently dropped.
 */
export function strictFields<T extends z.ZodRawShape>(shape: T) {
  return z.strictObject(shape, {
    error: (issue) =>
      issue.code === "unrecognized_keys"
        ? `Unknown field${issue.keys.length > 1 ? "s" : ""}: ${issue.keys.join(", ")}.`
        : undefined,
  });
}

/** The editable fields of a vise. */
export const viseFieldsSchema = strictFields({ name: profileNameSchema, ...viseSizeShape });
export type ViseFields = z.infer<typeof viseFieldsSchema>;

const atLeastOneField = (v: Record<string, unknown>) => Object.values(v).some((x) => x !== undefined);
const atLeastOneFieldMessage = { error: "Send at least one field to change." };

/** `POST /api/vises` body. */
export const createViseBodySchema = viseFieldsSchema;
export type CreateViseBody = z.infer<typeof createViseBodySchema>;
/** `PATCH /api/vises/:id` body: any non-empty subset of the fields. */
export const updateViseBodySchema = viseFieldsSchema
  .partial()
  .refine(atLeastOneField, atLeastOneFieldMessage);
export type UpdateViseBody = z.infer<typeof updateViseBodySchema>;

/** A vise as the API shows it; times are ISO 8601 strings. Never the owner. */
export const viseSchema = z.object({
  id: z.number().int().positive(),
  name: z.string(),
  jawWidthMm: z.number(),
  jawHeightMm: z.number(),
  jawThicknessMm: z.number(),
  maxOpeningMm: z.number(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Vise = z.infer<typeof viseSchema>;
/** `GET /api/vises` → `{ vises }`, ordered by name. */
export const viseListResponseSchema = z.object({ vises: z.array(viseSchema) });
/** `POST` (201) and `PATCH` (200) → `{ vise }`. */
export const viseResponseSchema = z.object({ vise: viseSchema });

/** The editable fields of a machine. */
export const machineFieldsSchema = strictFields({
  name: profileNameSchema,
  maxSpindleRpm: z
    .number({ error: "Maximum spindle speed must be a number of revolutions per minute." })
    .int({ error: "Maximum spindle speed must be a whole number of rpm." })
    .positive({ error: "Maximum spindle speed must be more than 0 rpm." })
    .max(maxSpindleRpmLimit, { error: `Maximum spindle speed must be at most ${maxSpindleRpmLimit} rpm.` }),
  units: unitPreferenceSchema,
});
export type MachineFields = z.infer<typeof machineFieldsSchema>;

/** `POST /api/machines` body. */
export const createMachineBodySchema = machineFieldsSchema;
export type CreateMachineBody = z.infer<typeof createMachineBodySchema>;
/** `PATCH /api/machines/:id` body: any non-empty subset of the fields. */
export const updateMachineBodySchema = machineFieldsSchema
  .partial()
  .refine(atLeastOneField, atLeastOneFieldMessage);
export type UpdateMachineBody = z.infer<typeof updateMachineBodySchema>;

export const machineSchema = z.object({
  id: z.number().int().positive(),
  name: z.string(),
  maxSpindleRpm: z.number(),
  units: unitPreferenceSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Machine = z.infer<typeof machineSchema>;
/** `GET /api/machines` → `{ machines }`, ordered by name. */
export const machineListResponseSchema = z.object({ machines: z.array(machineSchema) });
/** `POST` (201) and `PATCH` (200) → `{ machine }`. */
export const machineResponseSchema = z.object({ machine: machineSchema });

/** Path parameter `:id` of a profile or design. */
export const recordIdParamsSchema = z.object({
  id: z.coerce
    .number({ error: "The id must be a number." })
    .int({ error: "The id must be a positive whole number." })
    .positive({ error: "The id must be a positive whole number." })
    .max(4_294_967_295, { error: "The id is too large." }),
});
