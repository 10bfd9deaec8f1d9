/**
 * The drawing model's line work as a makerjs model, one makerjs layer per drawing layer: the single path
 * representation behind the SVG, DXF and PDF writers (makerjs for the paths and the SVG/DXF it writes
 * well; fills and text are written by each exporter itself, since makerjs has no filled entities and
 * garbles non-ASCII text).
 */
import makerjs from "makerjs";
import type { Layer, SheetShape } from "@/engine/drawing/model";

export type MakerLayers = Partial<Record<Layer, makerjs.IModel>>;

/** Maps shapes (sheet mm, y up) to a makerjs model with one child model per layer. `scale` multiplies every coordinate. */
export function toMakerModel(shapes: SheetShape[], scale = 1, layerName: (l: Layer) => string = (l) => l): makerjs.IModel {
  const models: Record<string, makerjs.IModel> = {};
  const counters: Record<string, number> = {};
  const add = (layer: Layer, path: makerjs.IPath) => {
    const name = layerName(layer);
    const m = (models[name] ??= { layer: name, paths: {} });
    const n = (counters[name] = (counters[name] ?? 0) + 1);
    m.paths![`p${n}`] = path;
  };
  const pt = (p: { x: number; y: number }): makerjs.IPoint => [p.x * scale, p.y * scale];
  for (const s of shapes) {
    switch (s.type) {
      case "line":
        if (Math.hypot(s.to.x - s.from.x, s.to.y - s.from.y) > 1e-9) add(s.layer, new makerjs.paths.Line(pt(s.from), pt(s.to)));
        break;
      case "polyline": {
        const pts = s.closed ? [...s.points, s.points[0]!] : s.points;
        for (let i = 1; i < pts.length; i++) add(s.layer, new makerjs.paths.Line(pt(pts[i - 1]!), pt(pts[i]!)));
        break;
      }
      case "circle":
        add(s.layer, new makerjs.paths.Circle(pt(s.centre), s.radius * scale));
        break;
      case "arc":
        add(s.layer, new makerjs.paths.Arc(pt(s.centre), s.radius * scale, s.startDeg, s.endDeg));
        break;
      case "fill":
      case "text":
        break;
    }
  }
  return { models };
}
