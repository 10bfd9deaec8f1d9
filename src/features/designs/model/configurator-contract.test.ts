import { describe, expect, it } from "vitest";
import { readUrlConfiguration } from "@/features/configurator/model/url-state";
import type { ParameterSpecView } from "@/features/configurator/model/parameter-spec";
import { configuratorHref } from "./configurator-link";

describe("a saved design's configurator link", () => {
  it("is read back by the configurator's own address reader", () => {
    // Contract check against the configurator feature: the values it reads are the values we saved.
    const specs = [
      { key: "jawWidth", kind: "length", default: 100 },
      { key: "withPad", kind: "boolean", default: true },
      { key: "padMaterial", kind: "material", default: "brass" },
    ] as unknown as ParameterSpecView[];
    const href = configuratorHref("vise-stop", "in", {
      jawWidth: 125.5,
      withPad: false,
      padMaterial: "aluminium",
    });
    const read = readUrlConfiguration(new URL(href, "http://x").searchParams, specs);
    expect(read).toEqual({
      units: "in",
      values: { jawWidth: 125.5, withPad: false, padMaterial: "aluminium" },
    });
  });
});
