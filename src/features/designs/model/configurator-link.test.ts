import { describe, expect, it } from "vitest";
import { configuratorHref } from "./configurator-link";

describe("configuratorHref", () => {
  it("puts the units first and every value in the query string", () => {
    const href = configuratorHref("vise-stop", "in", {
      jawWidth: 101.6,
      withPad: false,
      padMaterial: "brass",
    });
    expect(href).toBe("/templates/vise-stop?units=in&jawWidth=101.6&withPad=false&padMaterial=brass");
  });

  it("escapes what a URL cannot carry bare", () => {
    const href = configuratorHref("vise-stop", "mm", { label: "A & B = 1/2" });
    expect(new URL(href, "http://x").searchParams.get("label")).toBe("A & B = 1/2");
  });

  it("round-trips doubles exactly (JavaScript prints the shortest text that reads back the same number)", () => {
    const third = 1 / 3;
    const href = configuratorHref("vise-stop", "mm", { t: third });
    expect(Number(new URL(href, "http://x").searchParams.get("t"))).toBe(third);
  });
});
