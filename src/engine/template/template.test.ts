import { describe, expect, it } from "vitest";
import { stringify } from "yaml";
import { z } from "zod";
import type { Calculator } from "../calculators/types";
import { loadAndCompileTemplate, loadTemplate, MAX_TEMPLATE_BYTES, migrateTemplateDocument, parseTemplateYaml, TemplateValidationError, validateTemplateText } from "./index";

/** A tiny calculator of our own, registered only in these tests' dependency lookup. */
const doubler: Calculator = {
  kind: "test-doubler",
  label: "Doubler",
  summary: "Doubles a length.",
  inputSchema: z.strictObject({ length: z.number().positive() }),
  compute: (input: { length: number }) => ({ doubledMm: input.length * 2, cautions: [], sources: [] }),
  sources: [],
};
const deps = { getCalculator: (kind: string) => (kind === doubler.kind ? doubler : undefined) };

function minimal(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    formatVersion: 2,
    id: "test-block",
    version: "1.0.0",
    name: "Test block",
    family: "block",
    summary: "A block for tests.",
    units: "mm",
    parameters: [{ key: "size", label: "Size", kind: "length", default: 20, min: 10, max: 50 }],
    derived: { half: "size / 2" },
    analyses: [{ id: "twice", calculator: "test-doubler", inputs: { length: "size" } }],
    checks: [{ id: "small", severity: "warning", condition: "twice.doubledMm < 80", message: "Twice the size is {twice.doubledMm:len}.", parameters: ["size"] }],
    parts: [{ id: "block", name: "Block", material: "mild-steel", features: [{ kind: "block", size: { x: "size", y: "half", z: 10 } }] }],
    ...overrides,
  };
}

function reasons(text: string): string[] {
  const outcome = validateTemplateText(text, deps);
  if (outcome.ok) throw new Error("expected the template to be refused");
  return outcome.issues.map((i) => `${i.path}: ${i.message}`);
}

describe("a valid template", () => {
  it("loads, fills defaults and compiles", () => {
    const compiled = loadAndCompileTemplate(stringify(minimal()), deps);
    expect(compiled.template.assembly.fixtures).toEqual([]);
    expect(compiled.template.drawing.generalTolerance).toBe("m");
    expect(compiled.derived.map((d) => d.key)).toEqual(["half"]);
    expect(compiled.parts[0]!.parameters).toEqual(["size"]);
    expect(compiled.analyses[0]!.parameters).toEqual(["size"]);
  });
});

