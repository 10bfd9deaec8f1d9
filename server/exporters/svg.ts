/**
 * SVG of one drawing sheet: makerjs writes the line work (one path per layer, stroke widths and
 * `stroke-dasharray` after ISO 128-2), we add what it lacks (GEOMETRY.md item 9): a trim rectangle so the
 * viewBox is the whole sheet instead of the content, filled arrowheads, and text filled rather than stroked,
 * in the drawing font. Units: 1 user unit = 1 mm of paper.
 */
import makerjs from "makerjs";
import { LINE_STYLES, type DrawingSheet, type Layer, type SheetText } from "@/engine/drawing/model";
import { fontSizeForCapHeight } from "@/engine/drawing/text/measure";
import { toMakerModel } from "./makerModel";

const FONT_FAMILY = "Barlow, 'Barlow Semi Condensed', 'Helvetica Neue', Arial, sans-serif";
const LAYERS = Object.keys(LINE_STYLES) as Layer[];

function esc(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

const n = (v: number) => (Math.round(v * 1000) / 1000).toString();

function textElement(t: SheetText, sheetHeight: number): string {
  const x = t.at.x;
  const y = sheetHeight - t.at.y;
  const anchor = t.align === "left" ? "start" : t.align === "right" ? "end" : "middle";
  const rot = t.rotationDeg ? ` transform="rotate(${n(-t.rotationDeg)} ${n(x)} ${n(y)})"` : "";
  const weight = t.weight === "bold" ? ` font-weight="600"` : "";
  const role = t.role ? ` data-role="${t.role}"` : "";
  return `<text x="${n(x)}" y="${n(y)}" font-size="${n(fontSizeForCapHeight(t.heightMm))}" text-anchor="${anchor}"${weight}${rot}${role} class="layer-${t.layer}">${esc(t.text)}</text>`;
}

export function sheetToSvg(sheet: DrawingSheet): string {
  const { widthMm: W, heightMm: H } = sheet.size;
  const model = toMakerModel(sheet.shapes);
  model.models!.trim = {
    layer: "trim",
    paths: {
      a: new makerjs.paths.Line([0, 0], [W, 0]),
      b: new makerjs.paths.Line([W, 0], [W, H]),
      c: new makerjs.paths.Line([W, H], [0, H]),
      d: new makerjs.paths.Line([0, H], [0, 0]),
    },
  };
  const layerOptions: Record<string, makerjs.exporter.ISVGElementRenderOptions> = { trim: { stroke: "none" } };
  for (const l of LAYERS) {
    const st = LINE_STYLES[l];
    layerOptions[l] = {
      stroke: "#000",
      strokeWidth: `${st.widthMm}`,
      ...(st.dash ? { cssStyle: `stroke-dasharray:${st.dash.join(" ")};stroke-linecap:butt` } : {}),
    };
  }
  let svg = makerjs.exporter.toSVG(model, { units: makerjs.unitType.Millimeter, layerOptions, scalingStroke: true, strokeWidth: "0.25", fontSize: "3.5" });
  // makerjs writes width/height from the content; the trim rectangle makes that the sheet. Pin it anyway.
  svg = svg.replace(/<svg [^>]*>/, `<svg width="${n(W)}mm" height="${n(H)}mm" viewBox="0 0 ${n(W)} ${n(H)}" xmlns="http://www.w3.org/2000/svg" data-sheet="${esc(sheet.id)}">`);
  const fills = sheet.shapes
    .filter((s) => s.type === "fill")
    .map((s) => `<polygon points="${s.points.map((p) => `${n(p.x)},${n(H - p.y)}`).join(" ")}" class="layer-${s.layer}"/>`)
    .join("");
  const texts = sheet.shapes.filter((s): s is SheetText => s.type === "text").map((t) => textElement(t, H)).join("");
  const extra = `<g id="fills" fill="#000" stroke="none">${fills}</g><g id="text" fill="#000" stroke="none" font-family="${esc(FONT_FAMILY)}">${texts}</g>`;
  const title = `<title>${esc(sheet.id)} — sheet ${sheet.sheetNumber} of ${sheet.sheetCount}</title>`;
  return svg.replace(/<\/svg>\s*$/, `${extra}</svg>`).replace(/(<svg [^>]*>)/, `$1${title}<rect x="0" y="0" width="${n(W)}" height="${n(H)}" fill="#fff"/>`);
}
