/**
 * The pure drawing model, checked against the standards it follows:
 *  - ISO 5456-2 §5: view positions in first and third angle; orthographic views are right-handed (a view's
 *    right × up points at its viewer) and the view from above keeps the front view's x axis;
 *  - ISO 5456-2 §6: the projection symbol (truncated cone, small end left; its end view seen from the left
 *    is drawn right of it in first angle, left of it in third);
 *  - ISO 5455: the scale series, largest that fits;
 *  - ISO 129-1: every feature contributes its size and its location from the datums;
 *  - ASME Y14.5 §1.6.2 for inch values (no leading zero below one inch), 1 in = 25.4 mm exactly.
 */
import { describe, expect, it } from "vitest";
import type { ResolvedPart } from "../parts/features";
import { annotatePart, baseBox } from "./annotations";
import type { AnnotateContext, CalloutRequest, LinearRequest } from "./annotations/types";
import { formatter } from "./format";
import { arrangeViews } from "./layout/arrange";
import { engineFits, engineThreads } from "./lookups";
import { axisVector, type ViewName } from "./projection";
import { chooseScale } from "./scale";
import { projectionSymbol } from "./sheet/projectionSymbol";
import { titleBlock } from "./sheet/titleBlock";
import { textWidthMm } from "./text/measure";
import { sheetPoint } from "./model";
import { viewFrame } from "./views";

describe("view frames (ISO 5456-2)", () => {
  const names: ViewName[] = ["front", "top", "right", "left", "bottom", "rear"];
  for (const base of ["block", "turned"] as const) {
    it(`${base}: each view is right-handed and the six views face six different ways`, () => {
      const seen = new Set<string>();
      for (const n of names) {
        const f = viewFrame(base, n);
        const r = axisVector(f.right);
        const u = axisVector(f.up);
        const t = axisVector(f.towardViewer);
        // right × up = toward the viewer.
        expect([r.y * u.z - r.z * u.y, r.z * u.x - r.x * u.z, r.x * u.y - r.y * u.x].map((v) => v + 0)).toEqual([t.x, t.y, t.z].map((v) => v + 0));
        seen.add(f.towardViewer);
      }
      expect(seen.size).toBe(6);
    });
  }
  it("a block's front view looks from −y with x right and z up; the view from above keeps x and looks down", () => {
    expect(viewFrame("block", "front")).toMatchObject({ towardViewer: "-y", right: "+x", up: "+z" });
    expect(viewFrame("block", "top")).toMatchObject({ towardViewer: "+z", right: "+x", up: "+y" });
    // The view from the right looks along the front view's right axis and keeps its up axis.
    expect(viewFrame("block", "right")).toMatchObject({ towardViewer: "+x", up: "+z" });
  });
  it("a turned part lies with its axis horizontal, +z to the right", () => {
    expect(viewFrame("turned", "front")).toMatchObject({ right: "+z" });
    expect(viewFrame("turned", "right").towardViewer).toBe("+z");
  });
});

describe("arrangement by projection method (ISO 5456-2 §5)", () => {
  const box = { minX: 0, minY: 0, maxX: 50, maxY: 20 };
  const env = new Map<ViewName, typeof box>([
    ["front", box],
    ["top", box],
    ["right", box],
  ]);
  it("first angle: the view from above below the front view, the view from the right on its left", () => {
    const a = arrangeViews(env, "first");
    expect(a.offsets.get("top")!.dy).toBeLessThan(0);
    expect(a.offsets.get("top")!.dx).toBe(0);
    expect(a.offsets.get("right")!.dx).toBeLessThan(0);
    expect(a.offsets.get("right")!.dy).toBe(0);
  });
  it("third angle: the view from above above the front view, the view from the right on its right", () => {
    const a = arrangeViews(env, "third");
    expect(a.offsets.get("top")!.dy).toBeGreaterThan(0);
    expect(a.offsets.get("right")!.dx).toBeGreaterThan(0);
  });
  it("envelopes never overlap", () => {
    const a = arrangeViews(env, "first");
    const boxes = [...a.offsets].map(([n, o]) => ({ n, b: { minX: box.minX + o.dx, maxX: box.maxX + o.dx, minY: box.minY + o.dy, maxY: box.maxY + o.dy } }));
    for (const p of boxes) for (const q of boxes) if (p !== q) expect(p.b.maxX <= q.b.minX || q.b.maxX <= p.b.minX || p.b.maxY <= q.b.minY || q.b.maxY <= p.b.minY).toBe(true);
  });
});

