/**
 * The notes block and the sheet frame.
 */
import { sheetPoint, TEXT_HEIGHTS, type SheetPoint, type SheetShape, type SheetSize } from "../model";
import { textWidthMm } from "../text/measure";
import { frameRect } from "../sheets";

const NOTE_H = TEXT_HEIGHTS.normal;
const NOTE_PITCH_MM = 4.2;

/** Greedy word wrap to `widthMm` at capital height `heightMm`. */
export function wrapText(text: string, widthMm: number, heightMm: number): string[] {
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let current = "";
  for (const w of words) {
    const next = current ? `${current} ${w}` : w;
    if (current && textWidthMm(next, heightMm) > widthMm) {
      lines.push(current);
      current = w;
    } else current = next;
  }
  if (current) lines.push(current);
  return lines;
}

/** Height a notes block of `notes` takes at `widthMm`. */
export function notesHeight(notes: string[], widthMm: number): number {
  if (notes.length === 0) return 0;
  const lines = notes.reduce((n, note, i) => n + wrapText(`${i + 1}. ${note}`, widthMm, NOTE_H).length, 0);
  return 6 + lines * NOTE_PITCH_MM;
}

/** Numbered notes with a heading, bottom-left corner at `corner`, wrapped to `widthMm`. */
export function notesBlock(notes: string[], corner: SheetPoint, widthMm: number): SheetShape[] {
  if (notes.length === 0) return [];
  const shapes: SheetShape[] = [];
  const all = notes.map((note, i) => wrapText(`${i + 1}. ${note}`, widthMm, NOTE_H).map((l, k) => (k === 0 ? l : `    ${l}`)));
  let y = corner.y + notesHeight(notes, widthMm) - 4;
  shapes.push({ type: "text", layer: "text", role: "note", at: sheetPoint(corner.x, y), text: "Notes", heightMm: TEXT_HEIGHTS.large, align: "left", weight: "bold" });
  y -= 6;
  for (const lines of all) {
    for (const l of lines) {
      shapes.push({ type: "text", layer: "text", role: "note", at: sheetPoint(corner.x, y), text: l, heightMm: NOTE_H, align: "left" });
      y -= NOTE_PITCH_MM;
    }
  }
  return shapes;
}

/** The trimmed-sheet border and the frame (ISO 5457), with centring marks at the middle of each side. */
export function frame(size: SheetSize): SheetShape[] {
  const { min, max } = frameRect(size);
  const midX = (min.x + max.x) / 2;
  const midY = (min.y + max.y) / 2;
  return [
    {
      type: "polyline",
      layer: "frame",
      closed: true,
      points: [sheetPoint(min.x, min.y), sheetPoint(max.x, min.y), sheetPoint(max.x, max.y), sheetPoint(min.x, max.y)],
    },
    { type: "line", layer: "frame", from: sheetPoint(midX, max.y), to: sheetPoint(midX, size.heightMm - 5) },
    { type: "line", layer: "frame", from: sheetPoint(midX, min.y), to: sheetPoint(midX, 5) },
    { type: "line", layer: "frame", from: sheetPoint(min.x, midY), to: sheetPoint(5, midY) },
    { type: "line", layer: "frame", from: sheetPoint(max.x, midY), to: sheetPoint(size.widthMm - 5, midY) },
  ];
}

/** "NOT CHECKED — ERRORS" in a box, centred on `centre`. */
export function errorStamp(centre: SheetPoint): SheetShape[] {
  const text = "NOT CHECKED — ERRORS";
  const h = TEXT_HEIGHTS.title;
  const w = textWidthMm(text, h, "bold") + 8;
  const bh = h + 6;
  const x0 = centre.x - w / 2;
  const y0 = centre.y - bh / 2;
  return [
    { type: "polyline", layer: "stamp", closed: true, points: [sheetPoint(x0, y0), sheetPoint(x0 + w, y0), sheetPoint(x0 + w, y0 + bh), sheetPoint(x0, y0 + bh)] },
    { type: "text", layer: "stamp", role: "stamp", at: sheetPoint(centre.x, centre.y - h / 2), text, heightMm: h, align: "centre", weight: "bold" },
  ];
}

export const STAMP_HEIGHT_MM = TEXT_HEIGHTS.title + 6;
