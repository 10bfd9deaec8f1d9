/**
 * The evaluation pipeline with a tiny calculator of our own (registered only in this test's dependency
 * lookup), so the binding of analyses, checks and parts is tested independently of the shop calculators.
 */
import { describe, expect, it } from "vitest";
import { stringify } from "yaml";
import { z } from "zod";
import { CalculatorInputError, type Calculator } from "./calculators/types";
import { evaluateTemplate, evaluationContract } from "./evaluate";
import { ParameterResolutionError } from "./parameters";
import { loadAndCompileTemplate } from "./template";

/** Area and perimeter of a rectangle, in mm; refuses a square (to exercise refusals). */
const rectangle: Calculator = {
  kind: "test-rectangle",
  label: "Rectangle",
  summary: "Area and perimeter.",
  inputSchema: z.strictObject({ width: z.number().positive(), height: z.number().positive(), label: z.string().optional() }),
  compute(input: { width: number; height: number; label?: string }) {
    if (input.width === input.height) throw new CalculatorInputError("A square is not allowed here.", "width");
    return { areaMm2: input.width * input.height, perimeterMm: 2 * (input.width + input.height), label: input.label ?? "", cautions: ["test caution"], sources: [] };
  },
  sources: [],
};
const deps = { getCalculator: (k: string) => (k === rectangle.kind ? rectangle : undefined) };

function template(units: "mm" | "in" = "mm", extra: Record<string, unknown> = {}, lookup = deps) {
  const f = units === "mm" ? 1 : 1 / 25.4;
  return loadAndCompileTemplate(
    stringify({
      formatVersion: 1,
      id: "test-plate",
      version: "2.1.0",
      name: "Test plate",
      family: "block",
      summary: "A plate with a hole.",
      units,
      parameters: [
        { key: "width", label: "Width", kind: "length", default: 40 * f, min: 10 * f, max: 100 * f },
        { key: "height", label: "Height", kind: "length", default: 20 * f, min: 10 * f, max: 100 * f },
        { key: "holeDiameter", label: "Hole", kind: "length", default: 6 * f, min: 1 * f, max: 30 * f },
        { key: "withHole", label: "With hole", kind: "boolean", default: true },
        { key: "metal", label: "Metal", kind: "material", default: "mild-steel", materials: ["mild-steel", "brass"] },
        { key: "force", label: "Force", kind: "force", default: 100, min: 1, max: 1000 },
      ],
      derived: {
        margin: { expression: "(height - holeDiameter) / 2", kind: "length", label: "Margin" },
        root: "sqrt(margin - 5 * (1 / 25.4 + (1 - 1 / 25.4) * (1 - 0)))",
      },
      analyses: [
        { id: "rect", calculator: "test-rectangle", inputs: { width: "toMm(width)", height: "toMm(height)", label: "'plate'" } },
        { id: "skipped", calculator: "test-rectangle", when: "not withHole", inputs: { width: "toMm(width)", height: "toMm(height)" } },
      ],
      checks: [
        { id: "area", severity: "error", condition: "rect.areaMm2 <= 1500", message: "Area {rect.areaMm2:int} mm², perimeter {fromMm(rect.perimeterMm):len}.", failMessage: "Too big: {rect.areaMm2:int} mm².", parameters: ["width", "height"] },
        { id: "margin", severity: "warning", condition: "margin >= 5", message: "Margin {margin:len}; force {force:force}.", parameters: ["height", "holeDiameter"] },
        { id: "only-without-hole", severity: "note", when: "not withHole", condition: "skipped.areaMm2 > 0", message: "Skipped {skipped.areaMm2}." },
        { id: "uses-root", severity: "warning", condition: "root >= 0", message: "Root {root}." },
      ],
      parts: [
        {
          id: "plate",
          name: "Plate",
          material: "=metal",
          quantity: 2,
          features: [
            { kind: "block", size: { x: "width", y: "height", z: 10 * f } },
            { kind: "hole", when: "withHole", at: { x: "width / 2", y: "height / 2", z: 10 * f }, direction: "-z", diameter: "holeDiameter", through: true },
            { kind: "thread", form: "internal", at: { x: 5 * f, y: "height / 2", z: 10 * f }, direction: "-z", designation: "M4", depth: 6 * f },
          ],
          placement: { position: { x: 0, y: 0, z: 0 }, rotations: [{ axis: "z", angleDeg: 90 }] },
        },
        { id: "spare", name: "Spare", material: "brass", when: "not withHole", features: [{ kind: "block", size: { x: 5 * f, y: 5 * f, z: 5 * f } }] },
      ],
      assembly: { fixtures: [{ id: "jaw", label: "Jaw", position: { x: 0, y: "-height", z: 0 }, size: { x: "width", y: "height", z: 10 * f } }] },
      ...extra,
    }),
    lookup,
  );
}