describe("projection symbol (ISO 5456-2 §6)", () => {
  const parts = (method: "first" | "third") => {
    const s = projectionSymbol(method, sheetPoint(100, 50));
    const cone = s.find((x) => x.type === "polyline");
    const circles = s.filter((x) => x.type === "circle");
    return { cone, circles };
  };
  for (const method of ["first", "third"] as const) {
    it(`${method} angle: two concentric circles and a cone whose small end is on the left`, () => {
      const { cone, circles } = parts(method);
      expect(circles).toHaveLength(2);
      expect(cone?.type).toBe("polyline");
      if (cone?.type !== "polyline") return;
      const xs = cone.points.map((p) => p.x);
      const left = cone.points.filter((p) => p.x === Math.min(...xs));
      const right = cone.points.filter((p) => p.x === Math.max(...xs));
      const h = (ps: typeof left) => Math.max(...ps.map((p) => p.y)) - Math.min(...ps.map((p) => p.y));
      expect(h(left)).toBeLessThan(h(right));
    });
  }
  it("the end view is right of the cone in first angle and left of it in third", () => {
    const cx = (m: "first" | "third") => {
      const { cone, circles } = parts(m);
      const coneX = cone?.type === "polyline" ? cone.points[0]!.x : 0;
      return circles[0]!.type === "circle" ? circles[0]!.centre.x - coneX : 0;
    };
    expect(cx("first")).toBeGreaterThan(0);
    expect(cx("third")).toBeLessThan(0);
  });
});

describe("scale (ISO 5455)", () => {
  it("takes the largest scale of the series that fits", () => {
    // A 60 mm part in a 100 mm space: 2:1 gives 120 (too big), 1:1 fits.
    expect(chooseScale((s) => 60 * s.factor <= 100)?.label).toBe("1:1");
    // A 300 mm part: 1:2 gives 150 (too big), 1:5 gives 60.
    expect(chooseScale((s) => 300 * s.factor <= 100)?.label).toBe("1:5");
    expect(chooseScale((s) => 5 * s.factor <= 100)?.label).toBe("5:1");
  });
});

describe("dimension text", () => {
  it("mm without trailing zeros; inches to three places without a leading zero", () => {
    const mm = formatter("mm");
    const inch = formatter("in");
    expect([mm.length(12), mm.length(2.5), mm.length(6.35), mm.diameter(8)]).toEqual(["12", "2.5", "6.35", "Ø8"]);
    // 19.05 mm = 0.75 in exactly; 40 mm = 1.5748 in.
    expect([inch.length(19.05), inch.length(40), inch.diameter(25.4)]).toEqual([".750", "1.575", "Ø1.000"]);
    // ISO 286-2: Ø8 H7 is +0.015/0 mm = +0.0006/0 in.
    expect([mm.deviation(0.015), mm.deviation(0), inch.deviation(0.015)]).toEqual(["+0.015", "0", "+.0006"]);
  });
});

