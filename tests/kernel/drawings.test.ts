/**
 * Drawings and the download pack, end to end on the real kernel, read back with general-purpose libraries:
 * pdfjs-dist for the PDF's text and line dashes, dxf-parser for the DXF, jszip for the ZIP.
 *
 * Sources of the expectations:
 *  - the projection of a block with a through hole and a blind hole is worked by hand (ISO 5456-2
 *    orthographic projection; ISO 128-2: hidden edges dashed, and not drawn where a visible edge covers them);
 *  - ISO 128-2 line types (hidden 02.1 dash 12d gap 3d; centre 04.1) at d = 0.25 mm;
 *  - ISO 129-1: each feature's size and location on its part's sheet, no dimension text inside a view;
 *  - ISO 7200 title block fields; ISO 2768-1 general tolerance note; ISO 5455 scale series;
 *  - ISO 286-2 H7 limits for Ø8 (+0.015/0) and Ø5 (+0.012/0);
 *  - DXF group codes and control codes (%%c = Ø) as the DXF reference defines them;
 *  - the handbook rule of thumb that a circular cam with D/e well under 14 does not lock (PRODUCT.md) for
 *    the failing setting that must carry the NOT CHECKED stamp.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import DxfParser from "dxf-parser";
import JSZip from "jszip";
import { getDocument, OPS } from "pdfjs-dist/legacy/build/pdf.mjs";
import { evaluateTemplate, type CompiledTemplate, type Evaluation } from "@/engine";
import { buildPartSheet, layoutAtScale, type SheetCommon } from "@/engine/drawing/partSheet";
import { annotatePart, baseBox } from "@/engine/drawing/annotations";
import { formatAngle, formatter } from "@/engine/drawing/format";
import { engineFits, engineThreads } from "@/engine/drawing/lookups";
import type { ProjectedPart, ProjectedView, ViewEdge } from "@/engine/drawing/projection";
import type { ResolvedPart } from "@/engine/parts/features";
import { viewFrame } from "@/engine/drawing/views";
import { buildExport, clearProjectionCache, type ExportFormat, type ExportRequest } from "@server/exporters/build-export";
import { shapesBox } from "@/engine/drawing/layout/shapes";
import { segmentsIntersect } from "@/engine/drawing/layout/balloons";
import { balloonView, buildAssemblySheet } from "@/engine/drawing/assemblySheet";
import type { SheetShape } from "@/engine/drawing/model";
import { createInProcessKernel, type KernelPool } from "@server/kernel";
import type { ProjectTaskOutput } from "@server/kernel/tasks";
import { builtInTemplates } from "@server/templates";

let kernel: KernelPool;
let compiled: CompiledTemplate;
let ev: Evaluation;
/** Projections are the slow step; the same part is projected once for all the formats below. */
const projections = new Map<string, Promise<unknown>>();
const memoKernel: Pick<KernelPool, "run"> = {
  run<T>(task: string, input: unknown) {
    if (task !== "project") return kernel.run<T>(task, input);
    const key = JSON.stringify(input);
    if (!projections.has(key)) projections.set(key, kernel.run(task, input));
    return projections.get(key) as Promise<T>;
  },
};

/** The sheet fields every hand-built sheet below shares. */
const sheetCommon = {
  units: "mm",
  projection: "first",
  generalTolerance: "m",
  template: { id: "cam-vise-stop", name: "Cam-lock vise stop", version: "1.0.0" },
  owner: "Jigwright",
  drawnBy: "A. Fitter",
  date: "2026-12-01",
  failingChecks: [],
} satisfies SheetCommon;

function request(over: Partial<ExportRequest> & { format: ExportFormat }): ExportRequest {
  return { template: compiled.template, evaluation: ev, units: "mm", projection: "first", drawnBy: "A. Fitter", date: "2026-12-01", ...over };
}

async function pdfPages(body: Buffer): Promise<{ texts: string[][]; dashes: string[][] }> {
  const doc = await getDocument({ data: new Uint8Array(body), disableFontFace: true, verbosity: 0 }).promise;
  const texts: string[][] = [];
  const dashes: string[][] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    const tc = await page.getTextContent();
    texts.push(tc.items.map((it) => ("str" in it ? it.str : "")).filter((s) => s.trim() !== ""));
    const ops = await page.getOperatorList();
    dashes.push(ops.fnArray.flatMap((f, k) => (f === OPS.setDash ? [JSON.stringify((ops.argsArray[k] as unknown[])[0])] : [])));
  }
  await doc.destroy();
  return { texts, dashes };
}

