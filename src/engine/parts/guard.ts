/**
 * The degenerate-geometry guard. The solid kernel can spin for ever on a zero, negative or NaN size, and a
 * feature bigger than its part builds nothing or several solids; so every resolved part is checked here,
 * and a part with a `blocking` issue never reaches the kernel. (Finite numbers are already guaranteed by
 * the resolved schema.) Design problems that still make a valid solid — a hole breaking out of a wall — are
 * the general checks' job (checks/general.ts), not this guard's.
 */
import type { Direction, PatternableFeature, Point3, ResolvedFeature, ResolvedPart } from "./features";
import { availableDepth, axisOf, baseGeometry, faceAxes, stepAt, stepsBetween, type BaseGeometry } from "./frame";
import { featureName, featureRef, type GeometryIssue, type LengthFormatter } from "./issues";
import { expandPattern } from "./patterns";
import { metricThread } from "./threads";
import { holeLengthMm, internalThreadBore, isRadial } from "./analytic";

/** Smallest size the kernel is asked to build (mm). */
export const MIN_SIZE_MM = 0.01;
export const MAX_PATTERN_COUNT = 100;
export const MAX_QUANTITY = 1000;

interface Ctx {
  part: ResolvedPart;
  base: BaseGeometry;
  fmt: LengthFormatter;
  issues: GeometryIssue[];
}

/** Every blocking (and a few non-blocking) problem of one part. */
export function guardPart(part: ResolvedPart, fmt: LengthFormatter): GeometryIssue[] {
  const issues: GeometryIssue[] = [];
  const first = part.features[0];
  if (!first || (first.kind !== "block" && first.kind !== "turned")) {
    issues.push({ partId: part.id, code: "no-base", severity: "error", blocking: true, message: `${part.name}: the first feature must be a block or a turned base.` });
    return issues;
  }
  if (part.quantity !== undefined && (!Number.isInteger(part.quantity) || part.quantity < 1 || part.quantity > MAX_QUANTITY)) {
    issues.push({ partId: part.id, code: "bad-quantity", severity: "error", blocking: true, message: `${part.name}: the quantity must be a whole number from 1 to ${MAX_QUANTITY}; it is ${part.quantity}.` });
  }
  if (part.stock?.allowance !== undefined && part.stock.allowance < 0) {
    issues.push({ partId: part.id, code: "bad-allowance", severity: "error", blocking: false, message: `${part.name}: the stock allowance cannot be negative (${fmt(part.stock.allowance)}).` });
  }
  // The base first: nothing else can be judged on a degenerate base.
  const baseIssues: GeometryIssue[] = [];
  const ctx0: Ctx = { part, base: undefined as unknown as BaseGeometry, fmt, issues: baseIssues };
  if (first.kind === "block") {
    for (const a of ["x", "y", "z"] as const) positive(ctx0, first, 0, `size ${a}`, first.size[a]);
  } else {
    first.steps.forEach((s, i) => {
      positive(ctx0, first, 0, `step ${i + 1} diameter`, s.diameter);
      positive(ctx0, first, 0, `step ${i + 1} length`, s.length);
    });
  }
  if (baseIssues.length > 0) return [...issues, ...baseIssues];
  const ctx: Ctx = { part, base: baseGeometry(part), fmt, issues };
  part.features.slice(1).forEach((f, i) => guardFeature(ctx, f, i + 1));
  return issues;
}

function push(ctx: Ctx, f: ResolvedFeature, index: number, code: string, text: string, blocking = true) {
  ctx.issues.push({ partId: ctx.part.id, featureIndex: index, featureRef: featureRef(f, index), code, severity: "error", blocking, message: `${featureName(ctx.part, f, index)}: ${text}` });
}

function positive(ctx: Ctx, f: ResolvedFeature, index: number, what: string, value: number | undefined, allowZero = false) {
  if (value === undefined) return;
  const ok = allowZero ? value >= 0 : value >= MIN_SIZE_MM;
  if (!ok) push(ctx, f, index, "degenerate-size", `the ${what} must be ${allowZero ? "zero or more" : `at least ${ctx.fmt(MIN_SIZE_MM)}`}; it is ${ctx.fmt(value)}.`);
}

/** Whether the point's coordinates on the entry face's two axes lie within the base's box. */
function onFace(base: BaseGeometry, at: Point3, direction: Direction): boolean {
  return faceAxes(direction).every((a) => at[a] >= base.min[a] - 1e-6 && at[a] <= base.max[a] + 1e-6);
}

