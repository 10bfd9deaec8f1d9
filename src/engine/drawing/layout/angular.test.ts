/**
 * The eccentric bore located by polar coordinates (ISO 129-1): its offset in the callout and its angle as
 * a real angular dimension in the end view, an arc centred on the part axis with an arrowhead on each leg
 * and the value in degrees outside the part. The view is built by hand from our camera (views.ts): seen
 * from the right-hand end (+z), the part's +x is up and +y points left, so a bore at 15° from +x toward +y
 * lies 15° anticlockwise (to the left) of the upper centre line, and one at 75° lies 15° above the left one.
 */
import { describe, expect, it } from "vitest";
import type { ResolvedPart } from "../../parts/features";
import { annotatePart, baseBox } from "../annotations";
import type { AngularRequest } from "../annotations/types";
import { formatter } from "../format";
import { engineFits, engineThreads } from "../lookups";
import type { SheetShape } from "../model";
import { axisVector, type ProjectedView } from "../projection";
import { viewFrame } from "../views";
import { assignToViews } from "./assign";
import { angularGeometry } from "./angular";
import { segmentHitsBox } from "./geometry";
import { textBox } from "./shapes";
import { layoutView } from "./viewLayout";

const cam = (angleDeg: number): ResolvedPart => ({
  id: "cam",
  name: "Cam",
  material: "tool-steel",
  features: [
    { kind: "turned", steps: [{ diameter: 20, length: 8 }] },
    { kind: "eccentric-bore", id: "bore", eccentricity: 1, angleDeg, diameter: 8, through: true, fit: "H7", finish: "reamed" },
  ],
});

function requests(part: ResolvedPart) {
  const bbox = baseBox(part);
  return annotatePart({ part, baseKind: "turned", bbox, datum: (a) => (a === "z" ? bbox.min.z : 0), fmt: formatter("mm"), threads: engineThreads, fits: engineFits, showFitLimits: true });
}

/** A view with the disc's outline only (what the kernel would give, less the bore). */
function view(name: "right" | "front"): ProjectedView {
  const f = viewFrame("turned", name);
  const edges: ProjectedView["edges"] =
    name === "right"
      ? [{ visibility: "visible", curve: { type: "circle", centre: { x: 0, y: 0 }, radius: 10 } }]
      : [{ visibility: "visible", curve: { type: "polyline", points: [{ x: 0, y: -10 }, { x: 8, y: -10 }, { x: 8, y: 10 }, { x: 0, y: 10 }, { x: 0, y: -10 }] } }];
  return { name, towardViewer: axisVector(f.towardViewer), right: f.right, up: f.up, edges, centreMarks: [], bounds: name === "right" ? { minX: -10, minY: -10, maxX: 10, maxY: 10 } : { minX: 0, minY: -10, maxX: 8, maxY: 10 } };
}

describe("angular dimension of an eccentric bore (ISO 129-1)", () => {
  it("a bore off the centre lines asks for an angle, not words, and keeps its offset in the callout", () => {
    const reqs = requests(cam(15));
    const angular = reqs.filter((r): r is AngularRequest => r.kind === "angular");
    expect(angular).toHaveLength(1);
    const callout = reqs.find((r) => r.kind === "callout" && r.feature === "bore");
    expect(callout?.kind === "callout" && callout.lines).toContain("offset 1 from the part axis");
    expect(JSON.stringify(callout)).not.toMatch(/clockwise/);
    // On a centre line the bore is located by a linear dimension instead (no angle to give).
    expect(requests(cam(90)).some((r) => r.kind === "angular")).toBe(false);
  });

  it("the end view measures 15° from the upper centre line", () => {
    const a = requests(cam(15)).find((r): r is AngularRequest => r.kind === "angular")!;
    const g = angularGeometry(view("right"), a)!;
    expect(g.refDeg).toBe(90);
    expect(g.valueDeg).toBeCloseTo(15, 4);
    // +y points left in this view, so the line of centres leans left of the upper centre line.
    expect(g.lineDeg).toBeCloseTo(105, 4);
    // The reference is the nearest principal centre line: at 75° the bore is 15° above the left one.
    const b = requests(cam(75)).find((r): r is AngularRequest => r.kind === "angular")!;
    expect(angularGeometry(view("right"), b)).toMatchObject({ refDeg: 180 });
    expect(angularGeometry(view("right"), b)!.valueDeg).toBeCloseTo(15, 4);
  });

  it("is drawn as an arc about the axis outside the outline, an arrowhead on each leg, the value outside the arc", () => {
    const reqs = requests(cam(15));
    const { byView } = assignToViews(reqs, [view("front"), view("right")]);
    expect(byView.get("right")!.angular).toHaveLength(1);
    const scale = 2;
    const shapes = layoutView(view("right"), byView.get("right")!, scale).shapes;
    const arcs = shapes.filter((s): s is Extract<SheetShape, { type: "arc" }> => s.type === "arc" && s.layer === "dimension");
    expect(arcs).toHaveLength(1);
    const arc = arcs[0]!;
    expect(Math.hypot(arc.centre.x, arc.centre.y)).toBeLessThan(1e-9);
    // Outside the Ø20 outline at 2:1 (radius 20 on paper).
    expect(arc.radius).toBeGreaterThan(20);
    expect(arc.endDeg - arc.startDeg).toBeCloseTo(15, 4);
    // Arrowheads: filled triangles whose tips sit on the arc at the two legs (90° and 105°).
    const tips = shapes.filter((s): s is Extract<SheetShape, { type: "fill" }> => s.type === "fill" && s.points.length === 3).map((s) => s.points[0]!);
    for (const deg of [90, 105]) {
      const want = { x: arc.radius * Math.cos((deg * Math.PI) / 180), y: arc.radius * Math.sin((deg * Math.PI) / 180) };
      expect(tips.some((t) => Math.hypot(t.x - want.x, t.y - want.y) < 1e-3), `tip at ${deg}°`).toBe(true);
    }
    const text = shapes.find((s): s is Extract<SheetShape, { type: "text" }> => s.type === "text" && s.text === "15°")!;
    expect(Math.hypot(text.at.x, text.at.y + text.heightMm / 2)).toBeGreaterThan(arc.radius);
    // ISO 129-1: no line crosses the dimension value, at this scale or full size.
    for (const sc of [scale, 1]) {
      const all = sc === scale ? shapes : layoutView(view("right"), byView.get("right")!, sc).shapes;
      const value = all.find((s): s is Extract<SheetShape, { type: "text" }> => s.type === "text" && s.text === "15°")!;
      const box = textBox(value);
      for (const l of all) if (l.type === "line") expect(segmentHitsBox(l.from, l.to, box), `${l.layer} line through "15°" at ${sc}:1`).toBe(false);
    }
  });

  it("without an end view the angle is stated in the callout instead", () => {
    const { byView, unplaced } = assignToViews(requests(cam(15)), [view("front")]);
    expect(unplaced).toHaveLength(0);
    const lines = byView.get("front")!.callouts.flatMap((c) => c.lines);
    expect(lines).toContain("15° anticlockwise from the upper centre line (seen from the right-hand end)");
  });
});