let pack: { texts: string[][]; dashes: string[][] };

beforeAll(async () => {
  kernel = createInProcessKernel();
  await kernel.ready();
  compiled = builtInTemplates().get("cam-vise-stop")!;
  ev = evaluateTemplate(compiled, {});
  pack = await pdfPages((await buildExport(request({ format: "pdf" }), { kernel: memoKernel, inWorker: false })).body);
});

afterAll(async () => {
  await kernel?.close();
});

const holeBlock: ResolvedPart = {
  id: "block",
  name: "Test block",
  material: "mild-steel",
  features: [
    { kind: "block", size: { x: 60, y: 30, z: 20 } },
    // Through along y, seen end-on in the front view: a visible circle.
    { kind: "hole", at: { x: 15, y: 0, z: 10 }, direction: "+y", diameter: 6, through: true },
    // Blind from the top, 8 deep: hidden in the front view.
    { kind: "hole", at: { x: 45, y: 15, z: 20 }, direction: "-z", diameter: 5, depth: 8 },
  ],
};

const lines = (view: ProjectedView, visibility: ViewEdge["visibility"]) =>
  view.edges.filter((e) => e.visibility === visibility && e.curve.type === "line").map((e) => e.curve as Extract<ViewEdge["curve"], { type: "line" }>);
const near = (a: number, b: number) => Math.abs(a - b) < 1e-3;

describe("hidden-line views", () => {
  let views: ProjectedView[];
  beforeAll(async () => {
    const out = await kernel.run<ProjectTaskOutput>("project", { parts: [holeBlock] });
    views = out.parts[0]!.views;
  });

  it("front view: four outline edges and the through hole's circle visible; the blind hole's sides and bottom hidden", () => {
    const front = views.find((v) => v.name === "front")!;
    expect(front).toMatchObject({ right: "+x", up: "+z" });
    const visible = front.edges.filter((e) => e.visibility === "visible");
    expect(visible).toHaveLength(5);
    expect(visible.filter((e) => e.curve.type === "circle")).toHaveLength(1);
    const hidden = lines(front, "hidden");
    // Hole Ø5 at x = 45 from z = 12 to 20: sides at x = 42.5 and 47.5, bottom at z = 12.
    expect(hidden).toHaveLength(3);
    for (const x of [42.5, 47.5]) expect(hidden.some((l) => near(l.from.x, x) && near(l.to.x, x) && near(Math.min(l.from.y, l.to.y), 12) && near(Math.max(l.from.y, l.to.y), 20))).toBe(true);
    expect(hidden.some((l) => near(l.from.y, 12) && near(l.to.y, 12))).toBe(true);
    // The back outline lies under the front one and is not drawn twice.
    expect(front.edges.filter((e) => e.visibility === "hidden" && e.curve.type === "line" && near(e.curve.from.y, 0) && near(e.curve.to.y, 0))).toHaveLength(0);
    // Centre lines: a cross on the through hole, the blind hole's axis as a line.
    expect(front.centreMarks).toContainEqual({ type: "cross", centre: { x: 15, y: 10 }, radius: 3 });
    expect(front.centreMarks.some((m) => m.type === "axis" && near(m.from.x, 45) && near(m.to.x, 45))).toBe(true);
  });

  it("top view: the blind hole is a visible circle, the cross hole two hidden lines through the whole width", () => {
    const top = views.find((v) => v.name === "top")!;
    expect(top.edges.some((e) => e.visibility === "visible" && e.curve.type === "circle" && near(e.curve.radius, 2.5) && near(e.curve.centre.x, 45))).toBe(true);
    const hidden = lines(top, "hidden");
    for (const x of [12, 18]) expect(hidden.some((l) => near(l.from.x, x) && near(l.to.x, x) && near(Math.abs(l.to.y - l.from.y), 30))).toBe(true);
  });

  it("our own cameras are not mirrored: seen from the right, the part's +y runs to the right", () => {
    const right = views.find((v) => v.name === "right")!;
    expect(right.right).toBe("+y");
    // The blind hole at y = 15 ± 2.5 shows as hidden lines there, under the top face.
    const hidden = lines(right, "hidden");
    expect(hidden.some((l) => near(l.from.x, 12.5) && near(l.to.x, 12.5))).toBe(true);
    expect(hidden.some((l) => near(l.from.x, 17.5) && near(l.to.x, 17.5))).toBe(true);
  });
});

