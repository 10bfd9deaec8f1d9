/**
 * Picks the stock to buy for one resolved part: form (round, hex, flat bar, plate), the next standard size up
 * from ./stock-sizes after a machining allowance, and the length to saw.
 *
 * The finished envelope (form, sizes sorted thickness ≤ width ≤ length for blocks, a block-from-round-bar's
 * section diagonal) comes from the analytic part model (`partStockEnvelope`). Allowances, common practice for
 * small work:
 *  - default: 1 mm on a diameter, width or thickness so every surface cleans up, and 2 mm per faced end
 *    (the common 2–3 mm, lower end for bright bar), i.e. 4 mm on the length;
 *  - a part's own `stock.allowance` is already on every dimension of the envelope and replaces both;
 *  - a turned part is gripped in the chuck and parted off: +10 mm to grip and +3 mm for the parting tool;
 *  - plate is sawn on every side, so its blank width takes the length allowance too;
 *  - saw kerf, 2 mm per cut, is counted in the bar length to buy, not in the blank.
 */
import { partStockEnvelope } from "../parts/analytic";
import type { ResolvedPart } from "../parts/features";
import { FLAT_BAR_MM, formatStockSize, HEX_BAR_MM, nextSizeUp, PLATE_MM, ROUND_BAR_MM, type StockForm, type StockSystem } from "./stock-sizes";

export const DEFAULT_ALLOWANCES = {
  crossSectionMm: 1,
  facePerEndMm: 2,
  holdMm: 10,
  partingToolMm: 3,
  kerfMm: 2,
} as const;

export interface AppliedAllowances {
  /** Added to the finished diameter, width and thickness before picking a size. */
  crossSectionMm: number;
  /** Added to the finished length (both faced ends together). */
  lengthMm: number;
  /** Turned parts: grip in the chuck plus the parting tool's width; 0 otherwise. */
  holdMm: number;
  /** Saw kerf per blank, for the bar length to buy. */
  kerfMm: number;
  /** Turned parts: width of the parting tool (part of `holdMm`). */
  partingToolMm: number;
  from: "default" | "part";
}

export interface StockChoice {
  form: StockForm;
  system: StockSystem;
  /** False when the listed sizes are all too small: `designation` then says what is needed. */
  available: boolean;
  /** Round bar diameter, hexagon across flats, flat bar or plate blank width (mm). */
  widthMm: number;
  /** Flat bar or plate thickness (mm); equals widthMm for round and hex bar. */
  thicknessMm: number;
  /** Length of the blank to saw (mm). */
  cutLengthMm: number;
  /** Shop wording: `Ø25 mm round bar`, `30 × 10 mm flat bar`, `10 mm plate, cut 64 × 34 mm`. */
  designation: string;
  sectionAreaMm2: number;
  /** Volume of the sawn blank (mm³). */
  blankVolumeMm3: number;
  allowances: AppliedAllowances;
  notes: string[];
}

const sizeText = (mm: number, system: StockSystem) => formatStockSize(mm, system).replace(/ mm$/, "");
const unit = (system: StockSystem) => (system === "metric" ? " mm" : "");

function blankLengthText(lengthMm: number, widthMm: number, system: StockSystem): string {
  return system === "metric"
    ? `cut ${sizeText(lengthMm, "metric")} × ${sizeText(widthMm, "metric")} mm`
    : `cut ${(lengthMm / 25.4).toFixed(2)}" × ${(widthMm / 25.4).toFixed(2)}"`;
}

