/**
 * Balloon anchors on what the viewer sees (ISO 6433: the leader's dot sits on the item it names). Boxes
 * placed by hand, seen in orthographic views (ISO 5456-2): a box in front hides what lies behind it, and
 * the anchor is the point of the visible patch farthest from its edges (for a rectangle, its centre).
 */
import { describe, expect, it } from "vitest";
import { visibleAnchors, type PartTriangles } from "./assemblyAnchors";
import { viewFrame } from "./views";

/** An axis-aligned box as 12 triangles. */
function box(partId: string, min: [number, number, number], max: [number, number, number]): PartTriangles {
  const positions: number[] = [];
  for (let i = 0; i < 8; i++) positions.push(i & 1 ? max[0] : min[0], i & 2 ? max[1] : min[1], i & 4 ? max[2] : min[2]);
  const quads = [
    [0, 1, 3, 2],
    [4, 5, 7, 6],
    [0, 1, 5, 4],
    [2, 3, 7, 6],
    [0, 2, 6, 4],
    [1, 3, 7, 5],
  ];
  const indices = quads.flatMap(([a, b, c, d]) => [a!, b!, c!, a!, c!, d!]);
  return { partId, positions, indices };
}

// Front view looks from −y (x right, z up): smaller y is nearer the viewer.
const front = box("front", [0, 0, 0], [20, 5, 20]);
const back = box("back", [0, 10, 0], [40, 20, 20]);
// Wholly behind the front box in the front view; seen from above, nothing covers it.
const hidden = box("hidden", [2, 30, 2], [18, 35, 18]);
const anchors = visibleAnchors([front, back, hidden], [viewFrame("block", "front"), viewFrame("block", "top")]);
const at = (part: string, view: string) => anchors.find((a) => a.partId === part && a.view === view);

describe("visible anchors of an assembly view", () => {
  it("the part in front: the centre of its face, all of it visible", () => {
    const a = at("front", "front")!;
    expect(a.point.x).toBeCloseTo(10, 0);
    expect(a.point.y).toBeCloseTo(10, 0);
    expect(a.visibleShare).toBeCloseTo(1, 2);
    expect(a.clearanceMm).toBeGreaterThan(9);
  });
  it("a part half hidden: its anchor lies in the uncovered half (x 20…40), about its centre", () => {
    const a = at("back", "front")!;
    expect(a.point.x).toBeGreaterThan(24);
    expect(a.point.x).toBeLessThan(36);
    expect(a.point.y).toBeCloseTo(10, 0);
    expect(a.visibleShare!).toBeGreaterThan(0.45);
    expect(a.visibleShare!).toBeLessThan(0.55);
  });
  it("a part hidden in one view gets no anchor there, and one in the view that shows it", () => {
    expect(at("hidden", "front")).toBeUndefined();
    const top = at("hidden", "top")!;
    // Seen from above the view keeps x and has +y up: the box spans x 2…18, y 30…35.
    expect(top.point.x).toBeGreaterThan(2);
    expect(top.point.x).toBeLessThan(18);
    expect(top.point.y).toBeGreaterThan(30);
    expect(top.point.y).toBeLessThan(35);
  });
});
