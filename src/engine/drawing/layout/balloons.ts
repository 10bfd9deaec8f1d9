/**
 * Item balloons of an assembly view (ISO 6433): a circle with the item number in a row above the view, a
 * thin leader from the circle to a dot on the part. Leaders never cross one another and never run
 * through another balloon:
 *  1. each balloon starts over its anchor (a little to the right, so leaders lean rather than stand
 *     vertical, ISO 128-22), and the row is spread so neighbours keep a gap, moving each as little as
 *     possible (clusters of overlapping balloons are centred on their anchors);
 *  2. while two leaders cross, their balloons swap places. A swap always shortens the total leader length
 *     (of two crossing segments, the uncrossed pair is shorter by the triangle inequality), so this ends,
 *     and it ends with no crossings (the shortest assignment has none);
 *  3. a leader that still passes through a neighbouring balloon (a shallow leader near the row) lifts the
 *     row, which makes every leader steeper, and the layout is tried again.
 * All coordinates are sheet mm with the view origin at (0, 0).
 */
import { sheetPoint, TEXT_HEIGHTS, type SheetShape } from "../model";
import type { Box } from "./geometry";
import { line } from "./shapes";

export const BALLOON_RADIUS_MM = 4.5;
/** Gap between neighbouring balloons in the row. */
const BALLOON_GAP_MM = 3;
/** Height of the row's centre line above the view's top edge, and each lift when leaders clip a balloon. */
const ROW_RISE_MM = 12;
const ROW_LIFT_MM = 6;
const MAX_LIFTS = 6;
/** How far right of its anchor a balloon would like to sit. */
const LEAN_MM = 6;
const DOT_RADIUS_MM = 0.5;

export interface BalloonAnchor {
  item: number;
  x: number;
  y: number;
}

export interface PlacedBalloon {
  item: number;
  anchor: { x: number; y: number };
  centre: { x: number; y: number };
}

type Pt = { x: number; y: number };

/** Twice the signed area of a, b, c: > 0 when c lies left of a→b. */
function orient(a: Pt, b: Pt, c: Pt): number {
  return (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);
}

function onSegment(a: Pt, b: Pt, p: Pt): boolean {
  return Math.min(a.x, b.x) - 1e-9 <= p.x && p.x <= Math.max(a.x, b.x) + 1e-9 && Math.min(a.y, b.y) - 1e-9 <= p.y && p.y <= Math.max(a.y, b.y) + 1e-9;
}

/** Do segments p1–p2 and q1–q2 meet (touching counts)? */
export function segmentsIntersect(p1: Pt, p2: Pt, q1: Pt, q2: Pt): boolean {
  const d1 = orient(q1, q2, p1);
  const d2 = orient(q1, q2, p2);
  const d3 = orient(p1, p2, q1);
  const d4 = orient(p1, p2, q2);
  const eps = 1e-9;
  if (((d1 > eps && d2 < -eps) || (d1 < -eps && d2 > eps)) && ((d3 > eps && d4 < -eps) || (d3 < -eps && d4 > eps))) return true;
  if (Math.abs(d1) <= eps && onSegment(q1, q2, p1)) return true;
  if (Math.abs(d2) <= eps && onSegment(q1, q2, p2)) return true;
  if (Math.abs(d3) <= eps && onSegment(p1, p2, q1)) return true;
  if (Math.abs(d4) <= eps && onSegment(p1, p2, q2)) return true;
  return false;
}

/** Distance from point c to segment a–b. */
function distanceToSegment(a: Pt, b: Pt, c: Pt): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 < 1e-18 ? 0 : Math.max(0, Math.min(1, ((c.x - a.x) * dx + (c.y - a.y) * dy) / len2));
  return Math.hypot(a.x + t * dx - c.x, a.y + t * dy - c.y);
}

/** The drawn leader of a balloon: from the circle's rim toward the anchor, to the anchor. */
export function leaderOf(b: PlacedBalloon): [Pt, Pt] {
  const len = Math.hypot(b.anchor.x - b.centre.x, b.anchor.y - b.centre.y);
  if (len < 1e-9) return [b.centre, b.anchor];
  const ux = (b.anchor.x - b.centre.x) / len;
  const uy = (b.anchor.y - b.centre.y) / len;
  return [{ x: b.centre.x + ux * BALLOON_RADIUS_MM, y: b.centre.y + uy * BALLOON_RADIUS_MM }, b.anchor];
}

/**
 * Centres along a row for wanted positions `want` (sorted), at least `pitch` apart, each cluster of
 * balloons pushed together centred on the mean of its wishes (least squares for a fixed order).
 */
