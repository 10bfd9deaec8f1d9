import { describe, expect, it } from "vitest";
import { viseFieldsSchema } from "@/shared/profiles";
import { changedFields, checkDraft, parseNumber, type FieldSpec } from "./draft";

const fields: FieldSpec[] = [
  { key: "name", label: "Name", kind: "text" },
  { key: "jawWidthMm", label: "Jaw width", unit: "mm", kind: "number" },
  { key: "jawHeightMm", label: "Jaw height", unit: "mm", kind: "number" },
  { key: "jawThicknessMm", label: "Jaw thickness", unit: "mm", kind: "number" },
  { key: "maxOpeningMm", label: "Maximum opening", unit: "mm", kind: "number" },
];

describe("parseNumber", () => {
  it("reads points and a decimal comma, leaves empty as missing and nonsense as NaN", () => {
    expect(parseNumber(" 12.5 ")).toBe(12.5);
    expect(parseNumber("12,5")).toBe(12.5);
    expect(parseNumber(",5")).toBe(0.5);
    expect(parseNumber("")).toBeUndefined();
    expect(parseNumber("1,000,5")).toBeNaN();
    expect(parseNumber("12 mm")).toBeNaN();
  });
});

describe("checkDraft", () => {
  it("gives the shared schema's message per bad field", () => {
    const r = checkDraft(
      viseFieldsSchema,
      { name: " ", jawWidthMm: "-1", jawHeightMm: "abc", jawThicknessMm: "", maxOpeningMm: "90" },
      fields,
    );
    expect(r).toEqual({
      ok: false,
      errors: {
        name: "Name is required.",
        jawWidthMm: "Jaw width must be more than 0 mm.",
        jawHeightMm: "Jaw height must be a number of millimetres.",
        jawThicknessMm: "Jaw thickness must be a number of millimetres.",
      },
    });
  });

  it("returns the parsed record when all is well", () => {
    const r = checkDraft(
      viseFieldsSchema,
      { name: " Vise ", jawWidthMm: "100", jawHeightMm: "32", jawThicknessMm: "12,5", maxOpeningMm: "90" },
      fields,
    );
    expect(r).toEqual({
      ok: true,
      value: { name: "Vise", jawWidthMm: 100, jawHeightMm: 32, jawThicknessMm: 12.5, maxOpeningMm: 90 },
    });
  });
});

describe("changedFields", () => {
  it("keeps only what differs", () => {
    expect(changedFields({ name: "A", jawWidthMm: 100 }, { name: "A", jawWidthMm: 125 })).toEqual({
      jawWidthMm: 125,
    });
    expect(changedFields({ name: "A" }, { name: "A" })).toEqual({});
  });
});
