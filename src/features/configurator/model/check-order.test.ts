import { describe, expect, it } from "vitest";
import { countFailures, orderChecks, type CheckResultView } from "./check-order";

const check = (id: string, severity: CheckResultView["severity"], passed: boolean): CheckResultView => ({
  id,
  severity,
  passed,
  message: id,
  parameters: [],
});

describe("check order", () => {
  it("puts failing errors first, then failing warnings and notes, then what passes; template order within a rank", () => {
    const checks = [
      check("note-fails", "note", false),
      check("error-passes", "error", true),
      check("warning-fails", "warning", false),
      check("error-fails-1", "error", false),
      check("warning-passes", "warning", true),
      check("error-fails-2", "error", false),
    ];
    expect(orderChecks(checks).map((c) => c.id)).toEqual([
      "error-fails-1",
      "error-fails-2",
      "warning-fails",
      "note-fails",
      "error-passes",
      "warning-passes",
    ]);
    expect(countFailures(checks)).toEqual({ error: 2, warning: 1, note: 1 });
  });
});
