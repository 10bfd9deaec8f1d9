/**
 * A part drawing sheet: the kernel's views of one part, dimensioned from its features and datums,
 * arranged by the projection method, at the largest ISO 5455 scale that fits, on the smallest sheet that
 * does not force a reduction below full size, with title block, notes and, when the template's checks
 * fail, the "NOT CHECKED — ERRORS" stamp.
 */
import type { Axis, ResolvedPart } from "../parts/features";
import { annotatePart, baseBox, featureNames } from "./annotations";
import type { AnnotationRequest, FitLookup, ThreadLookup } from "./annotations/types";
import { formatter, type Units } from "./format";
import { arrangeViews, type ProjectionMethod } from "./layout/arrange";
import { assignToViews } from "./layout/assign";
import type { Box } from "./layout/geometry";
import { translateShapes } from "./layout/shapes";
import { layoutView, type LaidOutView } from "./layout/viewLayout";
import { sheetPoint, type DrawingSheet, type SheetPoint, type SheetShape, type SheetSize, type SheetSizeName } from "./model";
import type { ProjectedPart, ViewName } from "./projection";
import { chooseScale, type DrawingScale } from "./scale";
import { errorStamp, frame, notesBlock, notesHeight, STAMP_HEIGHT_MM } from "./sheet/notes";
import { partNotes, type ToleranceClass } from "./sheet/partNotes";
import { TITLE_BLOCK_HEIGHT_MM, TITLE_BLOCK_WIDTH_MM, titleBlock } from "./sheet/titleBlock";
import { frameRect, SHEET_SIZES, sheetSeries } from "./sheets";
import { baseKindOf } from "./views";

export interface SheetCommon {
  units: Units;
  projection: ProjectionMethod;
  generalTolerance: ToleranceClass;
  /** Force a sheet size (else chosen from the units' series). */
  sheetSize?: SheetSizeName;
  template: { id: string; name: string; version: string };
  owner: string;
  drawnBy: string;
  /** Date of issue, as printed (the engine has no clock). */
  date: string;
  /** Messages of the template's failing error checks; any → stamp and note. */
  failingChecks: string[];
  /** Notes the template prints on every sheet. */
  sheetNotes?: string[];
  /** Position in the pack (1-based) and the pack's page count, for "sheet n of m". */
  sheetNumber?: number;
  sheetCount?: number;
}

export interface PartSheetInput extends SheetCommon {
  part: ResolvedPart;
  projected: ProjectedPart;
  massKg?: number;
  material?: { name: string; grade?: string; hardenable: boolean; heatTreatmentNote?: string };
  threads: ThreadLookup;
  fits: FitLookup;
  showFitLimits?: boolean;
}

/**
 * Where things go on a sheet: the notes beside the title block when they fit there, else across the
 * sheet above it (whichever leaves the views more height); the error stamp across the top left.
 */
export interface SheetRegions {
  area: Box;
  notesCorner: SheetPoint;
  notesWidth: number;
  stampCentre?: SheetPoint;
}

export function sheetRegions(size: SheetSize, notes: string[], stamped: boolean, reservedAboveTitle = 0): SheetRegions {
  const { min, max } = frameRect(size);
  const besideWidth = max.x - min.x - TITLE_BLOCK_WIDTH_MM - 8;
  const acrossWidth = max.x - min.x - 6;
  const tb = TITLE_BLOCK_HEIGHT_MM + reservedAboveTitle;
  const beside = Math.max(tb, notesHeight(notes, besideWidth) + 2);
  const across = tb + 4 + notesHeight(notes, acrossWidth);
  const useBeside = beside <= across;
  const strip = useBeside ? beside : across;
  const top = max.y - 4 - (stamped ? STAMP_HEIGHT_MM + 4 : 0);
  return {
    area: { minX: min.x + 4, maxX: max.x - 4, minY: min.y + strip + 4, maxY: top },
    notesCorner: useBeside ? sheetPoint(min.x + 3, min.y + 2) : sheetPoint(min.x + 3, min.y + tb + 4),
    notesWidth: useBeside ? besideWidth : acrossWidth,
    ...(stamped ? { stampCentre: sheetPoint(min.x + 70, max.y - 4 - STAMP_HEIGHT_MM / 2) } : {}),
  };
}

