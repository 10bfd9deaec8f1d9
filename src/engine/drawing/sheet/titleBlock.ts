/**
 * The title block (ISO 7200): 180 mm wide at the bottom right corner of the frame, with the mandatory
 * fields (legal owner, identification/drawing number, date of issue, sheet number, title, creator,
 * approval, document type) and the ones a part drawing needs (revision, scale, projection method
 * symbol, material, mass, units, general tolerances). Labels in 1.8 mm lettering, values 2.5–5 mm.
 */
import type { ProjectionMethod } from "../layout/arrange";
import { sheetPoint, TEXT_HEIGHTS, type SheetPoint, type SheetShape, type SheetText } from "../model";
import { textWidthMm, type FontWeight } from "../text/measure";
import { projectionSymbol } from "./projectionSymbol";

export const TITLE_BLOCK_WIDTH_MM = 180;
export const TITLE_BLOCK_HEIGHT_MM = 36;

export interface TitleBlockFields {
  title: string;
  /** "Part drawing" / "Assembly drawing" plus where it comes from. */
  documentType: string;
  drawingNumber: string;
  revision: string;
  owner: string;
  material: string;
  mass: string;
  generalTolerance: string;
  units: string;
  scale: string;
  projection: ProjectionMethod;
  drawnBy: string;
  date: string;
  approved: string;
  /** "1 of 4". */
  sheet: string;
}

interface Cell {
  x: number;
  y: number;
  w: number;
  h: number;
  label: string;
  value?: string;
  valueHeight?: number;
  bold?: boolean;
}

/** Shortens text with an ellipsis until it fits `widthMm` at `heightMm`. */
export function fitText(text: string, widthMm: number, heightMm: number, weight?: FontWeight): string {
  if (textWidthMm(text, heightMm, weight) <= widthMm) return text;
  let t = text;
  while (t.length > 1 && textWidthMm(`${t}…`, heightMm, weight) > widthMm) t = t.slice(0, -1);
  return `${t.trimEnd()}…`;
}

/**
 * The lettering height for a value: its own, or the next smaller ISO 3098 height when that makes a long
 * title fit whole (a title is better smaller than cut short).
 */
function fittingHeight(text: string, widthMm: number, heightMm: number, weight?: FontWeight): number {
  if (heightMm <= TEXT_HEIGHTS.large || textWidthMm(text, heightMm, weight) <= widthMm) return heightMm;
  return TEXT_HEIGHTS.large;
}

/** The title block with its bottom-right corner at `corner` (the frame's inner corner). */
export function titleBlock(f: TitleBlockFields, corner: SheetPoint): SheetShape[] {
  const x0 = corner.x - TITLE_BLOCK_WIDTH_MM;
  const y0 = corner.y;
  const cells: Cell[] = [
    // Top row: what the part is made of and to what accuracy.
    { x: 0, y: 27, w: 60, h: 9, label: "Material", value: f.material },
    { x: 60, y: 27, w: 30, h: 9, label: "Mass", value: f.mass },
    { x: 90, y: 27, w: 50, h: 9, label: "General tolerances", value: f.generalTolerance },
    { x: 140, y: 27, w: 40, h: 9, label: "Units", value: f.units },
    // Middle row: who, when, scale and projection.
    { x: 0, y: 18, w: 40, h: 9, label: "Drawn by", value: f.drawnBy },
    { x: 40, y: 18, w: 28, h: 9, label: "Date", value: f.date },
    { x: 68, y: 18, w: 37, h: 9, label: "Approved", value: f.approved },
    { x: 105, y: 18, w: 20, h: 9, label: "Scale", value: f.scale },
    { x: 125, y: 18, w: 55, h: 9, label: `Projection: ${f.projection === "first" ? "first" : "third"} angle` },
    // Identification zone (ISO 7200 §4: bottom right).
    { x: 0, y: 6, w: 110, h: 12, label: "Title", value: f.title, valueHeight: TEXT_HEIGHTS.title, bold: true },
    { x: 0, y: 0, w: 110, h: 6, label: "", value: `${f.documentType} · ${f.owner}`, valueHeight: TEXT_HEIGHTS.small },
    { x: 110, y: 9, w: 70, h: 9, label: "Drawing number", value: f.drawingNumber, bold: true },
    { x: 110, y: 0, w: 30, h: 9, label: "Revision", value: f.revision },
    { x: 140, y: 0, w: 40, h: 9, label: "Sheet", value: f.sheet },
  ];
  const shapes: SheetShape[] = [];
  for (const c of cells) {
    const cx = x0 + c.x;
    const cy = y0 + c.y;
    shapes.push({
      type: "polyline",
      layer: "frame",
      closed: true,
      points: [sheetPoint(cx, cy), sheetPoint(cx + c.w, cy), sheetPoint(cx + c.w, cy + c.h), sheetPoint(cx, cy + c.h)],
    });
    if (c.label) {
      shapes.push({ type: "text", layer: "text", role: "label", at: sheetPoint(cx + 1, cy + c.h - 2.6), text: c.label, heightMm: TEXT_HEIGHTS.small, align: "left" });
    }
    if (c.value !== undefined) {
      const weight = c.bold ? ("bold" as const) : undefined;
      const vh = fittingHeight(c.value, c.w - 3, c.valueHeight ?? TEXT_HEIGHTS.normal, weight);
      const t: SheetText = {
        type: "text",
        layer: "text",
        role: "title",
        at: sheetPoint(cx + 1.5, cy + (c.label ? 1.6 : (c.h - vh) / 2)),
        text: fitText(c.value, c.w - 3, vh, weight),
        heightMm: vh,
        align: "left",
        ...(c.bold ? { weight: "bold" as const } : {}),
      };
      shapes.push(t);
    }
  }
  shapes.push(...projectionSymbol(f.projection, sheetPoint(x0 + 125 + 27.5, y0 + 18 + 3.4)));
  return shapes;
}
