/**
 * The engine's own design checks, run on every template's resolved parts: holes, slots and pockets too
 * close to an edge or breaking out, walls between neighbouring holes, thin floors under blind holes, bores
 * too close to a turned part's outside, internal threads with too little engagement.
 *
 * Walls are measured from the largest diameter at the face (counterbore, countersink, chamfer) and, for
 * threads, from the major diameter. Default minimum wall 1.5 mm and thread engagement 1×D in steel and
 * bronze, 1.5×D in brass and cast iron, 2×D in aluminium and acetal — common shop practice, overridable by
 * the template's `rules`.
 */
import { availableDepth, axisOf, baseGeometry, faceAxes, stepAt, stepsBetween, type BaseGeometry } from "../parts/frame";
import { holeLengthMm, internalThreadBore, isRadial } from "../parts/analytic";
import type { Axis, Direction, PatternableFeature, Point3, ResolvedFeature, ResolvedPart } from "../parts/features";
import { featureName, featureRef, type GeometryIssue, type LengthFormatter } from "../parts/issues";
import { expandPattern } from "../parts/patterns";
import { metricThread } from "../parts/threads";

export const DEFAULT_MIN_WALL_MM = 1.5;

/** Thread engagement as a multiple of the nominal diameter, by the material of the tapped part (common practice). */
export const THREAD_ENGAGEMENT_FACTOR: Readonly<Record<string, number>> = {
  "mild-steel": 1,
  "free-cutting-steel": 1,
  "tool-steel": 1,
  "stainless-303": 1,
  "stainless-304": 1,
  "phosphor-bronze": 1,
  "leaded-bronze": 1.25,
  brass: 1.5,
  "cast-iron": 1.5,
  "aluminium-6061": 2,
  "aluminium-6082": 2,
  acetal: 2,
};

export interface GeneralCheckOptions {
  minWallMm: number;
  /** Overrides the by-material engagement factor. */
  minThreadEngagement?: number;
  fmt: LengthFormatter;
}

/** A cylinder cut into the part, for wall checks. */
interface Bore {
  name: string;
  ref: string;
  index: number;
  axis: Axis;
  /** Centre on the two other axes (x,y for z bores; y,z for x bores; x,z for y bores). */
  centre: [number, number];
  radius: number;
  /** Range along the axis. */
  from: number;
  to: number;
  radial: boolean;
  /** For radial bores: the hole's footprint in the xy plane (entry and bottom along its axis). */
  entry?: Point3;
  bottom?: Point3;
  z?: number;
}

/** Design issues of one part (never blocking: the part still builds, but a machinist should know). */
export function generalPartIssues(part: ResolvedPart, options: GeneralCheckOptions): GeometryIssue[] {
  const base = baseGeometry(part);
  const issues: GeometryIssue[] = [];
  const bores: Bore[] = [];
  part.features.forEach((f, index) => {
    if (index === 0) return;
    const copies: PatternableFeature[] | ResolvedFeature[] = f.kind === "pattern-linear" || f.kind === "pattern-circular" ? expandPattern(f) : [f];
    copies.forEach((copy, i) => {
      const suffix = copies.length > 1 ? ` (copy ${i + 1})` : "";
      featureIssues(part, base, copy, index, f, suffix, options, issues, bores);
    });
  });
  pairwiseWalls(part, bores, options, issues);
  return issues;
}

function issue(part: ResolvedPart, f: ResolvedFeature, index: number, code: string, severity: GeometryIssue["severity"], text: string): GeometryIssue {
  return { partId: part.id, featureIndex: index, featureRef: featureRef(f, index), code, severity, blocking: false, message: `${featureName(part, f, index)}: ${text}` };
}

const FACE_WORD: Record<string, string> = { "x-": "left", "x+": "right", "y-": "front", "y+": "back", "z-": "bottom", "z+": "top" };

/** What the per-feature wall checks share (module functions, so no closures are made per feature). */
interface FeatureCtx {
  part: ResolvedPart;
  base: BaseGeometry;
  owner: ResolvedFeature;
  index: number;
  suffix: string;
  fmt: (mm: number) => string;
  minWallMm: number;
  out: GeometryIssue[];
  bores: Bore[];
}

/** Walls from a footprint [u0,u1]×[v0,v1] on the entry face to the four side faces of a block. */
function sideWalls(c: FeatureCtx, direction: Direction, lo: Record<string, number>, hi: Record<string, number>, what: string): void {
  const { part, base, owner, index, suffix, fmt, minWallMm, out } = c;
  for (const a of faceAxes(direction)) {
    const walls: Array<[number, string]> = [
      [lo[a]! - base.min[a], FACE_WORD[`${a}-`]!],
      [base.max[a] - hi[a]!, FACE_WORD[`${a}+`]!],
    ];
    for (const [w, side] of walls) {
      if (w < -1e-9) out.push(issue(part, owner, index, "breakout", "error", `${what}${suffix} breaks out of the ${side} face by ${fmt(-w)}.`));
      else if (w < minWallMm - 1e-9) out.push(issue(part, owner, index, "thin-wall", "warning", `${what}${suffix} leaves only ${fmt(w)} of wall to the ${side} face (at least ${fmt(minWallMm)} is wanted).`));
    }
  }
}

