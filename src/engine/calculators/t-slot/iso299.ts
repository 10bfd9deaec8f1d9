/**
 * T-slots of machine-tool tables and the bolts and nuts that go in them.
 *
 * Slot sizes: ISO 299:1987, "Machine tool tables — T-slots and corresponding bolts" (the same figures as
 * DIN 650), from memory. For each nominal slot width a (the throat): the width b and height c of the space
 * under the lips that takes the bolt head or nut, the total depth h, and the bolt size the standard pairs
 * with the slot. The throat is made H8 where it locates tenons or keys and H12 where it only clamps.
 *
 *     a  |  b      |  c      |  h       | bolt
 *     5  | 10–11   | 3.5–4.5 |  8–10    | M4
 *     6  | 11–12.5 | 5–6     | 11–13    | M5
 *     8  | 14.5–16 | 7–8     | 15–18    | M6
 *    10  | 16–18   | 7–8     | 17–21    | M8
 *    12  | 19–21   | 8–9     | 20–25    | M10
 *    14  | 23–25   | 9–11    | 23–28    | M12
 *    18  | 30–32   | 12–14   | 30–36    | M16
 *    22  | 37–40   | 16–18   | 38–45    | M20
 *    28  | 46–50   | 20–22   | 48–56    | M24
 *    36  | 56–60   | 25–28   | 61–71    | M30
 *    42  | 68–72   | 32–35   | 74–85    | M36
 *    48  | 80–85   | 36–40   | 84–95    | M42
 *    54  | 90–95   | 40–44   | 94–106   | M48
 *
 * T-slot nuts: DIN 508 (from memory) for slots 8–28 — head width e, total height h, head height k and
 * length l. The nut's tongue (the part in the throat) is made a − 0.3 mm here so it slides in an H12
 * throat (our design choice). The lip thickness (slot depth less the head space) is at least h_min − c_max.
 */

export interface TSlot {
  widthMm: number;
  headSpaceWidthMm: readonly [number, number];
  headSpaceHeightMm: readonly [number, number];
  depthMm: readonly [number, number];
  /** ISO 299's bolt for the slot, e.g. "M10". */
  bolt: string;
  boltNominalMm: number;
}

export interface TSlotNut {
  /** DIN 508 head width e. */
  headWidthMm: number;
  /** DIN 508 total height h. */
  heightMm: number;
  /** DIN 508 head height k. */
  headHeightMm: number;
  /** DIN 508 length l. */
  lengthMm: number;
}

const row = (a: number, b: [number, number], c: [number, number], h: [number, number], boltMm: number): TSlot => ({
  widthMm: a,
  headSpaceWidthMm: b,
  headSpaceHeightMm: c,
  depthMm: h,
  bolt: `M${boltMm}`,
  boltNominalMm: boltMm,
});

/** ISO 299 T-slots, smallest first. */
export const ISO_299_T_SLOTS: readonly TSlot[] = [
  row(5, [10, 11], [3.5, 4.5], [8, 10], 4),
  row(6, [11, 12.5], [5, 6], [11, 13], 5),
  row(8, [14.5, 16], [7, 8], [15, 18], 6),
  row(10, [16, 18], [7, 8], [17, 21], 8),
  row(12, [19, 21], [8, 9], [20, 25], 10),
  row(14, [23, 25], [9, 11], [23, 28], 12),
  row(18, [30, 32], [12, 14], [30, 36], 16),
  row(22, [37, 40], [16, 18], [38, 45], 20),
  row(28, [46, 50], [20, 22], [48, 56], 24),
  row(36, [56, 60], [25, 28], [61, 71], 30),
  row(42, [68, 72], [32, 35], [74, 85], 36),
  row(48, [80, 85], [36, 40], [84, 95], 42),
  row(54, [90, 95], [40, 44], [94, 106], 48),
];

export const T_SLOT_WIDTHS_MM: readonly number[] = ISO_299_T_SLOTS.map((s) => s.widthMm);

/** DIN 508 T-slot nuts by slot width (from memory). */
export const DIN_508_NUTS: Readonly<Record<number, TSlotNut>> = {
  8: { headWidthMm: 13, heightMm: 10, headHeightMm: 6, lengthMm: 15 },
  10: { headWidthMm: 15, heightMm: 12, headHeightMm: 6, lengthMm: 18 },
  12: { headWidthMm: 18, heightMm: 14, headHeightMm: 7, lengthMm: 20 },
  14: { headWidthMm: 22, heightMm: 16, headHeightMm: 8, lengthMm: 25 },
  18: { headWidthMm: 28, heightMm: 20, headHeightMm: 10, lengthMm: 32 },
  22: { headWidthMm: 35, heightMm: 28, headHeightMm: 14, lengthMm: 35 },
  28: { headWidthMm: 44, heightMm: 36, headHeightMm: 18, lengthMm: 44 },
};

/** Clearance between the nut's tongue and the throat, mm (our design choice). */
export const TONGUE_CLEARANCE_MM = 0.3;
