import { describe, expect, it } from "vitest";
import { convertTexts, defaultTexts, parseCamTexts, readNumber } from "./parse-inputs";
import { formatQuantity, MM_PER_INCH, NM_PER_LBF_IN, N_PER_LBF, toBase, toShown, trimNumber } from "./units";

describe("unit factors (exact by definition)", () => {
  it("1 in = 25.4 mm (international yard and pound, 1959)", () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(formatQuantity("inch", "length", 25.4)).toBe("1 in");
    expect(toBase("inch", "length", 1)).toBe(25.4);
  });

  it("1 lbf = 4.4482216152605 N (NIST SP 811, appendix B.8)", () => {
    expect(N_PER_LBF).toBeCloseTo(4.4482216152605, 12);
    expect(formatQuantity("inch", "force", 4.4482216152605)).toBe("1 lbf");
  });

  it("1 lbf·in = 0.1129848 N·m (NIST SP 811, appendix B.8)", () => {
    expect(NM_PER_LBF_IN).toBeCloseTo(0.1129848, 7);
    expect(toShown("inch", "torque", 0.1129848290276167)).toBeCloseTo(1, 12);
  });

  it("trims trailing zeros only after the point", () => {
    expect(trimNumber(25.4, 3)).toBe("25.4");
    expect(trimNumber(100, 2)).toBe("100");
    expect(trimNumber(0.05, 4)).toBe("0.05");
  });
});

describe("reading what was typed", () => {
  it("accepts a decimal comma and refuses words", () => {
    expect(readNumber("1,5")).toBe(1.5);
    expect(readNumber(" 12 ")).toBe(12);
    expect(readNumber(".5")).toBe(0.5);
    expect(readNumber("12mm")).toBeNull();
    expect(readNumber("")).toBeNull();
    expect(readNumber("1.2.3")).toBeNull();
  });

  it("inch input reaches the calculator in mm", () => {
    const texts = {
      ...defaultTexts("inch"),
      diameter: "1",
      eccentricity: "0.05",
      gap: "0.02",
      handForce: "10",
    };
    const parsed = parseCamTexts(texts, "inch");
    expect(parsed.errors).toBeNull();
    expect(parsed.input?.diameter).toBe(25.4);
    expect(parsed.input?.eccentricity).toBeCloseTo(1.27, 12);
    expect(parsed.input?.handForce).toBeCloseTo(44.482216152605, 9);
  });

  it("names the field that is empty, not a number, or out of the calculator's range", () => {
    const parsed = parseCamTexts({ ...defaultTexts("mm"), diameter: "", eccentricity: "abc" }, "mm");
    expect(parsed.errors).toEqual({
      diameter: "Enter the cam diameter.",
      eccentricity: "Enter a number, like 1.5.",
    });
    // The range rules come from the calculator's own schema.
    const negative = parseCamTexts({ ...defaultTexts("mm"), muContact: "-0.1" }, "mm");
    expect(negative.errors?.muContact).toBe("Contact friction coefficient cannot be negative.");
  });
});

describe("switching units converts in place", () => {
  it("25.4 mm becomes 1 in and lengths are rounded to 0.0001 in", () => {
    const mm = { ...defaultTexts("mm"), diameter: "25.4", eccentricity: "1.2" };
    const inch = convertTexts(mm, "mm", "inch");
    expect(inch.diameter).toBe("1");
    expect(inch.eccentricity).toBe("0.0472"); // 1.2 / 25.4 = 0.047244…
    expect(inch.muContact).toBe(mm.muContact); // a coefficient has no unit
    expect(inch.leverEndAngleDeg).toBe(mm.leverEndAngleDeg);
  });

  it("leaves text that is not a number as typed", () => {
    const inch = convertTexts({ ...defaultTexts("mm"), gap: "oops" }, "mm", "inch");
    expect(inch.gap).toBe("oops");
  });
});
