import { describe, expect, it } from "vitest";
import { fixtureTemplate } from "../test/fixture-template";
import { readUrlConfiguration, writeUrlConfiguration } from "./url-state";

const specs = fixtureTemplate.parameters;

describe("the configuration in the address", () => {
  it("writes units and only the values that differ from the defaults, in the template's units", () => {
    const params = writeUrlConfiguration(
      specs,
      { jawWidth: 101.6, jawThickness: 25.4, chamferEdges: false, finish: "blued" },
      "in",
    );
    expect(params.toString()).toBe("units=in&jawWidth=101.6&finish=blued&chamferEdges=false");
  });

  it("keeps entries that can never be a parameter, and drops stale parameters of the address", () => {
    const params = writeUrlConfiguration(
      specs,
      { jawWidth: 120 },
      "mm",
      new URLSearchParams("units=in&jawWidth=90&holeCount=5&saved-design=12"),
    );
    expect(params.toString()).toBe("units=mm&jawWidth=120&saved-design=12");
  });

  it("reads back what it wrote and ignores what does not fit", () => {
    const read = readUrlConfiguration(
      new URLSearchParams("units=in&jawWidth=101.6&holeCount=abc&chamferEdges=maybe&finish=blued&other=1"),
      specs,
    );
    expect(read).toEqual({ units: "in", values: { jawWidth: 101.6, finish: "blued" } });
    expect(readUrlConfiguration(new URLSearchParams("units=cubits"), specs).units).toBeNull();
  });
});
