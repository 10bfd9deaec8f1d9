import { describe, expect, it } from "vitest";
import { SETUP_CAUTION } from "../../calculators/types";
import { SPEED_CAUTION } from "../../calculators/cutting-speed";
import { predrillDiameterMm } from "../../calculators/ream";
import type { ResolvedPart } from "../../parts/features";
import { block, disc, pin } from "../fixtures.test-data";
import { buildOperationSheet, partOperations } from "./build";

const kinds = (p: ResolvedPart, opts = {}) => partOperations(p, opts).operations.map((o) => o.kind);
const rpmBy = (vMpm: number, dMm: number) => Math.round((1000 * vMpm) / (Math.PI * dMm));

describe("operation sheet: block with a reamed hole and a tapped hole", () => {
  const sheet = partOperations(block);
  const ops = sheet.operations;
  it("follows saw → square up → spot → drill → ream → countersink → tap → deburr", () => {
    expect(ops.map((o) => o.kind)).toEqual(["saw", "square-up", "spot-drill", "drill", "drill", "ream", "chamfer-hole", "tap", "deburr"]);
    expect(ops.map((o) => o.step)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
  });
  it("saws the blank the cut list picks", () => {
    expect(ops[0]!.description).toBe("Saw a blank 64 mm long from 32 × 25 mm flat bar");
  });
  it("machines a reference face first", () => {
    expect(ops[1]!.notes.join(" ")).toMatch(/reference face first/);
  });
  it("common practice: a 4 mm reamed hole is drilled 3.9 mm first", () => {
    const preDrill = ops.find((o) => o.kind === "drill" && o.features.includes("rod-hole"))!;
    expect(preDrill.toolDiameterMm).toBe(3.9);
    expect(ops.find((o) => o.kind === "ream")!.description).toBe("Ream Ø4 mm H7 through");
  });
  it("tap drill for M4 is 3.3 mm (workshop tap-drill tables: d − P = 4 − 0.7), drilled 3 pitches deeper than the thread", () => {
    const tapDrill = ops.find((o) => o.kind === "drill" && o.features.includes("clamp-screw"))!;
    expect(tapDrill.toolDiameterMm).toBe(3.3);
    expect(tapDrill.description).toBe("Drill Ø3.3 mm 10.1 mm deep (tap drill for M4)"); // 8 + 3 × 0.7
    const tap = ops.find((o) => o.kind === "tap")!;
    expect(tap.rpm).toBeNull(); // by hand
    expect(tap.description).toBe("Tap M4 8 mm deep");
  });
  it("both holes are spotted with one Ø4 spot drill", () => {
    const spot = ops.find((o) => o.kind === "spot-drill")!;
    expect(spot.count).toBe(2);
    expect(spot.toolDiameterMm).toBe(4);
    expect(spot.features).toEqual(["rod-hole", "clamp-screw"]);
  });
  it("speeds by hand: n = 1000·v/(π·D), HSS in mild steel (drill 25, ream 0.6 × 25 = 15, mill 25 m/min)", () => {
    expect(ops.find((o) => o.kind === "square-up")!.rpm).toBe(rpmBy(25, 16)); // 497
    expect(ops.find((o) => o.kind === "drill" && o.toolDiameterMm === 3.9)!.rpm).toBe(rpmBy(25, 3.9)); // 2040
    expect(ops.find((o) => o.kind === "ream")!.rpm).toBe(rpmBy(15, 4)); // 1194
  });
  it("caps every speed at the machine's top speed", () => {
    const capped = partOperations(block, { machineMaxRpm: 1500 }).operations;
    const drill = capped.find((o) => o.kind === "drill" && o.toolDiameterMm === 3.9)!;
    expect(drill.rpm).toBe(1500);
    expect(drill.capped).toBe(true);
    expect(capped.find((o) => o.kind === "square-up")!.capped).toBe(false);
    expect(capped.every((o) => o.rpm === null || o.rpm <= 1500)).toBe(true);
  });
  it("carbide tools run faster", () => {
    const carbide = partOperations(block, { tool: "carbide" }).operations;
    expect(carbide.find((o) => o.kind === "square-up")!.rpm).toBe(rpmBy(120, 16));
  });
});

describe("operation sheet: turned pin with an external thread", () => {
  const ops = partOperations(pin).operations;
  it("follows saw → face and turn → thread → part off → face to length → deburr", () => {
    expect(ops.map((o) => o.kind)).toEqual(["saw", "face-and-turn", "thread-die", "part-off", "face-to-length", "deburr"]);
  });
  it("cuts the M4 with a die (small threads by die, common practice) after chamfering to the minor diameter", () => {
    const thread = ops[2]!;
    expect(thread.description).toBe("Cut M4 external thread 10 mm long on the Ø4 mm step (from its end)");
    // ISO 724 / ISO 965-1: d3 = 4 − 1.226869·0.7 = 3.141 mm.
    expect(thread.notes[0]).toMatch(/Ø3\.14 mm/);
  });
  it("turns at the bar's diameter and parts off at half speed (common practice)", () => {
    // Free-cutting steel, HSS turning 40 m/min at the Ø14 bar: 909 rev/min; parting 20 m/min at Ø12: 531.
    expect(ops[1]!.rpm).toBe(rpmBy(40, 14));
    expect(ops[3]!.rpm).toBe(rpmBy(20, 12));
    expect(ops[3]!.description).toBe("Part off 27 mm from the faced end (leaves 2 mm to face)");
  });
  it("saws two blanks", () => {
    expect(ops[0]!.description).toBe("Saw 2 blanks 42 mm long from Ø14 mm round bar");
  });
});

describe("operation sheet: cam disc with an eccentric bore", () => {
  const ops = partOperations(disc).operations;
  it("turns the disc, then holds it in a four-jaw chuck for the offset bore", () => {
    expect(ops.map((o) => o.kind)).toEqual([
      "saw",
      "face-and-turn",
      "part-off",
      "face-to-length",
      "hold-four-jaw",
      "centre-drill",
      "drill",
      "ream",
      "deburr",
    ]);
  });
  it("common practice: the offset dialled in a four-jaw chuck within 0.01 mm is plenty for a bearing face", () => {
    const hold = ops.find((o) => o.kind === "hold-four-jaw")!;
    expect(hold.notes.join(" ")).toMatch(/Within 0\.01 mm/);
    // A part offset by e runs out 2e on a dial indicator: 2 mm for e = 1 mm.
    expect(hold.description).toMatch(/shows 2 mm total run-out/);
  });
  it("reams the Ø8 H7 bore after the ream calculator's pre-drill", () => {
    expect(ops.find((o) => o.kind === "drill")!.toolDiameterMm).toBe(predrillDiameterMm(8));
    expect(ops.find((o) => o.kind === "ream")!.description).toBe("Ream Ø8 mm H7 through");
  });
  it("the sheet warns about out-of-balance work and carries the speed cautions", () => {
    const sheet = buildOperationSheet([block, pin, disc]);
    expect(sheet.cautions).toContain(SETUP_CAUTION);
    expect(sheet.cautions).toContain(SPEED_CAUTION);
    expect(sheet.cautions.some((c) => c.includes("four-jaw"))).toBe(true);
    expect(sheet.parts.map((p) => p.partId)).toEqual(["stop-body", "carrier", "cam"]);
  });
});

describe("operation sheet: milled features and patterns", () => {
  const body: ResolvedPart = {
    id: "slotted",
    name: "Slotted body",
    material: "aluminium-6082",
    features: [
      { kind: "block", size: { x: 80, y: 40, z: 25 } },
      { kind: "hole", id: "big", at: { x: 20, y: 20, z: 25 }, direction: "-z", diameter: 16, through: true },
      { kind: "slot", id: "slot", at: { x: 40, y: 20, z: 25 }, direction: "-z", along: "x", length: 20, width: 6.5, through: true },
      { kind: "pocket", id: "recess", at: { x: 40, y: 20, z: 0 }, direction: "+z", shape: { kind: "rect", u: 30, v: 12, cornerRadius: 3 }, depth: 4 },
      {
        kind: "pattern-linear",
        id: "holes",
        count: 3,
        spacing: { x: 10, y: 0, z: 0 },
        feature: { kind: "hole", at: { x: 50, y: 35, z: 25 }, direction: "-z", diameter: 5, depth: 10, chamfer: 0.5 },
      },
      { kind: "chamfer", id: "edges", size: 1, faces: ["+z"] },
    ],
  };
  const ops = partOperations(body).operations;
  it("mills recess and slot before the holes, chamfers last", () => {
    expect(ops.map((o) => o.kind)).toEqual([
      "saw",
      "square-up",
      "mill-pocket",
      "mill-slot",
      "spot-drill",
      "spot-drill",
      "pilot-drill",
      "drill",
      "drill",
      "chamfer-hole",
      "chamfer",
      "deburr",
    ]);
  });
  it("picks cutters a machinist would: slot Ø6 in a 6.5 slot, recess cutter within 2 × corner radius", () => {
    const slot = ops.find((o) => o.kind === "mill-slot")!;
    expect(slot.toolDiameterMm).toBe(6);
    expect(slot.notes[0]).toMatch(/widen to 6\.5 mm/);
    expect(ops.find((o) => o.kind === "mill-pocket")!.toolDiameterMm).toBe(6); // ≤ 2·3 and ≤ 12/2
  });
  it("pilot drills the Ø16 hole (common practice above 12 mm) and counts the pattern's copies", () => {
    expect(ops.find((o) => o.kind === "pilot-drill")!.toolDiameterMm).toBe(6); // 0.4 × 16 = 6.4 → 6
    const patternDrill = ops.find((o) => o.kind === "drill" && o.features.includes("holes"))!;
    expect(patternDrill.count).toBe(3);
    expect(patternDrill.description).toBe("Drill Ø5 mm 10 mm deep");
    expect(ops.find((o) => o.kind === "chamfer-hole")!.toolDiameterMm).toBe(6); // 5 + 2 × 0.5
  });
  it("aluminium runs at the table's HSS milling speed (90 m/min)", () => {
    expect(ops.find((o) => o.kind === "mill-slot")!.rpm).toBe(rpmBy(90, 6));
  });
  it("inch units describe sizes in inches", () => {
    const inch = partOperations(body, { units: "in" }).operations;
    expect(inch.find((o) => o.kind === "drill" && o.features.includes("holes"))!.description).toBe('Drill Ø0.197" 0.394" deep');
  });
});

describe("operation sheet: bad input", () => {
  it("refuses unknown materials and threads clearly", () => {
    expect(() => kinds({ ...block, material: "wood" })).toThrow(/Unknown material "wood"/);
    const badThread: ResolvedPart = {
      ...block,
      features: [block.features[0]!, { kind: "thread", form: "internal", at: { x: 10, y: 10, z: 20 }, direction: "-z", designation: "M4.5", depth: 5 }],
    };
    expect(() => kinds(badThread)).toThrow(/M4\.5/);
  });
});
