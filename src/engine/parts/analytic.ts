/**
 * What can be computed from a resolved part without a solid kernel: bounding box, stock envelope, volume and
 * mass. The solid builders' golden tests compare the kernel's volume with {@link partVolumeMm3} (within
 * 0.5 %), so every feature kind has an exact formula here, following the meanings in features.ts.
 *
 * Assumption: features do not overlap one another (each removes material nobody else removes). The
 * engine's wall checks flag overlapping holes; other overlaps make this volume an underestimate of what
 * remains by the overlap's volume.
 *
 * Formulas (V = removed volume unless stated):
 *  - block: V = x·y·z (the base itself); turned: Σ π/4·Dᵢ²·Lᵢ.
 *  - hole: π/4·d²·L; counterbore adds π/4·(D² − d²)·h; a cone (countersink or 45° chamfer) from Ø D₁ at
 *    the face to Ø D₂ over depth t adds the frustum π·t/12·(D₁² + D₁D₂ + D₂²) − π/4·D₂²·t.
 *  - radial cross hole of radius r at lateral offset o in a step of radius R, through:
 *    V = ∫ 2√(r² − (y − o)²) · 2√(R² − y²) dy; blind to depth h at its axis: the chord term becomes
 *    √(R² − y²) − (√(R² − o²) − h). Integrated by Gauss–Legendre after y = o + r·sin θ (smooth integrand).
 *  - slot: (ℓ·w + π/4·w²)·depth; pocket: (u·v − (4 − π)·r²)·depth or π/4·d²·depth; step: Δx·Δy·Δz.
 *  - V-groove of included angle θ and depth h along a block of length ℓ: h²·tan(θ/2)·ℓ.
 *  - 45° chamfers of leg c on the edges of block faces: Σ c²/2·ℓₑ, less c³/3 at every corner where two
 *    chamfered edges meet and 3c³/4 where three meet (inclusion–exclusion of the edge prisms {s + t < c});
 *    on a turned end: π·c²·(R − c/3) (Pappus: triangle c²/2 at centroid radius R − c/3).
 *  - eccentric bore: π/4·d²·L plus its counterbore as for holes. Patterns: the sum over their copies.
 *  - internal thread: a hole of the modelled bore (D1) to the drill depth, with its entry chamfer.
 */
import { getMaterial, isMaterialKey } from "../materials";
import type {
  ChamferFeature,
  EccentricBoreFeature,
  HoleFeature,
  InternalThreadFeature,
  PatternableFeature,
  Point3,
  ResolvedFeature,
  ResolvedPart,
  SlotFeature,
} from "./features";
import { AXIS_LIST, availableDepth, axisOf, baseGeometry, stepAt, type BaseGeometry } from "./frame";
import { expandPattern } from "./patterns";
import { metricThread, TAP_RUN_OUT_PITCHES } from "./threads";

const PI = Math.PI;

export interface BoundingBox {
  min: Point3;
  max: Point3;
  /** Extents along x, y, z. */
  size: Point3;
}

/** Part-local bounding box of the base (cuts never make a part bigger). */
export function partBoundingBox(part: ResolvedPart): BoundingBox {
  const b = baseGeometry(part);
  return { min: { ...b.min }, max: { ...b.max }, size: { x: b.max.x - b.min.x, y: b.max.y - b.min.y, z: b.max.z - b.min.z } };
}

export interface StockEnvelope {
  form: "round" | "flat" | "plate" | "hex";
  /** Round or hex bar: diameter (across flats for hex) including allowance. */
  diameterMm?: number;
  /** Cut length including allowance (the longest extent for flat bar and plate). */
  lengthMm: number;
  /** Flat bar / plate: width and thickness including allowance. */
  widthMm?: number;
  thicknessMm?: number;
  /** The allowance added to every dimension (from the part's `stock.allowance`, default 0). */
  allowanceMm: number;
}

/**
 * The smallest stock the finished part fits in, plus the part's allowance on every dimension; choosing a
 * standard bar size from it is the cut list's job. Turned parts → round bar unless the part says hex;
 * blocks → flat bar (or plate when the part says so), sorted length ≥ width ≥ thickness.
 */