describe("PDF pack of the cam-lock vise stop (mm, first angle)", () => {
  // The part's own sheet (the assembly sheet's parts list names every drawing number too).
  const pageOf = (drawingNumber: string) =>
    pack.texts.find((t) => t.includes(drawingNumber) && (drawingNumber.endsWith("ASSEMBLY") || !t.includes("CAM-VISE-STOP-ASSEMBLY")))!;

  it("has a sheet per part, the assembly, the cut list and the operation sheet, numbered n of m", () => {
    const n = pack.texts.length;
    for (const part of ev.parts) expect(pageOf(`CAM-VISE-STOP-${part.id.toUpperCase()}`), part.id).toBeDefined();
    expect(pageOf("CAM-VISE-STOP-ASSEMBLY")).toBeDefined();
    expect(pack.texts.some((t) => t.includes("Cut list"))).toBe(true);
    expect(pack.texts.some((t) => t.includes("Operation sheet"))).toBe(true);
    pack.texts.forEach((t, i) => expect(t).toContain(`${i + 1} of ${n}`));
  });

  it("every title block is filled: title, number, revision, scale from ISO 5455, projection, material, mass, units, tolerance, drawn by, date", () => {
    for (const part of ev.parts) {
      const t = pageOf(`CAM-VISE-STOP-${part.id.toUpperCase()}`);
      expect(t).toContain(part.name);
      expect(t).toContain(compiled.template.version);
      expect(t.some((s) => /^(5:1|2:1|1:1|1:2|1:5|1:10)$/.test(s))).toBe(true);
      expect(t).toContain("Projection: first angle");
      expect(t).toContain("ISO 2768-m");
      expect(t).toContain("A. Fitter");
      expect(t).toContain("2026-12-01");
      expect(t).toContain("mm");
      expect(t.some((s) => / (g|kg)$/.test(s))).toBe(true);
    }
    expect(pageOf("CAM-VISE-STOP-BODY")).toContain("Mild steel (S235JR)");
  });

  it("every part sheet carries the ISO 2768 general tolerance note and the units note", () => {
    for (const part of ev.parts) {
      const t = pageOf(`CAM-VISE-STOP-${part.id.toUpperCase()}`).join(" ");
      expect(t).toMatch(/General tolerances ISO 2768-m \(medium\)/);
      expect(t).toMatch(/Dimensions in mm/);
    }
  });

  it("each feature's size is on its sheet: overall sizes, Ø with fits and ISO 286 limits, threads, slot width, chamfers", () => {
    const mm = formatter("mm");
    for (const part of ev.parts) {
      const text = pageOf(`CAM-VISE-STOP-${part.id.toUpperCase()}`).join(" | ");
      for (const f of part.features) {
        const expectations: string[] = [];
        if (f.kind === "block") expectations.push(mm.length(f.size.x), mm.length(f.size.y), mm.length(f.size.z));
        if (f.kind === "turned") {
          expectations.push(mm.length(f.steps.reduce((s, st) => s + st.length, 0)));
          f.steps.forEach((st, i) => {
            const thread = part.features.find((g) => g.kind === "thread" && g.form === "external" && g.step === i);
            expectations.push(thread && thread.kind === "thread" ? thread.designation : mm.diameter(st.diameter));
          });
        }
        if (f.kind === "hole" || f.kind === "eccentric-bore") expectations.push(`${mm.diameter(f.diameter)}${f.fit ? ` ${f.fit}` : ""}`);
        if (f.kind === "pattern-linear" && f.feature.kind === "hole") expectations.push(`${f.count}× ${mm.diameter(f.feature.diameter)}`);
        if (f.kind === "thread") expectations.push(f.designation);
        if (f.kind === "slot") expectations.push(`slot ${mm.length(f.width)} wide`);
        if (f.kind === "chamfer") expectations.push(`chamfer ${mm.length(f.size)} × 45°`);
        if ((f.kind === "hole" || f.kind === "eccentric-bore") && f.counterbore) expectations.push(`counterbore ${mm.diameter(f.counterbore.diameter)}`);
        for (const e of expectations) expect(text, `${part.id}: ${f.kind} → "${e}"`).toContain(e);
      }
    }
    // ISO 286-2: H7 at Ø8 is +0.015/0, at Ø5 +0.012/0.
    expect(pageOf("CAM-VISE-STOP-BODY").join(" ")).toContain("Ø8 H7 (+0.015/0)");
    expect(pageOf("CAM-VISE-STOP-CAM").join(" ")).toContain("Ø5 H7 (+0.012/0)");
    // ISO 286-2 over 6 to 10 mm: g6 is -0.005/-0.014 (the carrier's boss), h6 is 0/-0.009 (the stop rod).
    expect(pageOf("CAM-VISE-STOP-CARRIER").join(" ")).toContain("Ø8 g6 (-0.005/-0.014)");
    expect(pageOf("CAM-VISE-STOP-STOP-ROD").join(" ")).toContain("Ø8 h6 (0/-0.009)");
  });

  it("each feature's location from the datums is on its sheet (every linear dimension the annotators ask for is printed)", () => {
    for (const part of ev.parts) {
      const text = pageOf(`CAM-VISE-STOP-${part.id.toUpperCase()}`);
      const bbox = baseBox(part);
      const kind = part.features[0]!.kind as "block" | "turned";
      const requests = annotatePart({
        part,
        baseKind: kind,
        bbox,
        datum: (a) => (kind === "turned" && a !== "z" ? 0 : part.datums?.[a] === "max" ? bbox.max[a] : bbox.min[a]),
        fmt: formatter("mm"),
        threads: engineThreads,
        fits: engineFits,
        showFitLimits: true,
      });
      for (const r of requests) if (r.kind === "linear") expect(text, `${part.id} ${r.feature} ${r.axis}`).toContain(r.text);
    }
    // By hand for the body (datum z at the top face, 46 high): the first rod hole at z = 15 is 31 down;
    // three holes 12 apart; the carrier slot 17 between end centres, 27 from the front face.
    const body = pageOf("CAM-VISE-STOP-BODY");
    for (const s of ["31", "2 × 12 (= 24)", "17", "27", "40", "55", "46"]) expect(body).toContain(s);
  });

  it("hidden lines are drawn dashed and centre lines long-dash dot (ISO 128-2 at 0.25 mm)", () => {
    const bodyIndex = pack.texts.findIndex((t) => t.includes("CAM-VISE-STOP-BODY"));
    expect(pack.dashes[bodyIndex]).toContain(JSON.stringify([3, 0.75]));
    expect(pack.dashes[bodyIndex]).toContain(JSON.stringify([6, 0.75, 0.5, 0.75]));
  });

  it("the cut list and operation sheet pages carry every part", () => {
    const cut = pack.texts.find((t) => t.includes("Cut list") && t.includes("Stock to buy"))!.join(" ");
    for (const part of ev.parts) expect(cut).toContain(part.name);
  });
});

