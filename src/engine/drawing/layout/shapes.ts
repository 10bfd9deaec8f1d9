/**
 * Shape helpers: translating shapes, measuring their extent, and the ISO 129-1 terminations.
 */
import { offset, sheetPoint, type Layer, type SheetPoint, type SheetShape, type SheetText } from "../model";
import { textWidthMm } from "../text/measure";
import { emptyBox, growBox, type Box } from "./geometry";

/** Filled arrowhead (ISO 129-1 closed, filled; ~3 mm long, ~20° included). */
export const ARROW_LENGTH_MM = 2.5;
export const ARROW_HALF_WIDTH_MM = 0.45;

/** An arrowhead with its tip at `tip`, pointing along the unit vector (ux, uy). */
export function arrowhead(tip: SheetPoint, ux: number, uy: number, layer: Layer = "dimension"): SheetShape {
  const bx = tip.x - ux * ARROW_LENGTH_MM;
  const by = tip.y - uy * ARROW_LENGTH_MM;
  const nx = -uy * ARROW_HALF_WIDTH_MM;
  const ny = ux * ARROW_HALF_WIDTH_MM;
  return { type: "fill", layer, points: [tip, sheetPoint(bx + nx, by + ny), sheetPoint(bx - nx, by - ny)] };
}

export function line(layer: Layer, from: SheetPoint, to: SheetPoint): SheetShape {
  return { type: "line", layer, from, to };
}

/** The box a text occupies (upright or turned by a multiple of 90°), with descenders. */
export function textBox(t: Pick<SheetText, "at" | "text" | "heightMm" | "align" | "rotationDeg" | "weight">): Box {
  const w = textWidthMm(t.text, t.heightMm, t.weight);
  const x0 = t.align === "left" ? 0 : t.align === "right" ? -w : -w / 2;
  const local = { minX: x0, maxX: x0 + w, minY: -0.3 * t.heightMm, maxY: t.heightMm * 1.05 };
  const rot = (((t.rotationDeg ?? 0) % 360) + 360) % 360;
  const b = emptyBox();
  const corners: [number, number][] = [
    [local.minX, local.minY],
    [local.maxX, local.minY],
    [local.minX, local.maxY],
    [local.maxX, local.maxY],
  ];
  const c = Math.cos((rot * Math.PI) / 180);
  const s = Math.sin((rot * Math.PI) / 180);
  for (const [x, y] of corners) growBox(b, t.at.x + x * c - y * s, t.at.y + x * s + y * c);
  return b;
}

/** Extent of shapes on the sheet (texts by their boxes). */
export function shapesBox(shapes: SheetShape[]): Box {
  const b = emptyBox();
  for (const s of shapes) {
    switch (s.type) {
      case "line":
        growBox(b, s.from.x, s.from.y);
        growBox(b, s.to.x, s.to.y);
        break;
      case "polyline":
      case "fill":
        for (const p of s.points) growBox(b, p.x, p.y);
        break;
      case "circle":
      case "arc":
        growBox(b, s.centre.x - s.radius, s.centre.y - s.radius);
        growBox(b, s.centre.x + s.radius, s.centre.y + s.radius);
        break;
      case "text": {
        const t = textBox(s);
        growBox(b, t.minX, t.minY);
        growBox(b, t.maxX, t.maxY);
        break;
      }
    }
  }
  return b;
}

/** Moves shapes by (dx, dy) sheet mm. */
export function translateShapes(shapes: SheetShape[], dx: number, dy: number): SheetShape[] {
  const m = (p: SheetPoint) => offset(p, dx, dy);
  return shapes.map((s): SheetShape => {
    switch (s.type) {
      case "line":
        return { ...s, from: m(s.from), to: m(s.to) };
      case "polyline":
      case "fill":
        return { ...s, points: s.points.map(m) };
      case "circle":
      case "arc":
        return { ...s, centre: m(s.centre) };
      case "text":
        return { ...s, at: m(s.at) };
    }
  });
}