export function partStockEnvelope(part: ResolvedPart): StockEnvelope {
  const b = baseGeometry(part);
  const allowance = part.stock?.allowance ?? 0;
  if (b.kind === "turned") {
    const form = part.stock?.form === "hex" ? "hex" : "round";
    return { form, diameterMm: b.maxDiameter + allowance, lengthMm: b.lengthMm + allowance, allowanceMm: allowance };
  }
  const [t, w, l] = [b.max.x, b.max.y, b.max.z].sort((p, q) => p - q) as [number, number, number];
  const form = part.stock?.form === "plate" ? "plate" : part.stock?.form === "round" ? "round" : "flat";
  if (form === "round") {
    // A block from round bar: the bar must take the block's cross-section diagonal.
    return { form, diameterMm: Math.hypot(t, w) + allowance, lengthMm: l + allowance, allowanceMm: allowance };
  }
  return { form, lengthMm: l + allowance, widthMm: w + allowance, thicknessMm: t + allowance, allowanceMm: allowance };
}

/** Volume of the base alone. */
export function baseVolumeMm3(part: ResolvedPart): number {
  const b = baseGeometry(part);
  if (b.kind === "block") return b.max.x * b.max.y * b.max.z;
  return b.feature.steps.reduce((s, st) => s + (PI / 4) * st.diameter * st.diameter * st.length, 0);
}

/** Finished volume: the base less every feature's removed volume (features assumed not to overlap). */
export function partVolumeMm3(part: ResolvedPart): number {
  const b = baseGeometry(part);
  let v = baseVolumeMm3(part);
  for (const f of part.features.slice(1)) v -= removedVolumeMm3(f, b);
  return v;
}

/** Mass from the catalogue density (kg/m³ × mm³ × 1e-9). Throws for a material not in the catalogue. */
export function partMassKg(part: ResolvedPart, volumeMm3 = partVolumeMm3(part)): number {
  const material = getMaterial(part.material);
  return material.densityKgM3 * volumeMm3 * 1e-9;
}

/** Mass, or undefined when the part's material is not in the catalogue. */
export function partMassKgOrUndefined(part: ResolvedPart, volumeMm3?: number): number | undefined {
  return isMaterialKey(part.material) ? partMassKg(part, volumeMm3) : undefined;
}

// --- removed volume per feature ---

const disc = (d: number) => (PI / 4) * d * d;
const frustum = (d1: number, d2: number, t: number) => ((PI * t) / 12) * (d1 * d1 + d1 * d2 + d2 * d2);
/** Extra volume of a cone from Ø d1 at the face to Ø d2 over depth t, beyond the cylinder Ø d2. */
const coneExtra = (d1: number, d2: number, t: number) => frustum(d1, d2, t) - disc(d2) * t;

/** Volume a single cutting feature removes from the given base. */
export function removedVolumeMm3(f: ResolvedFeature, base: BaseGeometry): number {
  switch (f.kind) {
    case "block":
    case "turned":
      return 0;
    case "hole":
      return holeVolume(f, base);
    case "thread":
      return f.form === "internal" ? internalThreadVolume(f, base) : 0;
    case "slot":
      return slotVolume(f, base);
    case "pocket": {
      const area = f.shape.kind === "round" ? disc(f.shape.diameter) : f.shape.u * f.shape.v - (4 - PI) * (f.shape.cornerRadius ?? 0) ** 2;
      return area * f.depth;
    }
    case "step":
      return Math.abs(f.to.x - f.from.x) * Math.abs(f.to.y - f.from.y) * Math.abs(f.to.z - f.from.z);
    case "v-groove": {
      const length = base.max[f.along] - base.min[f.along];
      return f.depth * f.depth * Math.tan(((f.angleDeg / 2) * PI) / 180) * length;
    }
    case "chamfer":
      return chamferVolume(f, base);
    case "eccentric-bore":
      return eccentricBoreVolume(f, base);
    case "pattern-linear":
    case "pattern-circular":
      return expandPattern(f).reduce((s, copy) => s + removedVolumeMm3(copy as PatternableFeature, base), 0);
  }
}

