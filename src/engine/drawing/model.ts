/**
 * The drawing model: what a sheet shows, as plain data in sheet millimetres, independent of PDF, SVG or
 * DXF. Every exporter renders this and nothing else, so the three formats always agree.
 *
 * Sheet space: origin at the bottom-left corner of the trimmed sheet, x right, y up, millimetres of paper.
 * Model space (a view's frame, {@link ViewPoint}) only reaches the sheet through {@link toSheet}, so a
 * dimension cannot silently mix the two.
 */
import type { ViewPoint } from "./projection";
import type { FontWeight } from "./text/measure";

declare const sheetBrand: unique symbol;

/** A point on the sheet, mm of paper. Made only by {@link sheetPoint} or {@link toSheet}. */
export type SheetPoint = { readonly x: number; readonly y: number } & { readonly [sheetBrand]: true };

export function sheetPoint(x: number, y: number): SheetPoint {
  return { x, y } as SheetPoint;
}

/** Moves a sheet point by a sheet-space offset. */
export function offset(p: SheetPoint, dx: number, dy: number): SheetPoint {
  return sheetPoint(p.x + dx, p.y + dy);
}

/** Where a view sits on the sheet: the sheet position of the view frame's origin, and the drawing scale. */
export interface ViewPlacement {
  origin: SheetPoint;
  /** Sheet mm per model mm (2 for 2:1, 0.5 for 1:2). */
  scale: number;
}

/** Model → sheet. */
export function toSheet(placement: ViewPlacement, p: ViewPoint): SheetPoint {
  return sheetPoint(placement.origin.x + p.x * placement.scale, placement.origin.y + p.y * placement.scale);
}

/**
 * The layers of a drawing. Each maps to one ISO 128 line type in {@link LINE_STYLES} and to one DXF layer.
 */
export type Layer = "visible" | "hidden" | "centre" | "thin" | "dimension" | "text" | "frame" | "stamp";

export type SheetShape =
  | { type: "line"; layer: Layer; from: SheetPoint; to: SheetPoint }
  | { type: "polyline"; layer: Layer; points: SheetPoint[]; closed?: boolean }
  | { type: "circle"; layer: Layer; centre: SheetPoint; radius: number }
  /** Counter-clockwise from startDeg to endDeg. */
  | { type: "arc"; layer: Layer; centre: SheetPoint; radius: number; startDeg: number; endDeg: number }
  /** A filled polygon: arrowheads, the solid parts of symbols. */
  | { type: "fill"; layer: Layer; points: SheetPoint[] }
  | SheetText;

export interface SheetText {
  type: "text";
  layer: Layer;
  /** Anchor point: where the baseline meets the alignment edge. */
  at: SheetPoint;
  text: string;
  /** Capital height, mm (ISO 3098). */
  heightMm: number;
  align: "left" | "centre" | "right";
  /** Counter-clockwise rotation about `at`, degrees (0 = upright). */
  rotationDeg?: number;
  weight?: FontWeight;
  /** What the text says, for tests and tools: a dimension, a callout, a title-block field, a note. */
  role?: "dimension" | "callout" | "title" | "note" | "label" | "table" | "stamp";
}

export type SheetSizeName = "A4" | "A3" | "Letter" | "Tabloid";

export interface SheetSize {
  name: SheetSizeName;
  /** Landscape, mm. */
  widthMm: number;
  heightMm: number;
}

export interface DrawingSheet {
  /** Stable id used for file names: "body", "assembly". */
  id: string;
  kind: "part" | "assembly";
  size: SheetSize;
  /** The scale printed in the title block, e.g. "1:1", "2:1". */
  scaleLabel: string;
  shapes: SheetShape[];
  /** 1-based, and the total in the pack. */
  sheetNumber: number;
  sheetCount: number;
}

/** ISO 128-2 line: width in mm and dash pattern (dash, gap, …) in mm of paper; none = continuous. */
export interface LineStyle {
  widthMm: number;
  dash?: number[];
}

/**
 * ISO 128-2 line types, line group 0.5 (d = line width): continuous wide 0.5 for visible outlines (01.2);
 * dashed narrow 0.25 for hidden edges (02.1: dash 12d = 3, gap 3d = 0.75); long-dash dot narrow 0.25 for
 * centre lines (04.1: long dash 24d = 6, gap 3d = 0.75, dot 0.5d — lengthened here to 0.5 mm so that it
 * prints); continuous narrow 0.25 for dimension, extension and leader lines and thread roots (01.1). The
 * frame is drawn 0.7 (ISO 5457 border line).
 */
export const LINE_STYLES: Record<Layer, LineStyle> = {
  visible: { widthMm: 0.5 },
  hidden: { widthMm: 0.25, dash: [3, 0.75] },
  centre: { widthMm: 0.25, dash: [6, 0.75, 0.5, 0.75] },
  thin: { widthMm: 0.25 },
  dimension: { widthMm: 0.25 },
  text: { widthMm: 0.25 },
  frame: { widthMm: 0.7 },
  stamp: { widthMm: 0.5 },
};

/** Lettering heights, mm (ISO 3098-0 series). */
export const TEXT_HEIGHTS = { small: 1.8, normal: 2.5, large: 3.5, title: 5 } as const;
