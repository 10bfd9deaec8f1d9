/**
 * DXF of one part at 1:1, in mm or inches: the same views and dimensions as the PDF sheet, laid out at
 * full size in model space for CAM or a CAD program.
 *
 * makerjs writes the header, tables and the line/arc/circle entities; on top of its output we fill what it
 * lacks (GEOMETRY.md item 9): a CENTER (long dash, dot) line type and a finer DASHED than its own, set per
 * layer; arrowheads as SOLID entities; text as TEXT entities with the DXF control codes %%c (Ø), %%p (±)
 * and %%d (°) and \U+ escapes for anything else outside ASCII. Layers: VISIBLE, HIDDEN, CENTER, THIN,
 * DIMENSIONS, TEXT.
 */
import makerjs from "makerjs";
import type { Layer, SheetShape, SheetText } from "@/engine/drawing/model";
import { MM_PER_INCH, type Units } from "@/engine/drawing/format";
import { toMakerModel } from "./makerModel";

export const DXF_LAYERS: Record<Layer, string> = {
  visible: "VISIBLE",
  hidden: "HIDDEN",
  centre: "CENTER",
  thin: "THIN",
  dimension: "DIMENSIONS",
  text: "TEXT",
  frame: "TEXT",
  stamp: "TEXT",
};

/** AutoCAD colour index per layer: white/black outlines, yellow hidden, red centre, cyan dims, green text. */
const LAYER_COLOURS: Record<string, number> = { VISIBLE: 7, HIDDEN: 2, CENTER: 1, THIN: 8, DIMENSIONS: 4, TEXT: 3 };

/** Line type patterns in drawing units of mm (scaled for inch files): ISO 128-2 at d = 0.25 mm. */
function lineTypeTable(unitScale: number): string {
  const lt = (name: string, description: string, pattern: number[]) => {
    const total = pattern.reduce((s, v) => s + Math.abs(v), 0) * unitScale;
    const elements = pattern.map((v) => `49\n${(v * unitScale).toFixed(5)}\n74\n0`).join("\n");
    return `0\nLTYPE\n2\n${name}\n70\n0\n3\n${description}\n72\n65\n73\n${pattern.length}\n40\n${total.toFixed(5)}${pattern.length ? `\n${elements}` : ""}`;
  };
  return [
    `0\nTABLE\n2\nLTYPE\n70\n3`,
    lt("CONTINUOUS", "Solid line", []),
    lt("DASHED", "ISO 128 dashed, dash 3 gap 0.75", [3, -0.75]),
    lt("CENTER", "ISO 128 long dash dot, 6 / 0.75 / 0.5 / 0.75", [6, -0.75, 0.5, -0.75]),
    `0\nENDTAB`,
  ].join("\n");
}

/** DXF text with control codes for the symbols dimensions use. */
export function dxfText(s: string): string {
  return [...s]
    .map((ch) => {
      if (ch === "Ø" || ch === "⌀") return "%%c";
      if (ch === "±") return "%%p";
      if (ch === "°") return "%%d";
      const code = ch.codePointAt(0)!;
      if (code >= 32 && code < 127) return ch;
      return `\\U+${code.toString(16).toUpperCase().padStart(4, "0")}`;
    })
    .join("");
}

const f = (v: number) => (Math.round(v * 1e6) / 1e6).toString();

function textEntity(t: SheetText, k: number): string {
  const halign = t.align === "left" ? 0 : t.align === "centre" ? 1 : 2;
  const x = t.at.x * k;
  const y = t.at.y * k;
  const align = halign ? `\n72\n${halign}\n11\n${f(x)}\n21\n${f(y)}\n31\n0` : "";
  return `0\nTEXT\n8\n${DXF_LAYERS[t.layer]}\n10\n${f(x)}\n20\n${f(y)}\n30\n0\n40\n${f(t.heightMm * k)}\n1\n${dxfText(t.text)}\n50\n${f(t.rotationDeg ?? 0)}${align}`;
}

