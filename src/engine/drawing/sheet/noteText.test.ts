/**
 * Drawing notes that carry lengths: written once in the template's units with `{…:len}`, shown on each
 * sheet in that sheet's units. Expected values worked by hand from 1 in = 25.4 mm exactly (international
 * inch, 1959); inch values without a leading zero (ASME Y14.5 §1.6.2), three places for general work and
 * one significant figure for finer tolerances (.0004 — common practice for tenths on inch drawings).
 */
import { describe, expect, it } from "vitest";
import { stringify } from "yaml";
import { evaluateTemplate } from "../../evaluate";
import { loadAndCompileTemplate } from "../../template";
import { formatter } from "../format";
import { partNotes } from "./partNotes";
import { noteLength, renderNote } from "./noteText";

const deps = { getCalculator: () => undefined };

function template(units: "mm" | "in", notes: { sheet?: string[]; assembly?: string[]; part?: string[] }) {
  const f = units === "mm" ? 1 : 1 / 25.4;
  return loadAndCompileTemplate(
    stringify({
      formatVersion: 2,
      id: "test-pin",
      version: "1.0.0",
      name: "Test pin",
      family: "other",
      summary: "A pin with notes.",
      units,
      parameters: [{ key: "fitGap", label: "Gap", kind: "length", default: 0.02 * f, min: 0.01 * f, max: 0.1 * f }],
      parts: [
        {
          id: "pin",
          name: "Pin",
          material: "mild-steel",
          features: [{ kind: "turned", steps: [{ diameter: 10 * f, length: 20 * f }] }],
          ...(notes.part ? { drawing: { notes: notes.part } } : {}),
        },
      ],
      ...(notes.assembly ? { assembly: { notes: notes.assembly } } : {}),
      drawing: { sheet: "auto", generalTolerance: "m", ...(notes.sheet ? { notes: notes.sheet } : {}) },
    }),
    deps,
  );
}

describe("note lengths in the sheet's units", () => {
  it("millimetres to 0.01, finer when the value needs it; inches to three places, finer for tenths", () => {
    const mm = formatter("mm");
    const inch = formatter("in");
    expect(noteLength(mm, 0.2)).toBe("0.2");
    expect(noteLength(mm, 12.5)).toBe("12.5");
    expect(noteLength(mm, 0.002)).toBe("0.002");
    expect(noteLength(mm, 0.02, 3)).toBe("0.020");
    // 0.2 mm = 0.00787 in; 0.5 mm = 0.01969 in; 0.01 mm = 0.000394 in; 0.002 mm = 0.0000787 in.
    expect(noteLength(inch, 0.2)).toBe(".008");
    expect(noteLength(inch, 0.5)).toBe(".020");
    expect(noteLength(inch, 0.01)).toBe(".0004");
    expect(noteLength(inch, 0.002)).toBe(".00008");
    expect(noteLength(inch, 25.4)).toBe("1.000");
  });

  it("renders length markers and literal braces; text without markers is left alone", () => {
    expect(renderNote("Edges {0.2:len} × 45°, stamp {{A}}", formatter("in"))).toBe("Edges .008 × 45°, stamp {A}");
    expect(renderNote("Plain {text}", formatter("mm"))).toBe("Plain {text}");
  });
});

describe("template notes through the evaluation", () => {
  const notes = {
    sheet: ["Dimensions in millimetres unless stated.", "Remove all burrs; break sharp edges.", "Stamp the part number {3:len} high on the end."],
    assembly: ["Shim to {fitGap:len} end float."],
    part: ["Dial the offset within {0.01:len}.", "Running gap {fitGap:len}; mark {{LH}} on the end.", "Break all sharp edges {0.2:len}–{0.5:len} × 45° unless shown."],
  };

  it("an mm template's notes read in mm on an mm drawing and in decimal inches on an inch drawing", () => {
    const compiled = template("mm", notes);
    const ev = evaluateTemplate(compiled, {});
    const part = ev.parts[0]!;
    const render = (units: "mm" | "in") => partNotes({ part, fmt: formatter(units), generalTolerance: "m", failingChecks: [], sheetNotes: ev.drawingNotes.sheet });
    const mm = render("mm").join("\n");
    const inch = render("in").join("\n");
    expect(mm).toContain("Dial the offset within 0.01.");
    expect(mm).toContain("Running gap 0.02; mark {LH} on the end.");
    expect(mm).toContain("Break all sharp edges 0.2–0.5 × 45° unless shown.");
    expect(inch).toContain("Dial the offset within .0004.");
    expect(inch).toContain("Running gap .0008; mark {LH} on the end.");
    expect(inch).toContain("Break all sharp edges .008–.020 × 45° unless shown.");
    expect(inch).toContain("Dimensions in inches.");
    // 3 mm = 0.118 in.
    expect(mm).toContain("Stamp the part number 3 high on the end.");
    expect(inch).toContain("Stamp the part number .118 high on the end.");
    // The template's own units note is replaced by the drawing's.
    expect(inch).not.toContain("millimetres");
    // One edge note: the part's own, with its sizes, stands in for the template's general one.
    expect(render("mm").filter((n) => /sharp edge|burr/i.test(n))).toHaveLength(1);
    expect(renderNote(ev.drawingNotes.assembly[0]!, formatter("in"))).toBe("Shim to .0008 end float.");
  });

  it("an inch template's note lengths are inches in the template and millimetres on an mm drawing", () => {
    const ev = evaluateTemplate(template("in", { part: ["Dial the offset within {0.0005:len}."] }), {});
    // 0.0005 in = 0.0127 mm.
    expect(renderNote(ev.parts[0]!.drawing!.notes![0]!, formatter("mm"))).toBe("Dial the offset within 0.013.");
    expect(renderNote(ev.parts[0]!.drawing!.notes![0]!, formatter("in"))).toBe("Dial the offset within .0005.");
  });

  it("refuses a unit written after a length placeholder, with the note's path", () => {
    expect(() => template("mm", { part: ["Within {0.01:len} mm of the offset."] })).toThrow(/parts\[0\]\.drawing\.notes\[0\].*leave out the "mm"/);
  });

  it("the generated edge note follows the drawing's units", () => {
    const ev = evaluateTemplate(template("mm", {}), {});
    const inch = partNotes({ part: ev.parts[0]!, fmt: formatter("in"), generalTolerance: "m", failingChecks: [] }).join("\n");
    expect(inch).toContain("break sharp edges about .008 × 45°");
  });

  it("the heat-treatment remark keeps the grade's capitals (O1, not o1)", () => {
    const ev = evaluateTemplate(template("mm", {}), {});
    const notes = partNotes({
      part: ev.parts[0]!,
      fmt: formatter("mm"),
      generalTolerance: "m",
      failingChecks: [],
      material: { name: "Tool steel (O1, annealed)", hardenable: true },
    }).join("\n");
    expect(notes).toContain("tool steel (O1, annealed) can be hardened");
  });
});
