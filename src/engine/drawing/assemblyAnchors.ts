/**
 * Where each part's balloon leader ends in an assembly view: on a face of that part that the viewer
 * really sees, as far inside the part's visible patch as possible, so the dot cannot be mistaken for a
 * neighbouring part (ISO 6433: the leader ends in a dot on the item it names).
 *
 * The parts' triangles (placed in assembly coordinates) are rasterised into one depth buffer per view
 * (orthographic: the nearest triangle toward the viewer wins each cell). For each part, its visible cells
 * are those it won; the anchor is the visible cell farthest from any cell it did not win (a chamfer
 * distance transform, 8 neighbours), and the share is visible cells over the cells it covers unhidden.
 */
import { axisVector, depthInView, projectToView, type AssemblyAnchor, type ViewPoint } from "./projection";
import type { ViewFrame } from "./views";

/** One part's triangles in assembly coordinates: x, y, z per vertex; three vertex indices per triangle. */
export interface PartTriangles {
  partId: string;
  positions: ArrayLike<number>;
  indices: ArrayLike<number>;
}


/** At most this many cells along the longer side of a view (the grid is square). */
const MAX_CELLS = 240;
/** Never finer than this, model mm. */
const MIN_CELL_MM = 0.2;

interface Grid {
  minX: number;
  minY: number;
  cell: number;
  w: number;
  h: number;
}

function gridFor(points: ViewPoint[][]): Grid | undefined {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const ps of points)
    for (const p of ps) {
      minX = Math.min(minX, p.x);
      minY = Math.min(minY, p.y);
      maxX = Math.max(maxX, p.x);
      maxY = Math.max(maxY, p.y);
    }
  if (!Number.isFinite(minX) || !Number.isFinite(minY)) return undefined;
  const cell = Math.max(MIN_CELL_MM, Math.max(maxX - minX, maxY - minY) / MAX_CELLS);
  return { minX, minY, cell, w: Math.max(1, Math.ceil((maxX - minX) / cell) + 1), h: Math.max(1, Math.ceil((maxY - minY) / cell) + 1) };
}

/** Rasterises every triangle of every part: the winning part per cell, and which cells each part covers. */
function rasterise(parts: PartTriangles[], xy: ViewPoint[][], depth: Float64Array[], g: Grid): { owner: Int32Array; covered: Uint8Array[] } {
  const n = g.w * g.h;
  const zbuf = new Float64Array(n).fill(-Infinity);
  const owner = new Int32Array(n).fill(-1);
  const covered = parts.map(() => new Uint8Array(n));
  parts.forEach((part, pi) => {
    const pts = xy[pi]!;
    const dz = depth[pi]!;
    const cov = covered[pi]!;
    for (let t = 0; t + 2 < part.indices.length; t += 3) {
      const ia = part.indices[t]!;
      const ib = part.indices[t + 1]!;
      const ic = part.indices[t + 2]!;
      const a = pts[ia]!;
      const b = pts[ib]!;
      const c = pts[ic]!;
      const area = (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);
      if (Math.abs(area) < 1e-12) continue;
      const i0 = Math.max(0, Math.floor((Math.min(a.x, b.x, c.x) - g.minX) / g.cell));
      const i1 = Math.min(g.w - 1, Math.ceil((Math.max(a.x, b.x, c.x) - g.minX) / g.cell));
      const j0 = Math.max(0, Math.floor((Math.min(a.y, b.y, c.y) - g.minY) / g.cell));
      const j1 = Math.min(g.h - 1, Math.ceil((Math.max(a.y, b.y, c.y) - g.minY) / g.cell));
      for (let j = j0; j <= j1; j++) {
        const y = g.minY + j * g.cell;
        for (let i = i0; i <= i1; i++) {
          const x = g.minX + i * g.cell;
          // Barycentric weights of (x, y); inside when all three have the sign of the area.
          const wa = ((b.x - x) * (c.y - y) - (b.y - y) * (c.x - x)) / area;
          const wb = ((c.x - x) * (a.y - y) - (c.y - y) * (a.x - x)) / area;
          const wc = 1 - wa - wb;
          if (wa < -1e-9 || wb < -1e-9 || wc < -1e-9) continue;
          const k = j * g.w + i;
          cov[k] = 1;
          const z = wa * dz[ia]! + wb * dz[ib]! + wc * dz[ic]!;
          if (z > zbuf[k]!) {
            zbuf[k] = z;
            owner[k] = pi;
          }
        }
      }
    }
  });
  return { owner, covered };
}