function drawingArea(size: SheetSize, notes: string[], stamped: boolean): { area: Box } {
  return { area: sheetRegions(size, notes, stamped).area };
}

export interface ViewSet {
  views: LaidOutView[];
  arranged: ReturnType<typeof arrangeViews>;
}

/** Lays out and arranges every view at one scale. */
export function layoutAtScale(projected: ProjectedPart, requests: AnnotationRequest[], scale: number, method: ProjectionMethod): ViewSet {
  const { byView } = assignToViews(requests, projected.views);
  const views = projected.views.map((v) => layoutView(v, byView.get(v.name)!, scale));
  const arranged = arrangeViews(new Map(views.map((v) => [v.view.name, v.envelope] as [ViewName, Box])), method);
  return { views, arranged };
}

const fits = (b: Box, area: Box) => b.maxX - b.minX <= area.maxX - area.minX && b.maxY - b.minY <= area.maxY - area.minY;

/** The sheet size and scale: the smallest sheet unless a bigger one avoids a reduction below 1:1. */
export function chooseSheetAndScale(
  candidates: SheetSize[],
  fitsOn: (size: SheetSize, scale: DrawingScale) => boolean,
): { size: SheetSize; scale: DrawingScale } {
  const options = candidates.map((size) => ({ size, scale: chooseScale((s) => fitsOn(size, s)) }));
  const first = options[0]!;
  const better = options.find((o) => o.scale && o.scale.factor >= 1);
  if (first.scale && first.scale.factor >= 1) return { size: first.size, scale: first.scale };
  if (better?.scale) return { size: better.size, scale: better.scale };
  const any = options.find((o) => o.scale);
  if (any?.scale) return { size: any.size, scale: any.scale };
  const last = candidates[candidates.length - 1]!;
  return { size: last, scale: { factor: 0.02, label: "1:50" } };
}

/** Composes frame, title block, notes, stamp and arranged views into one sheet. */
export function composeSheet(
  size: SheetSize,
  set: ViewSet,
  notes: string[],
  stamped: boolean,
  fields: Parameters<typeof titleBlock>[0],
): SheetShape[] {
  const { area, notesCorner, notesWidth, stampCentre } = sheetRegions(size, notes, stamped);
  const { min, max } = frameRect(size);
  const shapes: SheetShape[] = [...frame(size), ...titleBlock(fields, sheetPoint(max.x, min.y))];
  shapes.push(...notesBlock(notes, notesCorner, notesWidth));
  if (stampCentre) shapes.push(...errorStamp(stampCentre));
  const b = set.arranged.box;
  const dx = (area.minX + area.maxX) / 2 - (b.minX + b.maxX) / 2;
  const dy = (area.minY + area.maxY) / 2 - (b.minY + b.maxY) / 2;
  for (const v of set.views) {
    const o = set.arranged.offsets.get(v.view.name)!;
    shapes.push(...translateShapes(v.shapes, o.dx + dx, o.dy + dy));
  }
  return shapes;
}

export function formatMass(massKg: number | undefined, units: Units): string {
  if (massKg === undefined || !Number.isFinite(massKg)) return "—";
  if (units === "in") return `${(massKg * 2.20462262).toFixed(massKg < 0.45 ? 3 : 2)} lb`;
  return massKg < 1 ? `${(massKg * 1000).toFixed(0)} g` : `${massKg.toFixed(2)} kg`;
}

export interface PartSheetResult {
  sheet: DrawingSheet;
  /** Requests that found no view (a feature that cannot be dimensioned in the drawn views). */
  unplaced: AnnotationRequest[];
  /** Every request (for coverage checks) and the feature names that must appear. */
  requests: AnnotationRequest[];
  features: string[];
}

