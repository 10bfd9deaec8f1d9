/**
 * Linear dimensions around one view (ISO 129-1):
 *  - dimension lines outside the view, parallel to the measured length, the first 8 mm from the outline
 *    and each further one 7 mm out (common practice; ISO 129-1 asks for even spacing and enough room for
 *    the text), shorter dimensions inside longer ones so extension lines do not cross dimension text;
 *  - extension lines with a 1 mm gap from the feature and running 2 mm past the dimension line;
 *  - filled arrowheads, outside the extension lines when the dimension is too short for them;
 *  - text upright (read from the bottom of the sheet), above horizontal dimension lines and beside
 *    vertical ones on the side away from the view.
 * Each dimension goes on the side of the view where its extension lines do not have to cross the part's
 * visible outline; if both sides cross, the fewer crossings win, then bottom or left.
 */
import type { LinearRequest, OriginRegion } from "../annotations/types";
import { sheetPoint, type SheetShape, type SheetText, TEXT_HEIGHTS } from "../model";
import { projectToView, type ProjectedView } from "../projection";
import { textWidthMm } from "../text/measure";
import { boxesOverlap, crossings, segmentHitsBox, type Box } from "./geometry";
import { arrowhead, ARROW_LENGTH_MM, line, textBox } from "./shapes";

export const FIRST_ROW_MM = 8;
export const ROW_PITCH_MM = 7;
export const EXT_GAP_MM = 1;
export const EXT_OVERSHOOT_MM = 2;
const TEXT_H = TEXT_HEIGHTS.large;
const TEXT_LIFT_MM = 1;

type Side = "bottom" | "top" | "left" | "right";

interface Placed {
  req: LinearRequest;
  side: Side;
  /** Sheet coordinates along the measured direction, s1 < s2. */
  s1: number;
  s2: number;
  /** Sheet coordinate (across) where each extension line starts. */
  o1: number;
  o2: number;
  textW: number;
  slot: number;
  /** Across coordinate of the dimension line, set when placed. */
  at: number;
  textBox: Box;
  extent: Box;
}

function regionAcross(view: ProjectedView, region: OriginRegion, horizontal: boolean): { lo: number; hi: number; clear: number } {
  const a = projectToView(view, region.min);
  const b = projectToView(view, region.max);
  const lo = horizontal ? Math.min(a.y, b.y) : Math.min(a.x, b.x);
  const hi = horizontal ? Math.max(a.y, b.y) : Math.max(a.x, b.x);
  return { lo, hi, clear: region.clearanceMm ?? 0 };
}

/** Lays out the linear dimensions of one view around `viewBox` (sheet mm, view origin at 0,0). */
export function layoutLinear(view: ProjectedView, requests: LinearRequest[], scale: number, viewBox: Box): SheetShape[] {
  const bySide: Record<Side, Placed[]> = { bottom: [], top: [], left: [], right: [] };
  for (const req of requests) {
    const horizontal = view.right[1] === req.axis;
    if (!horizontal && view.up[1] !== req.axis) continue;
    const sign = (horizontal ? view.right[0] : view.up[0]) === "-" ? -1 : 1;
    const va = sign * req.a;
    const vb = sign * req.b;
    if (Math.abs(va - vb) < 1e-6) continue;
    const ra = regionAcross(view, req.originA, horizontal);
    const rb = regionAcross(view, req.originB, horizontal);
    const b = view.bounds;
    const candidates: Side[] = horizontal ? ["bottom", "top"] : ["left", "right"];
    let best: { side: Side; n: number; o1: number; o2: number } | undefined;
    for (const side of candidates) {
      const low = side === "bottom" || side === "left";
      const edge = horizontal ? (low ? b.minY : b.maxY) : low ? b.minX : b.maxX;
      // The extension line starts at the feature (past its clearance) on the side facing this band.
      const start = (r: typeof ra) => (low ? r.lo - r.clear : r.hi + r.clear);
      const pa = start(ra);
      const pb = start(rb);
      const seg = (along: number, from: number) =>
        horizontal
          ? crossings({ x: along, y: from }, { x: along, y: edge }, view.edges)
          : crossings({ x: from, y: along }, { x: edge, y: along }, view.edges);
      const n = seg(va, pa) + seg(vb, pb);
      if (!best || n < best.n) best = { side, n, o1: pa, o2: pb };
    }
    const text = req.text;
    const textW = textWidthMm(text, TEXT_H);
    const [s1, s2, o1, o2] = va < vb ? [va, vb, best!.o1, best!.o2] : [vb, va, best!.o2, best!.o1];
    const dir = best!.side === "bottom" || best!.side === "left" ? -1 : 1;
    bySide[best!.side].push({
      req,
      side: best!.side,
      s1: s1 * scale,
      s2: s2 * scale,
      o1: o1 * scale + dir * EXT_GAP_MM,
      o2: o2 * scale + dir * EXT_GAP_MM,
      textW,
      slot: -1,
      at: 0,
      textBox: { minX: 0, minY: 0, maxX: 0, maxY: 0 },
      extent: { minX: 0, minY: 0, maxX: 0, maxY: 0 },
    });
  }
  const shapes: SheetShape[] = [];
  for (const side of ["bottom", "top", "left", "right"] as Side[]) {
    const list = dedupe(bySide[side]);
    if (list.length === 0) continue;
    shapes.push(...packSide(side, list, viewBox));
  }
  return shapes;
}