/** Cells a part owns and their index range (i0…i1, j0…j1). */
interface Owned {
  count: number;
  i0: number;
  i1: number;
  j0: number;
  j1: number;
}

function ownedCells(owner: Int32Array, pi: number, g: Grid): Owned {
  const o: Owned = { count: 0, i0: g.w, i1: -1, j0: g.h, j1: -1 };
  for (let k = 0; k < owner.length; k++) {
    if (owner[k] !== pi) continue;
    const i = k % g.w;
    const j = (k - i) / g.w;
    o.count++;
    o.i0 = Math.min(o.i0, i);
    o.i1 = Math.max(o.i1, i);
    o.j0 = Math.min(o.j0, j);
    o.j1 = Math.max(o.j1, j);
  }
  return o;
}

/**
 * For the cells part `pi` owns, the chamfer distance (in cells, 1 and √2 steps) to the nearest cell it
 * does not own; worked only over the part's own cell range (outside it nothing is owned). Returns the
 * deepest cell and its distance.
 */
function deepestCell(owner: Int32Array, pi: number, g: Grid, o: Owned): { i: number; j: number; d: number } {
  const w = o.i1 - o.i0 + 1;
  const h = o.j1 - o.j0 + 1;
  const d = new Float64Array(w * h);
  for (let j = 0; j < h; j++) for (let i = 0; i < w; i++) d[j * w + i] = owner[(j + o.j0) * g.w + i + o.i0] === pi ? Infinity : 0;
  const D = Math.SQRT2;
  const at = (i: number, j: number) => (i < 0 || j < 0 || i >= w || j >= h ? 0 : d[j * w + i]!);
  for (let j = 0; j < h; j++)
    for (let i = 0; i < w; i++) {
      const k = j * w + i;
      if (d[k] === 0) continue;
      d[k] = Math.min(d[k]!, at(i - 1, j) + 1, at(i, j - 1) + 1, at(i - 1, j - 1) + D, at(i + 1, j - 1) + D);
    }
  let best = { i: 0, j: 0, d: 0 };
  for (let j = h - 1; j >= 0; j--)
    for (let i = w - 1; i >= 0; i--) {
      const k = j * w + i;
      if (d[k] === 0) continue;
      d[k] = Math.min(d[k]!, at(i + 1, j) + 1, at(i, j + 1) + 1, at(i + 1, j + 1) + D, at(i - 1, j + 1) + D);
      if (d[k]! >= best.d) best = { i: i + o.i0, j: j + o.j0, d: d[k]! };
    }
  return best;
}

/**
 * A visible anchor per part and view. Parts hidden in a view get no anchor for it (the caller keeps its
 * own fallback). `clearanceMm` is how far the anchor lies inside the part's visible patch, model mm;
 * `visibleShare` the part's visible fraction of its unhidden outline area in that view.
 */
export function visibleAnchors(parts: PartTriangles[], frames: ViewFrame[]): AssemblyAnchor[] {
  const out: AssemblyAnchor[] = [];
  for (const f of frames) {
    const toward = { towardViewer: axisVector(f.towardViewer) };
    const xy: ViewPoint[][] = [];
    const depth: Float64Array[] = [];
    for (const part of parts) {
      const n = Math.floor(part.positions.length / 3);
      const pts: ViewPoint[] = new Array<ViewPoint>(n);
      const dz = new Float64Array(n);
      for (let v = 0; v < n; v++) {
        const p = { x: part.positions[3 * v]!, y: part.positions[3 * v + 1]!, z: part.positions[3 * v + 2]! };
        pts[v] = projectToView(f, p);
        dz[v] = depthInView(toward, p);
      }
      xy.push(pts);
      depth.push(dz);
    }
    const g = gridFor(xy);
    if (!g) continue;
    const { owner, covered } = rasterise(parts, xy, depth, g);
    parts.forEach((part, pi) => {
      let total = 0;
      for (const c of covered[pi]!) total += c;
      const owned = ownedCells(owner, pi, g);
      if (owned.count === 0 || total === 0) return;
      const best = deepestCell(owner, pi, g, owned);
      out.push({
        partId: part.partId,
        view: f.name,
        point: { x: g.minX + best.i * g.cell, y: g.minY + best.j * g.cell },
        clearanceMm: best.d * g.cell,
        visibleShare: owned.count / total,
      });
    });
  }
  return out;
}
