import { resolvedVocabulary, type PatternableFeature, type ResolvedFeature, type ResolvedPart } from "@/engine/parts/features";
import { describeFeature, formatParameters, KernelError } from "./errors";
import type { BaseInfo } from "./builders/types";
import { metricThread } from "@/engine/parts/threads";
import { chamferFits } from "./builders/chamfer";
import { baseGeometry } from "@/engine/parts/frame";
import { directionAxis, type Vec3 } from "./frame";

/**
 * Checks a resolved part before any kernel call. A zero, negative or non-finite size gives a degenerate
 * solid on which the next boolean or volume call can spin for ever inside the WASM thread (GEOMETRY.md
 * pitfall 4), so such parts are refused here with a message naming the part, the feature and its values.
 * Wrong-but-buildable parts (a recess deeper than the block) are the template's own checks' business.
 */

/** Smallest size the kernel is asked to build (mm). */
export const MIN_SIZE_MM = 0.01;
/** Most copies a pattern may make. */
export const MAX_PATTERN_COUNT = 500;

export function baseInfoOf(part: ResolvedPart): BaseInfo {
  const base = part.features[0];
  if (base?.kind !== "block" && base?.kind !== "turned") {
    throw new KernelError("kernel_input", `Part "${part.id}" must start with a block or turned base.`, { partId: part.id, partName: part.name });
  }
  const geometry = baseGeometry(part);
  const min: Vec3 = [geometry.min.x, geometry.min.y, geometry.min.z];
  const max: Vec3 = [geometry.max.x, geometry.max.y, geometry.max.z];
  if (base.kind === "block") return { kind: "block", size: base.size, min, max, geometry };
  return { kind: "turned", steps: base.steps, lengthMm: max[2], min, max, geometry };
}

type Problem = string | null;

const positive = (name: string, v: number | undefined): Problem =>
  v === undefined ? `${name} is missing` : !(v >= MIN_SIZE_MM) ? `${name} must be at least ${MIN_SIZE_MM} mm (got ${v})` : null;
const nonNegative = (name: string, v: number | undefined): Problem => (v !== undefined && !(v >= 0) ? `${name} may not be negative (got ${v})` : null);

function depthProblem(f: { depth?: number; through?: boolean }): Problem {
  if (f.through) return null;
  return f.depth === undefined ? "give a depth or make it through" : positive("depth", f.depth);
}

function holeLike(f: { diameter: number; chamfer?: number; counterbore?: { diameter: number; depth: number }; countersink?: { diameter: number; angleDeg?: number }; depth?: number; through?: boolean }): Problem[] {
  const out: Problem[] = [positive("diameter", f.diameter), nonNegative("chamfer", f.chamfer), depthProblem(f)];
  if (f.counterbore) {
    out.push(positive("counterbore depth", f.counterbore.depth));
    if (!(f.counterbore.diameter > f.diameter + MIN_SIZE_MM)) out.push(`counterbore diameter ${f.counterbore.diameter} must exceed the hole diameter ${f.diameter}`);
    if (!f.through && f.depth !== undefined && !(f.depth > f.counterbore.depth + MIN_SIZE_MM)) out.push(`depth ${f.depth} must exceed the counterbore depth ${f.counterbore.depth}`);
  }
  if (f.countersink) {
    if (f.counterbore) out.push("a hole takes a counterbore or a countersink, not both");
    if (f.chamfer) out.push("a countersunk hole takes no separate chamfer");
    if (!(f.countersink.diameter > f.diameter + MIN_SIZE_MM)) out.push(`countersink diameter ${f.countersink.diameter} must exceed the hole diameter ${f.diameter}`);
    const a = f.countersink.angleDeg ?? 90;
    if (!(a >= 30 && a <= 150)) out.push(`countersink angle must be between 30° and 150° (got ${a}°)`);
    else if (!f.through && f.depth !== undefined) {
      const csDepth = (f.countersink.diameter - f.diameter) / 2 / Math.tan(((a / 2) * Math.PI) / 180);
      if (!(f.depth > csDepth + MIN_SIZE_MM)) out.push(`depth ${f.depth} must exceed the countersink depth ${csDepth.toFixed(3)}`);
    }
  }
  if (f.chamfer && !f.through && f.depth !== undefined && !(f.depth > f.chamfer + MIN_SIZE_MM)) out.push(`depth ${f.depth} must exceed the chamfer ${f.chamfer}`);
  return out;
}

