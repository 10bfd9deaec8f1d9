/**
 * The download pack: one service that turns a template's evaluation into any of the export formats, so
 * the CLI, the template routes and (later) the saved-design routes all produce the same files.
 *
 *  - pdf: a sheet per part (or the chosen part), the assembly sheet, then the cut list and operation sheet
 *    pages; svg: one sheet (the chosen part, or `assembly`); dxf: one part at 1:1; step: one part, or the
 *    whole assembly when no part is chosen; stl: one part; csv: the cut list; zip: all of it.
 * The drawing model is built once per request and every format is written from it.
 */
import JSZip from "jszip";
import { LRUCache } from "lru-cache";
import { Readable } from "node:stream";
import { buildAssemblySheet } from "@/engine/drawing/assemblySheet";
import { madeToSuitNote } from "@/engine/drawing/madeToSuit";
import { engineFits, engineThreads } from "@/engine/drawing/lookups";
import type { DrawingSheet, SheetSizeName } from "@/engine/drawing/model";
import { buildPartModelSpace, buildPartSheet, type PartSheetInput, type SheetCommon } from "@/engine/drawing/partSheet";
import type { ProjectedAssembly, ProjectedPart, ViewName } from "@/engine/drawing/projection";
import type { ToleranceClass } from "@/engine/drawing/sheet/partNotes";
import { cutListDocument, operationDocument, tablePageCount, tableSheets } from "@/engine/drawing/tableSheets";
import type { Evaluation } from "@/engine/evaluate";
import { buildCutList, buildOperationSheet, cutListCsv } from "@/engine/manufacture";
import { getMaterial, isMaterialKey } from "@/engine/materials";
import type { ResolvedPart } from "@/engine/parts/features";
import { escapeNoteText } from "@/engine/template/notes";
import type { Template } from "@/engine/template/schema";
import type { KernelPool } from "@server/kernel";
import type { ProjectTaskInput, ProjectTaskOutput, StepTaskInput, StepTaskOutput, StlTaskInput, StlTaskOutput } from "@server/kernel/tasks";
import { canonicalHash, partShapeHash } from "@server/kernel/canonical";
import { shapesToDxf } from "./dxf";
import { sheetsToPdf } from "./pdf";
import { sheetToSvg } from "./svg";

export const EXPORT_FORMATS = ["pdf", "svg", "dxf", "step", "stl", "csv", "zip"] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

/** Bad export input (unknown part, a format that needs a part): the caller's mistake, shown as is. */
export class ExportInputError extends Error {
  constructor(
    message: string,
    readonly field: string,
  ) {
    super(message);
    this.name = "ExportInputError";
  }
}

export interface ExportRequest {
  template: Pick<Template, "id" | "version" | "name" | "drawing" | "parameters" | "assembly">;
  evaluation: Evaluation;
  format: ExportFormat;
  units: "mm" | "in";
  projection: "first" | "third";
  /** A part id, or "assembly" for the assembly sheet (SVG) or the placed assembly (STEP, STL). */
  part?: string;
  drawnBy: string;
  /** Date of issue as printed, e.g. "2026-12-01" (the service reads no clock). */
  date: string;
  owner?: string;
  /** Top spindle speed of the user's machine, rev/min, for the operation sheet. */
  machineMaxRpm?: number;
  /** Views already projected (the caller projects parts in parallel on the pool before the export job). */
  projections?: { parts: ProjectedPart[]; assembly?: ProjectedAssembly };
}

export interface ExportFile {
  fileName: string;
  contentType: string;
  body: Buffer;
}

export interface ExportDeps {
  kernel: Pick<KernelPool, "run">;
  signal?: AbortSignal;
  /**
   * Build the whole file inside a kernel worker (the "export" task), so laying out the sheets and writing
   * the PDF never holds up the web server's event loop. Default true; the task itself runs with false.
   * Input mistakes (unknown part, missing part) are found on the caller's thread first.
   */
  inWorker?: boolean;
  /** Time limit of the worker job, ms (a whole pack is several kernel jobs in one; default 120 s). */
  timeoutMs?: number;
}

