/**
 * Corner cases of the value comparison the API tests do not reach: a parameter that changed kind, and a
 * new version written in inches (1 in = 25.4 mm exactly). Built from our own test template
 * (tests/fixtures/templates/test-step-stop-*.yaml) with small edits to its text.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import "@/engine/calculators";
import { getCalculator } from "@/engine/calculators/registry";
import { loadAndCompileTemplate } from "@/engine";
import { compareValues } from "./upgrade-values";

const fixture = (version: string) =>
  fs.readFileSync(
    path.resolve(__dirname, `../../../tests/fixtures/templates/test-step-stop-${version}.yaml`),
    "utf8",
  );
const compile = (text: string) => loadAndCompileTemplate(text, { getCalculator });

const v1 = compile(fixture("1.0.0"));
const saved = {
  jawWidth: 127,
  stopHeight: 20,
  padThickness: 3,
  screw: "M6",
  metal: "brass",
  breakEdges: true,
};

describe("compareValues", () => {
  it("replaces a value whose parameter changed kind by the new default, and says so", () => {
    const v2 = compile(
      fixture("2.0.0").replace(
        "{ key: screw, label: Screw, kind: choice, default: M6, choices: [M6, M8], group: Stop }",
        "{ key: screw, label: Screw, kind: count, default: 2, min: 1, max: 4, group: Stop }",
      ),
    );
    const { changes, carried } = compareValues(saved, v2, v1, "mm");
    expect(changes.find((c) => c.key === "screw")).toEqual({
      kind: "wrong-type",
      key: "screw",
      label: "Screw",
      saved: { value: "M6", text: "M6" },
      replacement: { value: 2, text: "2" },
    });
    expect(carried.screw).toBe(2);
  });

  it("converts saved lengths when the new version is written in inches", () => {
    // The same limits as 1.0.0, written in inches: 40 mm = 1.5748 in, 200 mm = 7.874 in; 127 mm = 5 in.
    const inch = fixture("1.0.0")
      .replace("version: 1.0.0", "version: 1.1.0")
      .replace("units: mm", "units: in")
      .replace(
        "default: 100, min: 40, max: 200",
        "default: 4, min: 1.5748031496062993, max: 7.874015748031496",
      );
    const { changes, carried } = compareValues(saved, compile(inch), v1, "mm");
    expect(carried.jawWidth).toBeCloseTo(5, 12);
    // Limits equal once converted: no limits change reported; the default moved from 100 mm to 4 in = 101.6 mm.
    expect(changes.filter((c) => c.key === "jawWidth")).toEqual([
      {
        kind: "default-changed",
        key: "jawWidth",
        label: "Jaw width",
        from: { value: 100, text: "100 mm" },
        to: { value: 4, text: "101.6 mm" },
        affectsDesign: false,
      },
    ]);
  });
});
