/**
 * `t-slot`: an ISO 299 T-slot of a given width — the head space and depth, the bolt the standard pairs with
 * it, the DIN 508 T-nut that fits it, and whether a given bolt suits the slot. Data: ./iso299.
 *
 * A bolt suits the slot when it passes the throat and is the slot's own size or the next size down (a
 * T-nut with a reduced thread, sold for most slots; common practice). A larger bolt does not pass the
 * throat; a much smaller one leaves a weak bolt holding a big slot's load.
 */
import { z } from "zod";
import { CalculatorInputError, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { DIN_508_NUTS, ISO_299_T_SLOTS, T_SLOT_WIDTHS_MM, TONGUE_CLEARANCE_MM, type TSlot, type TSlotNut } from "./iso299";

export * from "./iso299";

export const tSlotInputSchema = z.strictObject({
  /** Nominal slot width a (the throat), mm: one of the ISO 299 sizes. */
  slotWidth: z.number({ error: "Slot width must be a number (mm)." }).positive("Slot width must be greater than 0 mm."),
  /** The bolt to be used, e.g. "M10" (optional). */
  bolt: z.string({ error: 'Bolt must be text such as "M10".' }).trim().min(2).max(8).optional(),
});
export type TSlotInput = z.infer<typeof tSlotInputSchema>;

export interface TSlotResult extends CalculatorResultMeta {
  standard: "ISO 299";
  slotWidthMm: number;
  headSpaceWidthMinMm: number;
  headSpaceWidthMaxMm: number;
  headSpaceHeightMinMm: number;
  headSpaceHeightMaxMm: number;
  depthMinMm: number;
  depthMaxMm: number;
  /** Thinnest lip the standard allows: depth min − head-space height max. */
  lipThicknessMinMm: number;
  /** The slot's own bolt (ISO 299). */
  matchedBolt: string;
  matchedBoltNominalMm: number;
  /** Smallest bolt accepted: the next smaller slot's bolt. */
  smallestBoltNominalMm: number;
  /** The bolt asked about (normalised), or null. */
  bolt: string | null;
  boltNominalMm: number | null;
  /** True / false when a bolt was given. */
  boltSuits: boolean | null;
  boltVerdict: "matched" | "reduced" | "too-large" | "too-small" | null;
  /** Radial room between the bolt and the throat walls. */
  throatClearanceMm: number | null;
  /** DIN 508 nut for the slot (null where not tabulated) and the tongue width to make it. */
  tNut: (TSlotNut & { tongueWidthMm: number; tongueHeightMm: number; standsBelowTableMm: number }) | null;
}

export const tSlotSources: Source[] = [
  { title: "ISO 299:1987, machine tool tables — T-slots and corresponding bolts (slot widths, head space, depth, bolt size)", kind: "standard", note: "from memory; the same figures as DIN 650" },
  { title: "DIN 508, T-slot nuts: head width, height, head height and length", kind: "standard", note: "from memory" },
  { title: "Tongue made 0.3 mm under the slot width; a reduced-thread T-nut (one bolt size down) suits a slot", kind: "common practice" },
];

export function tSlotFor(widthMm: number): TSlot {
  const slot = ISO_299_T_SLOTS.find((s) => Math.abs(s.widthMm - widthMm) < 1e-9);
  if (!slot) {
    throw new CalculatorInputError(`${widthMm} mm is not an ISO 299 T-slot width; the sizes are ${T_SLOT_WIDTHS_MM.join(", ")} mm.`, "slotWidth");
  }
  return slot;
}

function boltNominal(text: string): number {
  const m = /^\s*M\s*(\d+(?:\.\d+)?)\s*(?:[x×]\s*\d+(?:\.\d+)?)?\s*$/i.exec(text);
  if (!m) throw new CalculatorInputError(`"${text}" is not a metric bolt size; write e.g. "M10".`, "bolt");
  return Number(m[1]);
}

function compute(input: TSlotInput): TSlotResult {
  const slot = tSlotFor(input.slotWidth);
  const index = ISO_299_T_SLOTS.indexOf(slot);
  const smaller = ISO_299_T_SLOTS[index - 1];
  const smallestBoltNominalMm = smaller ? smaller.boltNominalMm : slot.boltNominalMm;
  const lipThicknessMinMm = slot.depthMm[0] - slot.headSpaceHeightMm[1];
  let bolt: string | null = null;
  let boltNominalMm: number | null = null;
  let boltVerdict: TSlotResult["boltVerdict"] = null;
  if (input.bolt !== undefined) {
    boltNominalMm = boltNominal(input.bolt);
    bolt = `M${boltNominalMm}`;
    boltVerdict =
      boltNominalMm === slot.boltNominalMm ? "matched" : boltNominalMm > slot.boltNominalMm ? "too-large" : boltNominalMm >= smallestBoltNominalMm ? "reduced" : "too-small";
  }
  const nut = DIN_508_NUTS[slot.widthMm];
  const cautions = [
    "Check the slot on your own table: older and imported tables are not always to ISO 299. Measure the throat and the head space before making a T-nut.",
    "Put the T-nut fully under the lips: a nut half out of the end of the slot, or an over-tightened bolt, can break a cast-iron lip.",
  ];
  if (boltVerdict === "too-large") cautions.push(`An ${bolt} bolt does not pass the ${slot.widthMm} mm throat; the slot takes ${slot.bolt}.`);
  if (boltVerdict === "too-small") cautions.push(`An ${bolt} bolt is small for a ${slot.widthMm} mm slot: it will stretch long before the slot's clamping load is reached.`);
  if (!nut) cautions.push(`No DIN 508 nut data is held for the ${slot.widthMm} mm slot; take the nut from the maker's catalogue.`);
  return {
    standard: "ISO 299",
    slotWidthMm: slot.widthMm,
    headSpaceWidthMinMm: slot.headSpaceWidthMm[0],
    headSpaceWidthMaxMm: slot.headSpaceWidthMm[1],
    headSpaceHeightMinMm: slot.headSpaceHeightMm[0],
    headSpaceHeightMaxMm: slot.headSpaceHeightMm[1],
    depthMinMm: slot.depthMm[0],
    depthMaxMm: slot.depthMm[1],
    lipThicknessMinMm,
    matchedBolt: slot.bolt,
    matchedBoltNominalMm: slot.boltNominalMm,
    smallestBoltNominalMm,
    bolt,
    boltNominalMm,
    boltSuits: boltVerdict === null ? null : boltVerdict === "matched" || boltVerdict === "reduced",
    boltVerdict,
    throatClearanceMm: boltNominalMm === null ? null : (slot.widthMm - boltNominalMm) / 2,
    tNut: nut
      ? {
          ...nut,
          tongueWidthMm: slot.widthMm - TONGUE_CLEARANCE_MM,
          tongueHeightMm: nut.heightMm - nut.headHeightMm,
          standsBelowTableMm: lipThicknessMinMm - (nut.heightMm - nut.headHeightMm),
        }
      : null,
    cautions,
    sources: tSlotSources,
  };
}

export const tSlotCalculator: Calculator<typeof tSlotInputSchema, TSlotResult> = {
  kind: "t-slot",
  label: "T-slot (ISO 299)",
  summary: "An ISO 299 T-slot by its width: head space, depth, the bolt it takes, the DIN 508 T-nut that fits, and whether your bolt suits it.",
  inputSchema: tSlotInputSchema,
  compute,
  sources: tSlotSources,
};
