/**
 * The cut list: per part, what to buy and saw — name, quantity, material, stock form and standard size, cut
 * length with allowances, and the finished and stock weights (density × volume; finished volume from the
 * analytic part model, stock volume from the sawn blank). Pure data; `cutListCsv` serialises it.
 */
import { SETUP_CAUTION, type Source } from "../calculators/types";
import { getMaterial } from "../materials";
import { partVolumeMm3 } from "../parts/analytic";
import type { ResolvedPart } from "../parts/features";
import { chooseStock, type StockChoice } from "./stock";
import { stockSizeSources, type StockForm } from "./stock-sizes";

export const MM_PER_INCH = 25.4;
/** International avoirdupois pound, exactly. */
export const KG_PER_LB = 0.45359237;

export interface CutListRow {
  partId: string;
  name: string;
  quantity: number;
  material: string;
  materialName: string;
  stockForm: StockForm;
  /** Shop wording of the stock to buy. */
  stockSize: string;
  stockAvailable: boolean;
  /** Diameter (round), across flats (hex), or width (flat bar, plate blank), mm. */
  stockWidthMm: number;
  /** Thickness (flat bar, plate), or the diameter again for round and hex, mm. */
  stockThicknessMm: number;
  /** Length of one blank, allowances included, mm. */
  cutLengthMm: number;
  /** Bar to buy for all pieces: quantity × (cut length + saw kerf), mm. */
  barLengthMm: number;
  finishedVolumeMm3: number;
  /** Weight of one finished part. */
  finishedWeightKg: number;
  /** Weight of one sawn blank. */
  stockWeightKg: number;
  totalFinishedWeightKg: number;
  totalStockWeightKg: number;
  stock: StockChoice;
}

export interface CutList {
  units: "mm" | "in";
  rows: CutListRow[];
  totals: { parts: number; finishedWeightKg: number; stockWeightKg: number };
  cautions: string[];
  sources: Source[];
}

export interface CutListOptions {
  /** "mm" buys metric stock and shows mm/kg; "in" buys fractional-inch stock and shows in/lb. */
  units: "mm" | "in";
}

const cutListSources: Source[] = [
  ...stockSizeSources,
  { title: "Machining allowances: 1 mm on section, 2 mm per faced end, 10 mm chuck grip + 3 mm parting, 2 mm saw kerf", kind: "common practice" },
  { title: "Weight = density × volume (densities from the materials catalogue)", kind: "textbook" },
];

/** Builds the cut list (throws CalculatorInputError for a material not in the catalogue). */
export function buildCutList(parts: readonly ResolvedPart[], options: CutListOptions): CutList {
  const system = options.units === "in" ? "imperial" : "metric";
  const rows: CutListRow[] = parts
    .filter((p) => p.when !== false)
    .map((part) => {
      const material = getMaterial(part.material);
      const stock = chooseStock(part, system);
      const quantity = part.quantity ?? 1;
      const finishedVolumeMm3 = partVolumeMm3(part);
      const kgPerMm3 = material.densityKgM3 * 1e-9;
      const finishedWeightKg = finishedVolumeMm3 * kgPerMm3;
      const stockWeightKg = stock.blankVolumeMm3 * kgPerMm3;
      return {
        partId: part.id,
        name: part.name,
        quantity,
        material: material.key,
        materialName: material.name,
        stockForm: stock.form,
        stockSize: stock.designation,
        stockAvailable: stock.available,
        stockWidthMm: stock.widthMm,
        stockThicknessMm: stock.thicknessMm,
        cutLengthMm: stock.cutLengthMm,
        barLengthMm: quantity * (stock.cutLengthMm + stock.allowances.kerfMm),
        finishedVolumeMm3,
        finishedWeightKg,
        stockWeightKg,
        totalFinishedWeightKg: quantity * finishedWeightKg,
        totalStockWeightKg: quantity * stockWeightKg,
        stock,
      };
    });
  const cautions = [
    "Stock sizes are common stockholder sizes; check what your supplier has, and that bright bar is really to size before relying on it.",
  ];
  if (rows.some((r) => !r.stockAvailable)) cautions.push("Some parts are larger than the listed stock sizes: see the stock column.");
  cautions.push(SETUP_CAUTION);
  return {
    units: options.units,
    rows,
    totals: {
      parts: rows.reduce((s, r) => s + r.quantity, 0),
      finishedWeightKg: rows.reduce((s, r) => s + r.totalFinishedWeightKg, 0),
      stockWeightKg: rows.reduce((s, r) => s + r.totalStockWeightKg, 0),
    },
    cautions,
    sources: cutListSources,
  };
}

/** One CSV field per RFC 4180: quoted when it holds a comma, quote or line break; quotes doubled. */
export function csvField(value: string | number): string {
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The cut list as CSV text: a header row with units in the column names, one row per part, CRLF lines. */
export function cutListCsv(list: CutList): string {
  const inch = list.units === "in";
  const L = inch ? "in" : "mm";
  const W = inch ? "lb" : "kg";
  const length = (mm: number) => (inch ? (mm / MM_PER_INCH).toFixed(3) : mm.toFixed(1));
  const weight = (kg: number) => (inch ? (kg / KG_PER_LB).toFixed(3) : kg.toFixed(3));
  const header = [
    "Part",
    "Name",
    "Quantity",
    "Material",
    "Stock form",
    "Stock to buy",
    `Stock width or diameter (${L})`,
    `Stock thickness (${L})`,
    `Cut length (${L})`,
    `Bar length incl. kerf (${L})`,
    `Finished weight each (${W})`,
    `Stock weight each (${W})`,
    `Total stock weight (${W})`,
  ];
  const lines = [header.map(csvField).join(",")];
  for (const r of list.rows) {
    lines.push(
      [
        r.partId,
        r.name,
        r.quantity,
        r.materialName,
        r.stockForm,
        r.stockSize,
        length(r.stockWidthMm),
        length(r.stockThicknessMm),
        length(r.cutLengthMm),
        length(r.barLengthMm),
        weight(r.finishedWeightKg),
        weight(r.stockWeightKg),
        weight(r.totalStockWeightKg),
      ]
        .map(csvField)
        .join(","),
    );
  }
  return `${lines.join("\r\n")}\r\n`;
}
