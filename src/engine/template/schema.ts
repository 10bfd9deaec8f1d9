/**
 * The template format (format version 2): one zod schema for the whole YAML document. Types are inferred
 * from it; `compile.ts` adds the checks a schema cannot express (names defined before use, defaults inside
 * their limits, calculators that exist, materials in the catalogue, expressions on the whitelist).
 *
 * Units: `units` is the template's own length unit. Every length written in the template — parameter
 * defaults and limits, numbers in expressions, part sizes — is in it. Angles are degrees, forces newtons,
 * everywhere. Calculator inputs and outputs are always millimetres and newtons (their keys say so, e.g.
 * `throwMm`); an inch template converts with `toMm(x)` / `fromMm(x)` (identity in a mm template).
 */
import { z } from "zod";
import { expressionSchema, templateVocabulary } from "../parts/features";

export const CURRENT_FORMAT_VERSION = 2;

export const UNIT_SYSTEMS = ["mm", "in"] as const;
export const unitSystemSchema = z.enum(UNIT_SYSTEMS);
export type UnitSystem = z.infer<typeof unitSystemSchema>;

export const FAMILIES = ["stop", "clamp", "parallels", "soft-jaws", "block", "fixture", "gauge", "other"] as const;
export const PARAMETER_KINDS = ["length", "angle", "count", "force", "ratio", "material", "choice", "boolean"] as const;
export type ParameterKind = (typeof PARAMETER_KINDS)[number];

/** A name expressions can use: lower camel case, letters and digits. */
export const keySchema = z
  .string()
  .regex(/^[a-z][a-zA-Z0-9]*$/, "A key is lower camel case: a lower-case letter, then letters and digits (e.g. jawThickness).")
  .max(40);
/** An id of a check, analysis or part: lower camel or kebab case. */
export const idSchema = z.string().regex(/^[a-z][a-zA-Z0-9-]*$/, "An id is lower case letters, digits and hyphens, starting with a letter.").max(60);

const semverSchema = z
  .string()
  .regex(/^(0|[1-9]\d*)\.(0|[1-9]\d*)\.(0|[1-9]\d*)(?:-[0-9A-Za-z.-]+)?$/, "The version is a semantic version such as 1.0.0.");
const shortText = z.string().trim().min(1).max(120);
const helpText = z.string().trim().min(1).max(600);
const numberOrExpression = z.union([z.number().finite(), expressionSchema]);
const conditionSchema = z.union([z.boolean(), expressionSchema]);

const parameterBase = {
  key: keySchema,
  label: shortText,
  group: shortText.optional(),
  help: helpText.optional(),
};

const numericParameter = <K extends "length" | "angle" | "force" | "ratio">(kind: K) =>
  z.strictObject({
    ...parameterBase,
    kind: z.literal(kind),
    default: z.number().finite(),
    min: z.number().finite(),
    max: z.number().finite(),
    /** Entry step for the form (a UI hint; values between steps are accepted). */
    step: z.number().finite().positive().optional(),
  });

const countParameter = z.strictObject({
  ...parameterBase,
  kind: z.literal("count"),
  default: z.number().int(),
  min: z.number().int(),
  max: z.number().int(),
  step: z.number().int().positive().optional(),
});

const booleanParameter = z.strictObject({ ...parameterBase, kind: z.literal("boolean"), default: z.boolean() });

const choiceOption = z.union([
  z.string().min(1).max(60),
  z.strictObject({ value: z.string().min(1).max(60), label: shortText }),
]);
const choiceParameter = z.strictObject({
  ...parameterBase,
  kind: z.literal("choice"),
  default: z.string().min(1).max(60),
  choices: z.array(choiceOption).min(1).max(50),
});

const materialParameter = z.strictObject({
  ...parameterBase,
  kind: z.literal("material"),
  default: z.string().min(1).max(60),
  /** Catalogue keys the user may pick; omitted = the whole catalogue. */
  materials: z.array(z.string().min(1).max(60)).min(1).max(50).optional(),
});

export const parameterSchema = z.discriminatedUnion("kind", [
  numericParameter("length"),
  numericParameter("angle"),
  numericParameter("force"),
  numericParameter("ratio"),
  countParameter,
  booleanParameter,
  choiceParameter,
  materialParameter,
]);
export type ParameterSpec = z.infer<typeof parameterSchema>;

export const DERIVED_KINDS = ["length", "angle", "force", "ratio", "count", "number", "boolean", "text"] as const;
export type DerivedKind = (typeof DERIVED_KINDS)[number];
/** `key: expression`, or the long form with a kind (so a length is shown in the user's units) and a label. */
export const derivedEntrySchema = z.union([
  expressionSchema,
  z.strictObject({ expression: expressionSchema, kind: z.enum(DERIVED_KINDS).optional(), label: shortText.optional(), help: helpText.optional() }),
]);

