/**
 * `evaluateTemplate`: parameters in → derived values, analyses, checks and resolved parts out.
 *
 * Order: parameters (resolved in the user's units, defaults filled) → derived values in order → analyses in
 * order (each calls a registered calculator with its inputs bound to expressions) → the template's checks,
 * the fit-purpose checks, and the engine's geometry checks on the resolved parts → part summaries
 * (bounding box, stock, analytic volume and mass).
 *
 * Failures inside a template never throw for in-range parameters: a derived value or analysis that cannot
 * be computed becomes a failed error check naming the reason, and everything that needs it reports that it
 * could not be worked out. Only bad parameters throw (ParameterResolutionError), because the caller must
 * show the user which field to fix.
 *
 * Budget: < 2 ms median per evaluation for the built-in templates (compile once; see bench/evaluate.ts).
 */
import "./calculators";
import { getCalculator } from "./calculators/registry";
import { SETUP_CAUTION } from "./calculators/types";
import { fitPurposeChecks, generalPartIssues, issuesToChecks, runTemplateChecks, DEFAULT_MIN_WALL_MM, type CheckResult, type GeneralCheckOptions } from "./checks";
import { ExpressionEvaluationError, Unavailable, type Scope } from "./expressions";
import { freezeUnderTest } from "./freeze";
import { MATERIAL_KEYS, isMaterialKey, getMaterial } from "./materials";
import { resolveParameters, type ParameterValue } from "./parameters";
import { partBoundingBox, partMassKg, partStockEnvelope, partVolumeMm3, type StockEnvelope } from "./parts/analytic";
import type { Point3, ResolvedPart } from "./parts/features";
import type { GeometryIssue } from "./parts/issues";
import { placePart, resolvePartShape, unresolvedPart, type ResolvePartsOptions } from "./parts/resolve";
import { DROPPED, resolveValue, scaleLengths } from "./parts/template-values";
import { compileTemplate, rememberResult, scopeKey, type CompiledPart, type CompiledTemplate } from "./template/compile";
import { resolveNote, type NoteContext } from "./template/notes";
import type { Template, UnitSystem } from "./template/schema";
import { convertLength, formatLength } from "./units";

export interface EvaluateInput {
  /** Parameter values in the user's units; missing keys take their defaults. */
  parameters?: Readonly<Record<string, unknown>>;
  /** The user's unit system (defaults to the template's). */
  units?: UnitSystem;
}

/** A calculator's result, or why it could not run. */
export type AnalysisOutcome = Record<string, unknown> | { error: string };

export interface PartSummary {
  id: string;
  name: string;
  quantity: number;
  material: string;
  materialName?: string;
  /** False when the degenerate-geometry guard refused the part: it must not reach the solid kernel. */
  buildable: boolean;
  /** Finished size, mm (part-local x, y, z). */
  bboxMm: Point3;
  stock: StockEnvelope;
  /** Analytic finished volume of one piece (features assumed not to overlap). */
  volumeMm3: number;
  /** Mass of one piece from the catalogue density; null when the material is not in the catalogue. */
  massKg: number | null;
  heatTreatment?: string;
  finish?: string;
}

export interface FixtureBox {
  id: string;
  label: string;
  /** Minimum corner and size in assembly coordinates, mm. */
  positionMm: Point3;
  sizeMm: Point3;
}

export interface Evaluation {
  template: { id: string; version: string };
  units: UnitSystem;
  /** Parameter values in the user's units. */
  parameters: Record<string, ParameterValue>;
  /** Derived values; lengths in the user's units; null when the value could not be computed. */
  derived: Record<string, ParameterValue | null>;
  analyses: Record<string, AnalysisOutcome>;
  checks: CheckResult[];
  /** False when any error-severity check fails. */
  ok: boolean;
  /** Resolved parts in mm (what the solid kernel, drawings and cut list consume). */
  parts: ResolvedPart[];
  partSummaries: PartSummary[];
  /** Parameters with lengths in mm: the normalised form for cache keys and saved designs. */
  parametersMm: Record<string, ParameterValue>;
  /** False when any part was refused by the degenerate-geometry guard. */
  buildable: boolean;
  /** Ids of parts that must not be sent to the solid kernel. */
  blockedParts: string[];
  geometryIssues: GeometryIssue[];
  assembly: { fixtures: FixtureBox[] };
  /**
   * The template's sheet and assembly notes as note text (lengths marked in mm for the drawing to show in
   * its units, template/notes.ts); each part's own notes are in `parts[].drawing.notes` in the same form.
   */
  drawingNotes: { sheet: string[]; assembly: string[] };
  /** Shown with every result that feeds a setup. */
  cautions: string[];
}