/** The stock to buy for one part in the given size system. */
export function chooseStock(part: ResolvedPart, system: StockSystem): StockChoice {
  const env = partStockEnvelope(part);
  const turned = part.features[0]?.kind === "turned";
  const fromPart = part.stock?.allowance !== undefined;
  const allowances: AppliedAllowances = {
    crossSectionMm: fromPart ? (part.stock?.allowance ?? 0) : DEFAULT_ALLOWANCES.crossSectionMm,
    lengthMm: fromPart ? (part.stock?.allowance ?? 0) : 2 * DEFAULT_ALLOWANCES.facePerEndMm,
    holdMm: turned ? DEFAULT_ALLOWANCES.holdMm + DEFAULT_ALLOWANCES.partingToolMm : 0,
    kerfMm: DEFAULT_ALLOWANCES.kerfMm,
    partingToolMm: turned ? DEFAULT_ALLOWANCES.partingToolMm : 0,
    from: fromPart ? "part" : "default",
  };
  // The analytic envelope already includes a part's own allowance; add the defaults only when it has none.
  const extraCross = fromPart ? 0 : allowances.crossSectionMm;
  const extraLength = fromPart ? 0 : allowances.lengthMm;
  const notes: string[] = [];
  const wanted = part.stock?.form;
  if (turned && (wanted === "flat" || wanted === "plate")) notes.push(`A turned part needs round or hexagon bar, not ${wanted}: ${env.form} bar chosen.`);
  if (!turned && wanted === "hex") notes.push("A block is not made from hexagon bar: flat bar chosen.");
  if (!turned && env.form === "round") notes.push("Block machined from round bar: its section's diagonal must clean up inside the bar.");

  if (env.form === "round" || env.form === "hex") {
    const required = (env.diameterMm ?? 0) + extraCross;
    const size = nextSizeUp(env.form === "round" ? ROUND_BAR_MM[system] : HEX_BAR_MM[system], required);
    const d = size ?? required;
    const cutLengthMm = env.lengthMm + extraLength + allowances.holdMm;
    const area = env.form === "round" ? (Math.PI * d * d) / 4 : (Math.sqrt(3) / 2) * d * d;
    const words = env.form === "round" ? `Ø${sizeText(d, system)}${unit(system)} round bar` : `${sizeText(d, system)}${unit(system)} A/F hexagon bar`;
    return {
      form: env.form,
      system,
      available: size !== undefined,
      widthMm: d,
      thicknessMm: d,
      cutLengthMm,
      designation: size !== undefined ? words : `${words} (larger than the listed sizes: at least ${required.toFixed(1)} mm needed)`,
      sectionAreaMm2: area,
      blankVolumeMm3: area * cutLengthMm,
      allowances,
      notes,
    };
  }

  const thicknessReq = (env.thicknessMm ?? 0) + extraCross;
  const widthReq = (env.widthMm ?? 0) + extraCross;
  const cutLengthMm = env.lengthMm + extraLength;
  if (env.form === "flat") {
    const flat = FLAT_BAR_MM[system];
    const w = nextSizeUp(flat.widths, widthReq);
    const t = w === undefined ? undefined : nextSizeUp(flat.thicknesses.filter((x) => x <= w + 1e-6), thicknessReq);
    if (w !== undefined && t !== undefined) {
      return {
        form: "flat",
        system,
        available: true,
        widthMm: w,
        thicknessMm: t,
        cutLengthMm,
        designation: `${sizeText(w, system)} × ${sizeText(t, system)}${unit(system)} flat bar`,
        sectionAreaMm2: w * t,
        blankVolumeMm3: w * t * cutLengthMm,
        allowances,
        notes,
      };
    }
    notes.push("No listed flat bar is big enough: cut from plate instead.");
  }
  const plate = nextSizeUp(PLATE_MM[system], thicknessReq);
  const t = plate ?? thicknessReq;
  // Plate is sawn on both long sides too: the blank width takes the length allowance, not the bar one.
  const blankWidthMm = (env.widthMm ?? 0) + extraLength;
  const words = `${sizeText(t, system)}${unit(system)} plate, ${blankLengthText(cutLengthMm, blankWidthMm, system)}`;
  return {
    form: "plate",
    system,
    available: plate !== undefined,
    widthMm: blankWidthMm,
    thicknessMm: t,
    cutLengthMm,
    designation: plate !== undefined ? words : `${words} (thicker than the listed plate: at least ${thicknessReq.toFixed(1)} mm needed)`,
    sectionAreaMm2: blankWidthMm * t,
    blankVolumeMm3: blankWidthMm * t * cutLengthMm,
    allowances,
    notes,
  };
}