function floor(c: FeatureCtx, at: Point3, direction: Direction, depth: number | undefined, what: string): void {
  const { part, base, owner, index, suffix, fmt, minWallMm, out } = c;
  if (depth === undefined) return;
  const left = availableDepth(base, at, direction) - depth;
  if (left > 1e-6 && left < minWallMm - 1e-9) out.push(issue(part, owner, index, "thin-floor", "warning", `${what}${suffix} leaves a floor only ${fmt(left)} thick (at least ${fmt(minWallMm)} is wanted).`));
}

/** Walls around a round cut of the given (outer) radius, and the bore itself for the pairwise checks. */
function round(c: FeatureCtx, at: Point3, direction: Direction, radius: number, length: number, what: string, boreRadius = radius): void {
  const { part, base, owner, index, suffix, fmt, minWallMm, out, bores } = c;
  const axis = axisOf(direction);
  const [u, v] = faceAxes(direction);
  if (base.kind === "block") {
    sideWalls(c, direction, { [u]: at[u] - radius, [v]: at[v] - radius }, { [u]: at[u] + radius, [v]: at[v] + radius }, what);
  } else if (axis === "z") {
    const z1 = at.z + (direction === "+z" ? length : -length);
    const offset = Math.hypot(at.x, at.y);
    for (const s of stepsBetween(base, at.z, z1)) {
      const w = s.diameter / 2 - offset - radius;
      if (w < -1e-9) out.push(issue(part, owner, index, "breakout", "error", `${what}${suffix} breaks out of the Ø${fmt(s.diameter)} outside by ${fmt(-w)}.`));
      else if (w < minWallMm - 1e-9) out.push(issue(part, owner, index, "thin-wall", "warning", `${what}${suffix} leaves only ${fmt(w)} of wall to the Ø${fmt(s.diameter)} outside (at least ${fmt(minWallMm)} is wanted).`));
    }
  }
  const sign = direction[0] === "-" ? -1 : 1;
  const a0 = at[axis];
  const a1 = a0 + sign * length;
  bores.push({ name: `${what}${suffix}`, ref: featureRef(owner, index), index, axis, centre: [at[u], at[v]], radius: boreRadius, from: Math.min(a0, a1), to: Math.max(a0, a1), radial: false });
}

function radial(c: FeatureCtx, at: Point3, direction: Direction, radius: number, depth: number | undefined, what: string): void {
  const { part, base, owner, index, suffix, fmt, minWallMm, out, bores } = c;
  if (base.kind !== "turned") return;
  const step = stepAt(base, at.z);
  if (!step) return;
  const zWalls: Array<[number, string]> = [
    [at.z - radius - step.zStart, step.index === 0 ? "bottom end" : "shoulder below"],
    [step.zEnd - at.z - radius, step.index === base.steps.length - 1 ? "top end" : "shoulder above"],
  ];
  for (const [w, side] of zWalls) {
    if (w >= -1e-9 && w < minWallMm - 1e-9 && !(w < 1e-9 && side.startsWith("shoulder"))) {
      out.push(issue(part, owner, index, "thin-wall", "warning", `${what}${suffix} leaves only ${fmt(w)} to the ${side} (at least ${fmt(minWallMm)} is wanted).`));
    }
  }
  const R = step.diameter / 2;
  const axis = axisOf(direction);
  const o = axis === "x" ? at.y : at.x;
  const entryAlong = Math.sqrt(Math.max(0, R * R - o * o));
  const sign = direction[0] === "-" ? -1 : 1;
  const entryCoord = -sign * entryAlong;
  const bottomCoord = depth === undefined ? sign * entryAlong : entryCoord + sign * depth;
  const entry: Point3 = axis === "x" ? { x: entryCoord, y: o, z: at.z } : { x: o, y: entryCoord, z: at.z };
  const bottom: Point3 = axis === "x" ? { x: bottomCoord, y: o, z: at.z } : { x: o, y: bottomCoord, z: at.z };
  bores.push({ name: `${what}${suffix}`, ref: featureRef(owner, index), index, axis, centre: [0, 0], radius, from: at.z - radius, to: at.z + radius, radial: true, entry, bottom, z: at.z });
}

