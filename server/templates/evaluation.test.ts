import { describe, expect, it } from "vitest";
import { evaluateTemplate } from "@/engine";
import { HttpError } from "@server/lib/errors";
import { builtInTemplates } from "./catalogue";
import { evaluateCached, evaluateForRequest, evaluationKey, requireBuildable } from "./evaluation";

const stop = builtInTemplates().get("cam-vise-stop")!;

describe("evaluateCached", () => {
  it("answers exactly what the engine answers", () => {
    const input = { parameters: { jawThickness: 11.5 }, units: "mm" as const };
    // The engine itself is the reference: the cache must not change a single number.
    expect(JSON.parse(JSON.stringify(evaluateCached(stop, input)))).toEqual(JSON.parse(JSON.stringify(evaluateTemplate(stop, input))));
  });

  it("gives one answer for the same values in any key order, and another for other units or values", () => {
    const a = evaluateCached(stop, { parameters: { jawThickness: 12, jawWidth: 100 } });
    const b = evaluateCached(stop, { parameters: { jawWidth: 100, jawThickness: 12 } });
    expect(b).toBe(a);
    expect(evaluationKey(stop, { parameters: { jawThickness: 12, jawWidth: 100 } })).toBe(evaluationKey(stop, { parameters: { jawWidth: 100, jawThickness: 12 } }));
    expect(evaluateCached(stop, { parameters: { jawThickness: 0.5, jawWidth: 4 }, units: "in" })).not.toBe(evaluateCached(stop, { parameters: { jawThickness: 12.7, jawWidth: 101.6 }, units: "mm" }));
    expect(evaluateCached(stop, { parameters: { jawThickness: 12.5, jawWidth: 100 } })).not.toBe(a);
  });

  it("keys on the template's own units when none are given, so {} and units: mm are one configuration", () => {
    expect(stop.template.units).toBe("mm");
    expect(evaluationKey(stop, {})).toBe(evaluationKey(stop, { units: "mm", parameters: {} }));
  });

  it("under test, freezes what it keeps, so a caller that changed a shared answer would fail its tests", () => {
    expect(process.env.NODE_ENV).toBe("test");
    const e = evaluateCached(stop, {});
    expect(Object.isFrozen(e)).toBe(true);
    expect(Object.isFrozen(e.checks)).toBe(true);
    expect(Object.isFrozen(e.parts[0])).toBe(true);
    expect(() => {
      (e.checks as unknown as unknown[]).push({});
    }).toThrow(TypeError);
  });
});

describe("evaluateForRequest", () => {
  it("turns one bad parameter into a 400 naming it, and never caches the refusal", () => {
    for (let i = 0; i < 2; i++) {
      let caught: unknown;
      try {
        evaluateForRequest(stop, { parameters: { jawThickness: "thick" } });
      } catch (err) {
        caught = err;
      }
      expect(caught).toBeInstanceOf(HttpError);
      const e = caught as HttpError;
      expect(e.status).toBe(400);
      expect(e.details?.[0]?.path).toContain("jawThickness");
    }
  });

  it("uses the caller's message for several bad parameters, or always when asked", () => {
    const several = () => evaluateForRequest(stop, { parameters: { jawThickness: -5, jawWidth: "wide" } }, { several: "Look at the values." });
    expect(several).toThrow("Look at the values.");
    const always = () => evaluateForRequest(stop, { parameters: { jawThickness: -5 } }, { always: "The saved values no longer suit." });
    expect(always).toThrow("The saved values no longer suit.");
  });

  it("passes good values through and requireBuildable lets a buildable answer by", () => {
    const e = evaluateForRequest(stop, {});
    expect(e.buildable).toBe(true);
    expect(() => requireBuildable(e)).not.toThrow();
  });
});
