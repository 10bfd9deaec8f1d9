/**
 * The engine remembers recent calculator results (per analysis, by their inputs) and recent parts (per
 * part, by the values its shape and notes read; its placement is worked out every time). Remembering must
 * never change an answer: whatever came before, an evaluation equals the one a freshly loaded template
 * gives for the same values. Property test (fast-check) over every built-in template, with sequences of
 * random configurations inside each parameter's limits, in mm and inch.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateTemplate, type ParameterSpec, type Template } from "@/engine";
import { compiledOf } from "@/engine/evaluate";
import { builtIn } from "./catalogue-helpers";

const FILES = [
  "stops/cam-vise-stop.yaml",
  "clamps/cam-edge-clamp.yaml",
  "clamps/strap-clamp.yaml",
  "blocks/v-block.yaml",
  "parallels/matched-parallels.yaml",
  "soft-jaws/vise-soft-jaws.yaml",
];

/** A value for one parameter inside its limits (numbers rounded as a form would send them). */
function valueOf(p: ParameterSpec): fc.Arbitrary<unknown> | undefined {
  switch (p.kind) {
    case "length":
    case "angle":
    case "force":
    case "ratio":
      return fc.double({ min: p.min, max: p.max, noNaN: true }).map((v) => Math.min(p.max, Math.max(p.min, Number(v.toFixed(3)))));
    case "count":
      return fc.integer({ min: p.min, max: p.max });
    case "boolean":
      return fc.boolean();
    default:
      return undefined;
  }
}

type Units = "mm" | "in";

/**
 * A configuration in the given units: a few parameters changed from their defaults, as a user changes a
 * form (limits are in the template's units; lengths are converted at exactly 25.4 mm per inch).
 */
function configuration(template: Template): fc.Arbitrary<{ parameters: Record<string, unknown>; units: Units }> {
  const specs = compiledOf(template).parameters;
  const entries = specs.flatMap((p) => {
    const arb = valueOf(p);
    return arb ? [fc.option(arb.map((v) => [p, v] as const), { freq: 3 })] : [];
  });
  return fc.tuple(fc.constantFrom<Units>("mm", "in"), ...entries).map(([units, ...pairs]) => {
    const factor = units === template.units ? 1 : units === "in" ? 1 / 25.4 : 25.4;
    const parameters: Record<string, unknown> = {};
    for (const pair of pairs) {
      if (pair === null) continue;
      const [p, v] = pair;
      parameters[p.key] = p.kind === "length" && typeof v === "number" ? v * factor : v;
    }
    return { parameters, units };
  });
}

describe("remembered results never change an answer (fast-check)", () => {
  for (const file of FILES) {
    it(`${file}: a sequence of configurations on one template equals each on a fresh template`, () => {
      const shared = builtIn(file);
      fc.assert(
        fc.property(fc.array(configuration(shared), { minLength: 2, maxLength: 5 }), (steps) => {
          for (const { parameters, units } of steps) {
            // Out-of-limit combinations of valid values can still be refused as a whole; both must agree.
            const run = (t: Template) => {
              try {
                return evaluateTemplate(t, { parameters, units });
              } catch (err) {
                return { refused: err instanceof Error ? err.message : String(err) };
              }
            };
            // A copy of the template object is compiled afresh: empty memories.
            const fresh = structuredClone(shared);
            expect(run(shared)).toEqual(run(fresh));
          }
        }),
        { numRuns: 25 },
      );
    });
  }
});

describe("remembered parts", () => {
  const stop = builtIn("stops/cam-vise-stop.yaml");
  const partOf = (e: ReturnType<typeof evaluateTemplate>, id: string) => e.parts.find((p) => p.id === id)!;

  it("reuses a part's shape when a value moves it but does not change it", () => {
    // A thicker jaw moves the cam along the carrier slot; the cam itself is the same part.
    const a = evaluateTemplate(stop, { parameters: { jawThickness: 14 } });
    const b = evaluateTemplate(stop, { parameters: { jawThickness: 24 } });
    expect(partOf(b, "cam").features).toBe(partOf(a, "cam").features);
    expect(partOf(b, "cam").placement).not.toEqual(partOf(a, "cam").placement);
  });

  it("works a part out again when a value it reads changes", () => {
    const a = evaluateTemplate(stop, { parameters: { camDiameter: 20 } });
    const b = evaluateTemplate(stop, { parameters: { camDiameter: 24 } });
    expect(partOf(b, "cam").features).not.toBe(partOf(a, "cam").features);
    expect(JSON.stringify(partOf(b, "cam").features)).toContain("24");
    expect(a.partSummaries.find((s) => s.id === "cam")!.volumeMm3).toBeLessThan(b.partSummaries.find((s) => s.id === "cam")!.volumeMm3);
  });

  it("shows a part's size in the user's units after the same part was worked out in the other units", () => {
    const mm = evaluateTemplate(stop, { units: "mm" });
    const inch = evaluateTemplate(stop, { units: "in" });
    // The wall checks name their minimum wall in the units of the request.
    const wall = (e: typeof mm) => e.checks.filter((c) => c.id.startsWith("engine.walls.")).map((c) => c.message);
    expect(wall(mm).every((m) => / mm /.test(m))).toBe(true);
    expect(wall(inch).every((m) => / in /.test(m) || /"/.test(m))).toBe(true);
  });
});
