/**
 * Table pages of the pack (the cut list and the operation sheet) as drawing sheets, so the same PDF and
 * SVG writers render them: a frame, the title block, a ruled table that wraps long cells and runs on to
 * further pages, and the cautions and sources under it.
 */
import type { CutList } from "../manufacture/cut-list";
import type { OperationSheet } from "../manufacture/operations/types";
import { formatter, type Units } from "./format";
import { sheetPoint, TEXT_HEIGHTS, type DrawingSheet, type SheetShape, type SheetSize } from "./model";
import type { SheetCommon } from "./partSheet";
import { formatMass } from "./partSheet";
import { frame, wrapText } from "./sheet/notes";
import { TITLE_BLOCK_HEIGHT_MM, titleBlock } from "./sheet/titleBlock";
import { frameRect, SHEET_SIZES } from "./sheets";
import { textWidthMm } from "./text/measure";

export interface TableColumn {
  header: string;
  /** Share of the spare width this column may take when wrapping (0 = keep natural width). */
  grow?: number;
  align?: "left" | "right";
}

export interface TableSection {
  /** A heading over the table (e.g. the part name on an operation sheet). */
  heading?: string;
  columns: TableColumn[];
  rows: string[][];
}

export interface TableDocument {
  id: string;
  title: string;
  documentType: string;
  sections: TableSection[];
  /** Printed after the tables: cautions, then sources. */
  footnotes: string[];
  massKg?: number;
}

const CELL_H: number = TEXT_HEIGHTS.normal;
const LINE_PITCH = 3.8;
const PAD = 1.5;

/** Column widths that fit `widthMm`: natural widths, the growable columns wrapping when space runs out. */
function columnWidths(section: TableSection, widthMm: number): number[] {
  const natural = section.columns.map((c, i) =>
    Math.max(textWidthMm(c.header, CELL_H, "bold"), ...section.rows.map((r) => textWidthMm(r[i] ?? "", CELL_H))) + 2 * PAD + 0.5,
  );
  const total = natural.reduce((a, b) => a + b, 0);
  const growers = section.columns.map((c) => c.grow ?? 0);
  const share = growers.reduce((a, b) => a + b, 0);
  if (total <= widthMm) {
    // Room to spare: the growable columns share it, so the table spans the page.
    return share > 0 ? natural.map((w, i) => w + ((widthMm - total) * growers[i]!) / share) : natural;
  }
  const fixed = natural.reduce((sum, w, i) => sum + (growers[i]! > 0 ? 0 : w), 0);
  const spare = Math.max(widthMm - fixed, 20);
  return natural.map((w, i) => (growers[i]! > 0 ? Math.min(w, (spare * growers[i]!) / (share || 1)) : w));
}

interface Page {
  shapes: SheetShape[];
}

/** Lays the document out on as many pages of `size` as it needs (title blocks added by the caller). */
function layoutPages(doc: TableDocument, size: SheetSize): Page[] {
  const { min, max } = frameRect(size);
  const left = min.x + 5;
  const width = max.x - min.x - 10;
  const top = max.y - 6;
  const bottom = min.y + TITLE_BLOCK_HEIGHT_MM + 6;
  const pages: Page[] = [{ shapes: [] }];
  let y = top;
  const page = () => pages[pages.length - 1]!;
  const newPage = () => {
    pages.push({ shapes: [] });
    y = top;
  };
  const text = (x: number, yy: number, t: string, bold = false, align: "left" | "right" = "left", h: number = CELL_H, role: "table" | "note" | "title" = "table") =>
    page().shapes.push({ type: "text", layer: "text", role, at: sheetPoint(x, yy), text: t, heightMm: h, align, ...(bold ? { weight: "bold" as const } : {}) });
  text(left, y - TEXT_HEIGHTS.title, doc.title, true, "left", TEXT_HEIGHTS.title, "title");
  y -= TEXT_HEIGHTS.title + 6;
  for (const section of doc.sections) {
    const widths = columnWidths(section, width);
    const drawHeader = () => {
      if (section.heading) {
        text(left, y - TEXT_HEIGHTS.large, section.heading, true, "left", TEXT_HEIGHTS.large);
        y -= TEXT_HEIGHTS.large + 3;
      }
      drawRow(section.columns.map((c) => c.header), true);
    };
    const drawRow = (cells: string[], header: boolean) => {
      const wrapped = cells.map((c, i) => wrapText(c, widths[i]! - 2 * PAD, CELL_H));
      const lines = Math.max(1, ...wrapped.map((w) => w.length));
      const h = lines * LINE_PITCH + 2 * PAD;
      if (y - h < bottom) {
        newPage();
        if (!header) drawHeader();
      }
      let x = left;
      wrapped.forEach((cellLines, i) => {
        const w = widths[i]!;
        page().shapes.push({
          type: "polyline",
          layer: header ? "frame" : "thin",
          closed: true,
          points: [sheetPoint(x, y - h), sheetPoint(x + w, y - h), sheetPoint(x + w, y), sheetPoint(x, y)],
        });
        const right = section.columns[i]?.align === "right";
        cellLines.forEach((l, k) => text(right ? x + w - PAD : x + PAD, y - PAD - CELL_H - k * LINE_PITCH, l, header, right ? "right" : "left"));
        x += w;
      });
      y -= h;
    };
    if (y - 20 < bottom) newPage();
    drawHeader();
    for (const r of section.rows) drawRow(r, false);
    y -= 6;
  }
  for (const note of doc.footnotes) {
    const lines = wrapText(note, width, TEXT_HEIGHTS.small + 0.2);
    for (const l of lines) {
      if (y - 3.5 < bottom) newPage();
      text(left, y - 2.5, l, false, "left", TEXT_HEIGHTS.small + 0.2, "note");
      y -= 3.4;
    }
    y -= 1;
  }
  return pages;
}