function patternableProblems(f: PatternableFeature, base: BaseInfo): Problem[] {
  if (base.kind === "turned" && (f.kind === "slot" || f.kind === "pocket")) return [`a ${f.kind} is for blocks, not turned parts (features.ts)`];
  const radial = base.kind === "turned" && directionAxis(f.direction) !== "z";
  switch (f.kind) {
    case "hole":
      if (radial && (f.counterbore || f.countersink || f.chamfer)) return ["a cross hole in a turned part takes no counterbore, countersink or chamfer", ...holeLike(f)];
      return holeLike(f);
    case "thread": {
      const t = metricThread(f.designation);
      if (!t) return [`"${f.designation}" is not an ISO metric thread designation (M6 or M6x0.75)`];
      const out: Problem[] = [depthProblem(f), nonNegative("chamfer", f.chamfer)];
      if (f.drillDepth !== undefined && f.depth !== undefined && !(f.drillDepth >= f.depth)) out.push(`drill depth ${f.drillDepth} is less than the thread depth ${f.depth}`);
      return out;
    }
    case "slot": {
      const out: Problem[] = [positive("width", f.width), nonNegative("length", f.length), depthProblem(f)];
      if (directionAxis(f.direction) === f.along) out.push(`the slot runs along ${f.along}, the same axis it is cut along`);
      return out;
    }
    case "pocket": {
      const out: Problem[] = [positive("depth", f.depth)];
      if (f.shape.kind === "round") out.push(positive("diameter", f.shape.diameter));
      else {
        out.push(positive("u", f.shape.u), positive("v", f.shape.v), nonNegative("corner radius", f.shape.cornerRadius));
        const rc = f.shape.cornerRadius ?? 0;
        if (rc > Math.min(f.shape.u, f.shape.v) / 2 + 1e-9) out.push(`corner radius ${rc} is more than half the pocket's smaller side`);
      }
      return out;
    }
  }
}

