import { describe, expect, it } from "vitest";
import { formatValue, humaniseKey } from "./present";

describe("humaniseKey", () => {
  it("splits lower camel case into words", () => {
    expect(humaniseKey("jawWidth")).toBe("Jaw width");
    expect(humaniseKey("maxOpening")).toBe("Max opening");
    expect(humaniseKey("throw")).toBe("Throw");
    expect(humaniseKey("m4ThreadDepth")).toBe("M4 thread depth");
  });
});

describe("formatValue", () => {
  it("shows yes/no for booleans and text as is", () => {
    expect(formatValue(true)).toBe("yes");
    expect(formatValue(false)).toBe("no");
    expect(formatValue("brass")).toBe("brass");
  });
});