/** What the "export" kernel task returns. */
export interface ExportTaskOutput {
  fileName: string;
  contentType: string;
  bytes: Uint8Array;
}

const CONTENT_TYPES: Record<ExportFormat, string> = {
  pdf: "application/pdf",
  svg: "image/svg+xml",
  dxf: "application/dxf",
  step: "model/step",
  stl: "model/stl",
  csv: "text/csv; charset=utf-8",
  zip: "application/zip",
};

const SHEET_HINTS: Record<string, SheetSizeName | undefined> = { A4: "A4", A3: "A3", letter: "Letter", tabloid: "Tabloid", auto: undefined };

/** A file name safe on every system: lower case letters, digits, dots and hyphens. */
export function exportFileName(templateId: string, version: string, what: string, ext: string): string {
  const clean = (s: string) => s.toLowerCase().replace(/[^a-z0-9.-]+/g, "-").replace(/^-+|-+$/g, "");
  return `${clean(templateId)}-v${clean(version)}-${clean(what)}.${ext}`;
}

function materialInfo(key: string): PartSheetInput["material"] {
  if (!isMaterialKey(key)) return undefined;
  const m = getMaterial(key);
  // The grade's designation only ("S235JR (1.0038), hot rolled, EN 10025-2" → "S235JR").
  return { name: m.name, grade: m.grade.split(/[\s,(]/)[0]?.trim(), hardenable: m.hardenable, ...(m.heatTreatmentNote ? { heatTreatmentNote: m.heatTreatmentNote } : {}) };
}

interface Pack {
  req: ExportRequest;
  parts: ResolvedPart[];
  common: SheetCommon;
  /** Projections already made for this request (one kernel call per part, however many formats use it). */
  projected: Map<string, ProjectedPart>;
  assembly?: ProjectedAssembly;
  /** The template's `drawing.views` for parts that do not list their own (else the engine's default). */
  defaultViews?: ViewName[];
}

function packFor(req: ExportRequest): Pack {
  const ev = req.evaluation;
  const blocked = new Set(ev.blockedParts);
  if (blocked.size > 0) {
    throw new ExportInputError(
      `These parts cannot be made with the current values, so there is nothing to draw: ${[...blocked].join(", ")}. Fix the failing checks first.`,
      "parameters",
    );
  }
  const parts = ev.parts.filter((p) => p.when !== false);
  if (req.part && req.part !== "assembly" && !parts.some((p) => p.id === req.part)) {
    throw new ExportInputError(`There is no part "${req.part}" in ${req.template.name}; parts: ${parts.map((p) => p.id).join(", ")}${parts.length > 1 ? ", assembly" : ""}.`, "part");
  }
  const failing = ev.checks.filter((c) => c.severity === "error" && !c.passed).map((c) => c.message);
  const common: SheetCommon = {
    units: req.units,
    projection: req.projection,
    generalTolerance: (req.template.drawing?.generalTolerance ?? "m") as ToleranceClass,
    sheetSize: SHEET_HINTS[req.template.drawing?.sheet ?? "auto"],
    template: { id: req.template.id, name: req.template.name, version: req.template.version },
    owner: req.owner ?? "Jigwright",
    drawnBy: req.drawnBy,
    date: req.date,
    failingChecks: failing,
  };
  const projected = new Map((req.projections?.parts ?? []).map((p) => [p.partId, p] as const));
  const defaultViews = req.template.drawing?.views;
  return {
    req,
    parts,
    common,
    projected,
    ...(req.projections?.assembly ? { assembly: req.projections.assembly } : {}),
    ...(defaultViews && defaultViews.length > 0 ? { defaultViews: [...defaultViews] } : {}),
  };
}

/** The template's notes for every sheet, as note text (from the evaluation; literal text for an older one). */
function sheetNotesOf(req: ExportRequest): string[] {
  return req.evaluation.drawingNotes?.sheet ?? (req.template.drawing?.notes ?? []).map(escapeNoteText);
}

function partInput(pack: Pack, part: ResolvedPart, projected: ProjectedPart, sheetNumber: number, sheetCount: number): PartSheetInput {
  const summary = pack.req.evaluation.partSummaries.find((s) => s.id === part.id);
  return {
    ...pack.common,
    part,
    sheetNotes: sheetNotesOf(pack.req),
    projected,
    ...(summary?.massKg != null ? { massKg: summary.massKg } : {}),
    material: materialInfo(part.material),
    threads: engineThreads,
    fits: engineFits,
    sheetNumber,
    sheetCount,
  };
}

/**
 * Projections made recently in this process, by the hash of the part's canonical JSON without its
 * placement (the assembly by all its parts, placed): a PDF followed by the DXF or the ZIP of the same
 * design projects each part once, and the next vise's pack re-projects only the parts that changed shape.
 * Bounded by count; a view set is tens of kilobytes.
 */
const partViews = new LRUCache<string, ProjectedPart>({ max: 256 });
/** The key of a part's projection: the part's shape and the template's default views (which views get drawn). */
const partKey = (part: ResolvedPart, views: readonly ViewName[] | undefined) => `${partShapeHash(part)}|${views ? views.join(",") : ""}`;
const assemblyViews = new LRUCache<string, ProjectedAssembly>({ max: 32 });
const assemblyKey = (parts: ResolvedPart[]) => canonicalHash(parts);

/** Forgets the remembered projections (benchmarks measure cold packs with it). */
export function clearProjectionCache(): void {
  partViews.clear();
  assemblyViews.clear();
}

/**
 * A rough cost of projecting a part, to start the slowest first. A cross hole in a turned part (a lever
 * hole in a cam or nut) meets the round faces in spline curves: those views are drawn by sight lines
 * (server/kernel/projection/sightlines.ts), 30–250 ms each here, still the longest part tasks; otherwise
 * the cost grows with the features.
 */
export function projectionCost(part: ResolvedPart): number {
  const turned = part.features[0]?.kind === "turned";
  let cost = part.features.length;
  for (const f of part.features) {
    const direction = "direction" in f ? String(f.direction) : "";
    if (turned && direction !== "" && !direction.endsWith("z")) cost += 20;
  }
  return cost;
}

/** Projects whatever of `parts` (and the assembly) this request has not projected yet. */
async function project(pack: Pack, deps: ExportDeps, parts: ResolvedPart[], assembly: boolean): Promise<{ parts: ProjectedPart[]; assembly?: ProjectedAssembly }> {
  for (const p of parts) {
    const hit = pack.projected.has(p.id) ? undefined : partViews.get(partKey(p, pack.defaultViews));
    if (hit) pack.projected.set(p.id, { ...hit, partId: p.id });
  }
  if (assembly && !pack.assembly) {
    const hit = assemblyViews.get(assemblyKey(pack.parts));
    if (hit) pack.assembly = hit;
  }
  const missing = parts.filter((p) => !pack.projected.has(p.id));
  const needAssembly = assembly && !pack.assembly;
  // One task per part (and one for the assembly), so a pool with several workers projects them at once;
  // the slowest go first (longest-first scheduling), so no worker is left with a long task at the end.
  const opts = deps.signal ? { signal: deps.signal } : {};
  const jobs: Promise<ProjectTaskOutput>[] = [];
  if (needAssembly) jobs.push(deps.kernel.run<ProjectTaskOutput>("project", { parts: [], assembly: { parts: pack.parts } } satisfies ProjectTaskInput, opts));
  for (const part of [...missing].sort((a, b) => projectionCost(b) - projectionCost(a))) {
    jobs.push(deps.kernel.run<ProjectTaskOutput>("project", { parts: [part], ...(pack.defaultViews ? { defaultViews: pack.defaultViews } : {}) } satisfies ProjectTaskInput, opts));
  }
  for (const out of await Promise.all(jobs)) {
    for (const p of out.parts) {
      pack.projected.set(p.partId, p);
      const part = missing.find((m) => m.id === p.partId);
      if (part) partViews.set(partKey(part, pack.defaultViews), p);
    }
    if (out.assembly) {
      pack.assembly = out.assembly;
      assemblyViews.set(assemblyKey(pack.parts), out.assembly);
    }
  }
  return { parts: parts.map((p) => pack.projected.get(p.id)!), ...(assembly && pack.assembly ? { assembly: pack.assembly } : {}) };
}

/** Every sheet of the PDF pack, numbered "n of m". */
async function drawingSheets(pack: Pack, deps: ExportDeps, only?: ResolvedPart): Promise<DrawingSheet[]> {
  const drawn = only ? [only] : pack.parts;
  const withAssembly = !only && pack.parts.length > 1 && (pack.req.template.drawing?.assemblySheet ?? true);
  const projected = await project(pack, deps, drawn, withAssembly);
  const cut = cutListDocument(buildCutList(drawn, { units: pack.req.units }), pack.req.units);
  const ops = operationDocument(
    buildOperationSheet(drawn, { units: pack.req.units, ...(pack.req.machineMaxRpm ? { machineMaxRpm: pack.req.machineMaxRpm } : {}) }),
    pack.req.units,
  );
  const cutPages = tablePageCount(cut, pack.common);
  const opPages = tablePageCount(ops, pack.common);
  const total = drawn.length + (withAssembly ? 1 : 0) + cutPages + opPages;
  const sheets: DrawingSheet[] = [];
  let n = 1;
  if (withAssembly && projected.assembly) sheets.push(assemblySheet(pack, projected.assembly, n++, total));
  for (const part of drawn) {
    const p = projected.parts.find((x) => x.partId === part.id)!;
    sheets.push(buildPartSheet(partInput(pack, part, p, n++, total)).sheet);
  }
  sheets.push(...tableSheets(cut, pack.common, n, total));
  n += cutPages;
  sheets.push(...tableSheets(ops, pack.common, n, total));
  return sheets;
}

function assemblySheet(pack: Pack, projected: ProjectedAssembly, n: number, total: number): DrawingSheet {
  const materialNames = Object.fromEntries(pack.parts.map((p) => [p.id, materialInfo(p.material)?.name ?? p.material]));
  const mass = pack.req.evaluation.partSummaries.reduce((s, p) => (p.massKg == null ? s : s + p.massKg * p.quantity), 0);
  const { template, evaluation, units } = pack.req;
  // In mm whatever units the evaluation was worked in (a saved design is evaluated in its template's own).
  const madeToSuit = madeToSuitNote(template.parameters, evaluation.parametersMm, units);
  const extraNotes = [...(madeToSuit ? [escapeNoteText(madeToSuit)] : []), ...(evaluation.drawingNotes?.assembly ?? (template.assembly?.notes ?? []).map(escapeNoteText))];
  return buildAssemblySheet({ ...pack.common, parts: pack.parts, projected, materialNames, totalMassKg: mass, sheetNumber: n, sheetCount: total, extraNotes });
}

async function partDxf(pack: Pack, deps: ExportDeps, part: ResolvedPart): Promise<string> {
  const projected = await project(pack, deps, [part], false);
  return shapesToDxf(buildPartModelSpace(partInput(pack, part, projected.parts[0]!, 1, 1)), pack.req.units);
}

/** The projections a format draws from. */
function viewsNeeded(pack: Pack): { parts: ResolvedPart[]; assembly: boolean } {
  const { format, part } = pack.req;
  const chosen = part && part !== "assembly" ? pack.parts.filter((p) => p.id === part) : undefined;
  switch (format) {
    case "pdf":
    case "zip":
      return chosen ? { parts: chosen, assembly: false } : { parts: pack.parts, assembly: pack.parts.length > 1 && (pack.req.template.drawing?.assemblySheet ?? true) };
    case "svg":
      return part === "assembly" ? { parts: [], assembly: true } : { parts: chosen ?? pack.parts.slice(0, 1), assembly: false };
    case "dxf":
      return { parts: chosen ?? pack.parts.slice(0, 1), assembly: false };
    default:
      return { parts: [], assembly: false };
  }
}

/** Refuses, before any work, a format that needs one part when none (or "assembly") was chosen. */
function checkChoices(pack: Pack): void {
  const { format, part } = pack.req;
  if (format === "dxf") requirePart(pack, format);
  if (format === "stl" && part !== "assembly") requirePart(pack, format);
  if (format === "svg" && !part && pack.parts.length > 1) {
    throw new ExportInputError(`An SVG holds one sheet: choose a part (${pack.parts.map((p) => p.id).join(", ")}) or "assembly".`, "part");
  }
}

function requirePart(pack: Pack, format: string): ResolvedPart {
  const id = pack.req.part;
  if (!id || id === "assembly") {
    if (pack.parts.length === 1) return pack.parts[0]!;
    throw new ExportInputError(`A ${format.toUpperCase()} file holds one part: choose one of ${pack.parts.map((p) => p.id).join(", ")} (or download the ZIP pack).`, "part");
  }
  return pack.parts.find((p) => p.id === id)!;
}

async function stepFile(pack: Pack, deps: ExportDeps, parts: ResolvedPart[], assembly: boolean): Promise<Buffer> {
  const input: StepTaskInput = { parts, assembly };
  const out = await deps.kernel.run<StepTaskOutput>("step", input, deps.signal ? { signal: deps.signal } : {});
  return Buffer.from(out.bytes);
}

async function stlFile(deps: ExportDeps, parts: ResolvedPart[], assembly: boolean): Promise<Buffer> {
  const input: StlTaskInput = { parts, assembly };
  const out = await deps.kernel.run<StlTaskOutput>("stl", input, deps.signal ? { signal: deps.signal } : {});
  return Buffer.from(out.bytes);
}

function pdfMeta(pack: Pack, what: string) {
  return { title: `${pack.req.template.name} v${pack.req.template.version}: ${what}`, author: pack.req.drawnBy, subject: "Jigwright drawing pack" };
}

/** Builds one export file. Throws ExportInputError for bad choices and KernelError for solid failures. */
export async function buildExport(req: ExportRequest, deps: ExportDeps): Promise<ExportFile> {
  const pack = packFor(req);
  checkChoices(pack);
  // The cut list is a few rows of text: made here, no worker needed.
  if ((deps.inWorker ?? true) && req.format !== "csv") {
    // Project the parts this file shows in parallel across the pool's workers, then build the file in one.
    const need = viewsNeeded(pack);
    const done = need.parts.length > 0 || need.assembly ? await project(pack, deps, need.parts, need.assembly) : { parts: [] };
    const withViews: ExportRequest = { ...req, projections: done };
    const out = await deps.kernel.run<ExportTaskOutput>("export", withViews, { timeoutMs: deps.timeoutMs ?? 120_000, ...(deps.signal ? { signal: deps.signal } : {}) });
    return { fileName: out.fileName, contentType: out.contentType, body: Buffer.from(out.bytes.buffer, out.bytes.byteOffset, out.bytes.byteLength) };
  }
  const { id, version } = req.template;
  const file = (what: string, ext: string, body: Buffer | string): ExportFile => ({
    fileName: exportFileName(id, version, what, ext),
    contentType: CONTENT_TYPES[req.format],
    body: typeof body === "string" ? Buffer.from(body, "utf8") : body,
  });
  const chosen = req.part && req.part !== "assembly" ? pack.parts.find((p) => p.id === req.part) : undefined;
  switch (req.format) {
    case "pdf": {
      const sheets = await drawingSheets(pack, deps, chosen);
      return file(chosen ? chosen.id : "drawings", "pdf", await sheetsToPdf(sheets, pdfMeta(pack, chosen ? chosen.name : "drawing pack")));
    }
    case "svg": {
      if (req.part === "assembly" || (!req.part && pack.parts.length > 1)) {
        if (!req.part) throw new ExportInputError(`An SVG holds one sheet: choose a part (${pack.parts.map((p) => p.id).join(", ")}) or "assembly".`, "part");
        const projected = await project(pack, deps, [], true);
        return file("assembly", "svg", sheetToSvg(assemblySheet(pack, projected.assembly!, 1, 1)));
      }
      const part = requirePart(pack, "svg");
      const projected = await project(pack, deps, [part], false);
      return file(part.id, "svg", sheetToSvg(buildPartSheet(partInput(pack, part, projected.parts[0]!, 1, 1)).sheet));
    }
    case "dxf": {
      const part = requirePart(pack, "dxf");
      return file(part.id, "dxf", await partDxf(pack, deps, part));
    }
    case "step": {
      if (chosen) return file(chosen.id, "step", await stepFile(pack, deps, [chosen], false));
      if (pack.parts.length === 1) return file(pack.parts[0]!.id, "step", await stepFile(pack, deps, pack.parts, false));
      return file("assembly", "step", await stepFile(pack, deps, pack.parts, true));
    }
    case "stl": {
      if (req.part === "assembly") return file("assembly", "stl", await stlFile(deps, pack.parts, true));
      const part = requirePart(pack, "stl");
      return file(part.id, "stl", await stlFile(deps, [part], false));
    }
    case "csv": {
      const parts = chosen ? [chosen] : pack.parts;
      return file(chosen ? `${chosen.id}-cut-list` : "cut-list", "csv", cutListCsv(buildCutList(parts, { units: req.units })));
    }
    case "zip":
      return file(chosen ? chosen.id : "pack", "zip", await zipPack(pack, deps, chosen));
  }
}

/** The whole pack in one ZIP: PDF, an SVG per sheet, a DXF/STEP/STL per part, the assembly STEP and the CSV. */
async function zipPack(pack: Pack, deps: ExportDeps, only?: ResolvedPart): Promise<Buffer> {
  const { id, version } = pack.req.template;
  const name = (what: string, ext: string) => exportFileName(id, version, what, ext);
  const zip = new JSZip();
  const parts = only ? [only] : pack.parts;
  const sheets = await drawingSheets(pack, deps, only);
  zip.file(name(only ? only.id : "drawings", "pdf"), await sheetsToPdf(sheets, pdfMeta(pack, "drawing pack")));
  for (const s of sheets) zip.file(`svg/${name(`sheet-${String(s.sheetNumber).padStart(2, "0")}-${s.id}`, "svg")}`, sheetToSvg(s));
  for (const part of parts) {
    zip.file(`dxf/${name(part.id, "dxf")}`, await partDxf(pack, deps, part));
    zip.file(`step/${name(part.id, "step")}`, await stepFile(pack, deps, [part], false));
    zip.file(`stl/${name(part.id, "stl")}`, await stlFile(deps, [part], false));
  }
  if (!only && pack.parts.length > 1) zip.file(`step/${name("assembly", "step")}`, await stepFile(pack, deps, pack.parts, true));
  zip.file(name("cut-list", "csv"), cutListCsv(buildCutList(parts, { units: pack.req.units })));
  return zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE", compressionOptions: { level: 6 } });
}

/** The file as a stream, for HTTP responses. */
export function fileStream(f: ExportFile): Readable {
  return Readable.from([f.body]);
}