const body: ResolvedPart = {
  id: "body",
  name: "Stop body",
  material: "mild-steel",
  datums: { x: "min", y: "min", z: "max" },
  features: [
    { kind: "block", size: { x: 60, y: 30, z: 20 } },
    { kind: "hole", id: "cross", at: { x: 15, y: 0, z: 10 }, direction: "+y", diameter: 8, through: true, fit: "H7", finish: "reamed" },
    { kind: "slot", id: "slot", at: { x: 15, y: 15, z: 20 }, direction: "-z", along: "x", length: 30, width: 4, depth: 6 },
    { kind: "pocket", id: "recess", at: { x: 30, y: 15, z: 0 }, direction: "+z", shape: { kind: "rect", u: 40, v: 16 }, depth: 3 },
    { kind: "thread", id: "tapped", form: "internal", at: { x: 52, y: 15, z: 20 }, direction: "-z", designation: "M4", depth: 8 },
    { kind: "pattern-linear", id: "row", count: 3, spacing: { x: 10, y: 0, z: 0 }, feature: { kind: "hole", at: { x: 10, y: 25, z: 20 }, direction: "-z", diameter: 3, depth: 5 } },
    { kind: "step", id: "rebate", from: { x: 0, y: 0, z: 15 }, to: { x: 60, y: 5, z: 20 } },
    { kind: "chamfer", id: "edges", size: 0.5, faces: ["+z"] },
  ],
};

function context(part: ResolvedPart, units: "mm" | "in" = "mm"): AnnotateContext {
  const bbox = baseBox(part);
  const kind = part.features[0]!.kind as "block" | "turned";
  return {
    part,
    baseKind: kind,
    bbox,
    datum: (a) => (kind === "turned" && a !== "z" ? 0 : part.datums?.[a] === "max" ? bbox.max[a] : bbox.min[a]),
    fmt: formatter(units),
    threads: engineThreads,
    fits: engineFits,
    showFitLimits: true,
  };
}