const compiledCache = new WeakMap<Template, CompiledTemplate>();

function isCompiled(t: Template | CompiledTemplate): t is CompiledTemplate {
  return "derived" in t && Array.isArray((t as CompiledTemplate).derived) && "mmPerTemplateUnit" in t;
}

/** The compiled form of a template, compiled once per template object (against the calculator registry). */
export function compiledOf(template: Template | CompiledTemplate): CompiledTemplate {
  if (isCompiled(template)) return template;
  let compiled = compiledCache.get(template);
  if (!compiled) {
    compiled = compileTemplate(template, { getCalculator });
    compiledCache.set(template, compiled);
  }
  return compiled;
}

function reasonOf(err: unknown): string {
  if (err instanceof ExpressionEvaluationError) return err.reason;
  return err instanceof Error ? err.message : String(err);
}

/**
 * Calculator results are fresh object literals (plain data): expressions read them with own-property
 * lookups only, so they are used as they are, without a defensive copy (a copy cost more than the rest of
 * an evaluation).
 */
function plain(value: unknown): Record<string, unknown> {
  return value as Record<string, unknown>;
}

/**
 * Evaluates a template for one set of parameters.
 * @throws ParameterResolutionError when a parameter is unknown, of the wrong type, out of range or not in its list.
 */