describe("sheet layout rules", () => {
  it("no dimension or note text sits inside a view, and views do not overlap (ISO 129-1)", async () => {
    for (const part of ev.parts) {
      const out = await memoKernel.run<ProjectTaskOutput>("project", { parts: [part] });
      const projected: ProjectedPart = out.parts[0]!;
      const bbox = baseBox(part);
      const kind = part.features[0]!.kind as "block" | "turned";
      const reqs = annotatePart({
        part,
        baseKind: kind,
        bbox,
        datum: (a) => (kind === "turned" && a !== "z" ? 0 : part.datums?.[a] === "max" ? bbox.max[a] : bbox.min[a]),
        fmt: formatter("mm"),
        threads: engineThreads,
        fits: engineFits,
        showFitLimits: true,
      });
      const set = layoutAtScale(projected, reqs, 1, "first");
      const boxes = set.views.map((v) => {
        const o = set.arranged.offsets.get(v.view.name)!;
        return { name: v.view.name, b: { minX: v.geometryBox.minX + o.dx, maxX: v.geometryBox.maxX + o.dx, minY: v.geometryBox.minY + o.dy, maxY: v.geometryBox.maxY + o.dy } };
      });
      for (const v of set.views) {
        const o = set.arranged.offsets.get(v.view.name)!;
        for (const s of v.shapes) {
          if (s.type !== "text") continue;
          const t = shapesBox([s]);
          const tb = { minX: t.minX + o.dx, maxX: t.maxX + o.dx, minY: t.minY + o.dy, maxY: t.maxY + o.dy };
          for (const { name, b } of boxes) {
            const inside = tb.minX > b.minX + 0.5 && tb.maxX < b.maxX - 0.5 && tb.minY > b.minY + 0.5 && tb.maxY < b.maxY - 0.5;
            expect(inside, `${part.id}: "${s.text}" inside the ${name} view`).toBe(false);
          }
        }
      }
    }
  });

  it("third angle puts the view from above over the front view and the view from the right on its right", async () => {
    const part = ev.parts.find((p) => p.id === "body")!;
    const out = await memoKernel.run<ProjectTaskOutput>("project", { parts: [part] });
    const reqs = annotatePart({
      part,
      baseKind: "block",
      bbox: baseBox(part),
      datum: (a) => (part.datums?.[a] === "max" ? baseBox(part).max[a] : baseBox(part).min[a]),
      fmt: formatter("mm"),
      threads: engineThreads,
      fits: engineFits,
      showFitLimits: true,
    });
    const third = layoutAtScale(out.parts[0]!, reqs, 1, "third").arranged.offsets;
    const first = layoutAtScale(out.parts[0]!, reqs, 1, "first").arranged.offsets;
    expect(third.get("top")!.dy).toBeGreaterThan(0);
    expect(third.get("right")!.dx).toBeGreaterThan(0);
    expect(first.get("top")!.dy).toBeLessThan(0);
    expect(first.get("right")!.dx).toBeLessThan(0);
  });
});

