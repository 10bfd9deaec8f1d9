import { describe, expect, it } from "vitest";
import { configuratorHref, savedDesignIdOf } from "./configurator-link";

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

  it("names the saved design last, and reads back only a whole positive id", () => {
    const href = configuratorHref("vise-stop", "mm", { jawWidth: 100 }, { savedDesignId: 42 });
    expect(href).toBe("/templates/vise-stop?units=mm&jawWidth=100&saved-design=42");
    expect(savedDesignIdOf(new URL(href, "http://x").searchParams)).toBe(42);
    for (const bad of ["", "0", "-3", "4.5", "12abc", "99999999999"]) {
      expect(savedDesignIdOf(new URLSearchParams({ "saved-design": bad }))).toBeNull();
    }
    expect(savedDesignIdOf(new URLSearchParams("jawWidth=1"))).toBeNull();
  });
});