describe("annotations: size and location of every feature (ISO 129-1)", () => {
  const reqs = annotatePart(context(body));
  const linear = (feature: string) => reqs.filter((r): r is LinearRequest => r.kind === "linear" && r.feature === feature);
  const callouts = (feature: string) => reqs.filter((r): r is CalloutRequest => r.kind === "callout" && r.feature === feature);

  it("the block gives its three overall sizes", () => {
    // An unnamed feature is named by its kind and place in the list.
    expect(linear("block 1").map((r) => `${r.axis}=${r.text}`).sort()).toEqual(["x=60", "y=30", "z=20"]);
  });
  it("a hole: Ø and fit with ISO 286 limits in the callout, and its centre located from the x and z datums", () => {
    // ISO 286-2: H7 over 6 to 10 mm is +0.015/0.
    expect(callouts("cross")[0]!.lines[0]).toBe("Ø8 H7 (+0.015/0) reamed through");
    // x from the left face (datum min): 15; z from the top face (datum max): 20 − 10 = 10.
    expect(linear("cross").map((r) => `${r.axis}=${r.text}`).sort()).toEqual(["x=15", "z=10"]);
  });
  it("a slot: width and depth in the callout, length between centres and both locations as dimensions", () => {
    expect(callouts("slot")[0]!.lines[0]).toBe("slot 4 wide × 6 deep");
    expect(linear("slot").map((r) => `${r.axis}=${r.text}`).sort()).toEqual(["x=15", "x=30", "y=15"]);
  });
  it("a rectangular pocket: its two sizes and its edges located from the datums", () => {
    // u: 10 … 50 along x → edge at 10 from x = 0, size 40; v: 7 … 23 along y → edge at 7, size 16.
    expect(linear("recess").map((r) => `${r.axis}=${r.text}`).sort()).toEqual(["x=10", "x=40", "y=16", "y=7"]);
    expect(callouts("recess")[0]!.lines[0]).toBe("pocket 3 deep");
  });
  it("a tapped hole: designation and depth, the tap drill (ISO 724 / d − P: M4 → Ø3.3), and a thread mark", () => {
    expect(callouts("tapped")[0]!.lines).toEqual(["M4 × 8 deep", "tap drill Ø3.3"]);
    expect(reqs.some((r) => r.kind === "thread-mark" && r.feature === "tapped" && r.majorMm === 4)).toBe(true);
  });
  it("a linear pattern: the count in the callout, the first copy located, the spacing as n × pitch", () => {
    expect(callouts("row")[0]!.lines[0]).toBe("3× Ø3 × 5 deep");
    const texts = linear("row").map((r) => `${r.axis}=${r.text}`);
    expect(texts).toContain("x=10");
    expect(texts).toContain("x=2 × 10 (= 20)");
    expect(texts).toContain("y=25");
  });
  it("a step: its size from the face it opens on (5 into y, 5 down from the top)", () => {
    expect(linear("rebate").map((r) => `${r.axis}=${r.text}`).sort()).toEqual(["y=5", "z=5"]);
  });
  it("a staircase of steps: each tread edge from the datum once (16, 32, 48), no chain repeating an edge (ISO 129-1)", () => {
    const heel: ResolvedPart = {
      id: "heel",
      name: "Heel",
      material: "mild-steel",
      datums: { x: "min", y: "min", z: "min" },
      features: [
        { kind: "block", size: { x: 64, y: 50, z: 36 } },
        { kind: "step", id: "t1", from: { x: 0, y: 0, z: 12 }, to: { x: 16, y: 50, z: 36 } },
        { kind: "step", id: "t2", from: { x: 16, y: 0, z: 20 }, to: { x: 32, y: 50, z: 36 } },
        { kind: "step", id: "t3", from: { x: 32, y: 0, z: 28 }, to: { x: 48, y: 50, z: 36 } },
      ],
    };
    const x = annotatePart(context(heel)).filter((r): r is LinearRequest => r.kind === "linear" && r.axis === "x" && r.feature !== "block 1");
    const spans = [...new Set(x.map((r) => `${Math.min(r.a, r.b)}-${Math.max(r.a, r.b)}`))].sort();
    expect(spans).toEqual(["0-16", "0-32", "0-48"]);
  });
  it("steps that share no edge keep their widths as sizes (an opening's width is the functional size)", () => {
    const stirrup: ResolvedPart = {
      id: "stirrup",
      name: "Stirrup",
      material: "mild-steel",
      datums: { x: "min", y: "min", z: "min" },
      features: [
        { kind: "block", size: { x: 16, y: 78, z: 80 } },
        { kind: "step", id: "opening", from: { x: 0, y: 8, z: 6 }, to: { x: 16, y: 70, z: 70 } },
        { kind: "step", id: "lips", from: { x: 0, y: 13, z: 0 }, to: { x: 16, y: 65, z: 6 } },
      ],
    };
    const y = annotatePart(context(stirrup)).filter((r): r is LinearRequest => r.kind === "linear" && r.axis === "y" && r.feature !== "block 1");
    expect(y.filter((r) => r.role === "size").map((r) => r.text).sort()).toEqual(["52", "62"]);
    // A pair of side grooves over the same height is no staircase: each keeps its height (8) as a size.
    const grooved: ResolvedPart = {
      ...stirrup,
      features: [
        { kind: "block", size: { x: 60, y: 50, z: 45 } },
        { kind: "step", id: "left", from: { x: 0, y: 0, z: 10 }, to: { x: 5, y: 50, z: 18 } },
        { kind: "step", id: "right", from: { x: 55, y: 0, z: 10 }, to: { x: 60, y: 50, z: 18 } },
      ],
    };
    const z = annotatePart(context(grooved)).filter((r): r is LinearRequest => r.kind === "linear" && r.axis === "z" && r.feature !== "block 1");
    expect(z.filter((r) => r.role === "size").map((r) => r.text)).toContain("8");
  });
  it("a chamfer gets a callout", () => {
    expect(callouts("edges")[0]!.lines[0]).toBe("chamfer 0.5 × 45°, all edges of top face");
  });
  it("inch drawings carry inch text: the 60 mm length reads 2.362, the Ø8 hole Ø.315", () => {
    const inch = annotatePart(context(body, "in"));
    expect(inch.some((r) => r.kind === "linear" && r.text === "2.362")).toBe(true);
    expect(inch.some((r) => r.kind === "callout" && r.lines[0]!.startsWith("Ø.315 H7"))).toBe(true);
  });
  it("a turned part: each diameter, shoulders from the datum end, the overall length and the thread designation", () => {
    const pin: ResolvedPart = {
      id: "pin",
      name: "Pin",
      material: "mild-steel",
      features: [
        { kind: "turned", steps: [{ diameter: 12, length: 3 }, { diameter: 8, length: 9 }, { diameter: 4, length: 14 }] },
        { kind: "thread", form: "external", step: 2, designation: "M4", length: 10, from: "end" },
      ],
    };
    const r = annotatePart(context(pin)).filter((x): x is LinearRequest => x.kind === "linear");
    expect(r.filter((x) => x.axis === "x").map((x) => x.text)).toEqual(["Ø12", "Ø8", "M4"]);
    // Shoulders at 3 and 12 from z = 0, overall 26, thread length 10 (shorter than its 14 mm step).
    expect(r.filter((x) => x.axis === "z").map((x) => x.text).sort()).toEqual(["10", "12", "26", "3"]);
  });
  it("a turned step with a fit: Ø, the shaft class and its ISO 286 limits after the size, in mm and in inches", () => {
    const boss: ResolvedPart = {
      id: "boss",
      name: "Boss",
      material: "mild-steel",
      features: [{ kind: "turned", steps: [{ diameter: 12, length: 2 }, { diameter: 8, length: 8, fit: "g6" }, { diameter: 5, length: 20, fit: "h6" }] }],
    };
    const texts = (units: "mm" | "in") =>
      annotatePart(context(boss, units))
        .filter((x): x is LinearRequest => x.kind === "linear" && x.axis === "x")
        .map((x) => x.text);
    // ISO 286-2, over 6 to 10 mm: g6 is -0.005/-0.014; over 3 to 6 mm: h6 is 0/-0.008.
    expect(texts("mm")).toEqual(["Ø12", "Ø8 g6 (-0.005/-0.014)", "Ø5 h6 (0/-0.008)"]);
    // The same limits in decimal inches (0.005 mm = .0002 in, 0.014 mm = .0006 in).
    expect(texts("in")[1]).toBe("Ø.315 g6 (-.0002/-.0006)");
  });
});