function featureProblems(f: ResolvedFeature, index: number, base: BaseInfo): Problem[] {
  if (index === 0) {
    if (f.kind === "block") return [positive("size.x", f.size.x), positive("size.y", f.size.y), positive("size.z", f.size.z)];
    if (f.kind === "turned") return f.steps.flatMap((s, i) => [positive(`step ${i} diameter`, s.diameter), positive(`step ${i} length`, s.length)]);
    return ["the first feature must be a block or turned base"];
  }
  if (base.kind === "turned" && (f.kind === "slot" || f.kind === "pocket" || f.kind === "step" || f.kind === "v-groove")) {
    return [`a ${f.kind} is for blocks, not turned parts (features.ts)`];
  }
  switch (f.kind) {
    case "block":
    case "turned":
      return ["only the first feature may be a base"];
    case "hole":
    case "slot":
    case "pocket":
      return patternableProblems(f, base);
    case "thread": {
      if (f.form === "internal") return patternableProblems(f, base);
      const t = metricThread(f.designation);
      if (!t) return [`"${f.designation}" is not an ISO metric thread designation (M6 or M6x0.75)`];
      if (base.kind !== "turned") return ["an external thread needs a turned base"];
      const step = base.steps[f.step];
      if (!step) return [`step ${f.step} does not exist (the part has ${base.steps.length})`];
      const out: Problem[] = [positive("length", f.length)];
      if (f.length > step.length + 1e-9) out.push(`thread length ${f.length} is longer than step ${f.step} (${step.length})`);
      if (Math.abs(step.diameter - t.nominalDiameterMm) > t.pitchMm) out.push(`step ${f.step} is Ø${step.diameter}, too far from the thread's Ø${t.nominalDiameterMm}`);
      return out;
    }
    case "step": {
      const d = [f.to.x - f.from.x, f.to.y - f.from.y, f.to.z - f.from.z];
      const out: Problem[] = d.map((v, i) => (Math.abs(v) >= MIN_SIZE_MM ? null : `the step is flat along ${"xyz"[i]} (from ${[f.from.x, f.from.y, f.from.z][i]} to ${[f.to.x, f.to.y, f.to.z][i]})`));
      const lo = [Math.min(f.from.x, f.to.x), Math.min(f.from.y, f.to.y), Math.min(f.from.z, f.to.z)];
      const hi = [Math.max(f.from.x, f.to.x), Math.max(f.from.y, f.to.y), Math.max(f.from.z, f.to.z)];
      const reaches = [0, 1, 2].some((i) => lo[i]! <= base.min[i]! + 1e-9 || hi[i]! >= base.max[i]! - 1e-9);
      if (!reaches) out.push("the step box must reach at least one outside face of the base");
      return out;
    }
    case "v-groove": {
      const out: Problem[] = [positive("depth", f.depth)];
      if (!(f.angleDeg >= 10 && f.angleDeg <= 170)) out.push(`angle must be between 10° and 170° (got ${f.angleDeg}°)`);
      if (directionAxis(f.direction) === f.along) out.push(`the groove runs along ${f.along}, the same axis it is cut along`);
      return out;
    }
    case "chamfer": {
      const size = positive("size", f.size);
      return [size ?? chamferFits(f, base)];
    }
    case "eccentric-bore": {
      if (base.kind !== "turned") return ["an eccentric bore needs a turned base"];
      return [nonNegative("eccentricity", f.eccentricity), ...holeLike(f)];
    }
    case "pattern-linear":
    case "pattern-circular": {
      const out: Problem[] = [];
      if (!Number.isInteger(f.count) || f.count < 1 || f.count > MAX_PATTERN_COUNT) out.push(`count must be a whole number from 1 to ${MAX_PATTERN_COUNT} (got ${f.count})`);
      if (f.kind === "pattern-linear" && f.count > 1 && Math.hypot(f.spacing.x, f.spacing.y, f.spacing.z) < MIN_SIZE_MM) out.push("spacing is zero");
      if (f.kind === "pattern-circular" && f.angleDeg !== undefined && f.count > 1 && !(Math.abs(f.angleDeg) >= 0.01)) out.push("angle between copies is zero");
      out.push(...patternableProblems(f.feature, base).map((p) => (p ? `copied ${f.feature.kind}: ${p}` : null)));
      return out;
    }
  }
}

/**
 * Throws a `kernel_input` KernelError naming the part and the first feature with a problem.
 * `schema: false` skips the structural (zod) check, for parts fresh from the engine's evaluator on the web
 * thread; the worker always runs the full check before its first kernel call.
 */
export function validatePartForKernel(part: ResolvedPart, { schema = true }: { schema?: boolean } = {}): BaseInfo {
  const parsed = schema ? resolvedVocabulary.part.safeParse(part) : ({ success: true } as const);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new KernelError("kernel_input", `Part "${part?.id ?? "?"}": ${issue.path.join(".") || "part"}: ${issue.message}`, { partId: part?.id, partName: part?.name });
  }
  const base = baseInfoOf(part);
  part.features.forEach((f, index) => {
    const problems = featureProblems(f, index, base).filter((p): p is string => p !== null);
    if (problems.length > 0) {
      throw new KernelError(
        "kernel_input",
        `Part "${part.id}" (${part.name}), ${describeFeature(index, f.kind, f.id)}: ${problems.join("; ")} [${formatParameters(f as Record<string, unknown>)}].`,
        { partId: part.id, partName: part.name, featureIndex: index, featureKind: f.kind, featureId: f.id, parameters: f as Record<string, unknown> },
      );
    }
  });
  const ext = [0, 1, 2].map((i) => base.max[i]! - base.min[i]!);
  if (!ext.every((e) => Number.isFinite(e) && e >= MIN_SIZE_MM)) {
    throw new KernelError("kernel_input", `Part "${part.id}" (${part.name}) has a degenerate extent ${ext.join(" × ")} mm.`, { partId: part.id, partName: part.name });
  }
  return base;
}
