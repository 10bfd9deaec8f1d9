import { describe, expect, it } from "vitest";
import type { AnalysisSpec } from "../template/schema";
import { fitPurposeChecks } from "./fits";

const spec = (purpose: AnalysisSpec["purpose"]): AnalysisSpec => ({ id: "f", calculator: "fit", label: "Pin in its hole", inputs: {}, purpose });
const run = (purpose: AnalysisSpec["purpose"], clearanceMin: number, clearanceMax: number, units: "mm" | "in" = "mm") =>
  fitPurposeChecks([spec(purpose)], { f: { clearanceMin, clearanceMax } }, units)[0]!;

// Limits from ISO 286-2 (from memory), Ø10: H7 +15/0; g6 −5/−14; h6 0/−9; k6 +10/+1; p6 +24/+15 µm.
describe("a fit suits its function", () => {
  it.each([
    ["running", 0.005, 0.029, true], // H7/g6
    ["running", 0, 0.024, false], // H7/h6 can be line-to-line: no running clearance guaranteed
    ["sliding", 0, 0.024, true], // H7/h6
    ["sliding", -0.01, 0.014, false], // H7/k6 can be tight
    ["location", -0.01, 0.014, true], // H7/k6
    ["location", 0.005, 0.061, false], // too loose to locate
    ["press", -0.024, -0.0, false], // can be line-to-line at the loosest
    ["press", -0.024, -0.0001, true],
    ["press", -0.024, 0.0001, false],
  ] as const)("%s with clearance %f to %f → passes: %s", (purpose, min, max, passed) => {
    expect(run(purpose, min, max).passed).toBe(passed);
  });

  it("says why in shop language, in the user's units", () => {
    expect(run("running", 0, 0.024).message).toBe(
      "Pin in its hole: clearance 0 mm to 0.024 mm (negative = interference), but a part that turns needs clearance even at the tightest; choose a looser shaft (g6, f7).",
    );
    expect(run("running", 0.0254, 0.0508, "in").message).toBe("Pin in its hole: clearance 0.001 in to 0.002 in (negative = interference) suits a running fit.");
  });

  it("fails when the fit could not be worked out, and ignores fits without a purpose", () => {
    expect(fitPurposeChecks([spec("running")], { f: { error: "no such class" } }, "mm")[0]).toMatchObject({ passed: false, severity: "error" });
    expect(fitPurposeChecks([{ ...spec("running"), purpose: undefined }], {}, "mm")).toEqual([]);
  });
});
