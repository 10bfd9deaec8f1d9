/**
 * The assembly sheet: the parts at their assembly placements, projected together (so they hide each
 * other), arranged by the projection method, with item balloons (ISO 6433: a circle with the item number,
 * a thin leader ending in a dot on the part) and a parts list above the title block (ISO 7573: item,
 * quantity, name, material, drawing number, item numbers rising upward from the header).
 */
import type { ResolvedPart } from "../parts/features";
import { formatter } from "./format";
import { arrangeViews } from "./layout/arrange";
import type { Box } from "./layout/geometry";
import { emptyBox, unionBox } from "./layout/geometry";
import { balloonShapes, placeBalloons } from "./layout/balloons";
import { shapesBox, translateShapes } from "./layout/shapes";
import { centreShapes, edgeShapes } from "./layout/viewLines";
import { sheetPoint, TEXT_HEIGHTS, type DrawingSheet, type SheetShape, type SheetSize } from "./model";
import { formatMass, sheetRegions, type SheetCommon } from "./partSheet";
import type { ProjectedAssembly, ViewName } from "./projection";
import { chooseScale, type DrawingScale } from "./scale";
import { errorStamp, frame, notesBlock } from "./sheet/notes";
import { renderNote } from "./sheet/noteText";
import { fitText, TITLE_BLOCK_HEIGHT_MM, TITLE_BLOCK_WIDTH_MM, titleBlock } from "./sheet/titleBlock";
import { frameRect, SHEET_SIZES, sheetSeries } from "./sheets";

export interface AssemblySheetInput extends SheetCommon {
  parts: ResolvedPart[];
  projected: ProjectedAssembly;
  /** Display name of each part's material, by part id. */
  materialNames: Record<string, string>;
  totalMassKg?: number;
  /** Notes of the template's own (what the design was made to suit, assembly instructions), as note text. */
  extraNotes?: string[];
}

const ROW_H = 6;
const LIST_COLUMNS = [
  { title: "Item", width: 12 },
  { title: "Qty", width: 12 },
  { title: "Name", width: 56 },
  { title: "Material", width: 50 },
  { title: "Drawing number", width: 50 },
] as const;

/** The parts list rows, item 1 first. */
function listRows(input: AssemblySheetInput): string[][] {
  return input.parts.map((p, i) => [
    String(i + 1),
    String(p.quantity ?? 1),
    p.name,
    input.materialNames[p.id] ?? p.material,
    `${input.template.id}-${p.id}`.toUpperCase(),
  ]);
}

function partsList(rows: string[][], corner: { x: number; y: number }): SheetShape[] {
  const shapes: SheetShape[] = [];
  const x0 = corner.x - TITLE_BLOCK_WIDTH_MM;
  const all = [LIST_COLUMNS.map((c) => c.title), ...rows];
  all.forEach((cells, r) => {
    const y = corner.y + r * ROW_H;
    let x = x0;
    cells.forEach((cell, c) => {
      const w = LIST_COLUMNS[c]!.width;
      shapes.push({ type: "polyline", layer: "frame", closed: true, points: [sheetPoint(x, y), sheetPoint(x + w, y), sheetPoint(x + w, y + ROW_H), sheetPoint(x, y + ROW_H)] });
      shapes.push({
        type: "text",
        layer: "text",
        role: "table",
        at: sheetPoint(x + 1.5, y + (ROW_H - TEXT_HEIGHTS.normal) / 2),
        text: fitText(cell, w - 3, TEXT_HEIGHTS.normal),
        heightMm: TEXT_HEIGHTS.normal,
        align: "left",
        ...(r === 0 ? { weight: "bold" as const } : {}),
      });
      x += w;
    });
  });
  return shapes;
}

interface LaidOut {
  name: ViewName;
  shapes: SheetShape[];
  envelope: Box;
}

/** One assembly view with its balloons (in a row above it, leaders uncrossed: layout/balloons.ts). */
function layoutAssemblyView(input: AssemblySheetInput, view: ProjectedAssembly["views"][number], scale: number, balloons: { item: number; partId: string }[]): LaidOut {
  const place = { origin: sheetPoint(0, 0), scale };
  const lines = [...edgeShapes(view, place), ...centreShapes(view, place)];
  const anchors = balloons.flatMap((b) => {
    const at = input.projected.anchors.find((a) => a.partId === b.partId && a.view === view.name)?.point;
    return at ? [{ item: b.item, x: at.x * scale, y: at.y * scale }] : [];
  });
  const shapes = [...lines, ...balloonShapes(placeBalloons(anchors, shapesBox(lines)))];
  return { name: view.name, shapes, envelope: shapesBox(shapes) };
}

/**
 * The view a part's balloon goes in: the one where the part shows the widest visible patch (its anchor
 * deepest inside it), the first view when it does nearly as well there (balloons kept together read
 * easier), and the first view for a part that no view shows.
 */
