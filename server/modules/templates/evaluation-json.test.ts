/**
 * The evaluate route writes its answer with the text of shared analyses and part summaries reused; the
 * bytes must be exactly what `JSON.stringify` (the reference serialiser of the ECMAScript standard, as
 * `res.json` used it) gives for the same answer, for every built-in template, in mm and inch, also when
 * the pieces come from an earlier configuration.
 */
import { describe, expect, it } from "vitest";
import { evaluateTemplate, type Evaluation } from "@/engine";
import { builtInTemplates } from "@server/templates";
import { evaluationJson } from "./service";

const reference = (e: Evaluation) => {
  const { parts: _parts, geometryIssues: _issues, ...rest } = e;
  return JSON.stringify(rest);
};

describe("evaluationJson", () => {
  for (const compiled of builtInTemplates().list()) {
    it(`${compiled.template.id}: the same bytes as JSON.stringify, first and after a change`, () => {
      const length = compiled.parameters.find((p) => p.kind === "length");
      for (const units of ["mm", "in"] as const) {
        const first = evaluateTemplate(compiled, { units });
        expect(evaluationJson(first)).toBe(reference(first));
        if (!length || length.kind !== "length") continue;
        // Another value of one length: most analyses and part summaries are the same objects as before.
        const value = units === compiled.template.units ? length.max : units === "in" ? length.max / 25.4 : length.max * 25.4;
        const next = evaluateTemplate(compiled, { units, parameters: { [length.key]: value } });
        const text = evaluationJson(next);
        expect(text).toBe(reference(next));
        expect(JSON.parse(text)).toEqual(JSON.parse(reference(next)));
      }
    });
  }
});