/** The document's pages, each a sheet with frame and title block. */
export function tableSheets(doc: TableDocument, common: SheetCommon, firstSheetNumber: number, sheetCount: number): DrawingSheet[] {
  const size = SHEET_SIZES[common.sheetSize ?? (common.units === "in" ? "Letter" : "A4")];
  const pages = layoutPages(doc, size);
  const { min, max } = frameRect(size);
  return pages.map((p, i) => {
    const shapes: SheetShape[] = [...frame(size), ...p.shapes];
    shapes.push(
      ...titleBlock(
        {
          title: doc.title,
          documentType: `${doc.documentType}, ${common.template.name} v${common.template.version}`,
          drawingNumber: `${common.template.id}-${doc.id}`.toUpperCase(),
          revision: common.template.version,
          owner: common.owner,
          material: "see table",
          mass: formatMass(doc.massKg, common.units),
          generalTolerance: `ISO 2768-${common.generalTolerance}`,
          units: common.units === "mm" ? "mm, kg" : "inch, lb",
          scale: "—",
          projection: common.projection,
          drawnBy: common.drawnBy,
          date: common.date,
          approved: common.failingChecks.length > 0 ? "NOT CHECKED" : "—",
          sheet: `${firstSheetNumber + i} of ${sheetCount}`,
        },
        sheetPoint(max.x, min.y),
      ),
    );
    return { id: pages.length > 1 ? `${doc.id}-${i + 1}` : doc.id, kind: "part" as const, size, scaleLabel: "—", shapes, sheetNumber: firstSheetNumber + i, sheetCount };
  });
}

/** How many pages a document takes (to number the pack before drawing it). */
export function tablePageCount(doc: TableDocument, common: Pick<SheetCommon, "sheetSize" | "units">): number {
  return layoutPages(doc, SHEET_SIZES[common.sheetSize ?? (common.units === "in" ? "Letter" : "A4")]).length;
}

const KG_PER_LB = 0.45359237;

/** The cut list as a table document, in the user's units. */
export function cutListDocument(list: CutList, units: Units): TableDocument {
  const fmt = formatter(units);
  const inch = units === "in";
  const L = inch ? "in" : "mm";
  const W = inch ? "lb" : "kg";
  const weight = (kg: number) => (inch ? (kg / KG_PER_LB).toFixed(3) : kg.toFixed(3));
  return {
    id: "cut-list",
    title: "Cut list",
    documentType: "Cut list",
    massKg: list.totals.finishedWeightKg,
    sections: [
      {
        columns: [
          { header: "Part" },
          { header: "Qty", align: "right" },
          { header: "Material", grow: 1 },
          { header: "Stock to buy", grow: 2 },
          { header: `Cut length (${L})`, align: "right" },
          { header: `Bar incl. kerf (${L})`, align: "right" },
          { header: `Finished each (${W})`, align: "right" },
          { header: `Blank each (${W})`, align: "right" },
        ],
        rows: list.rows.map((r) => [
          r.name,
          String(r.quantity),
          r.materialName,
          `${r.stockSize}${r.stockAvailable ? "" : " (larger than listed stock)"}`,
          fmt.length(r.cutLengthMm),
          fmt.length(r.barLengthMm),
          weight(r.finishedWeightKg),
          weight(r.stockWeightKg),
        ]),
      },
    ],
    footnotes: [
      `Total: ${list.totals.parts} parts, finished ${weight(list.totals.finishedWeightKg)} ${W}, stock ${weight(list.totals.stockWeightKg)} ${W}.`,
      ...list.cautions,
      `Sources: ${list.sources.map((s) => `${s.title} (${s.kind})`).join("; ")}.`,
    ],
  };
}

/** The operation sheet as a table document: one section per part, operations in order. */
export function operationDocument(sheet: OperationSheet, units: Units): TableDocument {
  const fmt = formatter(units);
  return {
    id: "operations",
    title: "Operation sheet",
    documentType: "Operation sheet",
    sections: sheet.parts.map((p) => ({
      heading: `${p.name} (${p.partId}), qty ${p.quantity}: ${p.stock.designation}`,
      columns: [
        { header: "Op", align: "right" as const },
        { header: "Machine" },
        { header: "Operation", grow: 3 },
        { header: "Tool", grow: 1 },
        { header: "rev/min", align: "right" as const },
        { header: "Notes", grow: 2 },
      ],
      rows: p.operations.map((o) => [
        String(o.step),
        o.machine,
        `${o.count > 1 ? `${o.count}× ` : ""}${o.description}`,
        o.tool ? (units === "in" && o.toolDiameterMm ? `${o.tool} (${fmt.diameter(o.toolDiameterMm)} in)` : o.tool) : "—",
        o.rpm ? `${o.rpm}${o.capped ? " (max)" : ""}` : "—",
        o.notes.join(" "),
      ]),
    })),
    footnotes: [
      `Spindle speeds for ${sheet.toolMaterial.toUpperCase()} tools${sheet.machineMaxRpm ? `, held to the machine's ${sheet.machineMaxRpm} rev/min` : ""}.`,
      ...sheet.cautions,
      `Sources: ${sheet.sources.map((s) => `${s.title} (${s.kind})`).join("; ")}.`,
    ],
  };
}