/** Whether the part is a block; otherwise the feature is refused as unsupported on a turned part. */
function blockOnly(ctx: Ctx, f: ResolvedFeature, index: number, what: string): boolean {
  if (ctx.base.kind !== "block") {
    push(ctx, f, index, "unsupported", `${what} can only be cut in a block; this part is turned.`);
    return false;
  }
  return true;
}

function guardFeature(ctx: Ctx, f: ResolvedFeature, index: number): void {
  const { base, fmt } = ctx;
  switch (f.kind) {
    case "block":
    case "turned":
      push(ctx, f, index, "second-base", "only the first feature can be a base.");
      return;
    case "hole": {
      positive(ctx, f, index, "diameter", f.diameter);
      if (!f.through) {
        if (f.depth === undefined) push(ctx, f, index, "missing-depth", "a hole needs a depth or through: true.");
        else positive(ctx, f, index, "depth", f.depth);
      }
      positive(ctx, f, index, "chamfer", f.chamfer, true);
      if (f.counterbore && f.countersink) push(ctx, f, index, "unsupported", "a hole has a counterbore or a countersink, not both.");
      if (f.countersink && f.chamfer) push(ctx, f, index, "unsupported", "a countersunk hole takes no extra chamfer.");
      guardBore(ctx, f, index, f.diameter, f.through || f.depth === undefined ? undefined : f.depth);
      if (isRadial(base, f.direction) && (f.counterbore || f.countersink || f.chamfer)) {
        push(ctx, f, index, "unsupported", "a radial hole in a turned part takes no counterbore, countersink or chamfer (the face is curved).");
      }
      const length = isRadial(base, f.direction) ? 0 : holeLengthMm(f, base);
      if (f.counterbore) {
        if (f.counterbore.diameter <= f.diameter + MIN_SIZE_MM) push(ctx, f, index, "degenerate-size", `the counterbore Ø${fmt(f.counterbore.diameter)} must be larger than the hole Ø${fmt(f.diameter)}.`);
        positive(ctx, f, index, "counterbore depth", f.counterbore.depth);
        if (length > 0 && f.counterbore.depth >= length) push(ctx, f, index, "larger-than-part", `the counterbore (${fmt(f.counterbore.depth)} deep) is as deep as the hole (${fmt(length)}).`);
      }
      if (f.countersink) {
        if (f.countersink.diameter <= f.diameter + MIN_SIZE_MM) push(ctx, f, index, "degenerate-size", `the countersink Ø${fmt(f.countersink.diameter)} must be larger than the hole Ø${fmt(f.diameter)}.`);
        const angle = f.countersink.angleDeg ?? 90;
        if (angle < 30 || angle > 150) push(ctx, f, index, "degenerate-size", `a countersink angle of ${angle}° is outside 30°–150°.`);
      }
      return;
    }
    case "thread": {
      const t = metricThread(f.designation);
      if (!t) {
        push(ctx, f, index, "bad-designation", `"${f.designation}" is not an ISO metric thread (write M6 for coarse or M6x0.75 for fine).`);
        return;
      }
      if (f.form === "external") {
        if (base.kind !== "turned") return void push(ctx, f, index, "unsupported", "an external thread needs a turned part.");
        const step = base.steps[f.step];
        if (!step) return void push(ctx, f, index, "outside-part", `the thread is on step ${f.step + 1}, but the part has ${base.steps.length} steps.`);
        positive(ctx, f, index, "thread length", f.length);
        if (f.length > step.zEnd - step.zStart + 1e-6) push(ctx, f, index, "larger-than-part", `the thread (${fmt(f.length)}) is longer than its step (${fmt(step.zEnd - step.zStart)}).`, false);
        return;
      }
      if (!f.through) {
        if (f.depth === undefined) push(ctx, f, index, "missing-depth", "a threaded hole needs a depth or through: true.");
        else positive(ctx, f, index, "thread depth", f.depth);
        if (f.drillDepth !== undefined && f.depth !== undefined && f.drillDepth < f.depth) push(ctx, f, index, "degenerate-size", `the drill depth ${fmt(f.drillDepth)} is less than the thread depth ${fmt(f.depth)}.`);
      }
      positive(ctx, f, index, "chamfer", f.chamfer, true);
      if (isRadial(base, f.direction) && f.chamfer) push(ctx, f, index, "unsupported", "a radial threaded hole in a turned part takes no chamfer.");
      const bore = internalThreadBore(f, base);
      guardBore(ctx, f, index, bore.boreDiameterMm, bore.through ? undefined : bore.drillDepthMm);
      return;
    }
    case "slot": {
      if (!blockOnly(ctx, f, index, "A slot")) return;
      positive(ctx, f, index, "width", f.width);
      positive(ctx, f, index, "length", f.length);
      if (f.along === axisOf(f.direction)) return void push(ctx, f, index, "unsupported", `a slot cut in ${f.direction} cannot run along ${f.along}.`);
      if (!f.through) {
        if (f.depth === undefined) push(ctx, f, index, "missing-depth", "a slot needs a depth or through: true.");
        else positive(ctx, f, index, "depth", f.depth);
      }
      entryInside(ctx, f, index, f.at, f.direction, f.through || f.depth === undefined ? undefined : f.depth);
      const across = faceAxes(f.direction).find((a) => a !== f.along)!;
      if (f.width >= base.max[across] - base.min[across]) push(ctx, f, index, "larger-than-part", `the slot is ${fmt(f.width)} wide but the part is only ${fmt(base.max[across] - base.min[across])} across.`);
      return;
    }
    case "pocket": {
      if (!blockOnly(ctx, f, index, "A pocket")) return;
      positive(ctx, f, index, "depth", f.depth);
      if (f.shape.kind === "rect") {
        positive(ctx, f, index, "pocket width", f.shape.u);
        positive(ctx, f, index, "pocket length", f.shape.v);
        const r = f.shape.cornerRadius ?? 0;
        positive(ctx, f, index, "corner radius", r, true);
        if (r > Math.min(f.shape.u, f.shape.v) / 2 + 1e-9) push(ctx, f, index, "degenerate-size", `the corner radius ${fmt(r)} is more than half the pocket's smaller side.`);
      } else positive(ctx, f, index, "diameter", f.shape.diameter);
      entryInside(ctx, f, index, f.at, f.direction, f.depth);
      if (f.depth >= availableDepth(base, f.at, f.direction) - 1e-6) push(ctx, f, index, "larger-than-part", `the pocket (${fmt(f.depth)} deep) goes right through the ${fmt(availableDepth(base, f.at, f.direction))} of material; use a through cut or less depth.`);
      return;
    }
    case "step": {
      if (!blockOnly(ctx, f, index, "A step")) return;
      let touches = false;
      for (const a of ["x", "y", "z"] as const) {
        const lo = Math.min(f.from[a], f.to[a]);
        const hi = Math.max(f.from[a], f.to[a]);
        if (hi - lo < MIN_SIZE_MM) push(ctx, f, index, "degenerate-size", `the step is ${fmt(hi - lo)} along ${a}; it must be at least ${fmt(MIN_SIZE_MM)}.`);
        if (lo < base.min[a] - 1e-6 || hi > base.max[a] + 1e-6) push(ctx, f, index, "outside-part", `the step reaches ${fmt(lo)}–${fmt(hi)} along ${a}, outside the part's 0–${fmt(base.max[a])}.`);
        if (Math.abs(lo - base.min[a]) < 1e-6 || Math.abs(hi - base.max[a]) < 1e-6) touches = true;
      }
      if (!touches) push(ctx, f, index, "unsupported", "a step must reach at least one outside face (an enclosed void cannot be machined).");
      const all = (["x", "y", "z"] as const).every((a) => Math.min(f.from[a], f.to[a]) <= base.min[a] + 1e-6 && Math.max(f.from[a], f.to[a]) >= base.max[a] - 1e-6);
      if (all) push(ctx, f, index, "larger-than-part", "the step removes the whole part.");
      return;
    }
    case "v-groove": {
      if (!blockOnly(ctx, f, index, "A V-groove")) return;
      positive(ctx, f, index, "depth", f.depth);
      if (!(f.angleDeg > 1 && f.angleDeg < 179)) push(ctx, f, index, "degenerate-size", `the V angle ${f.angleDeg}° must lie between 1° and 179°.`);
      if (f.along === axisOf(f.direction)) return void push(ctx, f, index, "unsupported", `a groove cut in ${f.direction} cannot run along ${f.along}.`);
      entryInside(ctx, f, index, f.at, f.direction, f.depth);
      const across = faceAxes(f.direction).find((a) => a !== f.along)!;
      const halfWidth = f.depth * Math.tan((f.angleDeg * Math.PI) / 360);
      if (2 * halfWidth >= base.max[across] - base.min[across]) push(ctx, f, index, "larger-than-part", `the groove is ${fmt(2 * halfWidth)} wide at the face, wider than the part (${fmt(base.max[across] - base.min[across])}).`);
      if (f.depth >= availableDepth(base, f.at, f.direction) - 1e-6) push(ctx, f, index, "larger-than-part", `the groove (${fmt(f.depth)} deep) cuts the part in two.`);
      return;
    }
    case "chamfer": {
      positive(ctx, f, index, "chamfer size", f.size);
      if (base.kind === "turned") {
        if (f.faces.some((x) => x !== "+z" && x !== "-z")) return void push(ctx, f, index, "unsupported", "on a turned part only the end faces (+z, -z) can be chamfered.");
        for (const face of new Set(f.faces)) {
          const step = face === "+z" ? base.steps[base.steps.length - 1]! : base.steps[0]!;
          const limit = Math.min(step.diameter / 2, step.zEnd - step.zStart);
          if (f.size >= limit) push(ctx, f, index, "larger-than-part", `a ${fmt(f.size)} chamfer does not fit the Ø${fmt(step.diameter)} × ${fmt(step.zEnd - step.zStart)} end.`);
        }
      } else {
        const smallest = Math.min(base.max.x, base.max.y, base.max.z);
        if (f.size >= smallest / 2) push(ctx, f, index, "larger-than-part", `a ${fmt(f.size)} chamfer needs every side longer than ${fmt(2 * f.size)}; the smallest is ${fmt(smallest)}.`);
      }
      return;
    }
    case "eccentric-bore": {
      if (base.kind !== "turned") return void push(ctx, f, index, "unsupported", "an eccentric bore needs a turned part.");
      positive(ctx, f, index, "diameter", f.diameter);
      positive(ctx, f, index, "eccentricity", f.eccentricity, true);
      const length = f.through || f.depth === undefined ? base.lengthMm : f.depth;
      if (!f.through && f.depth !== undefined) {
        positive(ctx, f, index, "depth", f.depth);
        if (f.depth > base.lengthMm + 1e-6) push(ctx, f, index, "larger-than-part", `the bore (${fmt(f.depth)} deep) is deeper than the part (${fmt(base.lengthMm)}).`);
      }
      const fromTop = f.from !== "bottom";
      const z0 = fromTop ? base.lengthMm : 0;
      const z1 = fromTop ? base.lengthMm - length : length;
      for (const s of stepsBetween(base, z0, z1)) {
        if (f.diameter >= s.diameter) push(ctx, f, index, "larger-than-part", `the Ø${fmt(f.diameter)} bore is not smaller than the Ø${fmt(s.diameter)} it is bored in.`);
        else if (f.eccentricity - f.diameter / 2 >= s.diameter / 2) push(ctx, f, index, "outside-part", `the bore lies outside the Ø${fmt(s.diameter)} step.`);
      }
      if (f.counterbore) {
        if (f.counterbore.diameter <= f.diameter + MIN_SIZE_MM) push(ctx, f, index, "degenerate-size", `the counterbore Ø${fmt(f.counterbore.diameter)} must be larger than the bore Ø${fmt(f.diameter)}.`);
        positive(ctx, f, index, "counterbore depth", f.counterbore.depth);
        if (f.counterbore.depth >= length) push(ctx, f, index, "larger-than-part", `the counterbore (${fmt(f.counterbore.depth)} deep) is as deep as the bore (${fmt(length)}).`);
      }
      return;
    }
    case "pattern-linear":
    case "pattern-circular": {
      if (!Number.isInteger(f.count) || f.count < 1 || f.count > MAX_PATTERN_COUNT) {
        return void push(ctx, f, index, "bad-count", `a pattern needs a whole number of copies from 1 to ${MAX_PATTERN_COUNT}; it has ${f.count}.`);
      }
      if (f.kind === "pattern-linear" && f.count > 1 && Math.hypot(f.spacing.x, f.spacing.y, f.spacing.z) < MIN_SIZE_MM) {
        return void push(ctx, f, index, "degenerate-size", "the copies of a linear pattern need a spacing; they would all sit on top of each other.");
      }
      if (f.kind === "pattern-circular") {
        if (f.feature.kind === "slot") return void push(ctx, f, index, "unsupported", "slots cannot be patterned round a circle (their direction would turn).");
        if (f.axis !== axisOf(f.feature.direction)) return void push(ctx, f, index, "unsupported", `a circular pattern turns about ${f.axis}, which must be parallel to its feature's direction (${f.feature.direction}).`);
      }
      const before = ctx.issues.length;
      expandPattern(f).forEach((copy: PatternableFeature, i) => {
        if (ctx.issues.length > before) return;
        const sub: Ctx = { ...ctx, issues: [] };
        guardFeature(sub, copy, index);
        for (const issue of sub.issues) ctx.issues.push({ ...issue, featureRef: featureRef(f, index), message: `${issue.message.replace(/\.$/, "")} (copy ${i + 1} of ${f.count}).` });
      });
      return;
    }
  }
}