export function evaluateTemplate(template: Template | CompiledTemplate, input: EvaluateInput = {}): Evaluation {
  const compiled = compiledOf(template);
  const t = compiled.template;
  const units = input.units ?? t.units;
  const resolved = resolveParameters(compiled.parameters, input.parameters, { templateUnits: t.units, userUnits: units });
  const renderCtx = { templateUnits: t.units, userUnits: units };
  const scope: Record<string, unknown> = Object.create(null) as Record<string, unknown>;
  Object.assign(scope, resolved.values);
  const failures: CheckResult[] = [];

  // Derived values.
  const derived: Record<string, ParameterValue | null> = {};
  for (const d of compiled.derived) {
    try {
      const v = d.expr.evaluate(scope);
      if (typeof v !== "number" && typeof v !== "boolean" && typeof v !== "string") throw new ExpressionEvaluationError(d.expr.source, "a derived value must be a number, true/false or text");
      scope[d.key] = v;
      derived[d.key] = d.kind === "length" && typeof v === "number" ? convertLength(v, t.units, units) : v;
    } catch (err) {
      const reason = reasonOf(err);
      scope[d.key] = new Unavailable(`derived value ${d.key} failed: ${reason}`);
      derived[d.key] = null;
      failures.push({ id: `derived.${d.key}`, severity: "error", passed: false, message: `${d.label ?? d.key} could not be worked out for these values: ${reason}.`, parameters: [] });
    }
  }

  // Analyses.
  const analyses: Record<string, AnalysisOutcome> = {};
  for (const a of compiled.analyses) {
    const label = a.spec.label ?? a.spec.id;
    try {
      if (a.when !== undefined) {
        const applies = typeof a.when === "boolean" ? a.when : a.when.evaluate(scope);
        if (applies !== true) {
          scope[a.spec.id] = new Unavailable(`the ${label} analysis does not apply with these settings`);
          continue;
        }
      }
      const args: Record<string, unknown> = {};
      for (const inp of a.inputs) args[inp.key] = "literal" in inp ? inp.literal : inp.expr.evaluate(scope);
      // The inputs in their declared order identify the result; a repeat skips parsing and computing.
      const key = JSON.stringify(args);
      let result = a.recent.get(key);
      if (!result) {
        const parsed = a.calculator.inputSchema.safeParse(args);
        if (!parsed.success) {
          const why = parsed.error.issues.map((i) => `${i.path.join(".") || "input"}: ${i.message}`).join("; ");
          throw new Error(why);
        }
        result = rememberResult(a, key, plain(a.calculator.compute(parsed.data)));
      }
      scope[a.spec.id] = result;
      analyses[a.spec.id] = result;
    } catch (err) {
      const reason = reasonOf(err);
      scope[a.spec.id] = new Unavailable(`the ${label} analysis failed: ${reason}`);
      analyses[a.spec.id] = { error: reason };
      failures.push({ id: `analysis.${a.spec.id}`, severity: "error", passed: false, message: `${label} could not be worked out for these values: ${reason}`, parameters: a.parameters });
    }
  }

  // Template checks and fit purposes.
  const checks: CheckResult[] = [...failures, ...runTemplateChecks(compiled.checks, scope, renderCtx), ...fitPurposeChecks(t.analyses, analyses, units)];

  // Parts: each part's shape, checks and summary are remembered by the values it reads (its placement is
  // worked out every time), so a change that only moves parts does not work them out again.
  const fmt = (mm: number) => formatLength(mm, "mm", units);
  const partCtx: PartContext = {
    resolve: { mmPerTemplateUnit: compiled.mmPerTemplateUnit, materialKeys: MATERIAL_KEYS, fmt },
    notes: { mmPerTemplateUnit: compiled.mmPerTemplateUnit, render: renderCtx },
    general: { minWallMm: t.rules.minWall !== undefined ? t.rules.minWall * compiled.mmPerTemplateUnit : DEFAULT_MIN_WALL_MM, fmt, ...(t.rules.minThreadEngagement !== undefined ? { minThreadEngagement: t.rules.minThreadEngagement } : {}) },
    ownNotes: compiled.notes.parts,
  };
  const parts: ResolvedPart[] = [];
  const partSummaries: PartSummary[] = [];
  const resolveIssues: GeometryIssue[] = [];
  const design: GeometryIssue[] = [];
  const blocked: string[] = [];
  for (const cp of compiled.parts) {
    const key = scopeKey(cp.reads, scope, units);
    const work = (cp.recent.get(key) as PartWork | undefined) ?? rememberResult<unknown>(cp, key, freezeUnderTest(workOutPart(cp, scope, partCtx))) as PartWork;
    let part: ResolvedPart | undefined;
    if (work.shape) {
      try {
        part = placePart(cp, work.shape, scope, compiled.mmPerTemplateUnit);
      } catch (err) {
        const failed = unresolvedPart(cp, err);
        resolveIssues.push(...failed.issues);
        blocked.push(cp.id);
        continue;
      }
    }
    resolveIssues.push(...work.issues);
    if (work.blocked) blocked.push(cp.id);
    if (!part) continue;
    parts.push(part);
    design.push(...work.design);
    if (work.walls) checks.push(work.walls);
    partSummaries.push(work.summary!);
  }
  const geometryIssues = [...resolveIssues, ...design];
  const paramsOfPart = (id: string) => compiled.parts.find((p) => p.id === id)?.parameters ?? [];
  checks.push(...issuesToChecks(geometryIssues, paramsOfPart));

  const fixtures: FixtureBox[] = [];
  for (const f of compiled.fixtures) {
    try {
      const v = resolveValue(f.node, scope);
      if (v === DROPPED) continue;
      const box = scaleLengths(v, compiled.mmPerTemplateUnit) as { position: Point3; size: Point3 };
      fixtures.push({ id: f.id, label: f.label, positionMm: box.position, sizeMm: box.size });
    } catch {
      // A ghost box that cannot be placed is simply not drawn.
    }
  }

  const ok = !checks.some((c) => c.severity === "error" && !c.passed);
  return {
    template: { id: t.id, version: t.version },
    units,
    parameters: resolved.display,
    derived,
    analyses,
    checks,
    ok,
    parts,
    partSummaries,
    parametersMm: resolved.valuesMm,
    buildable: blocked.length === 0,
    blockedParts: blocked,
    geometryIssues,
    assembly: { fixtures },
    drawingNotes: { sheet: compiled.notes.sheet.map((n) => resolveNote(n, scope, partCtx.notes)), assembly: compiled.notes.assembly.map((n) => resolveNote(n, scope, partCtx.notes)) },
    cautions: [SETUP_CAUTION, ...(t.cautions ?? [])],
  };
}

