import { describe, expect, it } from "vitest";
import { fixtureTemplate } from "../test/fixture-template";
import {
  convertFormState,
  fillLengthsMm,
  formStateFromTemplateValues,
  parameterValues,
  parseDecimal,
} from "./form-values";
import { numericProblem, rangeText } from "./form-schema";

const specs = fixtureTemplate.parameters;
const byKey = (key: string) => specs.find((s) => s.key === key)!;

// 1 in = 25.4 mm exactly: international yard and pound agreement (1959); NIST SP 811, Appendix B.
describe("mm ↔ inch in place, exactly", () => {
  const mm = formStateFromTemplateValues(specs, {}, "mm", "mm");

  it("25.4 mm becomes 1 in and 100 mm becomes 3.93701 in on screen", () => {
    const inch = convertFormState(specs, mm, "mm", "in");
    expect(inch.values.jawThickness).toBe("1");
    expect(inch.values.jawWidth).toBe("3.93701");
    // Angles, forces, ratios and counts are not lengths: untouched.
    expect(inch.values.handForce).toBe("100");
    expect(inch.values.friction).toBe("0.1");
  });

  it("sends the exact inch value (100 / 25.4), not the rounded text", () => {
    const inch = convertFormState(specs, mm, "mm", "in");
    const sent = parameterValues(specs, inch, "in", "in")!;
    // 100 / 25.4 = 3.937007874015748… (the exact definition), not the 3.93701 on screen.
    expect(sent.jawWidth).not.toBe(3.93701);
    expect(Math.abs((sent.jawWidth as number) - 100 / 25.4)).toBeLessThan(1e-11);
    expect(sent.jawThickness).toBe(1);
    // In the template's own units (the address, saved designs) it is still exactly 100 mm.
    expect(parameterValues(specs, inch, "in", "mm")!.jawWidth).toBe(100);
  });

  it("comes home exactly: mm → in → mm gives 100 and 25.4 again", () => {
    const back = convertFormState(specs, convertFormState(specs, mm, "mm", "in"), "in", "mm");
    expect(back.values.jawWidth).toBe("100");
    expect(back.values.jawThickness).toBe("25.4");
  });

  it("a value typed in inches converts by 25.4 exactly: 1.5 in → 38.1 mm", () => {
    const inch = convertFormState(specs, mm, "mm", "in");
    const typed = { ...inch, values: { ...inch.values, jawWidth: "1.5" } };
    expect(parameterValues(specs, typed, "in", "mm")!.jawWidth).toBe(38.1);
    expect(convertFormState(specs, typed, "in", "mm").values.jawWidth).toBe("38.1");
  });

  it("a field that does not hold a number is left as typed and blocks sending", () => {
    const bad = { ...mm, values: { ...mm.values, jawWidth: "12..5" } };
    expect(convertFormState(specs, bad, "mm", "in").values.jawWidth).toBe("12..5");
    expect(parameterValues(specs, bad, "mm", "mm")).toBeNull();
  });

  it("fills vise sizes given in mm exactly, whatever the form shows", () => {
    const inch = convertFormState(specs, mm, "mm", "in");
    const { state, filled } = fillLengthsMm(
      specs,
      inch,
      { jawWidth: 125, jawThickness: 22, notAParameter: 3 },
      "in",
    );
    expect(filled).toEqual(["jawWidth", "jawThickness"]);
    expect(state.values.jawWidth).toBe("4.92126");
    expect(parameterValues(specs, state, "in", "mm")!.jawWidth).toBe(125);
  });
});

describe("reading numbers a person typed", () => {
  it("accepts a decimal point or comma and refuses the rest", () => {
    expect(parseDecimal("12.5")).toBe(12.5);
    expect(parseDecimal(" 12,5 ")).toBe(12.5);
    expect(parseDecimal(".5")).toBe(0.5);
    expect(parseDecimal("1e3")).toBeNull();
    expect(parseDecimal("12 mm")).toBeNull();
    expect(parseDecimal("")).toBeNull();
  });
});

describe("limits in the user's units", () => {
  it("shows ranges in mm, in inches (4 decimals), degrees and newtons", () => {
    expect(rangeText(byKey("jawWidth"), "mm", "mm")).toBe("20–250 mm");
    // 20 / 25.4 = 0.787401…, 250 / 25.4 = 9.842519…
    expect(rangeText(byKey("jawWidth"), "mm", "in")).toBe("0.7874–9.8425 in");
    expect(rangeText(byKey("leverAngle"), "mm", "in")).toBe("0–90°");
    expect(rangeText(byKey("handForce"), "mm", "mm")).toBe("20–300 N");
    expect(rangeText(byKey("holeCount"), "mm", "mm")).toBe("1–6");
  });

  it("says which limit is broken, in the units the person works in", () => {
    const state = (values: Record<string, string>) => ({ values, exact: {} });
    expect(numericProblem(byKey("jawWidth"), state({ jawWidth: "300" }), "mm", "mm")).toBe(
      "Jaw width must be at most 250 mm (allowed 20–250 mm).",
    );
    expect(numericProblem(byKey("jawWidth"), state({ jawWidth: "10" }), "mm", "in")).toBe(
      "Jaw width must be at most 9.8425 in (allowed 0.7874–9.8425 in).",
    );
    expect(numericProblem(byKey("holeCount"), state({ holeCount: "2.5" }), "mm", "mm")).toBe(
      "Cross holes must be a whole number from 1–6.",
    );
    expect(numericProblem(byKey("jawWidth"), state({ jawWidth: "" }), "mm", "mm")).toBe(
      "Jaw width: enter a number from 20–250 mm.",
    );
    expect(numericProblem(byKey("jawWidth"), state({ jawWidth: "250" }), "mm", "mm")).toBeNull();
  });

  it("judges a converted limit by its exact size: 250 mm shown as 9.84252 in is inside the range", () => {
    const mm = formStateFromTemplateValues(specs, { jawWidth: 250 }, "mm", "mm");
    const inch = convertFormState(specs, mm, "mm", "in");
    expect(inch.values.jawWidth).toBe("9.84252");
    expect(numericProblem(byKey("jawWidth"), inch, "mm", "in")).toBeNull();
  });
});