/** Whether a hole on a turned part is a radial cross hole (±x / ±y). */
export function isRadial(base: BaseGeometry, direction: string): boolean {
  return base.kind === "turned" && axisOf(direction as HoleFeature["direction"]) !== "z";
}

/** Length of full diameter of a hole: its depth, or the material to the far side of the base box. */
export function holeLengthMm(f: Pick<HoleFeature, "at" | "direction" | "depth" | "through">, base: BaseGeometry): number {
  if (f.through || f.depth === undefined) return availableDepth(base, f.at, f.direction);
  return f.depth;
}

function holeVolume(f: HoleFeature, base: BaseGeometry): number {
  if (isRadial(base, f.direction)) return radialHoleVolume(f, base, f.diameter, f.through || f.depth === undefined ? undefined : f.depth);
  const d = f.diameter;
  let v = disc(d) * holeLengthMm(f, base);
  let outer = d;
  if (f.counterbore) {
    v += (disc(f.counterbore.diameter) - disc(d)) * f.counterbore.depth;
    outer = f.counterbore.diameter;
  }
  if (f.countersink) {
    const half = (((f.countersink.angleDeg ?? 90) / 2) * PI) / 180;
    const t = (f.countersink.diameter - d) / 2 / Math.tan(half);
    v += coneExtra(f.countersink.diameter, d, t);
  } else if (f.chamfer) {
    v += coneExtra(outer + 2 * f.chamfer, outer, f.chamfer);
  }
  return v;
}

/** Modelled bore and drill depth of an internal thread (bore D1, drill = depth + 3 pitches by default). */
export function internalThreadBore(f: InternalThreadFeature, base: BaseGeometry): { boreDiameterMm: number; drillDepthMm: number; through: boolean } {
  const t = metricThread(f.designation);
  const bore = f.boreDiameter ?? t?.internalMinorDiameterMm ?? NaN;
  if (f.through || f.depth === undefined) return { boreDiameterMm: bore, drillDepthMm: availableDepth(base, f.at, f.direction), through: true };
  const pitch = f.pitch ?? t?.pitchMm ?? NaN;
  return { boreDiameterMm: bore, drillDepthMm: f.drillDepth ?? f.depth + TAP_RUN_OUT_PITCHES * pitch, through: false };
}

function internalThreadVolume(f: InternalThreadFeature, base: BaseGeometry): number {
  const { boreDiameterMm: d, drillDepthMm, through } = internalThreadBore(f, base);
  if (isRadial(base, f.direction)) return radialHoleVolume(f, base, d, through ? undefined : drillDepthMm);
  let v = disc(d) * drillDepthMm;
  if (f.chamfer) v += coneExtra(d + 2 * f.chamfer, d, f.chamfer);
  return v;
}

function slotVolume(f: SlotFeature, base: BaseGeometry): number {
  const depth = f.through || f.depth === undefined ? availableDepth(base, f.at, f.direction) : f.depth;
  return (f.length * f.width + disc(f.width)) * depth;
}

function eccentricBoreVolume(f: EccentricBoreFeature, base: BaseGeometry): number {
  const total = base.kind === "turned" ? base.lengthMm : base.max.z;
  const length = f.through || f.depth === undefined ? total : f.depth;
  let v = disc(f.diameter) * length;
  if (f.counterbore) v += (disc(f.counterbore.diameter) - disc(f.diameter)) * f.counterbore.depth;
  return v;
}

function chamferVolume(f: ChamferFeature, base: BaseGeometry): number {
  const c = f.size;
  if (base.kind === "turned") {
    const faces = [...new Set(f.faces)];
    let v = 0;
    for (const face of faces) {
      const step = face === "+z" ? base.steps[base.steps.length - 1] : face === "-z" ? base.steps[0] : undefined;
      if (step) v += PI * c * c * (step.diameter / 2 - c / 3);
    }
    return v;
  }
  const t = chamferTopology(f.faces);
  let v = 0;
  for (const along of t.along) v += ((c * c) / 2) * (base.max[along] - base.min[along]);
  return v - (t.cornersOfTwo * c * c * c) / 3 - (t.cornersOfThree * 3 * c * c * c) / 4;
}

