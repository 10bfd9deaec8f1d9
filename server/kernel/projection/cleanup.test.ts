/**
 * The plain-geometry half of the projection: classifying sampled curves and the visible-over-hidden rule.
 * Expected values are worked by hand from the coordinates; the rule itself is ISO 128-2 (where a visible
 * and a hidden edge coincide only the visible one is drawn).
 */
import { describe, expect, it } from "vitest";
import type { ViewEdge } from "@/engine/drawing/projection";
import { arcThrough, classifySamples } from "./classify";
import { cleanEdges, subtractIntervals, unionIntervals } from "./cleanup";

const line = (x1: number, y1: number, x2: number, y2: number, visibility: "visible" | "hidden" = "visible"): ViewEdge => ({
  visibility,
  curve: { type: "line", from: { x: x1, y: y1 }, to: { x: x2, y: y2 } },
});

describe("interval arithmetic", () => {
  it("joins overlapping and touching intervals", () => {
    expect(unionIntervals([[5, 8], [0, 2], [2, 4], [7, 10]], 1e-6)).toEqual([[0, 4], [5, 10]]);
  });
  it("subtracts a union, leaving the pieces outside it", () => {
    expect(subtractIntervals([[0, 10]], [[2, 3], [5, 12]], 1e-6)).toEqual([[0, 2], [3, 5]]);
  });
});

describe("classifySamples", () => {
  it("a spline whose points are all on one line is a line, end to end (a circle seen edge-on)", () => {
    // Out and back along y = 20 from x 47.5 to 42.5 and back: one segment 42.5 → 47.5.
    const pts = [47.5, 46, 44, 42.5, 44, 46, 47.5].map((x) => ({ x, y: 20 }));
    const c = classifySamples(pts);
    expect(c.type).toBe("line");
    if (c.type !== "line") return;
    expect(Math.min(c.from.x, c.to.x)).toBeCloseTo(42.5, 9);
    expect(Math.max(c.from.x, c.to.x)).toBeCloseTo(47.5, 9);
  });
  it("points on a circle of radius 4 about (1, 2) over a quarter turn are a 90° arc", () => {
    const pts = Array.from({ length: 9 }, (_, i) => {
      const a = (i / 8) * (Math.PI / 2);
      return { x: 1 + 4 * Math.cos(a), y: 2 + 4 * Math.sin(a) };
    });
    const c = classifySamples(pts);
    expect(c.type).toBe("arc");
    if (c.type !== "arc") return;
    expect(c.centre.x).toBeCloseTo(1, 6);
    expect(c.centre.y).toBeCloseTo(2, 6);
    expect(c.radius).toBeCloseTo(4, 6);
    expect(c.startDeg).toBeCloseTo(0, 4);
    expect(c.endDeg).toBeCloseTo(90, 4);
  });
  it("a spline that runs out along an arc and back is that arc, not a whole circle (a cross hole's edge on a round face, seen along the face's axis)", () => {
    // Radius 9 about (60, 28), from 0° out to 12° and back to 0°: the arc 0°–12°.
    const angles = [0, 2, 4, 6, 8, 10, 12, 10, 8, 6, 4, 2, 0];
    const pts = angles.map((d) => ({ x: 60 + 9 * Math.cos((d * Math.PI) / 180), y: 28 + 9 * Math.sin((d * Math.PI) / 180) }));
    const c = classifySamples(pts);
    expect(c.type).toBe("arc");
    if (c.type !== "arc") return;
    expect(c.radius).toBeCloseTo(9, 6);
    expect(c.startDeg).toBeCloseTo(0, 4);
    expect(c.endDeg).toBeCloseTo(12, 4);
  });
  it("a closed run once around is still a whole circle", () => {
    const pts = Array.from({ length: 25 }, (_, i) => ({ x: 3 * Math.cos((i / 24) * 2 * Math.PI), y: 3 * Math.sin((i / 24) * 2 * Math.PI) }));
    expect(classifySamples(pts)).toMatchObject({ type: "circle", radius: expect.closeTo(3, 6) });
  });
  it("a curve that is neither stays a polyline", () => {
    const pts = [0, 1, 2, 3, 4].map((x) => ({ x, y: x * x }));
    expect(classifySamples(pts).type).toBe("polyline");
  });
  it("an arc given clockwise comes back counter-clockwise over the same points", () => {
    // From (0, 1) through (−1, 0) to (0, −1) about the origin: CCW from 90° to 270°.
    const c = arcThrough({ x: 0, y: 0 }, 1, { x: 0, y: 1 }, { x: -1, y: 0 }, { x: 0, y: -1 });
    expect(c).toMatchObject({ type: "arc", startDeg: 90, endDeg: 270 });
    // The other way round through (1, 0): CCW from 270° to 450°.
    const d = arcThrough({ x: 0, y: 0 }, 1, { x: 0, y: 1 }, { x: 1, y: 0 }, { x: 0, y: -1 });
    expect(d.type === "arc" && d.endDeg - d.startDeg).toBeCloseTo(180, 6);
    expect(d.type === "arc" && ((d.startDeg % 360) + 360) % 360).toBeCloseTo(270, 6);
  });
});

describe("cleanEdges", () => {
  it("drops a hidden edge lying exactly under a visible one (the back outline of a block)", () => {
    const out = cleanEdges([line(0, 0, 60, 0), line(0, 0, 60, 0, "hidden"), line(60, 0, 0, 0, "hidden")]);
    expect(out.filter((e) => e.visibility === "hidden")).toHaveLength(0);
    expect(out.filter((e) => e.visibility === "visible")).toHaveLength(1);
  });
  it("keeps the part of a hidden edge that sticks out past the visible one", () => {
    const out = cleanEdges([line(0, 0, 40, 0), line(30, 0, 60, 0, "hidden")]);
    const hidden = out.filter((e) => e.visibility === "hidden");
    expect(hidden).toHaveLength(1);
    const c = hidden[0]!.curve;
    expect(c.type === "line" && [Math.min(c.from.x, c.to.x), Math.max(c.from.x, c.to.x)]).toEqual([40, 60]);
  });
  it("joins touching collinear visible pieces into one line", () => {
    const out = cleanEdges([line(0, 5, 10, 5), line(10, 5, 25, 5), line(25, 5, 30, 5)]);
    expect(out).toHaveLength(1);
  });
  it("a hidden circle under a visible one of the same centre and radius goes; a different radius stays", () => {
    const circle = (r: number, visibility: "visible" | "hidden"): ViewEdge => ({ visibility, curve: { type: "circle", centre: { x: 15, y: 10 }, radius: r } });
    const out = cleanEdges([circle(3, "visible"), circle(3, "hidden"), circle(2, "hidden")]);
    expect(out.map((e) => `${e.visibility}:${e.curve.type === "circle" ? e.curve.radius : "?"}`).sort()).toEqual(["hidden:2", "visible:3"]);
  });
  it("half a hidden circle under a visible semicircle leaves the other half as an arc", () => {
    const out = cleanEdges([
      { visibility: "visible", curve: { type: "arc", centre: { x: 0, y: 0 }, radius: 5, startDeg: 0, endDeg: 180 } },
      { visibility: "hidden", curve: { type: "circle", centre: { x: 0, y: 0 }, radius: 5 } },
    ]);
    const hidden = out.find((e) => e.visibility === "hidden")!;
    expect(hidden.curve).toMatchObject({ type: "arc", startDeg: 180, endDeg: 360 });
  });
});
