import { describe, expect, it } from "vitest";
import { buildCutList, cutListCsv, KG_PER_LB } from "./cut-list";
import { formatStockSize, nextSizeUp, ROUND_BAR_MM, FLAT_BAR_MM, PLATE_MM } from "./stock-sizes";
import { block, disc, pin } from "./fixtures.test-data";
import type { ResolvedPart } from "../parts/features";

const PI = Math.PI;

describe("stock sizes (common practice stockholder ranges)", () => {
  it("tables ascend and imperial sizes are exact inch fractions (25.4 mm per inch)", () => {
    for (const list of [ROUND_BAR_MM.metric, ROUND_BAR_MM.imperial, FLAT_BAR_MM.metric.widths, PLATE_MM.imperial]) {
      for (let i = 1; i < list.length; i++) expect(list[i]!).toBeGreaterThan(list[i - 1]!);
    }
    for (const mm of ROUND_BAR_MM.imperial) expect(Number.isInteger(Math.round((mm / 25.4) * 16 * 1e6) / 1e6)).toBe(true);
  });
  it("next size up keeps an exact match and otherwise rounds up", () => {
    expect(nextSizeUp(ROUND_BAR_MM.metric, 20)).toBe(20);
    expect(nextSizeUp(ROUND_BAR_MM.metric, 20.5)).toBe(22);
    expect(nextSizeUp(ROUND_BAR_MM.metric, 1000)).toBeUndefined();
  });
  it("writes sizes the way the trade does", () => {
    expect(formatStockSize(31.75, "imperial")).toBe('1 1/4"');
    expect(formatStockSize(14.2875, "imperial")).toBe('9/16"');
    expect(formatStockSize(25.4, "imperial")).toBe('1"');
    expect(formatStockSize(25, "metric")).toBe("25 mm");
  });
});

describe("cut list: hand-built parts, sizes and weights by hand", () => {
  const list = buildCutList([block, pin, disc], { units: "mm" });
  const [b, p, d] = list.rows as [NonNullable<(typeof list.rows)[0]>, NonNullable<(typeof list.rows)[0]>, NonNullable<(typeof list.rows)[0]>];

  it("block 60 × 30 × 20 → 32 × 25 mm flat bar, 64 mm blank", () => {
    // Section 30 × 20 + 1 mm allowance = 31 × 21 → next listed flat bar 32 × 25; length 60 + 2 × 2 = 64 mm.
    expect(b.stockForm).toBe("flat");
    expect(b.stockSize).toBe("32 × 25 mm flat bar");
    expect(b.cutLengthMm).toBe(64);
    expect(b.barLengthMm).toBe(66); // + 2 mm kerf
  });
  it("block weights: density 7850 kg/m³ × volume", () => {
    // Finished: 60·30·20 = 36 000 mm³, less the Ø4 through hole π/4·4²·20 = 251.327, less the M4 tap-drill bore
    // modelled at the basic minor diameter D1 = 4 − 1.082532·0.7 = 3.242228 (ISO 724) to 8 + 3·0.7 = 10.1 deep:
    // π/4·3.242228²·10.1 = 83.387 ⇒ 35 665.29 mm³ ⇒ 0.279973 kg. Blank: 32·25·64 = 51 200 mm³ ⇒ 0.401920 kg.
    const d1 = 4 - 1.0825317547 * 0.7;
    const finished = 36000 - (PI / 4) * 16 * 20 - (PI / 4) * d1 * d1 * 10.1;
    expect(finished).toBeCloseTo(35665.29, 1);
    expect(b.finishedVolumeMm3).toBeCloseTo(finished, 3);
    expect(b.finishedWeightKg).toBeCloseTo(0.279973, 5);
    expect(b.stockWeightKg).toBeCloseTo(0.40192, 6);
  });
  it("turned pin → Ø14 mm round bar, blank 25 + 4 + 10 grip + 3 parting = 42 mm, two off", () => {
    // Largest diameter 12 + 1 = 13 → next round bar 14 mm.
    expect(p.stockSize).toBe("Ø14 mm round bar");
    expect(p.cutLengthMm).toBe(42);
    expect(p.quantity).toBe(2);
    expect(p.barLengthMm).toBe(88); // 2 × (42 + 2 kerf)
    // Finished: π/4·(12²·3 + 8²·10 + 4²·12) = π/4·1264 = 992.743 mm³ (a thread is cosmetic) ⇒ ×7850e-9 = 0.0077930 kg.
    expect(p.finishedWeightKg).toBeCloseTo(0.007793, 6);
    // Blank: π/4·14²·42 = 6465.40 mm³ ⇒ 0.0507534 kg; two off 0.101507 kg.
    expect(p.stockWeightKg).toBeCloseTo(0.0507534, 6);
    expect(p.totalStockWeightKg).toBeCloseTo(0.101507, 5);
  });
  it("cam disc Ø20 × 8 with Ø8 eccentric bore → Ø22 mm bar, 25 mm blank; tool steel 7800 kg/m³", () => {
    expect(d.stockSize).toBe("Ø22 mm round bar");
    expect(d.cutLengthMm).toBe(25);
    // π/4·(20² − 8²)·8 = 2111.15 mm³ ⇒ 0.0164670 kg.
    expect(d.finishedWeightKg).toBeCloseTo(0.016467, 6);
  });
  it("totals add up over quantities", () => {
    expect(list.totals.parts).toBe(4);
    expect(list.totals.stockWeightKg).toBeCloseTo(b.stockWeightKg + 2 * p.stockWeightKg + d.stockWeightKg, 12);
  });
  it("a part's own allowance replaces the defaults; plate when asked for", () => {
    const plate: ResolvedPart = { ...block, id: "base-plate", stock: { form: "plate", allowance: 2 } };
    const row = buildCutList([plate], { units: "mm" }).rows[0]!;
    // Envelope 20 + 2 = 22 thick → 25 mm plate; blank (60 + 2) × (30 + 2).
    expect(row.stockForm).toBe("plate");
    expect(row.stockThicknessMm).toBe(25);
    expect(row.cutLengthMm).toBe(62);
    expect(row.stockWidthMm).toBe(32);
    expect(row.stockSize).toBe("25 mm plate, cut 62 × 32 mm");
  });
  it("inch units buy fractional-inch stock", () => {
    const inch = buildCutList([block, pin], { units: "in" });
    // 21 mm = 0.83" → 1" thick; 31 mm = 1.22" → 1 1/4" wide; 13 mm = 0.51" → 9/16" round.
    expect(inch.rows[0]!.stockSize).toBe('1 1/4" × 1" flat bar');
    expect(inch.rows[1]!.stockSize).toBe('Ø9/16" round bar');
  });
  it("refuses a material that is not in the catalogue", () => {
    expect(() => buildCutList([{ ...block, material: "oak" }], { units: "mm" })).toThrow(/Unknown material "oak"/);
  });
});

