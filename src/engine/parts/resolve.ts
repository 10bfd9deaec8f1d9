/**
 * Template parts → {@link ResolvedPart}s: every expression evaluated, `when: false` parts and features
 * dropped, lengths converted to mm, material expressions turned into catalogue keys, thread data filled in
 * from the designation, the result checked against the resolved schema and then by the degenerate-geometry
 * guard. A part with a blocking issue is still returned (drawings of the problem can be useful) but is
 * marked, and the evaluation says it is not buildable.
 */
import type { Scope } from "../expressions";
import type { CompiledPart } from "../template/compile";
import { formatPath } from "../template/zod-issues";
import { resolvedVocabulary, type ResolvedPart } from "./features";
import { guardPart } from "./guard";
import type { GeometryIssue, LengthFormatter } from "./issues";
import { DROPPED, PartFieldError, resolveValue, scaleLengths } from "./template-values";
import { metricThread, TAP_RUN_OUT_PITCHES } from "./threads";

export interface ResolvePartsOptions {
  /** Millimetres per template length unit. */
  mmPerTemplateUnit: number;
  /** Known material keys; a part naming anything else gets an error issue. */
  materialKeys: readonly string[];
  fmt: LengthFormatter;
}

export interface ResolvedParts {
  parts: ResolvedPart[];
  issues: GeometryIssue[];
  /** Ids of parts that must not reach the solid kernel. */
  blocked: string[];
}

/** Fills pitch, modelled bore and default drill depth (internal) or minor diameter (external) of threads. */
function fillThreadData(feature: Record<string, unknown>, steps: Array<{ diameter: number }> | undefined): void {
  if (feature.kind === "pattern-linear" || feature.kind === "pattern-circular") {
    const inner = feature.feature as Record<string, unknown> | undefined;
    if (inner) fillThreadData(inner, steps);
    return;
  }
  if (feature.kind !== "thread" || typeof feature.designation !== "string") return;
  const t = metricThread(feature.designation);
  if (!t) return;
  feature.pitch ??= t.pitchMm;
  if (feature.form === "internal") {
    feature.boreDiameter ??= t.internalMinorDiameterMm;
    if (!feature.through && typeof feature.depth === "number") feature.drillDepth ??= feature.depth + TAP_RUN_OUT_PITCHES * t.pitchMm;
  } else if (feature.form === "external" && typeof feature.step === "number") {
    const step = steps?.[feature.step];
    if (step) feature.minorDiameter ??= step.diameter - (t.nominalDiameterMm - t.externalMinorDiameterMm);
  }
}

/** Full schema validation of a part received from outside the engine (e.g. a saved design or a worker). */
export function validateResolvedPart(value: unknown): { ok: true; part: ResolvedPart } | { ok: false; issues: string[] } {
  const parsed = resolvedVocabulary.part.safeParse(value);
  if (parsed.success) return { ok: true, part: parsed.data };
  return { ok: false, issues: parsed.error.issues.map((i) => `${formatPath(i.path)}: ${i.message}`) };
}

/** One part's shape worked out: the part (unless left out or impossible), its issues, whether it is refused. */
export interface PartOutcome {
  /** The part without its assembly placement; undefined when its `when` is false or it could not be worked out. */
  part?: ResolvedPart;
  issues: GeometryIssue[];
  /** True when the part must not reach the solid kernel. */
  blocked: boolean;
}

/** The outcome of a part whose expressions failed: refused, with the failing field and reason. */
export function unresolvedPart(cp: CompiledPart, err: unknown): PartOutcome {
  const reason = err instanceof PartFieldError ? `${err.path}: ${err.reason}` : err instanceof Error ? err.message : String(err);
  return { issues: [{ partId: cp.id, code: "unresolved", severity: "error", blocking: true, message: `Part "${cp.id}" could not be worked out for these values (${reason}).` }], blocked: true };
}

/** Resolves a part's shape (everything but its placement) and runs the degenerate-geometry guard on it. */
export function resolvePartShape(cp: CompiledPart, scope: Scope, options: ResolvePartsOptions): PartOutcome {
  let raw: unknown;
  try {
    raw = resolveValue(cp.node, scope);
  } catch (err) {
    return unresolvedPart(cp, err);
  }
  if (raw === DROPPED) return { issues: [], blocked: false };
  const scaled = scaleLengths(raw, options.mmPerTemplateUnit) as Record<string, unknown>;
  const features = Array.isArray(scaled.features) ? (scaled.features as Record<string, unknown>[]) : [];
  const base = features[0];
  const steps = base && base.kind === "turned" && Array.isArray(base.steps) ? (base.steps as Array<{ diameter: number }>) : undefined;
  for (const f of features) fillThreadData(f, steps);

  // Shape and finiteness are guaranteed by construction: the template passed its schema (literal numbers
  // are finite), and every expression result is type-checked as it resolves and refused unless finite.
  // `validateResolvedPart` does the full check for parts that come from anywhere else.
  const part = scaled as unknown as ResolvedPart;
  const issues: GeometryIssue[] = [];
  if (!options.materialKeys.includes(part.material)) {
    issues.push({ partId: part.id, code: "unknown-material", severity: "error", blocking: false, message: `${part.name}: "${part.material}" is not in the materials catalogue.` });
  }
  const guard = guardPart(part, options.fmt);
  issues.push(...guard);
  return { part, issues, blocked: guard.some((g) => g.blocking) };
}

/**
 * The part placed in the assembly: its placement and exploded offset resolved (in mm) and the keys in the
 * template's order. The shape's objects are shared, not copied.
 * @throws PartFieldError when a placement expression fails.
 */
export function placePart(cp: CompiledPart, shape: ResolvedPart, scope: Scope, mmPerTemplateUnit: number): ResolvedPart {
  if (cp.placement.length === 0) return shape;
  const at: Record<string, unknown> = {};
  for (const [key, node] of cp.placement) at[key] = scaleLengths(resolveValue(node, scope), mmPerTemplateUnit, key);
  const out: Record<string, unknown> = {};
  for (const key of cp.keyOrder) out[key] = key in at ? at[key] : (shape as unknown as Record<string, unknown>)[key];
  // Keys the resolution added (thread data lives in features; a part's own keys are all in keyOrder).
  for (const key of Object.keys(shape)) if (!(key in out)) out[key] = (shape as unknown as Record<string, unknown>)[key];
  return out as unknown as ResolvedPart;
}

export function resolveParts(compiled: readonly CompiledPart[], scope: Scope, options: ResolvePartsOptions): ResolvedParts {
  const parts: ResolvedPart[] = [];
  const issues: GeometryIssue[] = [];
  const blocked = new Set<string>();
  for (const cp of compiled) {
    let outcome = resolvePartShape(cp, scope, options);
    let part: ResolvedPart | undefined;
    if (outcome.part) {
      try {
        part = placePart(cp, outcome.part, scope, options.mmPerTemplateUnit);
      } catch (err) {
        outcome = unresolvedPart(cp, err);
      }
    }
    issues.push(...outcome.issues);
    if (outcome.blocked) blocked.add(cp.id);
    if (part) parts.push(part);
  }
  return { parts, issues, blocked: [...blocked] };
}