describe("inch drawings (decimal inches, three places)", () => {
  it("the body sheet reads in inches: 40 mm → 1.575, 55 mm → 2.165, Ø8 → Ø.315 H7, and says so", async () => {
    const inchEv = evaluateTemplate(compiled, { units: "in" });
    const file = await buildExport({ ...request({ format: "pdf", part: "body", units: "in", projection: "third" }), evaluation: inchEv }, { kernel: memoKernel, inWorker: false });
    const { texts } = await pdfPages(file.body);
    const body = texts[0]!.join(" | ");
    for (const s of ["1.575", "2.165", "Ø.315 H7", "Dimensions in inches", "Projection: third angle", "inch"]) expect(body).toContain(s);
    // No millimetre dimension slipped through: 40 and 55 are absent as dimension values.
    expect(texts[0]).not.toContain("55");
  });
});

describe("the NOT CHECKED stamp", () => {
  it("a cam with D/e = 8 fails its lock check, and every drawing of that pack says NOT CHECKED — ERRORS", async () => {
    const failing = evaluateTemplate(compiled, { parameters: { camEccentricity: 2.5 } });
    expect(failing.ok).toBe(false);
    const cam = failing.parts.find((p) => p.id === "cam")!;
    const file = await buildExport({ ...request({ format: "pdf", part: "cam" }), evaluation: failing }, { kernel: memoKernel, inWorker: false });
    const { texts } = await pdfPages(file.body);
    expect(texts[0]).toContain("NOT CHECKED — ERRORS");
    expect(texts[0]).toContain("NOT CHECKED");
    expect(texts[0]!.join(" ")).toMatch(/Template checks failing: .*does not lock/);
    expect(cam).toBeDefined();
    // The default (locking) cam carries no stamp.
    expect(pack.texts.find((t) => t.includes("CAM-VISE-STOP-CAM"))).not.toContain("NOT CHECKED — ERRORS");
  });
});