/** Independent RFC 4180 reader for the check (quoted fields, doubled quotes, CRLF). */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let field = "";
  let row: string[] = [];
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ",") {
      row.push(field);
      field = "";
    } else if (c === "\r" && text[i + 1] === "\n") {
      row.push(field);
      rows.push(row);
      row = [];
      field = "";
      i++;
    } else field += c;
  }
  return rows;
}

describe("cut list CSV (RFC 4180)", () => {
  it("has a header with units and one row per part; quotes survive a round trip", () => {
    const rows = parseCsv(cutListCsv(buildCutList([block, pin, disc], { units: "mm" })));
    expect(rows).toHaveLength(4);
    expect(rows[0]).toContain("Cut length (mm)");
    expect(rows[0]).toContain("Finished weight each (kg)");
    const cam = rows[3]!;
    expect(cam[3]).toBe("Tool steel (O1, annealed)"); // the comma was quoted
    expect(cam[8]).toBe("25.0");
    expect(rows.every((r) => r.length === rows[0]!.length)).toBe(true);
  });
  it("inch CSV shows in and lb; inch marks are escaped", () => {
    const rows = parseCsv(cutListCsv(buildCutList([block], { units: "in" })));
    expect(rows[0]).toContain("Cut length (in)");
    expect(rows[0]).toContain("Stock weight each (lb)");
    expect(rows[1]![5]).toBe('1 1/4" × 1" flat bar');
    expect(rows[1]![8]).toBe((64 / 25.4).toFixed(3)); // 2.520
    // Blank 1 1/4" × 1" × 64 mm = 31.75·25.4·64 = 51 612.8 mm³ ⇒ 0.405161 kg ⇒ ÷ 0.45359237 = 0.893 lb.
    expect(Number(rows[1]![11])).toBeCloseTo((31.75 * 25.4 * 64 * 7850e-9) / KG_PER_LB, 3);
  });
});
