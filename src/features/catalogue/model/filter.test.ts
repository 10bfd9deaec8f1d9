import { describe, expect, it } from "vitest";
import type { TemplateSummary } from "../api/get-templates";
import { familiesOf, filterTemplates, searchWords } from "./filter";

// Invented catalogue entries for the filter; not real templates.
const list: TemplateSummary[] = [
  {
    id: "cam-vise-stop",
    version: "1.0.0",
    name: "Cam-lock vise stop",
    family: "stop",
    summary: "Hooks over the fixed jaw; a cam locks the stop rod.",
  },
  {
    id: "toe-clamp",
    version: "1.0.0",
    name: "Toe clamp",
    family: "clamp",
    summary: "Low clamp for the mill table's T-slots.",
  },
  {
    id: "step-block",
    version: "2.1.0",
    name: "Step block",
    family: "block",
    summary: "Stepped support under a clamp's heel.",
  },
];

describe("catalogue filter", () => {
  it("keeps templates that have every word, matched at the start of a word, any case", () => {
    expect(filterTemplates(list, null, "CAM").map((t) => t.id)).toEqual(["cam-vise-stop"]);
    expect(filterTemplates(list, null, "clamp").map((t) => t.id)).toEqual(["toe-clamp", "step-block"]);
    expect(filterTemplates(list, null, "clamp heel").map((t) => t.id)).toEqual(["step-block"]);
    // "amp" is inside "clamp", not at a word start.
    expect(filterTemplates(list, null, "amp")).toEqual([]);
    // The family's label counts too: "stops" finds the stop.
    expect(filterTemplates(list, null, "stops").map((t) => t.id)).toEqual(["cam-vise-stop"]);
  });

  it("filters by family and combines with the words", () => {
    expect(filterTemplates(list, "clamp", "").map((t) => t.id)).toEqual(["toe-clamp"]);
    expect(filterTemplates(list, "block", "toe")).toEqual([]);
  });

  it("splits the search on anything that is not a letter or digit and folds accents", () => {
    expect(searchWords("  T-slot, Étau ")).toEqual(["t", "slot", "etau"]);
  });

  it("lists the families present in the format's order with their counts", () => {
    expect(familiesOf(list)).toEqual([
      { family: "stop", count: 1 },
      { family: "clamp", count: 1 },
      { family: "block", count: 1 },
    ]);
  });
});
