import { describe, expect, it } from "vitest";
import { generalPartIssues } from "../checks/general";
import type { ResolvedFeature, ResolvedPart } from "./features";
import { guardPart } from "./guard";

const fmt = (mm: number) => `${+mm.toFixed(3)} mm`;
const part = (features: ResolvedFeature[], extra: Partial<ResolvedPart> = {}): ResolvedPart => ({ id: "p", name: "Plate", material: "mild-steel", features, ...extra });
const block: ResolvedFeature = { kind: "block", size: { x: 40, y: 20, z: 10 } };
const disc: ResolvedFeature = { kind: "turned", steps: [{ diameter: 20, length: 10 }] };
const blocking = (p: ResolvedPart) => guardPart(p, fmt).filter((i) => i.blocking);
const design = (p: ResolvedPart, minWallMm = 1.5) => generalPartIssues(p, { minWallMm, fmt });

describe("degenerate geometry never reaches the kernel", () => {
  it.each([
    ["a zero block", [{ kind: "block", size: { x: 0, y: 20, z: 10 } }], /size x must be at least 0.01 mm; it is 0 mm/],
    ["a negative step", [{ kind: "turned", steps: [{ diameter: 10, length: -2 }] }], /step 1 length must be at least/],
    ["a zero hole", [block, { kind: "hole", at: { x: 20, y: 10, z: 10 }, direction: "-z", diameter: 0, through: true }], /diameter must be at least/],
    ["a hole wider than the part", [block, { kind: "hole", at: { x: 20, y: 10, z: 10 }, direction: "-z", diameter: 25, through: true }], /Ø25 mm hole is not smaller than the 20 mm face/],
    ["a hole deeper than the part", [block, { kind: "hole", at: { x: 20, y: 10, z: 10 }, direction: "-z", diameter: 5, depth: 12 }], /12 mm deep but there is only 10 mm of material/],
    ["a hole off the part", [block, { kind: "hole", at: { x: 50, y: 10, z: 10 }, direction: "-z", diameter: 5, through: true }], /lies outside the part's face/],
    ["a hole with no depth", [block, { kind: "hole", at: { x: 20, y: 10, z: 10 }, direction: "-z", diameter: 5 }], /needs a depth or through/],
    ["a counterbore smaller than its hole", [block, { kind: "hole", at: { x: 20, y: 10, z: 10 }, direction: "-z", diameter: 6, through: true, counterbore: { diameter: 5, depth: 2 } }], /counterbore Ø5 mm must be larger than the hole Ø6 mm/],
    ["counterbore and countersink together", [block, { kind: "hole", at: { x: 20, y: 10, z: 10 }, direction: "-z", diameter: 5, through: true, counterbore: { diameter: 8, depth: 2 }, countersink: { diameter: 9 } }], /not both/],
    ["a pocket through the part", [block, { kind: "pocket", at: { x: 20, y: 10, z: 10 }, direction: "-z", shape: { kind: "round", diameter: 6 }, depth: 10 }], /goes right through/],
    ["a corner radius too big", [block, { kind: "pocket", at: { x: 20, y: 10, z: 10 }, direction: "-z", shape: { kind: "rect", u: 10, v: 6, cornerRadius: 4 }, depth: 3 }], /corner radius 4 mm is more than half/],
    ["a slot along its own direction", [block, { kind: "slot", at: { x: 5, y: 10, z: 10 }, direction: "-z", along: "z", length: 10, width: 4, depth: 2 }], /cannot run along z/],
    ["a step outside the part", [block, { kind: "step", from: { x: 0, y: 0, z: 5 }, to: { x: 50, y: 20, z: 10 } }], /outside the part's 0–40 mm/],
    ["a step removing everything", [block, { kind: "step", from: { x: 0, y: 0, z: 0 }, to: { x: 40, y: 20, z: 10 } }], /removes the whole part/],
    ["an enclosed step", [block, { kind: "step", from: { x: 5, y: 5, z: 2 }, to: { x: 10, y: 10, z: 8 } }], /must reach at least one outside face/],
    ["a V-groove that splits the part", [block, { kind: "v-groove", at: { x: 20, y: 10, z: 10 }, direction: "-z", along: "x", angleDeg: 90, depth: 10 }], /cuts the part in two|wider than the part/],
    ["a chamfer too large", [block, { kind: "chamfer", size: 5, faces: ["+z"] }], /smallest is 10 mm/],
    ["an eccentric bore bigger than the disc", [disc, { kind: "eccentric-bore", eccentricity: 1, diameter: 22, through: true }], /Ø22 mm bore is not smaller than the Ø20 mm/],
    ["a slot in a turned part", [disc, { kind: "slot", at: { x: 0, y: 0, z: 10 }, direction: "-z", along: "x", length: 4, width: 2, depth: 1 }], /only be cut in a block/],
    ["a radial hole with a counterbore", [disc, { kind: "hole", at: { x: 0, y: 0, z: 5 }, direction: "+x", diameter: 3, depth: 4, counterbore: { diameter: 5, depth: 1 } }], /curved/],
    ["a cross hole breaking out of the end", [disc, { kind: "hole", at: { x: 0, y: 0, z: 9 }, direction: "+x", diameter: 4, through: true }], /breaks out of the end/],
    ["a bad thread designation", [block, { kind: "thread", form: "internal", at: { x: 20, y: 10, z: 10 }, direction: "-z", designation: "M4.4", depth: 6 }], /not an ISO metric thread/],
    ["a pattern with 0 copies", [block, { kind: "pattern-linear", count: 0, spacing: { x: 5, y: 0, z: 0 }, feature: { kind: "hole", at: { x: 5, y: 10, z: 10 }, direction: "-z", diameter: 2, through: true } }], /from 1 to 100/],
    ["a pattern stacking copies", [block, { kind: "pattern-linear", count: 3, spacing: { x: 0, y: 0, z: 0 }, feature: { kind: "hole", at: { x: 5, y: 10, z: 10 }, direction: "-z", diameter: 2, through: true } }], /sit on top of each other/],
    ["a pattern whose last copy leaves the part", [block, { kind: "pattern-linear", count: 5, spacing: { x: 10, y: 0, z: 0 }, feature: { kind: "hole", at: { x: 5, y: 10, z: 10 }, direction: "-z", diameter: 2, through: true } }], /outside the part's face \(copy 5 of 5\)/],
  ] as Array<[string, ResolvedFeature[], RegExp]>)("%s", (_name, features, pattern) => {
    const issues = blocking(part(features));
    expect(issues.length).toBeGreaterThan(0);
    expect(issues.map((i) => i.message).join("\n")).toMatch(pattern);
  });

  it("refuses a fractional quantity", () => {
    expect(blocking(part([block], { quantity: 1.5 }))[0]!.message).toMatch(/whole number from 1 to 1000/);
  });

  it("passes a sound part", () => {
    const sound = part([
      block,
      { kind: "hole", at: { x: 10, y: 10, z: 10 }, direction: "-z", diameter: 5, through: true, chamfer: 0.5 },
      { kind: "slot", at: { x: 20, y: 10, z: 10 }, direction: "-z", along: "x", length: 8, width: 4, depth: 3 },
      { kind: "chamfer", size: 0.5, faces: ["+z"] },
    ]);
    expect(guardPart(sound, fmt)).toEqual([]);
    expect(design(sound)).toEqual([]);
  });
});

describe("the engine's design checks", () => {
  it("flags a hole breaking out of a side and one too close to it", () => {
    const issues = design(part([block, { kind: "hole", at: { x: 2, y: 10, z: 10 }, direction: "-z", diameter: 6, through: true }, { kind: "hole", at: { x: 36, y: 10, z: 10 }, direction: "-z", diameter: 6, through: true }]));
    expect(issues.map((i) => [i.code, i.severity])).toEqual([["breakout", "error"], ["thin-wall", "warning"]]);
    expect(issues[0]!.message).toBe('Plate: hole #1: the Ø6 mm hole breaks out of the left face by 1 mm.');
    expect(issues[1]!.message).toBe('Plate: hole #2: the Ø6 mm hole leaves only 1 mm of wall to the right face (at least 1.5 mm is wanted).');
  });

  it("measures a counterbored hole's wall from the counterbore", () => {
    const issues = design(part([block, { kind: "hole", at: { x: 20, y: 4, z: 10 }, direction: "-z", diameter: 4, through: true, counterbore: { diameter: 7, depth: 2 } }]));
    expect(issues.map((i) => i.message)).toEqual(["Plate: hole #1: the Ø4 mm hole leaves only 0.5 mm of wall to the front face (at least 1.5 mm is wanted)."]);
  });

  it("flags walls between neighbouring holes, overlaps and thin floors", () => {
    const issues = design(
      part([
        block,
        { kind: "hole", id: "a", at: { x: 10, y: 10, z: 10 }, direction: "-z", diameter: 6, through: true },
        { kind: "hole", id: "b", at: { x: 17, y: 10, z: 10 }, direction: "-z", diameter: 6, through: true },
        { kind: "hole", id: "c", at: { x: 30, y: 10, z: 10 }, direction: "-z", diameter: 6, depth: 9 },
        { kind: "hole", id: "d", at: { x: 33, y: 10, z: 10 }, direction: "-z", diameter: 4, depth: 3 },
      ]),
    );
    const text = issues.map((i) => `${i.code}: ${i.message}`).join("\n");
    expect(text).toMatch(/thin-wall: Plate: only 1 mm of wall between the Ø6 mm hole and the Ø6 mm hole/);
    expect(text).toMatch(/features-overlap: Plate: the Ø6 mm hole runs into the Ø4 mm hole \(they overlap by 2 mm\)/);
    expect(text).toMatch(/thin-floor: .*leaves a floor only 1 mm thick/);
  });

  it("checks a cross hole against the eccentric bore of a cam", () => {
    const cam = (depth: number) =>
      design(part([disc, { kind: "eccentric-bore", eccentricity: 1, diameter: 8, through: true }, { kind: "hole", at: { x: 0, y: 0, z: 5 }, direction: "+x", diameter: 5, depth }]));
    // Bore centre at x = 1 (offset toward +x), edge at x = −3; a 5 deep hole from x = −10 ends at −5: 2 mm wall.
    expect(cam(5)).toEqual([]);
    expect(cam(6.5)[0]!.message).toMatch(/only 0.5 mm of wall between the Ø5 mm cross hole and the Ø8 mm eccentric bore/);
    expect(cam(8)[0]!.message).toMatch(/runs into the Ø8 mm eccentric bore/);
  });

  it("checks an eccentric bore's thinnest wall", () => {
    expect(design(part([disc, { kind: "eccentric-bore", eccentricity: 3, diameter: 12, through: true }]))[0]!.message).toMatch(/leaves only 1 mm of wall at its thinnest/);
  });

  // Common practice: engage a tapped thread about 1×D in steel, 1.5×D in brass or cast iron, 2×D in aluminium.
  it("wants more thread in softer material", () => {
    const tapped = (material: string, depth: number) =>
      generalPartIssues(part([{ kind: "block", size: { x: 30, y: 30, z: 30 } }, { kind: "thread", form: "internal", at: { x: 15, y: 15, z: 30 }, direction: "-z", designation: "M6", depth }], { material }), { minWallMm: 1.5, fmt }).filter((i) => i.code === "thread-engagement");
    expect(tapped("mild-steel", 6)).toEqual([]);
    expect(tapped("mild-steel", 5)[0]!.message).toMatch(/the M6 thread is 5 mm long; in mild-steel about 6 mm \(1×D\)/);
    expect(tapped("brass", 8)[0]!.message).toMatch(/about 9 mm \(1.5×D\)/);
    expect(tapped("aluminium-6082", 11)[0]!.message).toMatch(/about 12 mm \(2×D\)/);
  });
});