describe("SVG, DXF, CSV and ZIP", () => {
  it("SVG: a sheet-sized viewBox in mm, dashed hidden and centre paths, filled text", async () => {
    const file = await buildExport(request({ format: "svg", part: "body" }), { kernel: memoKernel, inWorker: false });
    const svg = file.body.toString("utf8");
    expect(file.fileName).toBe("cam-vise-stop-v1.0.0-body.svg");
    expect(svg).toMatch(/<svg [^>]*width="(297|420)mm" height="(210|297)mm" viewBox="0 0 (297 210|420 297)"/);
    expect(svg).toMatch(/<path [^>]*id="hidden"[^>]*stroke-dasharray:3 0\.75/);
    expect(svg).toMatch(/<path [^>]*id="centre"[^>]*stroke-dasharray:6 0\.75 0\.5 0\.75/);
    expect(svg).toMatch(/<path [^>]*id="visible"[^>]*stroke-width="0\.5"/);
    expect(svg).toMatch(/<g id="text" fill="#000" stroke="none"/);
    expect(svg).toContain(">3× Ø8 H7 (+0.015/0) reamed × 16 deep<");
  });

  it("DXF per part at 1:1: the five layers, CENTER and DASHED line types, SOLID arrowheads, %%c text; inches when asked", async () => {
    const mmFile = await buildExport(request({ format: "dxf", part: "body" }), { kernel: memoKernel, inWorker: false });
    const dxf = new DxfParser().parseSync(mmFile.body.toString("utf8"))!;
    const layers = Object.keys(dxf.tables.layer.layers);
    for (const l of ["VISIBLE", "HIDDEN", "CENTER", "DIMENSIONS", "TEXT"]) expect(layers).toContain(l);
    expect(Object.keys(dxf.tables.lineType.lineTypes)).toEqual(expect.arrayContaining(["CONTINUOUS", "DASHED", "CENTER"]));
    expect(dxf.header.$INSUNITS).toBe(4);
    const on = (layer: string, type?: string) => dxf.entities.filter((e) => e.layer === layer && (!type || e.type === type));
    expect(on("VISIBLE", "LINE").length).toBeGreaterThan(10);
    expect(on("VISIBLE", "CIRCLE").length).toBeGreaterThanOrEqual(6);
    expect(on("HIDDEN").length).toBeGreaterThan(0);
    expect(on("HIDDEN").every((e) => e.lineType === "DASHED")).toBe(true);
    expect(on("CENTER").length).toBeGreaterThan(0);
    expect(on("DIMENSIONS", "SOLID").length).toBeGreaterThan(10);
    const texts = dxf.entities.filter((e) => e.type === "TEXT").map((e) => (e as unknown as { text: string }).text);
    expect(texts).toContain("40");
    expect(texts.some((t) => t.startsWith("3\\U+00D7 %%c8 H7"))).toBe(true);
    // 1:1: the front view's outline is the body's 40 mm length.
    const xs = on("VISIBLE", "LINE").flatMap((e) => (e as unknown as { vertices: { x: number }[] }).vertices.map((v) => v.x));
    expect(Math.max(...xs) - Math.min(...xs)).toBeGreaterThanOrEqual(40);

    const inFile = await buildExport({ ...request({ format: "dxf", part: "body", units: "in" }), evaluation: evaluateTemplate(compiled, { units: "in" }) }, { kernel: memoKernel, inWorker: false });
    const inch = new DxfParser().parseSync(inFile.body.toString("utf8"))!;
    expect(inch.header.$INSUNITS).toBe(1);
    const circles = inch.entities.filter((e) => e.layer === "VISIBLE" && e.type === "CIRCLE") as unknown as { radius: number }[];
    // The Ø8 mm rod holes are 0.3150 in across at 1:1.
    expect(circles.some((c) => Math.abs(c.radius * 2 - 8 / 25.4) < 1e-4)).toBe(true);
  });

  it("CSV cut list with a header row and one row per part", async () => {
    const file = await buildExport(request({ format: "csv" }), { kernel: memoKernel, inWorker: false });
    const rows = file.body.toString("utf8").trim().split(/\r\n/);
    expect(rows).toHaveLength(1 + ev.parts.length);
    expect(file.contentType).toMatch(/^text\/csv/);
  });

  it("ZIP: the PDF, an SVG per sheet, a DXF, STEP and STL per part, the assembly STEP and the cut list", async () => {
    const file = await buildExport(request({ format: "zip" }), { kernel: memoKernel, inWorker: false });
    const zip = await JSZip.loadAsync(file.body);
    const names = Object.keys(zip.files);
    const p = "cam-vise-stop-v1.0.0-";
    expect(names).toContain(`${p}drawings.pdf`);
    expect(names).toContain(`${p}cut-list.csv`);
    expect(names).toContain(`step/${p}assembly.step`);
    for (const part of ev.parts) for (const ext of ["dxf", "step", "stl"]) expect(names).toContain(`${ext}/${p}${part.id}.${ext}`);
    expect(names.filter((n) => n.startsWith("svg/") && n.endsWith(".svg")).length).toBe(pack.texts.length);
    const step = await zip.file(`step/${p}body.step`)!.async("string");
    expect(step.startsWith("ISO-10303-21;")).toBe(true);
  });

  it("asking for one-part formats without a part names the parts to choose from", async () => {
    await expect(buildExport(request({ format: "dxf" }), { kernel: memoKernel, inWorker: false })).rejects.toThrow(/choose one of body, stop-rod/);
    await expect(buildExport(request({ format: "pdf", part: "nope" }), { kernel: memoKernel, inWorker: false })).rejects.toThrow(/There is no part "nope"/);
  });
});