/** Checks an entry point: on the part, with material in front of it (and enough for a blind depth). */
function entryInside(ctx: Ctx, f: ResolvedFeature, index: number, at: Point3, direction: Direction, depth: number | undefined): boolean {
  const { base, fmt } = ctx;
  if (!onFace(base, at, direction)) {
    push(ctx, f, index, "outside-part", `its position (${fmt(at.x)}, ${fmt(at.y)}, ${fmt(at.z)}) lies outside the part's face.`);
    return false;
  }
  const available = availableDepth(base, at, direction);
  if (available < MIN_SIZE_MM) {
    push(ctx, f, index, "outside-part", `it starts at the far side of the part, going ${direction}: there is no material to cut.`);
    return false;
  }
  if (depth !== undefined && depth > available + 1e-6) {
    push(ctx, f, index, "larger-than-part", `it is ${fmt(depth)} deep but there is only ${fmt(available)} of material; make it through or shallower.`);
    return false;
  }
  return true;
}

/** A hole-like cylinder of Ø d: axial or block holes, or radial cross holes in a turned step. */
function guardBore(ctx: Ctx, f: ResolvedFeature & { at: Point3; direction: Direction }, index: number, d: number, depth: number | undefined): void {
  const { base, fmt } = ctx;
  if (!(d >= MIN_SIZE_MM)) return;
  if (base.kind === "turned" && isRadial(base, f.direction)) {
    const step = stepAt(base, f.at.z);
    if (!step) return void push(ctx, f, index, "outside-part", `its axis height ${fmt(f.at.z)} is off the part (0–${fmt(base.lengthMm)}).`);
    if (f.at.z - d / 2 < step.zStart - 1e-6 || f.at.z + d / 2 > step.zEnd + 1e-6) {
      const crossesEnd = (f.at.z - d / 2 < 1e-6 && step.index === 0) || (f.at.z + d / 2 > base.lengthMm - 1e-6 && step.index === base.steps.length - 1);
      push(ctx, f, index, crossesEnd ? "outside-part" : "unsupported", crossesEnd ? `the Ø${fmt(d)} cross hole at height ${fmt(f.at.z)} breaks out of the end of the part.` : `the Ø${fmt(d)} cross hole at height ${fmt(f.at.z)} crosses a shoulder; keep it within one diameter step.`);
    }
    const R = step.diameter / 2;
    const o = Math.abs(axisOf(f.direction) === "x" ? f.at.y : f.at.x);
    if (o - d / 2 >= R) push(ctx, f, index, "outside-part", `the cross hole misses the Ø${fmt(step.diameter)} step (offset ${fmt(o)}).`);
    else if (d >= step.diameter) push(ctx, f, index, "larger-than-part", `the Ø${fmt(d)} cross hole is not smaller than the Ø${fmt(step.diameter)} it crosses.`);
    if (depth !== undefined) {
      const chordAtAxis = 2 * Math.sqrt(Math.max(0, R * R - o * o));
      if (depth > chordAtAxis + 1e-6) push(ctx, f, index, "larger-than-part", `it is ${fmt(depth)} deep but the part is only ${fmt(chordAtAxis)} across there; make it through or shallower.`);
    }
    return;
  }
  if (!entryInside(ctx, f, index, f.at, f.direction, depth)) return;
  if (base.kind === "block") {
    const [u, v] = faceAxes(f.direction);
    const smaller = Math.min(base.max[u] - base.min[u], base.max[v] - base.min[v]);
    if (d >= smaller) push(ctx, f, index, "larger-than-part", `the Ø${fmt(d)} hole is not smaller than the ${fmt(smaller)} face it enters.`);
  } else {
    const length = depth ?? availableDepth(base, f.at, f.direction);
    const z1 = f.at.z + (f.direction === "+z" ? length : -length);
    for (const s of stepsBetween(base, f.at.z, z1)) {
      if (d >= s.diameter) push(ctx, f, index, "larger-than-part", `the Ø${fmt(d)} hole is not smaller than the Ø${fmt(s.diameter)} step it is drilled in.`);
    }
  }
}
