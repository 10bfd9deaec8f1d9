import { describe, expect, it } from "vitest";
import { madeToSuitNote } from "./madeToSuit";
import type { Template } from "../template/schema";

type Parameter = Template["parameters"][number];

const jaw = (key: string, label: string, group = "Your vise"): Parameter =>
  ({ key, label, group, kind: "length", default: 10, min: 1, max: 500 }) as Parameter;

describe("made-to-suit note on the assembly sheet", () => {
  const parameters: Parameter[] = [
    jaw("jawWidth", "Jaw width"),
    jaw("jawThickness", "Jaw thickness"),
    jaw("camDiameter", "Cam diameter", "Cam"),
  ];

  it("lists the user's machine measurements with their unit, and nothing else", () => {
    expect(madeToSuitNote(parameters, { jawWidth: 127, jawThickness: 26.5, camDiameter: 20 }, "mm")).toBe(
      "Made to suit: Jaw width 127 mm, Jaw thickness 26.5 mm.",
    );
  });

  it("prints inch sheets in decimal inches to three places (exactly 25.4 mm per inch: 127 mm = 5 in, 26.5 mm = 1.0433 in)", () => {
    expect(madeToSuitNote(parameters, { jawWidth: 127, jawThickness: 26.5 }, "in")).toBe("Made to suit: Jaw width 5.000 in, Jaw thickness 1.043 in.");
    // Under an inch without a leading zero (ASME Y14.5 §1.6.2): 20 mm = .787 in.
    expect(madeToSuitNote(parameters, { jawWidth: 20 }, "in")).toBe("Made to suit: Jaw width .787 in.");
  });

  it("says nothing for a template with no machine measurements", () => {
    expect(madeToSuitNote([jaw("camDiameter", "Cam diameter", "Cam")], { camDiameter: 20 }, "mm")).toBeUndefined();
  });
});