describe("title block (ISO 7200)", () => {
  const fields = {
    title: "Strap clamp with heel block: assembly",
    documentType: "Assembly drawing",
    drawingNumber: "STRAP-CLAMP-ASSEMBLY",
    revision: "1.0.0",
    owner: "Jigwright",
    material: "see parts list",
    mass: "1.5 kg",
    generalTolerance: "ISO 2768-m",
    units: "mm",
    scale: "1:1",
    projection: "first" as const,
    drawnBy: "A. Fitter",
    date: "2026-12-01",
    approved: "—",
    sheet: "1 of 10",
  };
  it("a long title is lettered smaller (ISO 3098 3.5 mm) rather than cut short, and fits its 110 mm field", () => {
    const title = titleBlock(fields, sheetPoint(287, 10)).find((s) => s.type === "text" && s.role === "title" && s.text.startsWith("Strap"));
    expect(title?.type === "text" && title.text).toBe(fields.title);
    expect(title?.type === "text" && title.heightMm).toBe(3.5);
    expect(title?.type === "text" && textWidthMm(title.text, title.heightMm, "bold")).toBeLessThanOrEqual(107);
  });
  it("a short title keeps the 5 mm lettering", () => {
    const title = titleBlock({ ...fields, title: "Body" }, sheetPoint(287, 10)).find((s) => s.type === "text" && s.text === "Body");
    expect(title?.type === "text" && title.heightMm).toBe(5);
  });
});