interface PartContext {
  resolve: ResolvePartsOptions;
  notes: NoteContext;
  general: GeneralCheckOptions;
  ownNotes: CompiledTemplate["notes"]["parts"];
}

/** What one part's shape gives, whatever its placement: remembered per part by the values it reads. */
interface PartWork {
  /** The part without its placement, drawing notes filled in; undefined when left out or impossible. */
  shape?: ResolvedPart;
  issues: GeometryIssue[];
  blocked: boolean;
  /** The engine's design checks (walls, edges, engagement) of a buildable part. */
  design: GeometryIssue[];
  /** "Every hole keeps its wall" when the part has cuts and none of them is too close. */
  walls?: CheckResult;
  summary?: PartSummary;
}

function workOutPart(cp: CompiledPart, scope: Scope, ctx: PartContext): PartWork {
  const outcome = resolvePartShape(cp, scope, ctx.resolve);
  const part = outcome.part;
  if (!part) return { issues: outcome.issues, blocked: outcome.blocked, design: [] };
  const own = ctx.ownNotes[part.id];
  if (own && own.length > 0) part.drawing = { ...part.drawing, notes: own.map((n) => resolveNote(n, scope, ctx.notes)) };
  const work: PartWork = { shape: part, issues: outcome.issues, blocked: outcome.blocked, design: [], summary: summarise(part, !outcome.blocked) };
  if (outcome.blocked) return work;
  work.design = generalPartIssues(part, ctx.general);
  const hasCuts = part.features.some((f) => f.kind === "hole" || f.kind === "slot" || f.kind === "pocket" || f.kind === "eccentric-bore" || f.kind === "pattern-linear" || f.kind === "pattern-circular" || (f.kind === "thread" && f.form === "internal"));
  if (work.design.length === 0 && hasCuts) {
    work.walls = {
      id: `engine.walls.${part.id}`,
      severity: "warning",
      passed: true,
      message: `${part.name}: every hole, slot and pocket keeps at least ${ctx.general.fmt(ctx.general.minWallMm)} of wall and nothing breaks out.`,
      parameters: cp.parameters,
    };
  }
  return work;
}

function summarise(part: ResolvedPart, buildable: boolean): PartSummary {
  let bbox = { size: { x: 0, y: 0, z: 0 } };
  let stock: StockEnvelope = { form: "flat", lengthMm: 0, allowanceMm: 0 };
  let volumeMm3 = NaN;
  try {
    bbox = partBoundingBox(part);
    stock = partStockEnvelope(part);
    volumeMm3 = partVolumeMm3(part);
  } catch {
    // Only a part refused by the guard (no usable base) gets here; its summary says it is not buildable.
  }
  const known = isMaterialKey(part.material);
  return {
    id: part.id,
    name: part.name,
    quantity: part.quantity ?? 1,
    material: part.material,
    ...(known ? { materialName: getMaterial(part.material).name } : {}),
    buildable,
    bboxMm: bbox.size,
    stock,
    volumeMm3,
    massKg: known && Number.isFinite(volumeMm3) ? partMassKg(part, volumeMm3) : null,
    ...(part.heatTreatment ? { heatTreatment: part.heatTreatment } : {}),
    ...(part.finish ? { finish: part.finish } : {}),
  };
}

/** The first seven keys, exactly as the CLI prints them. */
export function evaluationContract(e: Evaluation): Pick<Evaluation, "template" | "units" | "parameters" | "derived" | "analyses" | "checks" | "ok"> {
  return { template: e.template, units: e.units, parameters: e.parameters, derived: e.derived, analyses: e.analyses, checks: e.checks, ok: e.ok };
}
