/**
 * Hidden lines by sight lines (server/kernel/projection/sightlines.ts), the way views with cross holes in
 * turned parts are drawn, checked against:
 *  - OpenCascade's exact hidden-line removal (HLRBRep_Algo, from the replicad-opencascadejs package):
 *    after the same cleanup, each view's visible and hidden lines must lie on lines of the same kind in
 *    the other, view by view, for every built-in part view that takes the sight lines;
 *  - a view worked by hand (ISO 128-2: hidden edges dashed; ISO 5456-2 orthographic projection): a Ø4
 *    cross hole through a Ø18 head, seen along the pin's axis, shows as two hidden lines 4 apart across
 *    the head, each as long as the chord 2·√(9² − 2²) = 17.55 mm.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ViewEdge, ViewPoint } from "@/engine/drawing/projection";
import { viewFrame, viewsForPart, type ViewFrame } from "@/engine/drawing/views";
import { evaluateTemplate } from "@/engine";
import type { ResolvedPart } from "@/engine/parts/features";
import { buildPart } from "@server/kernel/build-part";
import { meshTriangles } from "@server/kernel/mesh";
import { loadKernel, type LoadedKernel } from "@server/kernel/oc";
import { placedCopy } from "@server/kernel/step";
import { cleanEdges, distanceToCurve, edgeBounds } from "@server/kernel/projection/cleanup";
import { encodeRegularity, projectEdges } from "@server/kernel/projection/hlr";
import { hasFreeFormEdges, planSightLines, SIGHT_MESH } from "@server/kernel/projection/sightlines";
import { builtInTemplates } from "@server/templates";

let kernel: LoadedKernel;
const made: { delete(): void }[] = [];

beforeAll(async () => {
  kernel = await loadKernel();
}, 120_000);

afterAll(() => {
  for (const s of made) s.delete();
});

/** Points every 0.05 mm along a drawn curve. */
function along(edge: ViewEdge): ViewPoint[] {
  const c = edge.curve;
  const step = 0.05;
  const out: ViewPoint[] = [];
  const run = (a: ViewPoint, b: ViewPoint) => {
    const n = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / step));
    for (let i = 0; i <= n; i++) out.push({ x: a.x + ((b.x - a.x) * i) / n, y: a.y + ((b.y - a.y) * i) / n });
  };
  if (c.type === "line") run(c.from, c.to);
  else if (c.type === "polyline") for (let i = 1; i < c.points.length; i++) run(c.points[i - 1]!, c.points[i]!);
  else {
    const s = c.type === "arc" ? c.startDeg : 0;
    const e = c.type === "arc" ? c.endDeg : 360;
    const n = Math.max(4, Math.ceil((((e - s) * Math.PI) / 180) * (c.radius / step)));
    for (let i = 0; i <= n; i++) {
      const a = ((s + ((e - s) * i) / n) * Math.PI) / 180;
      out.push({ x: c.centre.x + c.radius * Math.cos(a), y: c.centre.y + c.radius * Math.sin(a) });
    }
  }
  return out;
}

/** Points of the lines of one visibility in `a` that lie on no line of that visibility in `b` (within 0.01 mm), every 0.05 mm. */
function unmatchedPoints(a: ViewEdge[], b: ViewEdge[], visibility: ViewEdge["visibility"]): ViewPoint[] {
  const others = b.filter((e) => e.visibility === visibility);
  const misses: ViewPoint[] = [];
  for (const e of a.filter((x) => x.visibility === visibility)) for (const p of along(e)) if (!others.some((o) => distanceToCurve(p, o.curve) < 0.01)) misses.push(p);
  return misses;
}

/** Length (mm) of the lines of one visibility in `a` that lie on no line of that visibility in `b`. */
function unmatched(a: ViewEdge[], b: ViewEdge[], visibility: ViewEdge["visibility"]): number {
  return unmatchedPoints(a, b, visibility).length * 0.05;
}

interface Compared {
  exact: ViewEdge[];
  sight: ViewEdge[];
  pays: boolean;
}

function compare(shape: { wrapped: never }, frame: ViewFrame): Compared {
  const exact = cleanEdges(projectEdges(kernel.oc, shape.wrapped, frame));
  const plan = planSightLines(kernel.oc, shape.wrapped, frame);
  try {
    const sight = cleanEdges(plan.project(meshTriangles(kernel, shape, SIGHT_MESH)));
    return { exact, sight, pays: plan.pays };
  } finally {
    plan.dispose();
  }
}

function partShape(part: ResolvedPart) {
  const built = buildPart(kernel, part);
  encodeRegularity(kernel.oc, built.shape.wrapped);
  return built.shape as unknown as { wrapped: never };
}

const evaluation = (id: string) => evaluateTemplate(builtInTemplates().get(id)!, {});