function featureIssues(
  part: ResolvedPart,
  base: BaseGeometry,
  f: ResolvedFeature,
  index: number,
  owner: ResolvedFeature,
  suffix: string,
  o: GeneralCheckOptions,
  out: GeometryIssue[],
  bores: Bore[],
): void {
  const { fmt, minWallMm } = o;
  const c: FeatureCtx = { part, base, owner, index, suffix, fmt, minWallMm, out, bores };
  switch (f.kind) {
    case "hole": {
      const length = holeLengthMm(f, base);
      if (isRadial(base, f.direction)) return radial(c, f.at, f.direction, f.diameter / 2, f.through || f.depth === undefined ? undefined : f.depth, `the Ø${fmt(f.diameter)} cross hole`);
      const outer = f.counterbore ? f.counterbore.diameter + 2 * (f.chamfer ?? 0) : f.countersink ? f.countersink.diameter : f.diameter + 2 * (f.chamfer ?? 0);
      // Side walls from the largest diameter at the face; neighbours see the hole's own diameter.
      round(c, f.at, f.direction, outer / 2, length, `the Ø${fmt(f.diameter)} hole`, f.diameter / 2);
      floor(c, f.at, f.direction, f.through ? undefined : f.depth, `the Ø${fmt(f.diameter)} hole`);
      return;
    }
    case "thread": {
      if (f.form !== "internal") return;
      const t = metricThread(f.designation);
      if (!t) return;
      const bore = internalThreadBore(f, base);
      if (isRadial(base, f.direction)) radial(c, f.at, f.direction, t.nominalDiameterMm / 2, bore.through ? undefined : bore.drillDepthMm, `the ${t.designation} thread`);
      else {
        round(c, f.at, f.direction, t.nominalDiameterMm / 2 + (f.chamfer ?? 0), bore.drillDepthMm, `the ${t.designation} thread`, t.nominalDiameterMm / 2);
        floor(c, f.at, f.direction, bore.through ? undefined : bore.drillDepthMm, `the ${t.designation} tap-drill hole`);
      }
      const full = bore.through ? bore.drillDepthMm : (f.depth ?? bore.drillDepthMm);
      const factor = o.minThreadEngagement ?? THREAD_ENGAGEMENT_FACTOR[part.material] ?? 1;
      const wanted = factor * t.nominalDiameterMm;
      if (full < wanted - 1e-9) {
        out.push(issue(part, owner, index, "thread-engagement", "warning", `the ${t.designation} thread is ${fmt(full)} long; in ${part.material} about ${fmt(wanted)} (${factor}×D) of engagement is usual.`));
      }
      return;
    }
    case "slot": {
      if (base.kind !== "block") return;
      const across = faceAxes(f.direction).find((a) => a !== f.along)!;
      const lo = { [f.along]: f.at[f.along] - f.width / 2, [across]: f.at[across] - f.width / 2 };
      const hi = { [f.along]: f.at[f.along] + f.length + f.width / 2, [across]: f.at[across] + f.width / 2 };
      sideWalls(c, f.direction, lo, hi, `the ${fmt(f.width)} slot`);
      floor(c, f.at, f.direction, f.through ? undefined : f.depth, `the ${fmt(f.width)} slot`);
      return;
    }
    case "pocket": {
      if (base.kind !== "block") return;
      const [u, v] = faceAxes(f.direction);
      const hu = f.shape.kind === "rect" ? f.shape.u / 2 : f.shape.diameter / 2;
      const hv = f.shape.kind === "rect" ? f.shape.v / 2 : f.shape.diameter / 2;
      sideWalls(c, f.direction, { [u]: f.at[u] - hu, [v]: f.at[v] - hv }, { [u]: f.at[u] + hu, [v]: f.at[v] + hv }, "the pocket");
      floor(c, f.at, f.direction, f.depth, "the pocket");
      return;
    }
    case "eccentric-bore": {
      if (base.kind !== "turned") return;
      const a = ((f.angleDeg ?? 0) * Math.PI) / 180;
      const cx = f.eccentricity * Math.cos(a);
      const cy = f.eccentricity * Math.sin(a);
      const length = f.through || f.depth === undefined ? base.lengthMm : f.depth;
      const fromTop = f.from !== "bottom";
      const z0 = fromTop ? base.lengthMm : 0;
      const z1 = fromTop ? z0 - length : length;
      const check = (d: number, zA: number, zB: number, what: string) => {
        for (const s of stepsBetween(base, zA, zB)) {
          const w = s.diameter / 2 - f.eccentricity - d / 2;
          if (w < -1e-9) out.push(issue(part, owner, index, "breakout", "error", `${what} breaks out of the Ø${fmt(s.diameter)} outside by ${fmt(-w)}.`));
          else if (w < minWallMm - 1e-9) out.push(issue(part, owner, index, "thin-wall", "warning", `${what} leaves only ${fmt(w)} of wall at its thinnest, to the Ø${fmt(s.diameter)} outside (at least ${fmt(minWallMm)} is wanted).`));
        }
      };
      check(f.diameter, z0, z1, `the Ø${fmt(f.diameter)} eccentric bore`);
      if (f.counterbore) check(f.counterbore.diameter, z0, fromTop ? z0 - f.counterbore.depth : f.counterbore.depth, `the Ø${fmt(f.counterbore.diameter)} counterbore`);
      bores.push({ name: `the Ø${fmt(f.diameter)} eccentric bore`, ref: featureRef(owner, index), index, axis: "z", centre: [cx, cy], radius: f.diameter / 2, from: Math.min(z0, z1), to: Math.max(z0, z1), radial: false });
      if (f.counterbore) {
        const zc = fromTop ? z0 - f.counterbore.depth : f.counterbore.depth;
        bores.push({ name: `the Ø${fmt(f.counterbore.diameter)} counterbore`, ref: featureRef(owner, index), index, axis: "z", centre: [cx, cy], radius: f.counterbore.diameter / 2, from: Math.min(z0, zc), to: Math.max(z0, zc), radial: false });
      }
      return;
    }
    default:
      return;
  }
}

