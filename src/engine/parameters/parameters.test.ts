import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { ParameterSpec } from "../template/schema";
import { ParameterResolutionError, resolveParameters } from "./index";

const specs: ParameterSpec[] = [
  { key: "jawThickness", label: "Jaw thickness", kind: "length", default: 20, min: 8, max: 40 },
  { key: "leverAngle", label: "Lever angle", kind: "angle", default: 15, min: -45, max: 90 },
  { key: "handForce", label: "Hand force", kind: "force", default: 30, min: 5, max: 200 },
  { key: "mu", label: "Friction", kind: "ratio", default: 0.1, min: 0.03, max: 0.5 },
  { key: "rows", label: "Rows", kind: "count", default: 3, min: 1, max: 4 },
  { key: "relief", label: "Relief holes", kind: "boolean", default: false },
  { key: "side", label: "Side", kind: "choice", default: "left", choices: ["left", { value: "right", label: "Right-hand" }] },
  { key: "bodyMaterial", label: "Body material", kind: "material", default: "mild-steel", materials: ["mild-steel", "brass"] },
];
const mm = { templateUnits: "mm", userUnits: "mm" } as const;
const inch = { templateUnits: "mm", userUnits: "in" } as const;

function issuesOf(input: Record<string, unknown>, units: { templateUnits: "mm" | "in"; userUnits: "mm" | "in" } = mm) {
  try {
    resolveParameters(specs, input, units);
  } catch (err) {
    expect(err).toBeInstanceOf(ParameterResolutionError);
    return (err as ParameterResolutionError).issues;
  }
  throw new Error("no error");
}

describe("parameter resolution", () => {
  it("fills every missing value with its default", () => {
    const r = resolveParameters(specs, {}, mm);
    expect(r.values).toEqual({ jawThickness: 20, leverAngle: 15, handForce: 30, mu: 0.1, rows: 3, relief: false, side: "left", bodyMaterial: "mild-steel" });
    expect(r.defaulted).toHaveLength(specs.length);
  });

  it("names an unknown key and suggests the near one", () => {
    const [issue] = issuesOf({ jawThicknes: 20 });
    expect(issue!.path).toBe("parameters.jawThicknes");
    expect(issue!.message).toBe('"jawThicknes" is not a parameter of this template (did you mean jawThickness?).');
  });

  it("names the parameter, the value and the range in the user's units", () => {
    const [mmIssue] = issuesOf({ jawThickness: 45 });
    expect(mmIssue!.message).toBe("jawThickness (Jaw thickness) must be between 8–40 mm; got 45 mm.");
    expect(mmIssue!.allowed).toBe("8–40 mm");
    // 8 mm = 0.31496 in, 40 mm = 1.5748 in (÷ 25.4).
    const [inIssue] = issuesOf({ jawThickness: 2 }, inch);
    expect(inIssue!.message).toBe("jawThickness (Jaw thickness) must be between 0.315–1.5748 in; got 2 in.");
  });

  it("refuses wrong types, fractional counts and values not in the list", () => {
    const issues = issuesOf({ handForce: "strong", rows: 2.5, relief: "yes", side: "middle", bodyMaterial: "unobtainium", leverAngle: 120 });
    const byKey = Object.fromEntries(issues.map((i) => [i.key, i.message]));
    expect(byKey.handForce).toBe('handForce (Hand force) must be a force in N between 5–200 N; got "strong".');
    expect(byKey.rows).toBe("rows (Rows) must be a whole number between 1–4; got 2.5.");
    expect(byKey.relief).toBe('relief (Relief holes) must be true or false; got "yes".');
    expect(byKey.side).toBe('side (Side) must be one of left, right; got "middle".');
    expect(byKey.bodyMaterial).toBe('bodyMaterial (Body material) must be one of mild-steel, brass; got "unobtainium".');
    expect(byKey.leverAngle).toBe("leverAngle (Lever angle) must be between -45–90°; got 120°.");
    expect(issues).toHaveLength(6); // every bad field, not just the first
  });

  it("converts inch input to mm and keeps the user's value for display", () => {
    const r = resolveParameters(specs, { jawThickness: 0.75 }, inch);
    expect(r.values.jawThickness).toBe(19.05); // 0.75 × 25.4
    expect(r.valuesMm.jawThickness).toBe(19.05);
    expect(r.display.jawThickness).toBe(0.75);
  });

  it("accepts an inch limit typed from the mm limit despite rounding", () => {
    expect(resolveParameters(specs, { jawThickness: 40 / 25.4 }, inch).values.jawThickness).toBe(40);
  });
});

describe("parameter resolution (property tests)", () => {
  const inRangeMm = fc.integer({ min: 8000, max: 40000 }).map((n) => n / 1000);

  it("any in-range length resolves to itself", () => {
    fc.assert(fc.property(inRangeMm, (v) => resolveParameters(specs, { jawThickness: v }, mm).values.jawThickness === v));
  });

  it("any in-range length typed in inches resolves to the same mm as typed in mm", () => {
    fc.assert(
      fc.property(fc.integer({ min: 315, max: 1574 }).map((n) => n / 1000), (inches) => {
        const r = resolveParameters(specs, { jawThickness: inches }, inch);
        return Math.abs((r.values.jawThickness as number) - inches * 25.4) < 1e-9;
      }),
    );
  });

  it("any out-of-range value is refused with the key, the value and the range", () => {
    const outside = fc.oneof(fc.double({ min: -1e6, max: 7.999, noNaN: true }), fc.double({ min: 40.001, max: 1e6, noNaN: true }));
    fc.assert(
      fc.property(outside, (v) => {
        try {
          resolveParameters(specs, { jawThickness: v }, mm);
          return false;
        } catch (err) {
          const [issue] = (err as ParameterResolutionError).issues;
          return issue!.key === "jawThickness" && issue!.message.includes("8–40 mm") && issue!.received === v;
        }
      }),
    );
  });

  it("any unknown key is refused by name", () => {
    const name = fc.stringMatching(/^[a-z][a-zA-Z0-9]{0,12}$/).filter((k) => !specs.some((s) => s.key === k));
    fc.assert(fc.property(name, (k) => issuesOf({ [k]: 1 }).some((i) => i.key === k && i.message.includes(`"${k}"`))));
  });

  it("any choice outside the list is refused with the list", () => {
    fc.assert(fc.property(fc.string().filter((s) => s !== "left" && s !== "right"), (s) => issuesOf({ side: s })[0]!.message.includes("left, right")));
  });
});