/** One dimension per measured span on a side (two features at the same position share it). */
function dedupe(list: Placed[]): Placed[] {
  const out: Placed[] = [];
  for (const p of list) if (!out.some((q) => Math.abs(q.s1 - p.s1) < 1e-6 && Math.abs(q.s2 - p.s2) < 1e-6)) out.push(p);
  return out;
}

function extensionLines(p: Placed, at: number): [{ x: number; y: number }, { x: number; y: number }][] {
  const horizontal = p.side === "bottom" || p.side === "top";
  const pt = (along: number, across: number) => (horizontal ? { x: along, y: across } : { x: across, y: along });
  return [
    [pt(p.s1, p.o1), pt(p.s1, at)],
    [pt(p.s2, p.o2), pt(p.s2, at)],
  ];
}

/**
 * Geometry of one dimension placed at across-coordinate `at`. `textAlong` moves the text centre along the
 * dimension line (default: the middle), so it can dodge extension lines of dimensions further out.
 */
function geometry(p: Placed, at: number, textAlong?: number): { shapes: SheetShape[]; text: SheetText; textBox: Box; extent: Box } {
  const horizontal = p.side === "bottom" || p.side === "top";
  const dir = p.side === "bottom" || p.side === "left" ? -1 : 1;
  const pt = (along: number, across: number) => (horizontal ? sheetPoint(along, across) : sheetPoint(across, along));
  const len = p.s2 - p.s1;
  const arrowsInside = len >= 2 * ARROW_LENGTH_MM + 1;
  const shapes: SheetShape[] = [];
  // Extension lines, from the gap at the feature to just past the dimension line.
  shapes.push(line("dimension", pt(p.s1, p.o1), pt(p.s1, at + dir * EXT_OVERSHOOT_MM)));
  shapes.push(line("dimension", pt(p.s2, p.o2), pt(p.s2, at + dir * EXT_OVERSHOOT_MM)));
  const ext = arrowsInside ? 0 : ARROW_LENGTH_MM + 2;
  const mid = textAlong ?? (p.s1 + p.s2) / 2;
  let text: SheetText;
  let lineFrom = p.s1 - ext;
  let lineTo = p.s2 + ext;
  if (horizontal) {
    const fits = len >= p.textW + 2;
    if (fits) {
      text = { type: "text", layer: "dimension", role: "dimension", at: sheetPoint(mid, at + TEXT_LIFT_MM), text: p.req.text, heightMm: TEXT_H, align: "centre" };
    } else {
      // Too short for its text: the text sits beyond the right-hand arrow, on an extended dimension line.
      const x = textAlong ?? p.s2 + ext + 1 + p.textW / 2;
      text = { type: "text", layer: "dimension", role: "dimension", at: sheetPoint(x, at + TEXT_LIFT_MM), text: p.req.text, heightMm: TEXT_H, align: "centre" };
      lineFrom = Math.min(lineFrom, x - p.textW / 2 - 0.5);
      lineTo = Math.max(lineTo, x + p.textW / 2 + 0.5);
    }
  } else {
    const x = at + dir * TEXT_LIFT_MM;
    text = { type: "text", layer: "dimension", role: "dimension", at: sheetPoint(x, mid - TEXT_H / 2), text: p.req.text, heightMm: TEXT_H, align: dir < 0 ? "right" : "left" };
    lineFrom = Math.min(lineFrom, mid - TEXT_H / 2);
    lineTo = Math.max(lineTo, mid + TEXT_H / 2);
  }
  shapes.push(line("dimension", pt(lineFrom, at), pt(lineTo, at)));
  const u = arrowsInside ? 1 : -1;
  shapes.push(horizontal ? arrowhead(pt(p.s1, at), -u, 0) : arrowhead(pt(p.s1, at), 0, -u));
  shapes.push(horizontal ? arrowhead(pt(p.s2, at), u, 0) : arrowhead(pt(p.s2, at), 0, u));
  const tb = textBox(text);
  const extent = horizontal
    ? { minX: Math.min(lineFrom, tb.minX), maxX: Math.max(lineTo, tb.maxX), minY: Math.min(at, tb.minY) - 0.5, maxY: Math.max(at, tb.maxY) + 0.5 }
    : { minX: Math.min(at, tb.minX) - 0.5, maxX: Math.max(at, tb.maxX) + 0.5, minY: Math.min(lineFrom, tb.minY), maxY: Math.max(lineTo, tb.maxY) };
  return { shapes: [...shapes, text], text, textBox: tb, extent };
}