describe("sight lines against the exact hidden-line removal", () => {
  const slowParts: [string, string][] = [
    ["cam-edge-clamp", "cam"],
    ["cam-edge-clamp", "pivot-pin"],
    ["cam-vise-stop", "cam"],
    ["cam-vise-stop", "lock-nut"],
  ];

  it.each(slowParts)("%s %s: every view takes the sight lines and draws the lines the exact algorithm draws", (templateId, partId) => {
    const compiled = builtInTemplates().get(templateId)!;
    const part = evaluation(templateId).parts.find((p) => p.id === partId)!;
    const shape = partShape(part);
    for (const frame of viewsForPart(part, compiled.template.drawing?.views)) {
      const { exact, sight, pays } = compare(shape, frame);
      expect(pays, `${partId} ${frame.name}`).toBe(true);
      // Both ways, each visibility: at most half a millimetre of difference (single pieces shorter than
      // the pen width where the exact algorithm splits a curve differently).
      for (const visibility of ["visible", "hidden"] as const) {
        expect(unmatched(exact, sight, visibility), `${partId} ${frame.name}: ${visibility} lines the sight lines miss`).toBeLessThanOrEqual(0.5);
        expect(unmatched(sight, exact, visibility), `${partId} ${frame.name}: ${visibility} lines the exact algorithm does not draw`).toBeLessThanOrEqual(0.5);
      }
    }
  }, 60_000);

  // The levers sit in holes of their own nominal size (a shared surface), where either algorithm may call
  // a few millimetres of the buried end visible or hidden; everywhere else the sheets must be the same.
  it.each([
    ["cam-edge-clamp", ["lever"]],
    ["cam-vise-stop", ["cam-lever", "nut-lever"]],
  ])("%s assembly: where the sight lines are taken, the two differ only on the levers in their holes", (templateId, levers) => {
    const ev = evaluation(templateId);
    const compound = kernel.r.makeCompound(ev.parts.map((p) => placedCopy(buildPart(kernel, p).shape, p)));
    made.push(compound);
    encodeRegularity(kernel.oc, compound.wrapped);
    let taken = 0;
    for (const name of ["front", "right"] as const) {
      const frame = viewFrame("block", name);
      const { exact, sight, pays } = compare(compound as unknown as { wrapped: never }, frame);
      if (!pays) continue;
      taken++;
      // (makeCompound takes over the copies it is given: each lever is placed again to be projected alone.)
      const leverBoxes = ev.parts
        .filter((p) => levers.includes(p.id))
        .map((p) => {
          const copy = placedCopy(buildPart(kernel, p).shape, p);
          made.push(copy);
          return edgeBounds(cleanEdges(projectEdges(kernel.oc, copy.wrapped, frame)));
        });
      const onALever = (q: ViewPoint) => leverBoxes.some((b) => q.x >= b.minX - 0.5 && q.x <= b.maxX + 0.5 && q.y >= b.minY - 0.5 && q.y <= b.maxY + 0.5);
      for (const visibility of ["visible", "hidden"] as const) {
        const elsewhere = [...unmatchedPoints(exact, sight, visibility), ...unmatchedPoints(sight, exact, visibility)].filter((q) => !onALever(q));
        expect(elsewhere.length * 0.05, `${templateId} assembly ${name}: ${visibility} lines that differ away from the levers`).toBeLessThanOrEqual(0.5);
      }
    }
    expect(taken).toBeGreaterThan(0);
  }, 120_000);

  it("blocks without curved intersections keep the exact algorithm", () => {
    for (const part of evaluation("v-block").parts) {
      const shape = partShape(part);
      expect(hasFreeFormEdges(kernel.oc, shape.wrapped), part.id).toBe(false);
    }
  }, 60_000);
});

describe("a view worked by hand", () => {
  it("the pivot pin seen along its axis: the Ø4 tommy-bar hole is two hidden lines 4 apart, 17.55 long", () => {
    const compiled = builtInTemplates().get("cam-edge-clamp")!;
    const pin = evaluation("cam-edge-clamp").parts.find((p) => p.id === "pivot-pin")!;
    const hole = pin.features.find((f) => f.kind === "hole")!;
    expect(hole).toMatchObject({ diameter: 4 });
    const head = pin.features.find((f) => f.kind === "turned");
    expect(head && "steps" in head ? head.steps.at(-1)!.diameter : undefined).toBe(18);
    const endView = viewsForPart(pin, compiled.template.drawing?.views).find((f) => f.name === "right")!;
    const { sight, pays } = compare(partShape(pin), endView);
    expect(pays).toBe(true);
    const hiddenLines = sight.filter((e) => e.visibility === "hidden" && e.curve.type === "line").map((e) => e.curve as Extract<ViewEdge["curve"], { type: "line" }>);
    const chord = 2 * Math.sqrt(9 ** 2 - 2 ** 2);
    const long = hiddenLines.filter((l) => Math.abs(Math.hypot(l.to.x - l.from.x, l.to.y - l.from.y) - chord) < 0.01);
    expect(long).toHaveLength(2);
    // Parallel, 4 apart (the hole's diameter).
    const [a, b] = long as [(typeof long)[0], (typeof long)[0]];
    const ux = (a.to.x - a.from.x) / chord;
    const uy = (a.to.y - a.from.y) / chord;
    expect(Math.abs(-uy * (b.from.x - a.from.x) + ux * (b.from.y - a.from.y))).toBeCloseTo(4, 3);
    // The head's outline stays a visible Ø18 circle.
    expect(sight.some((e) => e.visibility === "visible" && e.curve.type === "circle" && Math.abs(e.curve.radius - 9) < 1e-6)).toBe(true);
  }, 60_000);
});
