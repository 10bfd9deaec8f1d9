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
import { sheetPoint, type DrawingSheet, type SheetShape, type SheetSize, type SheetSizeName } from "./model";
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

/** Where views may go: inside the frame, above the title block and notes strip. */
export interface DrawingArea {
  box: Box;
  stripTop: number;
}

function drawingArea(size: SheetSize, notes: string[], stamped: boolean): { area: Box; notesWidth: number } {
  const { min, max } = frameRect(size);
  const notesWidth = max.x - min.x - TITLE_BLOCK_WIDTH_MM - 8;
  const strip = Math.max(TITLE_BLOCK_HEIGHT_MM, notesHeight(notes, notesWidth) + 2) + (stamped ? STAMP_HEIGHT_MM + 4 : 0);
  return { area: { minX: min.x + 4, maxX: max.x - 4, minY: min.y + strip + 4, maxY: max.y - 4 }, notesWidth };
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
  const { area, notesWidth } = drawingArea(size, notes, stamped);
  const { min, max } = frameRect(size);
  const shapes: SheetShape[] = [...frame(size), ...titleBlock(fields, sheetPoint(max.x, min.y))];
  shapes.push(...notesBlock(notes, sheetPoint(min.x + 3, min.y + 2), notesWidth));
  if (stamped) shapes.push(...errorStamp(sheetPoint(max.x - TITLE_BLOCK_WIDTH_MM / 2, min.y + TITLE_BLOCK_HEIGHT_MM + 3 + STAMP_HEIGHT_MM / 2)));
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
  const notes = partNotes({ part, fmt, generalTolerance: input.generalTolerance, material: input.material, failingChecks: input.failingChecks });
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
  const material = input.material ? `${input.material.name}${input.material.grade ? ` (${input.material.grade})` : ""}` : part.material;
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
    sheet: "1 of 1",
  });
  return {
    sheet: { id: part.id, kind: "part", size, scaleLabel: scale.label, shapes, sheetNumber: 1, sheetCount: 1 },
    unplaced,
    requests,
    features: featureNames(part),
  };
}
