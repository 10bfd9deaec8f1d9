/**
 * The annotator registry: one entry per feature kind, each turning a resolved feature into the dimensions
 * and callouts a machinist needs to make it (its size and its location from the part's datums), and
 * `annotatePart`, which runs them over a part in feature order.
 */
import type {
  Axis,
  CircularPatternFeature,
  ExternalThreadFeature,
  LinearPatternFeature,
  PatternableFeature,
  Point3,
  ResolvedFeature,
  ResolvedPart,
  TurnedFeature,
} from "../../parts/features";
import { formatAngle } from "../format";
import { annotateBlock, annotateExternalThread, annotateTurned, stepRanges } from "./base";
import { annotateChamfer, annotatePocket, annotateSlot, annotateStep, annotateVGroove } from "./cuts";
import { AXES3, entryViews, locationFromDatum, otherAxes, pointRegion, sizeBetween } from "./helpers";
import { annotateEccentricBore, annotateHole, annotateInternalThread, type AnnotateExtra } from "./holes";
import type { AnnotateContext, AnnotationRequest, CalloutRequest, ThreadMarkRequest } from "./types";

const TOL = 1e-6;

function annotatePatternable(f: PatternableFeature, ctx: AnnotateContext, extra: AnnotateExtra): AnnotationRequest[] {
  switch (f.kind) {
    case "hole":
      return annotateHole(f, ctx, extra);
    case "thread":
      return annotateInternalThread(f, ctx, extra);
    case "slot":
      return annotateSlot(f, ctx, extra);
    case "pocket":
      return annotatePocket(f, ctx, extra);
  }
}

/** Radius used to keep extension lines clear of a patterned feature's outline. */
function clearance(f: PatternableFeature, ctx: AnnotateContext): number {
  if (f.kind === "hole") return f.diameter / 2;
  if (f.kind === "thread") return ctx.threads(f.designation).nominalMm / 2;
  if (f.kind === "slot") return f.width / 2;
  return f.shape.kind === "round" ? f.shape.diameter / 2 : 0;
}

function moveFeature<F extends PatternableFeature>(f: F, at: Point3): F {
  return { ...f, at };
}

function copyThreadMarks(requests: AnnotationRequest[], positions: Point3[], first: Point3): ThreadMarkRequest[] {
  const marks = requests.filter((r): r is ThreadMarkRequest => r.kind === "thread-mark");
  return positions.slice(1).flatMap((p) =>
    marks.map((m) => ({ ...m, start: { x: m.start.x + p.x - first.x, y: m.start.y + p.y - first.y, z: m.start.z + p.z - first.z } })),
  );
}

function annotateLinearPattern(f: LinearPatternFeature, ctx: AnnotateContext, name: string): AnnotationRequest[] {
  const n = Math.max(1, Math.round(f.count));
  const first = f.feature.at;
  const positions = Array.from({ length: n }, (_, k) => ({ x: first.x + k * f.spacing.x, y: first.y + k * f.spacing.y, z: first.z + k * f.spacing.z }));
  const inner = annotatePatternable(f.feature, ctx, { name, count: n });
  const out: AnnotationRequest[] = [...inner, ...copyThreadMarks(inner, positions, first)];
  if (n > 1) {
    const last = positions[n - 1]!;
    const r = clearance(f.feature, ctx);
    const prefer = entryViews(f.feature.direction);
    for (const axis of AXES3) {
      const step = f.spacing[axis];
      if (Math.abs(step) < TOL) continue;
      const total = Math.abs(step) * (n - 1);
      const text = n > 2 ? `${n - 1} × ${ctx.fmt.length(Math.abs(step))} (= ${ctx.fmt.length(total)})` : ctx.fmt.length(total);
      const [a, b] = step > 0 ? [first, last] : [last, first];
      out.push(sizeBetween(name, axis, a[axis], b[axis], pointRegion(a, r), pointRegion(b, r), text, prefer));
    }
  }
  return out;
}

/** Rotates p about the line through c along axis by angleDeg (right-handed). */
function rotateAbout(p: Point3, c: Point3, axis: Axis, angleDeg: number): Point3 {
  const [u, v] = otherAxes(axis);
  // For x: (y, z); y: (x, z) would be left-handed, so swap to (z, x); z: (x, y).
  const [a, b] = axis === "y" ? [v, u] : [u, v];
  const t = (angleDeg * Math.PI) / 180;
  const da = p[a] - c[a];
  const db = p[b] - c[b];
  return { ...p, [a]: c[a] + da * Math.cos(t) - db * Math.sin(t), [b]: c[b] + da * Math.sin(t) + db * Math.cos(t) };
}

