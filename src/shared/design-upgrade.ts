import { z } from "zod";
import { designParametersSchema, designParameterValueSchema } from "./designs";
import { strictFields, unitPreferenceSchema } from "./profiles";

/**
 * `GET /api/designs/:id/upgrade?units=mm|in`: what changes for a saved design if it moves from the
 * template version it is pinned to onto the catalogue's current one. Nothing is changed by asking: the
 * design stays pinned until its owner saves it on the new version (`PATCH /api/designs/:id` with
 * `useCurrentTemplateVersion: true`, which the configurator does when opened with `saved-design=<id>`).
 *
 * Every value comes with its text in the person's units (`units`, default the design's own), ready to
 * show: "160 mm", "6.3 in", "30°", "Brass", "yes".
 */

/** `units` to show the values in; the design's own when left out. */
export const designUpgradeQuerySchema = strictFields({ units: unitPreferenceSchema.optional() });
export type DesignUpgradeQuery = z.infer<typeof designUpgradeQuerySchema>;

/** A value as stored (template units) and as shown (the person's units, with the unit). */
export const shownValueSchema = z.object({ value: designParameterValueSchema, text: z.string() });
export type ShownValue = z.infer<typeof shownValueSchema>;

const limitsSchema = z.object({ min: shownValueSchema, max: shownValueSchema });

const about = { key: z.string(), label: z.string() };

/**
 * One difference for one parameter. What the configurator is opened with (`carried`) follows from it:
 * - `added`: the new version asks for it; it starts at its default.
 * - `removed`: the new version no longer has it; the saved value is dropped.
 * - `out-of-range`: the saved value is outside the new limits; it is carried over unchanged, so the
 *   configurator marks the field and the person decides (a measured size is never changed silently).
 * - `not-offered`: the saved choice or material is not in the new list; the new default stands in, and
 *   the person should pick one.
 * - `wrong-type`: the parameter changed kind (a number became a choice…); the new default stands in.
 * - `default-changed`: the default moved; `affectsDesign` when the design held no value of its own.
 * - `limits-changed`: new limits, the saved value still inside them.
 * - `choices-changed`: options added or taken away, the saved one still offered.
 */
export const parameterChangeSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("added"), ...about, default: shownValueSchema }),
  z.object({ kind: z.literal("removed"), ...about, saved: shownValueSchema }),
  z.object({ kind: z.literal("out-of-range"), ...about, saved: shownValueSchema, limits: limitsSchema }),
  z.object({
    kind: z.literal("not-offered"),
    ...about,
    saved: shownValueSchema,
    offered: z.array(z.string()),
    replacement: shownValueSchema,
  }),
  z.object({
    kind: z.literal("wrong-type"),
    ...about,
    saved: shownValueSchema,
    replacement: shownValueSchema,
  }),
  z.object({
    kind: z.literal("default-changed"),
    ...about,
    from: shownValueSchema,
    to: shownValueSchema,
    affectsDesign: z.boolean(),
  }),
  z.object({ kind: z.literal("limits-changed"), ...about, from: limitsSchema, to: limitsSchema }),
  z.object({
    kind: z.literal("choices-changed"),
    ...about,
    added: z.array(z.string()),
    removed: z.array(z.string()),
  }),
]);
export type ParameterChange = z.infer<typeof parameterChangeSchema>;
export type ParameterChangeKind = ParameterChange["kind"];

/** A check's outcome on one version; null when that version does not make it (or was not evaluated). */
const checkOutcomeSchema = z.object({ passed: z.boolean(), message: z.string() }).nullable();

/** A check whose outcome differs between the versions, or that fails on the new one. */
export const checkChangeSchema = z.object({
  id: z.string(),
  severity: z.enum(["error", "warning", "note"]),
  before: checkOutcomeSchema,
  after: checkOutcomeSchema,
});
export type CheckChange = z.infer<typeof checkChangeSchema>;

export const designUpgradeSchema = z.object({
  designId: z.number().int().positive(),
  templateId: z.string(),
  templateName: z.string(),
  /** The pinned version, and whether this server still holds it (so its limits and checks can be compared). */
  from: z.object({ version: z.string(), available: z.boolean() }),
  /** The catalogue's current version when it is newer than the pinned one; otherwise null (nothing to do). */
  to: z.object({ version: z.string() }).nullable(),
  units: unitPreferenceSchema,
  parameters: z.array(parameterChangeSchema),
  checks: z.object({
    /** True when both versions were evaluated with the design's values, so before/after are both known. */
    compared: z.boolean(),
    /** True when the new version could be evaluated (no value outside its limits). */
    evaluatedOnNew: z.boolean(),
    /** Why a comparison is missing, in words for the person; null when both sides were evaluated. */
    note: z.string().nullable(),
    changes: z.array(checkChangeSchema),
    /** Error checks failing on the new version (when evaluated); 0 means it passes its error checks. */
    failingErrorsOnNew: z.number().int().nonnegative(),
  }),
  /**
   * The values to open the configurator with on the new version, in its own units: saved values kept
   * where they fit the new parameter's type, out-of-range ones kept (flagged), not-offered choices and
   * changed kinds replaced by the default, removed ones dropped, added ones left to their default.
   */
  carried: designParametersSchema,
});
export type DesignUpgrade = z.infer<typeof designUpgradeSchema>;

/** `GET /api/designs/:id/upgrade` → `{ upgrade }`. */
export const designUpgradeResponseSchema = z.object({ upgrade: designUpgradeSchema });