function solidEntity(points: { x: number; y: number }[], layer: Layer, k: number): string {
  const [a, b, c] = points;
  const d = points[3] ?? c;
  const p = [a!, b!, d!, c!]; // DXF SOLID corner order: 1, 2, 4, 3 makes a quadrilateral; a triangle repeats the last
  return `0\nSOLID\n8\n${DXF_LAYERS[layer]}\n${p.map((q, i) => `1${i}\n${f(q.x * k)}\n2${i}\n${f(q.y * k)}\n3${i}\n0`).join("\n")}`;
}

/**
 * The DXF for shapes laid out at 1:1 (coordinates in model mm). `units: "in"` writes inches
 * ($INSUNITS 1), every coordinate and text height divided by 25.4.
 */
export function shapesToDxf(shapes: SheetShape[], units: Units): string {
  const k = units === "in" ? 1 / MM_PER_INCH : 1;
  const model = toMakerModel(shapes, k, (l) => DXF_LAYERS[l]);
  const layerOptions: Record<string, makerjs.exporter.IDXFLayerOptions> = {};
  for (const name of new Set(Object.values(DXF_LAYERS))) {
    // makerjs only knows CONTINUOUS/DASHED/DOTTED; DOTTED stands in for CENTER and is renamed below.
    layerOptions[name] = { color: LAYER_COLOURS[name] ?? 7, lineType: name === "HIDDEN" ? "DASHED" : name === "CENTER" ? "DOTTED" : "CONTINUOUS" };
  }
  let dxf = makerjs.exporter.toDXF(model, { units: units === "in" ? makerjs.unitType.Inch : makerjs.unitType.Millimeter, layerOptions });
  dxf = dxf.replace(/\r\n/g, "\n");
  // Our own line types replace makerjs's table; entities and layers that said DOTTED now say CENTER.
  dxf = dxf.replace(/0\nTABLE\n2\nLTYPE\n[\s\S]*?0\nENDTAB/, lineTypeTable(k));
  dxf = dxf.replace(/\n6\nDOTTED\n/g, "\n6\nCENTER\n");
  // Layers makerjs did not list (no path on them) still get declared, so every file has the same layers.
  const layerTable = /0\nTABLE\n2\nLAYER\n([\s\S]*?)0\nENDTAB/.exec(dxf);
  if (layerTable) {
    const present = new Set([...layerTable[1]!.matchAll(/0\nLAYER\n2\n([^\n]+)\n/g)].map((m) => m[1]));
    const missing = Object.keys(layerOptions)
      .filter((n) => !present.has(n))
      .map((n) => `0\nLAYER\n2\n${n}\n70\n0\n62\n${layerOptions[n]!.color}\n6\n${n === "HIDDEN" ? "DASHED" : n === "CENTER" ? "CENTER" : "CONTINUOUS"}\n`)
      .join("");
    dxf = dxf.replace(layerTable[0], `0\nTABLE\n2\nLAYER\n${layerTable[1]}${missing}0\nENDTAB`);
  }
  const extra: string[] = [];
  for (const s of shapes) {
    if (s.type === "fill" && s.points.length >= 3) {
      // Triangles become one SOLID; bigger polygons a fan of them.
      for (let i = 1; i + 1 < s.points.length; i++) extra.push(solidEntity([s.points[0]!, s.points[i]!, s.points[i + 1]!], s.layer, k));
    } else if (s.type === "text") extra.push(textEntity(s, k));
  }
  const entitiesEnd = /(0\nSECTION\n2\nENTITIES\n[\s\S]*?)(0\nENDSEC)/;
  dxf = dxf.replace(entitiesEnd, (_m, body: string, end: string) => `${body}${extra.length ? `${extra.join("\n")}\n` : ""}${end}`);
  return dxf.replace(/\n/g, "\r\n");
}