export const FIT_PURPOSES = ["running", "sliding", "location", "press"] as const;
export const analysisSchema = z.strictObject({
  id: keySchema,
  /** A registered calculator kind, e.g. `eccentric-cam`. */
  calculator: z.string().regex(/^[a-z][a-z0-9-]*$/).max(60),
  label: shortText.optional(),
  summary: helpText.optional(),
  /**
   * Calculator input key → a number, true/false, or an expression (a string). Text inputs are written as
   * expression string literals: `section: "'round'"`, or taken from a parameter: `material: rodMaterial`.
   */
  inputs: z.record(z.string().regex(/^[a-z][a-zA-Z0-9]*$/).max(40), z.union([z.number().finite(), z.boolean(), expressionSchema])),
  when: conditionSchema.optional(),
  /** For `fit` analyses: what the fit is for; the engine checks the clearance suits it. */
  purpose: z.enum(FIT_PURPOSES).optional(),
  /** Parameters this analysis depends on (shown beside it). */
  parameters: z.array(keySchema).max(40).optional(),
});
export type AnalysisSpec = z.infer<typeof analysisSchema>;

export const SEVERITIES = ["error", "warning", "note"] as const;
export type Severity = (typeof SEVERITIES)[number];
export const checkSchema = z.strictObject({
  id: idSchema,
  severity: z.enum(SEVERITIES),
  /** True means the check passes. */
  condition: conditionSchema,
  /**
   * Plain shop language shown with the result. `{expr}` or `{expr:format}` placeholders show numbers:
   * formats `len`, `angle`, `force`, `num`, `pct`, `int`, `yesno`, `text`, each optionally `.N` decimals
   * (`{slotMin:len.1}`, `{margin:pct}`, `{cam.torqueNm:.2}`). `{{` and `}}` are literal braces.
   */
  message: z.string().trim().min(1).max(600),
  /** Shown instead of `message` when the check fails (same placeholders). */
  failMessage: z.string().trim().min(1).max(600).optional(),
  parameters: z.array(keySchema).max(40).default([]),
  when: conditionSchema.optional(),
});
export type CheckSpec = z.infer<typeof checkSchema>;

const pointExpr = z.strictObject({ x: numberOrExpression, y: numberOrExpression, z: numberOrExpression });
/** A ghosted box drawn in the 3D preview (the vise jaw the accessory sits on). */
export const fixtureBoxSchema = z.strictObject({
  id: idSchema,
  label: shortText,
  /** Minimum corner in assembly coordinates. */
  position: pointExpr,
  size: pointExpr,
  when: conditionSchema.optional(),
});
export const assemblySchema = z.strictObject({
  fixtures: z.array(fixtureBoxSchema).max(8).default([]),
  /** Assembly notes printed on the assembly sheet (placeholders as in drawing notes, template/notes.ts). */
  notes: z.array(z.string().max(300)).max(10).optional(),
});

export const SHEETS = ["auto", "A4", "A3", "letter", "tabloid"] as const;
export const drawingHintsSchema = z.strictObject({
  sheet: z.enum(SHEETS).default("auto"),
  /** ISO 2768-1 general tolerance class for the title block. */
  generalTolerance: z.enum(["f", "m", "c", "v"]).default("m"),
  /** Views for parts that do not list their own. */
  views: z.array(z.enum(["front", "top", "right", "left", "bottom", "rear"])).min(1).max(6).optional(),
  /**
   * Notes printed on every sheet. Placeholders as in check messages; `{expr:len}` is a length shown in the
   * drawing's units without a symbol (template/notes.ts).
   */
  notes: z.array(z.string().max(300)).max(20).optional(),
  /** Show the assembly sheet. */
  assemblySheet: z.boolean().default(true),
});

/** Settings of the engine's own geometry checks (lengths in the template's units). */
export const rulesSchema = z.strictObject({
  /** Thinnest wall left around a hole, slot, pocket or bore before a warning. */
  minWall: z.number().finite().positive().optional(),
  /** Shortest internal-thread length as a multiple of the nominal diameter before a warning. */
  minThreadEngagement: z.number().finite().positive().optional(),
});

export const templateSchema = z.strictObject({
  formatVersion: z.literal(CURRENT_FORMAT_VERSION),
  id: idSchema,
  version: semverSchema,
  name: shortText,
  family: z.enum(FAMILIES),
  summary: z.string().trim().min(1).max(1000),
  units: unitSystemSchema,
  parameters: z.array(parameterSchema).min(1).max(100),
  derived: z.record(keySchema, derivedEntrySchema).default({}),
  analyses: z.array(analysisSchema).max(40).default([]),
  checks: z.array(checkSchema).max(200).default([]),
  parts: z.array(templateVocabulary.part).min(1).max(40),
  assembly: assemblySchema.default({ fixtures: [] }),
  drawing: drawingHintsSchema.default({ sheet: "auto", generalTolerance: "m", assemblySheet: true }),
  rules: rulesSchema.default({}),
  /** Cautions shown with every evaluation of this template (the engine adds the general setup caution). */
  cautions: z.array(z.string().max(600)).max(10).optional(),
});

/** A template as written (before defaults are filled in). */
export type TemplateInput = z.input<typeof templateSchema>;
/** A validated template. */
export type Template = z.infer<typeof templateSchema>;