function annotateCircularPattern(f: CircularPatternFeature, ctx: AnnotateContext, name: string): AnnotationRequest[] {
  const n = Math.max(1, Math.round(f.count));
  const step = f.angleDeg ?? 360 / n;
  const first = f.feature.at;
  const positions = Array.from({ length: n }, (_, k) => rotateAbout(first, f.centre, f.axis, k * step));
  const inner = annotatePatternable(moveFeature(f.feature, first), ctx, { name, count: n });
  const [u, v] = otherAxes(f.axis);
  const pcd = 2 * Math.hypot(first[u] - f.centre[u], first[v] - f.centre[v]);
  const equal = f.angleDeg === undefined || Math.abs(f.angleDeg * n - 360) < 1e-6;
  const spacing = equal ? "equally spaced" : `${formatAngle(step)} apart`;
  const out: AnnotationRequest[] = inner
    .filter((r) => !(r.kind === "linear" && r.role === "location"))
    .map((r) => (r.kind === "callout" ? ({ ...r, lines: [...r.lines, `on ${ctx.fmt.diameter(pcd)} pitch circle, ${spacing}`] } satisfies CalloutRequest) : r));
  out.push(...copyThreadMarks(inner, positions, first));
  const prefer = entryViews(f.feature.direction);
  for (const axis of [u, v]) out.push(...locationFromDatum(ctx, name, axis, f.centre[axis], pointRegion(f.centre), prefer));
  return out;
}

/** The bounding box of the part's base, model mm. */
export function baseBox(part: ResolvedPart): { min: Point3; max: Point3 } {
  const base = part.features[0];
  if (base?.kind === "block") return { min: { x: 0, y: 0, z: 0 }, max: { ...base.size } };
  if (base?.kind === "turned") {
    const ranges = stepRanges(base);
    const r = Math.max(...base.steps.map((s) => s.diameter)) / 2;
    return { min: { x: -r, y: -r, z: 0 }, max: { x: r, y: r, z: ranges[ranges.length - 1]!.z1 } };
  }
  throw new Error(`Part "${part.id}" does not start with a block or turned base.`);
}

function isActive(f: ResolvedFeature): boolean {
  return f.when !== false;
}

/** Every annotation request of a part, in feature order (base first). */
export function annotatePart(ctx: AnnotateContext): AnnotationRequest[] {
  const features = ctx.part.features.filter(isActive);
  const base = features[0]!;
  const externalThreads = features.filter((f): f is ExternalThreadFeature => f.kind === "thread" && f.form === "external");
  const out: AnnotationRequest[] = [];
  features.forEach((f, i) => {
    const name = f.label ?? f.id ?? `${f.kind} ${i + 1}`;
    switch (f.kind) {
      case "block":
        if (i === 0) out.push(...annotateBlock(f, ctx, name));
        break;
      case "turned":
        if (i === 0) out.push(...annotateTurned(f, ctx, name, externalThreads));
        break;
      case "hole":
        out.push(...annotateHole(f, ctx, { name }));
        break;
      case "thread":
        if (f.form === "internal") out.push(...annotateInternalThread(f, ctx, { name }));
        else if (base.kind === "turned") out.push(...annotateExternalThread(f, base, ctx, name));
        break;
      case "slot":
        out.push(...annotateSlot(f, ctx, { name }));
        break;
      case "pocket":
        out.push(...annotatePocket(f, ctx, { name }));
        break;
      case "step":
        out.push(...annotateStep(f, ctx, name));
        break;
      case "v-groove":
        out.push(...annotateVGroove(f, ctx, name));
        break;
      case "chamfer":
        out.push(...annotateChamfer(f, ctx, name, (face) => endRadius(base, face)));
        break;
      case "eccentric-bore":
        out.push(...annotateEccentricBore(f, ctx, { name }));
        break;
      case "pattern-linear":
        out.push(...annotateLinearPattern(f, ctx, name));
        break;
      case "pattern-circular":
        out.push(...annotateCircularPattern(f, ctx, name));
        break;
    }
  });
  return out;
}

/** Radius of a turned part's end step at the given end face. */
function endRadius(base: ResolvedFeature, face: string): number | undefined {
  if (base.kind !== "turned") return undefined;
  const steps = (base as TurnedFeature).steps;
  const s = face === "-z" ? steps[0] : face === "+z" ? steps[steps.length - 1] : undefined;
  return s ? s.diameter / 2 : undefined;
}

/** The feature names that must appear among the placed annotations (every active feature). */
export function featureNames(part: ResolvedPart): string[] {
  return part.features.filter(isActive).map((f, i) => f.label ?? f.id ?? `${f.kind} ${i + 1}`);
}