/** Candidate text centres along the dimension line, the middle first, then stepping outward. */
function textCandidates(p: Placed): (number | undefined)[] {
  const horizontal = p.side === "bottom" || p.side === "top";
  const half = (horizontal ? p.textW : TEXT_H) / 2;
  const lo = p.s1 + ARROW_LENGTH_MM + half;
  const hi = p.s2 - ARROW_LENGTH_MM - half;
  const out: (number | undefined)[] = [undefined];
  const mid = (p.s1 + p.s2) / 2;
  for (let d = 1; d < 200 && (mid - d >= lo || mid + d <= hi); d += 1) {
    if (mid + d <= hi) out.push(mid + d);
    if (mid - d >= lo) out.push(mid - d);
  }
  // Outside either end as a last resort.
  out.push(p.s2 + ARROW_LENGTH_MM + 3 + half, p.s1 - ARROW_LENGTH_MM - 3 - half);
  return out;
}

function packSide(side: Side, list: Placed[], viewBox: Box): SheetShape[] {
  const horizontal = side === "bottom" || side === "top";
  const dir = side === "bottom" || side === "left" ? -1 : 1;
  const edge = horizontal ? (dir < 0 ? viewBox.minY : viewBox.maxY) : dir < 0 ? viewBox.minX : viewBox.maxX;
  // Upright text beside vertical dimensions: every column is as wide as the widest text on this side.
  const pitch = horizontal ? ROW_PITCH_MM : Math.max(ROW_PITCH_MM, Math.max(...list.map((p) => p.textW)) + TEXT_LIFT_MM + 3);
  const order = [...list].sort((a, b) => {
    const ra = a.req.role === "overall" ? 1 : 0;
    const rb = b.req.role === "overall" ? 1 : 0;
    return ra - rb || a.s2 - a.s1 - (b.s2 - b.s1) || a.s1 - b.s1;
  });
  // 1. Rows (columns): the first one where the dimension does not overlap another in the same row.
  const placed: Placed[] = [];
  for (const p of order) {
    for (let slot = 0; ; slot++) {
      const at = edge + dir * (FIRST_ROW_MM + slot * pitch);
      const g = geometry(p, at);
      if (placed.some((q) => q.slot === slot && boxesOverlap(g.extent, q.extent, 1.5))) continue;
      Object.assign(p, { slot, at, textBox: g.textBox, extent: g.extent });
      placed.push(p);
      break;
    }
  }
  // 2. Text positions: dodge the extension lines of dimensions further out, which cross this row.
  const shapes: SheetShape[] = [];
  for (const p of placed) {
    const outer = placed.filter((q) => q.slot > p.slot).flatMap((q) => extensionLines(q, q.at));
    const sameRow = placed.filter((q) => q.slot === p.slot && q !== p);
    let chosen = geometry(p, p.at);
    for (const c of textCandidates(p)) {
      const g = geometry(p, p.at, c);
      const crossed = outer.some(([a, b]) => segmentHitsBox(a, b, g.textBox));
      const overlaps = sameRow.some((q) => boxesOverlap(g.textBox, q.extent, 0.5));
      if (!crossed && !overlaps) {
        chosen = g;
        break;
      }
    }
    shapes.push(...chosen.shapes);
  }
  return shapes;
}