describe("bad schema is refused with path and reason", () => {
  it.each([
    [{ version: "one" }, /^version: The version is a semantic version/],
    [{ family: "spaceship" }, /^family: /],
    [{ units: "furlong" }, /^units: /],
    [{ parameters: [{ key: "Size", label: "Size", kind: "length", default: 1, min: 0, max: 2 }] }, /^parameters\[0\]\.key: A key is lower camel case/],
    [{ parameters: [{ key: "size", label: "Size", kind: "length", default: 1, min: 0 }] }, /^parameters\[0\]\.max: /],
    [{ parameters: [{ key: "size", label: "Size", kind: "volume", default: 1 }] }, /^parameters\[0\]\.kind: /],
    [{ surprise: true }, /^surprise: unknown field "surprise"/],
    [{ parts: [{ id: "p", name: "P", material: "mild-steel", features: [{ kind: "block", size: { x: 1, y: 1 } }] }] }, /^parts\[0\]\.features\[0\]\.size\.z: /],
    [{ parts: [{ id: "p", name: "P", material: "mild-steel", features: [{ kind: "block", size: { x: 1, y: 1, z: 1 } }, { kind: "hole", at: { x: 0, y: 0, z: 1 }, direction: "down", diameter: 2 }] }] }, /^parts\[0\]\.features\[1\]\.direction: /],
  ])("%j", (override, pattern) => {
    const list = reasons(stringify(minimal(override as Record<string, unknown>)));
    expect(list.some((r) => pattern.test(r))).toBe(true);
  });

  it("checks what a schema cannot: names, limits, calculators, materials, ids", () => {
    const list = reasons(
      stringify(
        minimal({
          parameters: [
            { key: "size", label: "Size", kind: "length", default: 60, min: 10, max: 50 },
            { key: "size", label: "Again", kind: "count", default: 1, min: 0, max: 3 },
            { key: "sin", label: "Shadow", kind: "ratio", default: 1, min: 0, max: 2 },
            { key: "metal", label: "Metal", kind: "material", default: "unobtainium" },
          ],
          derived: { later: "half * 2", half: "size / 2" },
          analyses: [{ id: "twice", calculator: "no-such-calculator", inputs: { length: "size" } }],
          checks: [
            { id: "a", severity: "error", condition: "size > 0", message: "ok", parameters: ["nope"] },
            { id: "a", severity: "error", condition: "size > 0", message: "ok {size:len" },
          ],
        }),
      ),
    );
    const text = list.join("\n");
    expect(text).toMatch(/parameters\[0\]\.default: size: the default 60 is outside 10–50/);
    expect(text).toMatch(/parameters\[1\]\.key: "size" is already defined/);
    expect(text).toMatch(/parameters\[2\]\.key: "sin" is a reserved word/);
    expect(text).toMatch(/parameters\[3\]\.default: metal: the default "unobtainium" is not an allowed material/);
    expect(text).toMatch(/derived\.later: Expression "half \* 2" \(derived\.later\) refused at character 1: unknown name "half"/);
    expect(text).toMatch(/analyses\[0\]\.calculator: Unknown calculator "no-such-calculator"/);
    expect(text).toMatch(/checks\[0\]\.parameters\[0\]: "nope" is not a parameter/);
    expect(text).toMatch(/checks\[1\]\.id: The check id "a" is used twice/);
    expect(text).toMatch(/checks\[1\]\.message: Message .* a '\{' is never closed/);
  });

  it("refuses an input the calculator does not take", () => {
    const text = reasons(stringify(minimal({ analyses: [{ id: "twice", calculator: "test-doubler", inputs: { length: "size", width: 3 } }] }))).join("\n");
    expect(text).toMatch(/analyses\[0\]\.inputs\.width: The test-doubler calculator has no input "width" \(it takes length\)/);
  });

  it("refuses a part whose first feature is not a base", () => {
    const text = reasons(stringify(minimal({ parts: [{ id: "p", name: "P", material: "mild-steel", features: [{ kind: "chamfer", size: 1, faces: ["+z"] }] }] }))).join("\n");
    expect(text).toMatch(/parts\[0\]\.features\[0\]: The first feature of part "p" must be its base/);
  });
});

describe("forbidden expressions in a template are refused with expression and position", () => {
  it.each([
    ["f(x)=x", /refused at character 5: defining functions/],
    ['import("fs")', /character 1: the function "import" is not allowed/],
    ['createUnit("thou")', /character 1: the function "createUnit" is not allowed/],
    ['evaluate("1")', /character 1: the function "evaluate" is not allowed/],
    ["a=1", /character 2: assigning values/],
    ["size.constructor", /character 5: the field "constructor" cannot be read/],
    [`${"(".repeat(40)}size${")".repeat(40)}`, /character 33: brackets are nested more than 32 deep/],
    [`size${" + size".repeat(1500)}`, /derived\.bad: An expression may be at most 500 characters long/],
  ])("derived value #%#", (expr, pattern) => {
    const text = reasons(stringify(minimal({ derived: { half: "size / 2", bad: expr } })));
    expect(text.join("\n")).toMatch(pattern);
  });

  it("refuses them inside parts and check messages too", () => {
    const text = reasons(
      stringify(
        minimal({
          checks: [{ id: "c", severity: "note", condition: "true", message: "Value {evaluate('1')}." }],
          parts: [{ id: "p", name: "P", material: "mild-steel", features: [{ kind: "block", size: { x: "import('x')", y: 1, z: 1 } }] }],
        }),
      ),
    ).join("\n");
    expect(text).toMatch(/checks\[0\]\.message: .*function "evaluate" is not allowed/);
    expect(text).toMatch(/parts\[0\]: Expression "import\('x'\)" \(parts\[0\]\.features\[0\]\.size\.x\) refused at character 1/);
  });
});

