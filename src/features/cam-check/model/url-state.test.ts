import { describe, expect, it } from "vitest";
import { defaultTexts } from "./parse-inputs";
import { readCamUrl, writeCamUrl } from "./url-state";

describe("the cam check's inputs in the address", () => {
  it("writes the units and every input as typed, and reads them back the same", () => {
    const texts = { ...defaultTexts("inch"), diameter: "1", eccentricity: "0,05" };
    const params = writeCamUrl("inch", texts);
    expect(params.get("units")).toBe("in");
    // A decimal comma is read as a point (parse-inputs.readNumber), so the address holds 0.05.
    expect(params.get("eccentricity")).toBe("0.05");
    expect(readCamUrl(params)).toEqual({
      system: "inch",
      texts: { ...texts, eccentricity: "0.05" },
      notes: [],
    });
  });

  it("takes the starting cam for what is missing, without a note", () => {
    expect(readCamUrl(new URLSearchParams(""))).toEqual({
      system: "mm",
      texts: defaultTexts("mm"),
      notes: [],
    });
    expect(readCamUrl(new URLSearchParams("eccentricity=2"), "inch").system).toBe("inch");
  });

  it("refuses, one note each, a value that is not a number or that the calculator would refuse alone", () => {
    const read = readCamUrl(
      new URLSearchParams("units=mm&diameter=-5&gap=1e999&muPivot=2&leverEndAngleDeg=200&handForce=80"),
    );
    const starting = defaultTexts("mm");
    expect(read.texts).toEqual({ ...starting, handForce: "80" });
    expect(read.notes).toEqual([
      "Cam diameter: -5 from the link cannot be used (it must be more than 0 mm); the starting value 24 mm is used.",
      "Set gap: “1e999” in the link is not a number; the starting value 0.6 mm is used.",
      "Lever angle when clamped: 200 from the link cannot be used (it must be at most 135°); the starting value 0° is used.",
      "Friction in the pivot: 2 from the link cannot be used (it must be at most 1); the starting value 0.1 is used.",
    ]);
  });

  it("states a broken limit in the unit of the link", () => {
    // Pivot diameter may be 0 but not less: −0.1 in.
    expect(readCamUrl(new URLSearchParams("units=in&pivotDiameter=-0.1")).notes).toEqual([
      "Pivot pin diameter: -0.1 from the link cannot be used (it must be at least 0 in); the starting value 0.315 in is used.",
    ]);
  });
});
