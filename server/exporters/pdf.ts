/**
 * PDF of a set of drawing sheets, one page per sheet at the sheet's size, with pdfkit.
 *
 * Line work: the sheet's makerjs model rendered per layer as SVG path data and stroked by pdfkit with the
 * layer's ISO 128-2 width and dash pattern (makerjs's own PDF writer draws every layer alike, GEOMETRY.md
 * item 9). Fills (arrowheads) as filled polygons. Text in the embedded Barlow WOFF (item 10), placed on its
 * baseline, so the PDF's text layer carries every dimension as searchable text.
 */
import makerjs from "makerjs";
import PDFDocument from "pdfkit";
import { LINE_STYLES, type DrawingSheet, type Layer, type SheetText } from "@/engine/drawing/model";
import { fontSizeForCapHeight } from "@/engine/drawing/text/measure";
import { DRAWING_FONTS, drawingFontData, type DrawingFontName } from "./fonts/fonts";
import { toMakerModel } from "./makerModel";

/** PDF points per millimetre. */
export const PT_PER_MM = 72 / 25.4;

export interface PdfMeta {
  title: string;
  author: string;
  subject?: string;
  /** Creation date written in the PDF info (passed in; defaults to none). */
  creationDate?: Date;
}

function drawText(doc: PDFKit.PDFDocument, t: SheetText, sheetHeight: number): void {
  const font = t.weight === "bold" ? "bold" : "regular";
  const size = fontSizeForCapHeight(t.heightMm);
  doc.font(font).fontSize(size);
  const w = doc.widthOfString(t.text);
  const x = t.at.x;
  const y = sheetHeight - t.at.y;
  const dx = t.align === "left" ? 0 : t.align === "right" ? -w : -w / 2;
  doc.save();
  if (t.rotationDeg) doc.rotate(-t.rotationDeg, { origin: [x, y] });
  doc.text(t.text, x + dx, y, { lineBreak: false, baseline: "alphabetic" });
  doc.restore();
}

/**
 * SVG path data per layer, as `makerjs.exporter.toSVGPathData(model, { byLayers: true, origin: [0, 0] })`
 * gives it but without a winding direction: asked for one, makerjs deep-copies every counter-clockwise
 * chain (with the model it points into) to reverse it, which was a quarter of a pack's drawing time, and
 * stroked line work has no winding.
 */
function pathDataByLayer(model: makerjs.IModel): Record<string, string> {
  const out: Record<string, string[]> = {};
  const origin: makerjs.IPoint = [0, 0];
  makerjs.model.findChains(
    model,
    (chains, loose, layer) => {
      const d = (out[layer] ??= []);
      const single = (wp: makerjs.IWalkPath) => d.push(makerjs.exporter.pathToSVGPathData(wp.pathContext, wp.offset, origin));
      for (const c of chains) {
        if (c.links.length > 1) d.push(makerjs.exporter.chainToSVGPathData(c, origin));
        else single(c.links[0]!.walkedPath);
      }
      for (const wp of loose) single(wp);
    },
    { byLayers: true, contain: false },
  );
  return Object.fromEntries(Object.entries(out).map(([layer, d]) => [layer, d.join(" ")]));
}

function drawSheet(doc: PDFKit.PDFDocument, sheet: DrawingSheet): void {
  const { widthMm: W, heightMm: H } = sheet.size;
  doc.addPage({ size: [W * PT_PER_MM, H * PT_PER_MM], margin: 0 });
  doc.save();
  // Work in millimetres with y down from the top of the sheet (PDF page space scaled).
  doc.scale(PT_PER_MM);
  const model = toMakerModel(sheet.shapes);
  const byLayer = pathDataByLayer(model);
  for (const [layer, d] of Object.entries(byLayer)) {
    const style = LINE_STYLES[layer as Layer];
    if (!style || !d) continue;
    doc.save();
    // SVG path data from makerjs with origin [0, 0] has y = −sheet y; shift by the sheet height.
    doc.translate(0, H);
    doc.lineWidth(style.widthMm).lineCap("butt").lineJoin("miter");
    // pdfkit accepts a dash array (its typings say a single number).
    if (style.dash) doc.dash(style.dash as unknown as number, {});
    else doc.undash();
    doc.path(d).stroke("#000");
    doc.restore();
  }
  doc.fillColor("#000");
  for (const s of sheet.shapes) {
    if (s.type !== "fill" || s.points.length < 3) continue;
    doc.polygon(...s.points.map((p) => [p.x, H - p.y] as [number, number])).fill("#000");
  }
  for (const s of sheet.shapes) if (s.type === "text") drawText(doc, s, H);
  doc.restore();
}

/** A pdfkit document (a readable stream) with one page per sheet; call `.end()` is done here. */
export function sheetsToPdfStream(sheets: DrawingSheet[], meta: PdfMeta): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    autoFirstPage: false,
    margin: 0,
    info: { Title: meta.title, Author: meta.author, Subject: meta.subject ?? "", Creator: "Jigwright", Producer: "Jigwright", ...(meta.creationDate ? { CreationDate: meta.creationDate } : {}) },
  });
  for (const name of Object.keys(DRAWING_FONTS) as DrawingFontName[]) doc.registerFont(name, drawingFontData(name));
  for (const s of sheets) drawSheet(doc, s);
  doc.end();
  return doc;
}

/** The whole PDF in memory. */
export async function sheetsToPdf(sheets: DrawingSheet[], meta: PdfMeta): Promise<Buffer> {
  const doc = sheetsToPdfStream(sheets, meta);
  const chunks: Buffer[] = [];
  for await (const chunk of doc) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}