describe("YAML safety", () => {
  it("refuses a billion-laughs alias bomb", () => {
    let bomb = 'a: &a ["lol","lol","lol","lol","lol","lol","lol","lol","lol"]\n';
    let prev = "a";
    for (let i = 0; i < 9; i++) {
      const n = `b${i}`;
      bomb += `${n}: &${n} [${Array.from({ length: 9 }, () => `*${prev}`).join(",")}]\n`;
      prev = n;
    }
    expect(() => parseTemplateYaml(bomb)).toThrow(TemplateValidationError);
    expect(reasons(bomb).join("\n")).toMatch(/aliases refused: Excessive alias count/);
  });

  it("refuses deep nesting before the parser recurses", () => {
    const deepFlow = `a: ${"[".repeat(20_000)}${"]".repeat(20_000)}`;
    expect(reasons(deepFlow).join("\n")).toMatch(/brackets are nested more than 64 deep/);
    const deepBlock = Array.from({ length: 300 }, (_, i) => `${" ".repeat(i)}a:`).join("\n");
    expect(reasons(deepBlock).join("\n")).toMatch(/indented more than 192 spaces/);
  });

  it("refuses files over the size limit", () => {
    const big = `summary: "${"x".repeat(MAX_TEMPLATE_BYTES)}"`;
    expect(reasons(big).join("\n")).toMatch(/the limit is 256 KB/);
  });

  it.each([
    ["a: !custom thing", /YAML tags are not allowed|Unresolved tag/],
    ['a: !!js/function "function () {}"', /Unresolved tag|tags are not allowed/],
    ["a: !!binary aGVsbG8=", /tags are not allowed/],
    ["a: !!str text", /tags are not allowed/],
  ])("refuses tags: %s", (text, pattern) => {
    expect(reasons(text).join("\n")).toMatch(pattern);
  });

  it("keeps merge keys off: `<<` is just an unknown field", () => {
    const doc = { ...minimal(), "<<": { name: "merged" } };
    expect(reasons(stringify(doc)).join("\n")).toMatch(/unknown field "<<"/);
  });

  it("refuses duplicate keys and syntax errors with the line", () => {
    expect(reasons("id: a\nid: b").join("\n")).toMatch(/DUPLICATE_KEY/);
    expect(reasons("parameters: [1, 2").join("\n")).toMatch(/YAML/);
  });

  it("refuses a document that is not a mapping", () => {
    expect(reasons("- just\n- a list").join("\n")).toMatch(/A template is a mapping/);
  });
});

describe("format migrations", () => {
  const draft = () => {
    const doc = minimal();
    delete doc.formatVersion;
    const params = (doc.parameters as Array<Record<string, unknown>>).map(({ kind, ...rest }) => ({ ...rest, type: kind }));
    const checks = (doc.checks as Array<Record<string, unknown>>).map(({ severity, parameters, ...rest }) => ({ ...rest, level: severity, concerns: parameters }));
    return { ...doc, parameters: params, checks };
  };

  it("upgrades a format-0 draft step by step to the current format", () => {
    const result = migrateTemplateDocument(draft());
    expect(result.fromVersion).toBe(0);
    expect(result.applied).toEqual([
      "0 → 1: parameters[].type → kind, checks[].level → severity, checks[].concerns → parameters",
      "1 → 2: drawing notes take placeholders: braces in drawing.notes, assembly.notes and parts[].drawing.notes doubled",
    ]);
    expect(result.document.formatVersion).toBe(2);
    const t = loadTemplate(stringify(draft()));
    expect(t.parameters[0]!.kind).toBe("length");
    expect(t.checks[0]!.severity).toBe("warning");
    expect(t.checks[0]!.parameters).toEqual(["size"]);
  });

  it("format 1 notes were plain text: their braces are doubled so they still print as written; = notes stay expressions", () => {
    const doc = minimal({
      formatVersion: 1,
      drawing: { notes: ["Stamp {A} on the face."] },
      assembly: { notes: ["Fit {B} last."] },
      parts: [{ id: "block", name: "Block", material: "mild-steel", features: [{ kind: "block", size: { x: 10, y: 10, z: 10 } }], drawing: { notes: ["Mark {C}.", "='x'"] } }],
    });
    const out = migrateTemplateDocument(doc).document as { drawing: { notes: string[] }; assembly: { notes: string[] }; parts: { drawing: { notes: string[] } }[] };
    expect(out.drawing.notes).toEqual(["Stamp {{A}} on the face."]);
    expect(out.assembly.notes).toEqual(["Fit {{B}} last."]);
    expect(out.parts[0]!.drawing.notes).toEqual(["Mark {{C}}.", "='x'"]);
    // And the old file still loads.
    expect(() => loadAndCompileTemplate(stringify(doc), deps)).not.toThrow();
  });

  it("leaves a current document alone and refuses a future one", () => {
    expect(migrateTemplateDocument(minimal()).applied).toEqual([]);
    expect(reasons(stringify(minimal({ formatVersion: 9 }))).join("\n")).toMatch(/formatVersion: formatVersion 9 is newer than this server understands \(2\)/);
    expect(reasons(stringify(minimal({ formatVersion: "one" }))).join("\n")).toMatch(/formatVersion must be a whole number/);
  });
});