/** Distance from point (px, py) to the axis-aligned rectangle [x0,x1]×[y0,y1] (0 inside). */
function pointToRect(px: number, py: number, x0: number, x1: number, y0: number, y1: number): number {
  const dx = Math.max(x0 - px, 0, px - x1);
  const dy = Math.max(y0 - py, 0, py - y1);
  return Math.hypot(dx, dy);
}

/** Records a wall between two bores that is negative (they overlap) or thinner than wanted. */
function reportWall(part: ResolvedPart, o: GeneralCheckOptions, out: GeometryIssue[], a: Bore, b: Bore, wall: number): void {
  const { fmt, minWallMm } = o;
  if (wall < -1e-9) {
    out.push({ partId: part.id, featureIndex: a.index, featureRef: a.ref, code: "features-overlap", severity: "error", blocking: false, message: `${part.name}: ${a.name} runs into ${b.name} (they overlap by ${fmt(-wall)}).` });
  } else if (wall < minWallMm - 1e-9) {
    out.push({ partId: part.id, featureIndex: a.index, featureRef: a.ref, code: "thin-wall", severity: "warning", message: `${part.name}: only ${fmt(wall)} of wall between ${a.name} and ${b.name} (at least ${fmt(minWallMm)} is wanted).`, blocking: false });
  }
}

/** Walls between neighbouring bores of one part: parallel pairs, and radial cross holes against axial bores. */
function pairwiseWalls(part: ResolvedPart, bores: Bore[], o: GeneralCheckOptions, out: GeometryIssue[]): void {
  for (let i = 0; i < bores.length; i++) {
    for (let j = i + 1; j < bores.length; j++) {
      const a = bores[i]!;
      const b = bores[j]!;
      // A counterbore and its own bore are one feature.
      if (a.ref === b.ref && a.index === b.index && a.name !== b.name && !a.radial && !b.radial && a.centre[0] === b.centre[0] && a.centre[1] === b.centre[1]) continue;
      if (!a.radial && !b.radial) {
        if (a.axis !== b.axis) continue;
        if (a.to <= b.from + 1e-9 || b.to <= a.from + 1e-9) continue;
        const wall = Math.hypot(a.centre[0] - b.centre[0], a.centre[1] - b.centre[1]) - a.radius - b.radius;
        reportWall(part, o, out, a, b, wall);
      } else if (a.radial !== b.radial) {
        const r = a.radial ? a : b;
        const ax = a.radial ? b : a;
        if (ax.axis !== "z" || !r.entry || !r.bottom) continue;
        if (r.to <= ax.from + 1e-9 || ax.to <= r.from + 1e-9) continue;
        // The cross hole's section at its axis height is a rectangle along its axis, 2r wide.
        const alongX = r.axis === "x";
        const x0 = alongX ? Math.min(r.entry.x, r.bottom.x) : r.entry.x - r.radius;
        const x1 = alongX ? Math.max(r.entry.x, r.bottom.x) : r.entry.x + r.radius;
        const y0 = alongX ? r.entry.y - r.radius : Math.min(r.entry.y, r.bottom.y);
        const y1 = alongX ? r.entry.y + r.radius : Math.max(r.entry.y, r.bottom.y);
        const wall = pointToRect(ax.centre[0], ax.centre[1], x0, x1, y0, y1) - ax.radius;
        reportWall(part, o, out, r, ax, wall);
      }
    }
  }
}