function spreadRow(want: number[], pitch: number): number[] {
  const blocks: { first: number; count: number; sum: number }[] = [];
  const start = (b: { first: number; count: number; sum: number }) => b.sum / b.count;
  want.forEach((w, i) => {
    // Each block holds balloons first…first+count-1 at start, start+pitch, …; sum is Σ (want − k·pitch).
    let block = { first: i, count: 1, sum: w };
    for (;;) {
      const prev = blocks[blocks.length - 1];
      if (!prev || start(prev) + prev.count * pitch <= start(block) + 1e-9) break;
      blocks.pop();
      block = { first: prev.first, count: prev.count + block.count, sum: prev.sum + block.sum - block.count * prev.count * pitch };
    }
    blocks.push(block);
  });
  const out: number[] = [];
  for (const b of blocks) for (let k = 0; k < b.count; k++) out.push(start(b) + k * pitch);
  return out;
}

/** Swaps balloon places until no two leaders cross (each swap shortens the total; see the file note). */
function uncross(balloons: PlacedBalloon[]): void {
  const limit = balloons.length * balloons.length * 4 + 8;
  for (let round = 0; round < limit; round++) {
    let swapped = false;
    for (let i = 0; i < balloons.length; i++) {
      for (let j = i + 1; j < balloons.length; j++) {
        const a = balloons[i]!;
        const b = balloons[j]!;
        if (!segmentsIntersect(a.centre, a.anchor, b.centre, b.anchor)) continue;
        const before = Math.hypot(a.centre.x - a.anchor.x, a.centre.y - a.anchor.y) + Math.hypot(b.centre.x - b.anchor.x, b.centre.y - b.anchor.y);
        const after = Math.hypot(b.centre.x - a.anchor.x, b.centre.y - a.anchor.y) + Math.hypot(a.centre.x - b.anchor.x, a.centre.y - b.anchor.y);
        // Segments that only touch at a shared anchor cannot be helped by a swap.
        if (after >= before - 1e-9) continue;
        [a.centre, b.centre] = [b.centre, a.centre];
        swapped = true;
      }
    }
    if (!swapped) return;
  }
}

function clipsABalloon(balloons: PlacedBalloon[]): boolean {
  return balloons.some((b) => {
    const [from, to] = leaderOf(b);
    return balloons.some((o) => o !== b && distanceToSegment(from, to, o.centre) < BALLOON_RADIUS_MM + 0.5);
  });
}

/** Balloon places for anchors of one view whose line work spans `box`. */
export function placeBalloons(anchors: BalloonAnchor[], box: Box): PlacedBalloon[] {
  if (anchors.length === 0) return [];
  const sorted = [...anchors].sort((a, b) => a.x - b.x || a.y - b.y || a.item - b.item);
  const xs = spreadRow(
    sorted.map((a) => a.x + LEAN_MM),
    2 * BALLOON_RADIUS_MM + BALLOON_GAP_MM,
  );
  let placed: PlacedBalloon[] = [];
  for (let lift = 0; lift <= MAX_LIFTS; lift++) {
    const cy = box.maxY + ROW_RISE_MM + lift * ROW_LIFT_MM;
    placed = sorted.map((a, i) => ({ item: a.item, anchor: { x: a.x, y: a.y }, centre: { x: xs[i]!, y: cy } }));
    uncross(placed);
    if (!clipsABalloon(placed)) break;
  }
  return placed.sort((a, b) => a.item - b.item);
}

/** The balloons' shapes: circle, number, leader and the dot on the part. */
export function balloonShapes(balloons: PlacedBalloon[]): SheetShape[] {
  const shapes: SheetShape[] = [];
  for (const b of balloons) {
    const [from, to] = leaderOf(b);
    shapes.push({ type: "circle", layer: "dimension", centre: sheetPoint(b.centre.x, b.centre.y), radius: BALLOON_RADIUS_MM });
    shapes.push({
      type: "text",
      layer: "dimension",
      role: "label",
      at: sheetPoint(b.centre.x, b.centre.y - TEXT_HEIGHTS.large / 2),
      text: String(b.item),
      heightMm: TEXT_HEIGHTS.large,
      align: "centre",
    });
    shapes.push(line("dimension", sheetPoint(from.x, from.y), sheetPoint(to.x, to.y)));
    shapes.push({
      type: "fill",
      layer: "dimension",
      points: Array.from({ length: 8 }, (_, k) => sheetPoint(to.x + DOT_RADIUS_MM * Math.cos((k * Math.PI) / 4), to.y + DOT_RADIUS_MM * Math.sin((k * Math.PI) / 4))),
    });
  }
  return shapes;
}