describe("evaluateTemplate", () => {
  const mm = template();

  it("binds parameters → derived → analyses → checks → parts", () => {
    const e = evaluateTemplate(mm, {});
    expect(e.template).toEqual({ id: "test-plate", version: "2.1.0" });
    expect(e.derived.margin).toBe(7);
    expect(e.analyses.rect).toMatchObject({ areaMm2: 800, perimeterMm: 120, label: "plate" });
    expect(e.analyses.skipped).toBeUndefined(); // `when` false: not run, not shown
    const byId = Object.fromEntries(e.checks.map((c) => [c.id, c]));
    expect(byId.area).toEqual({ id: "area", severity: "error", passed: true, message: "Area 800 mm², perimeter 120 mm.", parameters: ["width", "height"] });
    expect(byId.margin!.message).toBe("Margin 7 mm; force 100 N.");
    expect(byId["only-without-hole"]).toBeUndefined();
    expect(e.ok).toBe(true);
    expect(e.parts).toHaveLength(1);
    expect(e.parts[0]!.material).toBe("mild-steel");
    expect(e.parts[0]!.features).toHaveLength(3);
    const thread = e.parts[0]!.features[2] as { pitch?: number; boreDiameter?: number; drillDepth?: number };
    expect(thread.pitch).toBe(0.7); // ISO 261 coarse M4
    expect(thread.drillDepth).toBeCloseTo(6 + 3 * 0.7, 12);
    expect(e.partSummaries[0]).toMatchObject({ id: "plate", quantity: 2, material: "mild-steel", buildable: true, bboxMm: { x: 40, y: 20, z: 10 } });
    expect(e.assembly.fixtures).toEqual([{ id: "jaw", label: "Jaw", positionMm: { x: 0, y: -20, z: 0 }, sizeMm: { x: 40, y: 20, z: 10 } }]);
    expect(e.buildable).toBe(true);
  });

  it("turns a failing check into ok: false, and uses failMessage", () => {
    const e = evaluateTemplate(mm, { parameters: { width: 100 } });
    const area = e.checks.find((c) => c.id === "area")!;
    expect(area).toMatchObject({ passed: false, message: "Too big: 2000 mm²." });
    expect(e.ok).toBe(false);
  });

  it("drops features and parts whose `when` is false, and runs the analyses that now apply", () => {
    const e = evaluateTemplate(mm, { parameters: { withHole: false } });
    expect(e.parts.map((p) => p.id)).toEqual(["plate", "spare"]);
    expect(e.parts[0]!.features.map((f) => f.kind)).toEqual(["block", "thread"]);
    expect(e.analyses.skipped).toMatchObject({ areaMm2: 800 });
    expect(e.checks.find((c) => c.id === "only-without-hole")).toMatchObject({ passed: true, message: "Skipped 800." });
  });

  it("reports a refused analysis as a failed error check, and everything that needs it as not worked out", () => {
    const e = evaluateTemplate(mm, { parameters: { width: 20 } });
    expect(e.analyses.rect).toEqual({ error: "A square is not allowed here." });
    expect(e.checks.find((c) => c.id === "analysis.rect")).toMatchObject({ severity: "error", passed: false, message: "rect could not be worked out for these values: A square is not allowed here." });
    expect(e.checks.find((c) => c.id === "area")).toMatchObject({ passed: false });
    expect(e.checks.find((c) => c.id === "area")!.message).toMatch(/could not be worked out for these values: "rect" has no value \(the rect analysis failed: A square/);
    expect(e.ok).toBe(false);
  });

  it("reports a derived value that cannot be computed, without throwing", () => {
    const e = evaluateTemplate(mm, { parameters: { holeDiameter: 12 } }); // margin 4 → sqrt(4 − 5) fails
    expect(e.derived.root).toBeNull();
    expect(e.checks.find((c) => c.id === "derived.root")).toMatchObject({ severity: "error", passed: false });
    expect(e.checks.find((c) => c.id === "derived.root")!.message).toMatch(/sqrt of a negative number/);
    expect(e.checks.find((c) => c.id === "uses-root")!.passed).toBe(false);
  });

  it("refuses bad parameters with every issue", () => {
    expect(() => evaluateTemplate(mm, { parameters: { width: 5, metal: "gold", extra: 1 } })).toThrow(ParameterResolutionError);
    try {
      evaluateTemplate(mm, { parameters: { width: 5, metal: "gold", extra: 1 } });
    } catch (err) {
      expect((err as ParameterResolutionError).issues.map((i) => i.path).sort()).toEqual(["parameters.extra", "parameters.metal", "parameters.width"]);
    }
  });

  it("marks a degenerate part as not buildable and says why", () => {
    const e = evaluateTemplate(mm, { parameters: { holeDiameter: 25, height: 20 } });
    expect(e.buildable).toBe(false);
    expect(e.blockedParts).toEqual(["plate"]);
    expect(e.checks.some((c) => c.id.startsWith("engine.larger-than-part.plate") && !c.passed && /Ø25 mm hole is not smaller than the 20 mm face/.test(c.message))).toBe(true);
    expect(e.partSummaries[0]!.buildable).toBe(false);
  });

  it("shows the user's units: inch input, inch messages, N with lbf", () => {
    const e = evaluateTemplate(mm, { parameters: { width: 2 }, units: "in" }); // 50.8 mm
    expect(e.units).toBe("in");
    expect(e.parameters.width).toBe(2);
    expect(e.parametersMm.width).toBe(50.8);
    expect(e.derived.margin).toBeCloseTo(7 / 25.4, 12);
    // 50.8 × 20 = 1016 mm²; perimeter 2 × (50.8 + 20) = 141.6 mm = 5.5748 in.
    expect(e.checks.find((c) => c.id === "area")!.message).toBe("Area 1016 mm², perimeter 5.575 in.");
    expect(e.checks.find((c) => c.id === "margin")!.message).toBe("Margin 0.276 in; force 100 N (22.5 lbf).");
    expect(e.parts[0]!.features[0]).toMatchObject({ size: { x: 50.8 } }); // parts are always mm
  });

  it("evaluates an inch template in its own units and gives mm parts", () => {
    const inch = template("in");
    const e = evaluateTemplate(inch, {});
    expect(e.units).toBe("in");
    expect(e.parameters.width).toBeCloseTo(40 / 25.4, 12);
    expect(e.analyses.rect).toMatchObject({ areaMm2: expect.closeTo(800, 9) as unknown as number });
    const size = (e.parts[0]!.features[0] as { size: { x: number; y: number; z: number } }).size;
    expect(size.x).toBeCloseTo(40, 9);
    expect(size.z).toBeCloseTo(10, 9);
    expect(e.partSummaries[0]!.volumeMm3).toBeCloseTo(evaluateTemplate(mm, {}).partSummaries[0]!.volumeMm3, 6);
    expect(evaluateTemplate(inch, { units: "mm" }).checks.find((c) => c.id === "margin")!.message).toBe("Margin 7 mm; force 100 N.");
  });

  it("keeps the CLI contract: exactly seven keys", () => {
    expect(Object.keys(evaluationContract(evaluateTemplate(mm, {})))).toEqual(["template", "units", "parameters", "derived", "analyses", "checks", "ok"]);
  });
});

describe("recent analysis results", () => {
  /** The rectangle calculator, counting how often it really computes. */
  function counted() {
    const calls = { n: 0 };
    const calculator: Calculator = { ...rectangle, compute: (input: never) => ((calls.n += 1), rectangle.compute(input)) };
    return { calls, compiled: template("mm", {}, { getCalculator: (k: string) => (k === rectangle.kind ? calculator : undefined) }) };
  }

  it("computes an analysis once for the same inputs, and again when an input changes", () => {
    const { calls, compiled } = counted();
    const first = evaluateTemplate(compiled, {});
    expect(calls.n).toBe(1);
    // holeDiameter is no input of the rectangle: the remembered result is used.
    const second = evaluateTemplate(compiled, { parameters: { holeDiameter: 8 } });
    expect(calls.n).toBe(1);
    expect(second.analyses.rect).toBe(first.analyses.rect);
    const wider = evaluateTemplate(compiled, { parameters: { width: 50 } });
    expect(calls.n).toBe(2);
    expect(wider.analyses.rect).toMatchObject({ areaMm2: 1000, perimeterMm: 140 });
  });

  it("never remembers a refusal: a refused input is refused every time", () => {
    const { calls, compiled } = counted();
    for (let i = 0; i < 2; i++) {
      const e = evaluateTemplate(compiled, { parameters: { width: 20, height: 20 } });
      expect(e.analyses.rect).toEqual({ error: "A square is not allowed here." });
    }
    expect(calls.n).toBe(2);
  });

  it("keeps a bounded number of results and still answers right after older ones are dropped", () => {
    const { calls, compiled } = counted();
    for (let w = 21; w <= 60; w++) evaluateTemplate(compiled, { parameters: { width: w } });
    expect(compiled.analyses[0]!.recent.size).toBeLessThanOrEqual(16);
    const e = evaluateTemplate(compiled, { parameters: { width: 21 } });
    expect(e.analyses.rect).toMatchObject({ areaMm2: 420 });
    expect(calls.n).toBe(41);
  });
});