export function balloonView(projected: ProjectedAssembly, partId: string): ViewName {
  const first = projected.views[0]!.name;
  const clearance = (v: ViewName) => projected.anchors.find((a) => a.partId === partId && a.view === v)?.clearanceMm ?? 0;
  let best = first;
  for (const v of projected.views) if (clearance(v.name) > clearance(best)) best = v.name;
  return clearance(first) >= 0.7 * clearance(best) ? first : best;
}

export function buildAssemblySheet(input: AssemblySheetInput): DrawingSheet {
  const rows = listRows(input);
  const listHeight = (rows.length + 1) * ROW_H;
  const stamped = input.failingChecks.length > 0;
  const notes = [
    `Dimensions in ${input.units === "mm" ? "mm" : "inches"}. Assembly for reference: make each part from its own drawing.`,
    `General tolerances ISO 2768-${input.generalTolerance} on the part drawings.`,
    ...(input.extraNotes ?? []).map((n) => renderNote(n, formatter(input.units))),
    "Check the assembly moves freely and clamps before it is used on the machine; follow the machine maker's guidance.",
    ...(stamped ? [`Template checks failing: ${input.failingChecks.join("; ")}.`] : []),
  ];
  const balloonsByView = new Map<ViewName, { item: number; partId: string }[]>();
  input.parts.forEach((p, i) => {
    const v = balloonView(input.projected, p.id);
    const list = balloonsByView.get(v) ?? [];
    list.push({ item: i + 1, partId: p.id });
    balloonsByView.set(v, list);
  });
  const layoutAt = (s: DrawingScale) => {
    const views = input.projected.views.map((v) => layoutAssemblyView(input, v, s.factor, balloonsByView.get(v.name) ?? []));
    return { views, arranged: arrangeViews(new Map(views.map((v) => [v.name, v.envelope])), input.projection) };
  };
  const area = (size: SheetSize) => {
    const r = sheetRegions(size, notes, stamped, listHeight + 2);
    return { box: r.area, notesWidth: r.notesWidth, notesCorner: r.notesCorner, stampCentre: r.stampCentre };
  };
  const candidates = input.sheetSize ? [SHEET_SIZES[input.sheetSize]] : sheetSeries(input.units);
  let chosen: { size: SheetSize; scale: DrawingScale } | undefined;
  for (const size of candidates) {
    const a = area(size).box;
    const scale = chooseScale((s) => {
      const b = layoutAt(s).arranged.box;
      return b.maxX - b.minX <= a.maxX - a.minX && b.maxY - b.minY <= a.maxY - a.minY;
    });
    if (scale && (!chosen || scale.factor > chosen.scale.factor)) chosen = { size, scale };
    // A bigger sheet only when the smaller one forces a reduction.
    if (chosen && chosen.scale.factor >= 1) break;
  }
  const { size, scale } = chosen ?? { size: candidates[candidates.length - 1]!, scale: { factor: 0.02, label: "1:50" } };
  const set = layoutAt(scale);
  const { box: drawArea, notesWidth, notesCorner, stampCentre } = area(size);
  const { min, max } = frameRect(size);
  const shapes: SheetShape[] = [...frame(size)];
  shapes.push(
    ...titleBlock(
      {
        title: `${input.template.name}: assembly`,
        documentType: `Assembly drawing, ${input.template.name} v${input.template.version}`,
        drawingNumber: `${input.template.id}-ASSEMBLY`.toUpperCase(),
        revision: input.template.version,
        owner: input.owner,
        material: "see parts list",
        mass: formatMass(input.totalMassKg, input.units),
        generalTolerance: `ISO 2768-${input.generalTolerance}`,
        units: input.units === "mm" ? "mm" : "inch",
        scale: scale.label,
        projection: input.projection,
        drawnBy: input.drawnBy,
        date: input.date,
        approved: stamped ? "NOT CHECKED" : "—",
        sheet: `${input.sheetNumber ?? 1} of ${input.sheetCount ?? 1}`,
      },
      sheetPoint(max.x, min.y),
    ),
  );
  shapes.push(...partsList(rows, { x: max.x, y: min.y + TITLE_BLOCK_HEIGHT_MM }));
  shapes.push(...notesBlock(notes, notesCorner, notesWidth));
  if (stampCentre) shapes.push(...errorStamp(stampCentre));
  let all = emptyBox();
  for (const v of set.views) {
    const o = set.arranged.offsets.get(v.name)!;
    all = unionBox(all, { minX: v.envelope.minX + o.dx, maxX: v.envelope.maxX + o.dx, minY: v.envelope.minY + o.dy, maxY: v.envelope.maxY + o.dy });
  }
  const dx = (drawArea.minX + drawArea.maxX) / 2 - (all.minX + all.maxX) / 2;
  const dy = (drawArea.minY + drawArea.maxY) / 2 - (all.minY + all.maxY) / 2;
  for (const v of set.views) {
    const o = set.arranged.offsets.get(v.name)!;
    shapes.push(...translateShapes(v.shapes, o.dx + dx, o.dy + dy));
  }
  return { id: "assembly", kind: "assembly", size, scaleLabel: scale.label, shapes, sheetNumber: input.sheetNumber ?? 1, sheetCount: input.sheetCount ?? 1 };
}
