/**
 * The order the drawing pack projects parts in. Measured on this machine (DEVELOPERS.md, drawings): the
 * exact hidden-line removal of a turned part with a cross hole (a cam's lever hole) takes about a second
 * per view, a plain block some tens of milliseconds, so such parts must start first.
 */
import { describe, expect, it } from "vitest";
import type { ResolvedPart } from "@/engine/parts/features";
import { projectionCost } from "./build-export";

const part = (features: unknown[]): ResolvedPart => ({ id: "p", name: "P", material: "mild-steel", features }) as unknown as ResolvedPart;
const turned = { kind: "turned", steps: [{ diameter: 20, length: 8 }] };
const block = { kind: "block", size: { x: 60, y: 20, z: 30 } };
const hole = (direction: string) => ({ kind: "hole", at: { x: 0, y: 0, z: 4 }, direction, diameter: 5, depth: 5 });

describe("projectionCost", () => {
  it("puts a turned part with a cross hole before a block with more holes", () => {
    const cam = part([turned, hole("+x")]);
    const plate = part([block, hole("-z"), hole("-z"), hole("-y"), hole("+x")]);
    expect(projectionCost(cam)).toBeGreaterThan(projectionCost(plate));
  });
  it("counts an axial bore of a turned part as an ordinary feature", () => {
    expect(projectionCost(part([turned, hole("-z")]))).toBe(projectionCost(part([block, hole("-z")])));
  });
});
