/**
 * Leader callouts (ISO 129-1 §6 / ISO 128-22): a thin leader, inclined, from the feature to a short
 * reference line with the note written above it. The leader ends in an arrowhead on the feature's outline:
 * on the circle at 45° when a round feature is seen end-on, else at the anchor point.
 * Notes sit in rows above the view and its dimensions; each note takes the lowest row where it neither
 * overlaps another note nor has a leader run through another note's text.
 */
import type { CalloutRequest } from "../annotations/types";
import { sheetPoint, TEXT_HEIGHTS, type SheetShape, type SheetText } from "../model";
import { projectToView, type ProjectedView } from "../projection";
import { wrapText } from "../sheet/notes";
import { textWidthMm } from "../text/measure";
import { boxesOverlap, segmentHitsBox, type Box } from "./geometry";
import { arrowhead, line } from "./shapes";

const TEXT_H = TEXT_HEIGHTS.normal;
const LINE_PITCH_MM = 4;
const FIRST_GAP_MM = 6;
const SHOULDER_MM = 2;
// Wide enough for a fitted hole with limits and depth in inches on one line (about 64 mm at 2.5 mm).
const MAX_WIDTH_MM = 72;

interface PlacedCallout {
  text: Box;
  leader: [{ x: number; y: number }, { x: number; y: number }];
  row: number;
}

/** The point the leader touches, sheet mm (view origin at 0,0), and the outward direction there. */
function anchorOf(view: ProjectedView, c: CalloutRequest, scale: number): { x: number; y: number } {
  const towardAxis = (["x", "y", "z"] as const).find((a) => Math.abs(view.towardViewer[a]) > 0.5);
  if (c.round && c.round.axis === towardAxis) {
    const centre = projectToView(view, c.round.centre);
    const r = c.round.radiusMm * scale;
    return { x: centre.x * scale + r * Math.SQRT1_2, y: centre.y * scale + r * Math.SQRT1_2 };
  }
  const p = projectToView(view, c.anchor);
  return { x: p.x * scale, y: p.y * scale };
}

/**
 * Lays out callouts above `topEdge` (sheet y of the highest thing already drawn for the view).
 * Returns shapes in sheet mm with the view origin at 0,0.
 */
export function layoutCallouts(view: ProjectedView, callouts: CalloutRequest[], scale: number, topEdge: number): SheetShape[] {
  if (callouts.length === 0) return [];
  // Long notes wrap so one callout does not push the view off a sheet.
  const wrapped = callouts.map((c) => ({ ...c, lines: c.lines.flatMap((l) => wrapText(l, MAX_WIDTH_MM, TEXT_H).map((w, i) => (i === 0 ? w : `  ${w}`))) }));
  const maxLines = Math.max(...wrapped.map((c) => c.lines.length));
  const rowPitch = maxLines * LINE_PITCH_MM + 2;
  const items = wrapped.map((c) => ({ c, anchor: anchorOf(view, c, scale), width: Math.max(...c.lines.map((l) => textWidthMm(l, TEXT_H))) }));
  // Right to left: texts run to the right and leaders rise to the right, so each note further left climbs
  // over the ones already placed instead of through them.
  items.sort((a, b) => b.anchor.x - a.anchor.x);
  const placed: PlacedCallout[] = [];
  const shapes: SheetShape[] = [];
  for (const it of items) {
    for (let row = 0; row < 60; row++) {
      // After 20 rows give up on keeping leaders off other notes; only keep notes apart.
      const strict = row < 20;
      const y = topEdge + FIRST_GAP_MM + row * rowPitch;
      const rise = y - it.anchor.y;
      // Leaders at about 63° (never horizontal or vertical, ISO 128-22); long rises are capped.
      const xs = it.anchor.x + Math.min(rise * 0.5, 12) + 2;
      const leader: PlacedCallout["leader"] = [it.anchor, { x: xs, y }];
      const n = it.c.lines.length;
      const text: Box = { minX: xs - 0.5, maxX: xs + SHOULDER_MM + it.width + 1, minY: y - 0.5, maxY: y + 1 + (n - 1) * LINE_PITCH_MM + TEXT_H * 1.1 };
      const clash = placed.some(
        (q) =>
          boxesOverlap(text, q.text, 1.5) ||
          (strict && (segmentHitsBox(leader[0], leader[1], shrink(q.text)) || segmentHitsBox(q.leader[0], q.leader[1], shrink(text)))),
      );
      if (clash && row < 59) continue;
      placed.push({ text, leader, row });
      const len = Math.hypot(xs - it.anchor.x, rise);
      const ux = (it.anchor.x - xs) / len;
      const uy = (it.anchor.y - y) / len;
      shapes.push(line("dimension", sheetPoint(xs, y), sheetPoint(it.anchor.x, it.anchor.y)));
      shapes.push(arrowhead(sheetPoint(it.anchor.x, it.anchor.y), ux, uy));
      shapes.push(line("dimension", sheetPoint(xs, y), sheetPoint(xs + SHOULDER_MM + it.width, y)));
      it.c.lines.forEach((l, k) => {
        const t: SheetText = {
          type: "text",
          layer: "dimension",
          role: "callout",
          at: sheetPoint(xs + SHOULDER_MM, y + 1 + (n - 1 - k) * LINE_PITCH_MM),
          text: l,
          heightMm: TEXT_H,
          align: "left",
        };
        shapes.push(t);
      });
      break;
    }
  }
  return shapes;
}

function shrink(b: Box): Box {
  return { minX: b.minX + 0.2, minY: b.minY + 0.2, maxX: b.maxX - 0.2, maxY: b.maxY - 0.2 };
}
