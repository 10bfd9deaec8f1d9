import { describe, expect, it } from "vitest";
import { designExportFormats } from "@/shared/designs";
import { EXPORT_FORMATS } from "@server/exporters/build-export";

describe("design export formats", () => {
  it("are exactly the formats the pack service writes", () => {
    expect([...designExportFormats]).toEqual([...EXPORT_FORMATS]);
  });
});
