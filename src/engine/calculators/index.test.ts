import { describe, expect, it } from "vitest";
import { z } from "zod";
import { getCalculator, listCalculators } from "./index";

const SOURCE_KINDS = ["standard", "handbook", "textbook", "common practice", "from memory"];

/** One valid input per calculator written in this area, so the result contract can be checked end to end. */
const EXAMPLES: Record<string, unknown> = {
  fit: { size: 8, hole: "H7", shaft: "g6" },
  "general-tolerance": { size: 30, class: "m" },
  thread: { designation: "M6" },
  ream: { diameter: 4 },
  counterbore: { screw: "M6" },
};

describe("calculator registry", () => {
  it("registers each standards calculator once", () => {
    const kinds = listCalculators().map((c) => c.kind);
    expect(new Set(kinds).size).toBe(kinds.length);
    for (const kind of Object.keys(EXAMPLES)) expect(getCalculator(kind)?.kind).toBe(kind);
  });

  it("gives every calculator a label, an object input schema with camelCase keys and named sources", () => {
    for (const c of listCalculators()) {
      expect(c.label.length, c.kind).toBeGreaterThan(3);
      expect(c.summary.length, c.kind).toBeGreaterThan(10);
      expect(c.inputSchema, c.kind).toBeInstanceOf(z.ZodObject);
      const keys = Object.keys((c.inputSchema as unknown as z.ZodObject).shape);
      expect(keys.length, c.kind).toBeGreaterThan(0);
      for (const key of keys) expect(key, c.kind).toMatch(/^[a-z][a-zA-Z0-9]*$/);
      expect(c.sources.length, c.kind).toBeGreaterThan(0);
      for (const s of c.sources) {
        expect(s.title.length, c.kind).toBeGreaterThan(5);
        expect(SOURCE_KINDS, c.kind).toContain(s.kind);
      }
    }
  });

  it("returns cautions and sources with every result, through the schema", () => {
    for (const [kind, input] of Object.entries(EXAMPLES)) {
      const c = getCalculator(kind);
      if (!c) throw new Error(`${kind} not registered`);
      const result = c.compute(c.inputSchema.parse(input));
      expect(result.cautions.length, kind).toBeGreaterThan(0);
      expect(result.sources.length, kind).toBeGreaterThan(0);
      // Results are plain data: they survive a JSON round trip unchanged (the CLI and HTTP print them).
      expect(JSON.parse(JSON.stringify(result)), kind).toEqual(result);
    }
  });
});