describe("one part sheet on its own", () => {
  it("turned parts get their end view and the profile, axis horizontal", async () => {
    const part = ev.parts.find((p) => p.id === "carrier")!;
    const out = await memoKernel.run<ProjectTaskOutput>("project", { parts: [part] });
    expect(out.parts[0]!.views.map((v) => v.name)).toEqual(["front", "right"]);
    expect(out.parts[0]!.views[0]).toMatchObject({ right: viewFrame("turned", "front").right, up: viewFrame("turned", "front").up });
    const res = buildPartSheet({
      part,
      projected: out.parts[0]!,
      ...sheetCommon,
      threads: engineThreads,
      fits: engineFits,
    });
    expect(res.unplaced).toHaveLength(0);
  });
});

describe("the template's drawing.views (views for parts that do not list their own)", () => {
  it("a part without its own list draws the template's views; a part with one keeps it; without the setting the default stays", async () => {
    const projected: ProjectTaskOutput[] = [];
    const recording: Pick<KernelPool, "run"> = {
      async run<T>(task: string, input: unknown) {
        const out = await memoKernel.run<T>(task, input);
        if (task === "project") projected.push(out as ProjectTaskOutput);
        return out;
      },
    };
    const views = (id: string) => projected.flatMap((o) => o.parts).filter((p) => p.partId === id).map((p) => p.views.map((v) => v.name));
    const chosen: ("front" | "top" | "left")[] = ["front", "left", "top"];
    const template = { ...compiled.template, drawing: { ...compiled.template.drawing, views: chosen } };
    // The cam lists no views of its own; the body lists front, top and right in the template.
    const cam = await buildExport({ ...request({ format: "svg", part: "cam" }), template }, { kernel: recording, inWorker: false });
    await buildExport({ ...request({ format: "svg", part: "body" }), template }, { kernel: recording, inWorker: false });
    expect(views("cam")).toEqual([["front", "left", "top"]]);
    expect(views("body")).toEqual([["front", "top", "right"]]);
    // The sheet draws what was projected: the cam's end view seen from the left carries its bore callout.
    expect(cam.body.toString("utf8")).toContain("Ø8 H7");
    projected.length = 0;
    clearProjectionCache();
    await buildExport(request({ format: "svg", part: "cam" }), { kernel: recording, inWorker: false });
    expect(views("cam")).toEqual([["front", "right"]]);
  });
});