export function buildPartSheet(input: PartSheetInput): PartSheetResult {
  const { part } = input;
  const fmt = formatter(input.units);
  const baseKind = baseKindOf(part);
  const bbox = baseBox(part);
  const datum = (axis: Axis) => {
    if (baseKind === "turned" && axis !== "z") return 0;
    return part.datums?.[axis] === "max" ? bbox.max[axis] : bbox.min[axis];
  };
  const requests = annotatePart({ part, baseKind, bbox, datum, fmt, threads: input.threads, fits: input.fits, showFitLimits: input.showFitLimits ?? true });
  const notes = partNotes({ part, fmt, generalTolerance: input.generalTolerance, material: input.material, failingChecks: input.failingChecks, sheetNotes: input.sheetNotes });
  const stamped = input.failingChecks.length > 0;
  const candidates = input.sheetSize ? [SHEET_SIZES[input.sheetSize]] : sheetSeries(input.units);
  const cache = new Map<number, ViewSet>();
  const setAt = (s: DrawingScale) => {
    let set = cache.get(s.factor);
    if (!set) {
      set = layoutAtScale(input.projected, requests, s.factor, input.projection);
      cache.set(s.factor, set);
    }
    return set;
  };
  const { size, scale } = chooseSheetAndScale(candidates, (sz, s) => fits(setAt(s).arranged.box, drawingArea(sz, notes, stamped).area));
  const set = setAt(scale);
  const { unplaced } = assignToViews(requests, input.projected.views);
  const material = input.material ? `${input.material.name}${input.material.grade && !input.material.name.includes("(") ? ` (${input.material.grade})` : ""}` : part.material;
  const shapes = composeSheet(size, set, notes, stamped, {
    title: `${part.name}${(part.quantity ?? 1) > 1 ? ` (qty ${part.quantity})` : ""}`,
    documentType: `Part drawing, ${input.template.name} v${input.template.version}`,
    drawingNumber: `${input.template.id}-${part.id}`.toUpperCase(),
    revision: input.template.version,
    owner: input.owner,
    material,
    mass: formatMass(input.massKg, input.units),
    generalTolerance: `ISO 2768-${input.generalTolerance}`,
    units: input.units === "mm" ? "mm" : "inch",
    scale: scale.label,
    projection: input.projection,
    drawnBy: input.drawnBy,
    date: input.date,
    approved: stamped ? "NOT CHECKED" : "—",
    sheet: `${input.sheetNumber ?? 1} of ${input.sheetCount ?? 1}`,
  });
  return {
    sheet: { id: part.id, kind: "part", size, scaleLabel: scale.label, shapes, sheetNumber: input.sheetNumber ?? 1, sheetCount: input.sheetCount ?? 1 },
    unplaced,
    requests,
    features: featureNames(part),
  };
}

/**
 * The part's views and dimensions at full size (1:1) in model space, for the DXF: the same layout as the
 * sheet without frame and title block, with a short text block (name, material, drawing number, units,
 * general tolerance) under the views. Coordinates are model millimetres.
 */
export function buildPartModelSpace(input: PartSheetInput): SheetShape[] {
  const { part } = input;
  const fmt = formatter(input.units);
  const baseKind = baseKindOf(part);
  const bbox = baseBox(part);
  const datum = (axis: Axis) => (baseKind === "turned" && axis !== "z" ? 0 : part.datums?.[axis] === "max" ? bbox.max[axis] : bbox.min[axis]);
  const requests = annotatePart({ part, baseKind, bbox, datum, fmt, threads: input.threads, fits: input.fits, showFitLimits: input.showFitLimits ?? true });
  const set = layoutAtScale(input.projected, requests, 1, input.projection);
  const shapes: SheetShape[] = [];
  for (const v of set.views) {
    const o = set.arranged.offsets.get(v.view.name)!;
    shapes.push(...translateShapes(v.shapes, o.dx, o.dy));
  }
  const b = set.arranged.box;
  const lines = [
    `${part.name} (${`${input.template.id}-${part.id}`.toUpperCase()}, revision ${input.template.version})`,
    `Material: ${input.material ? input.material.name : part.material}. Quantity ${part.quantity ?? 1}.`,
    `Full size 1:1, dimensions in ${fmt.unitWord}, ${input.projection} angle projection, general tolerances ISO 2768-${input.generalTolerance}.`,
  ];
  lines.forEach((text, i) => {
    shapes.push({ type: "text", layer: "text", role: "note", at: sheetPoint(b.minX, b.minY - 10 - i * 5), text, heightMm: 2.5, align: "left" });
  });
  return shapes;
}