/** Which box edges a set of chamfered faces breaks (by the axis each runs along), and at how many corners two or three of them meet. */
interface ChamferTopology {
  along: Array<(typeof AXIS_LIST)[number]>;
  cornersOfTwo: number;
  cornersOfThree: number;
}

/** By the sorted face list: the topology depends only on which of the six faces are chamfered. */
const chamferTopologies = new Map<string, ChamferTopology>();

function chamferTopology(faces: readonly string[]): ChamferTopology {
  const unique = [...new Set(faces)].sort();
  const id = unique.join(" ");
  const known = chamferTopologies.get(id);
  if (known) return known;
  // Edges of the box: an edge runs along one axis at the min or max side of the other two.
  const edges = new Map<string, { along: (typeof AXIS_LIST)[number]; corners: string[] }>();
  for (const face of unique) {
    const n = axisOf(face as Parameters<typeof axisOf>[0]);
    const nSide = face[0] === "+" ? "max" : "min";
    for (const along of AXIS_LIST.filter((a) => a !== n)) {
      const other = AXIS_LIST.find((a) => a !== n && a !== along)!;
      for (const oSide of ["min", "max"] as const) {
        const sides: Record<string, string> = { [n]: nSide, [other]: oSide };
        const key = `${along}|${AXIS_LIST.filter((a) => a !== along).map((a) => `${a}${sides[a]}`).join(",")}`;
        const corners = (["min", "max"] as const).map((side) => AXIS_LIST.map((a) => (a === along ? side : sides[a])).join(","));
        edges.set(key, { along, corners });
      }
    }
  }
  const cornerCount = new Map<string, number>();
  for (const e of edges.values()) for (const k of e.corners) cornerCount.set(k, (cornerCount.get(k) ?? 0) + 1);
  const counts = [...cornerCount.values()];
  const topology: ChamferTopology = {
    along: [...edges.values()].map((e) => e.along),
    cornersOfTwo: counts.filter((n) => n === 2).length,
    cornersOfThree: counts.filter((n) => n === 3).length,
  };
  chamferTopologies.set(id, topology);
  return topology;
}

// --- radial cross holes in a turned step, by Gauss–Legendre quadrature ---

const GL = gaussLegendre(64);

function gaussLegendre(n: number): { x: number[]; w: number[] } {
  const x: number[] = [];
  const w: number[] = [];
  for (let i = 1; i <= n; i++) {
    let t = Math.cos((PI * (i - 0.25)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = t;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * t * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (t * p1 - p0)) / (t * t - 1);
      const dt = p1 / dp;
      t -= dt;
      if (Math.abs(dt) < 1e-15) break;
    }
    x.push(t);
    w.push(2 / ((1 - t * t) * dp * dp));
  }
  return { x, w };
}

/**
 * Removed volume of a radial hole of Ø d (axis ⟂ the part's axis, lateral offset o from it) in the step that
 * contains its axis height; `depth` undefined = through.
 */
function radialHoleVolume(f: { at: Point3; direction: HoleFeature["direction"] }, base: BaseGeometry, d: number, depth: number | undefined): number {
  if (base.kind !== "turned") return 0;
  const step = stepAt(base, f.at.z);
  if (!step) return 0;
  const R = step.diameter / 2;
  const r = d / 2;
  const o = axisOf(f.direction) === "x" ? f.at.y : f.at.x;
  return radialVolume(R, r, o, depth);
}

/** ∫ over the hole's cross-section of the material length along its axis (see the file header). */
export function radialVolume(R: number, r: number, o: number, depth: number | undefined): number {
  const entryAtAxis = Math.sqrt(Math.max(0, R * R - o * o));
  let sum = 0;
  for (let i = 0; i < GL.x.length; i++) {
    const theta = (GL.x[i]! * PI) / 2;
    const y = o + r * Math.sin(theta);
    const half = Math.sqrt(Math.max(0, R * R - y * y));
    const chord = depth === undefined ? 2 * half : Math.min(2 * half, Math.max(0, half - (entryAtAxis - depth)));
    const cos = Math.cos(theta);
    sum += GL.w[i]! * 2 * r * r * cos * cos * chord;
  }
  return (sum * PI) / 2;
}