describe("assembly sheet balloons (ISO 6433)", () => {
  it("vise stop: a balloon per item, no two leaders cross, none runs through another balloon, each dot on a part its view shows", async () => {
    const out = await memoKernel.run<ProjectTaskOutput>("project", { parts: [], assembly: { parts: ev.parts } });
    const projected = out.assembly!;
    const sheet = buildAssemblySheet({
      ...sheetCommon,
      parts: ev.parts,
      projected,
      materialNames: {},
    });
    const balloons = sheet.shapes.filter((s): s is Extract<SheetShape, { type: "circle" }> => s.type === "circle" && s.layer === "dimension" && Math.abs(s.radius - 4.5) < 1e-9);
    const labels = sheet.shapes.filter((s) => s.type === "text" && s.role === "label" && s.layer === "dimension").map((s) => (s.type === "text" ? s.text : ""));
    expect(labels.sort((a, b) => Number(a) - Number(b))).toEqual(ev.parts.map((_, i) => String(i + 1)));
    expect(balloons).toHaveLength(ev.parts.length);
    // A leader starts on a balloon's rim.
    const leaders = sheet.shapes.filter(
      (s): s is Extract<SheetShape, { type: "line" }> =>
        s.type === "line" && s.layer === "dimension" && balloons.some((b) => Math.abs(Math.hypot(s.from.x - b.centre.x, s.from.y - b.centre.y) - 4.5) < 1e-6),
    );
    expect(leaders).toHaveLength(ev.parts.length);
    for (let i = 0; i < leaders.length; i++)
      for (let j = i + 1; j < leaders.length; j++) expect(segmentsIntersect(leaders[i]!.from, leaders[i]!.to, leaders[j]!.from, leaders[j]!.to), `leaders ${i} and ${j}`).toBe(false);
    for (const l of leaders) {
      const own = balloons.find((b) => Math.abs(Math.hypot(l.from.x - b.centre.x, l.from.y - b.centre.y) - 4.5) < 1e-6)!;
      for (const b of balloons) if (b !== own) expect(distanceToSegment(l.from, l.to, b.centre)).toBeGreaterThan(4.5);
    }
    // Each part is seen (a visible anchor, clear of its patch's edges) in the view its balloon is in.
    for (const p of ev.parts) {
      const anchor = projected.anchors.find((a) => a.partId === p.id && a.view === balloonView(projected, p.id))!;
      expect(anchor.visibleShare, p.id).toBeGreaterThan(0);
      expect(anchor.clearanceMm, p.id).toBeGreaterThan(0.2);
    }
    // Two parts never share a dot.
    const dots = leaders.map((l) => l.to);
    for (let i = 0; i < dots.length; i++) for (let j = i + 1; j < dots.length; j++) expect(Math.hypot(dots[i]!.x - dots[j]!.x, dots[i]!.y - dots[j]!.y)).toBeGreaterThan(1);
  });
});

function distanceToSegment(a: { x: number; y: number }, b: { x: number; y: number }, c: { x: number; y: number }): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t = Math.max(0, Math.min(1, ((c.x - a.x) * dx + (c.y - a.y) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(a.x + t * dx - c.x, a.y + t * dy - c.y);
}

describe("the eccentric bore's angular position (ISO 129-1 angular dimension)", () => {
  // The angle between the bore's offset and the nearest principal centre line of the cam, which no
  // quarter-turn of the view changes: min over k of |θ − k·90°|.
  const cam = () => ev.parts.find((p) => p.id === "cam")!;
  const expected = () => {
    const bore = cam().features.find((f) => f.kind === "eccentric-bore")!;
    const a = bore.kind === "eccentric-bore" ? (bore.angleDeg ?? 0) : 0;
    const r = ((a % 90) + 90) % 90;
    return formatAngle(Math.min(r, 90 - r));
  };

  it("the cam sheet gives the angle in degrees as a dimension, not in words", () => {
    const t = pack.texts.find((x) => x.includes("CAM-VISE-STOP-CAM") && !x.includes("CAM-VISE-STOP-ASSEMBLY"))!;
    expect(expected()).not.toBe("0°");
    expect(t).toContain(expected());
    expect(t.join(" ")).not.toMatch(/clockwise/);
  });

  it("SVG and DXF draw it from the same model: an arc on the dimension layer and the value in degrees", async () => {
    const svg = (await buildExport(request({ format: "svg", part: "cam" }), { kernel: memoKernel, inWorker: false })).body.toString("utf8");
    expect(svg).toContain(`>${expected()}<`);
    expect(svg).toMatch(/<path d="[^"]* A [^"]*" id="dimension"/);
    const dxf = new DxfParser().parseSync((await buildExport(request({ format: "dxf", part: "cam" }), { kernel: memoKernel, inWorker: false })).body.toString("utf8"))!;
    expect(dxf.entities.some((e) => e.type === "ARC" && e.layer === "DIMENSIONS")).toBe(true);
    const texts = dxf.entities.filter((e) => e.type === "TEXT").map((e) => (e as unknown as { text: string }).text);
    expect(texts).toContain(expected().replace("°", "%%d"));
  });
});
