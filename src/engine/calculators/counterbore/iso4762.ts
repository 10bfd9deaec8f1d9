/**
 * Socket head cap screws ISO 4762 (M3–M12) and the counterbores that take them.
 *
 * Head sizes: ISO 4762:2004 table, dk max (plain head and knurled head) and k max (from memory).
 * Counterbore diameters: the DIN 974-1 series for ISO 4762 screws without washers, which the standard
 * counterbore tools are made to (from memory): M3 Ø6.5, M4 Ø8, M5 Ø10, M6 Ø11, M8 Ø15, M10 Ø18, M12 Ø20.
 * Depth: common practice k max + 0.5 mm, so the head sits just below the face.
 */
export const SCREW_SIZES = ["M3", "M4", "M5", "M6", "M8", "M10", "M12"] as const;
export type ScrewSize = (typeof SCREW_SIZES)[number];

export interface SocketHeadScrew {
  nominalMm: number;
  /** ISO 4762 dk max, plain head, mm. */
  headDiameterMaxMm: number;
  /** ISO 4762 dk max, knurled head, mm. */
  headDiameterKnurledMaxMm: number;
  /** ISO 4762 k max = d, mm. */
  headHeightMaxMm: number;
  /** DIN 974-1 counterbore diameter for ISO 4762 without washer, mm. */
  counterboreDiameterMm: number;
}

export const ISO_4762: Readonly<Record<ScrewSize, SocketHeadScrew>> = {
  M3: { nominalMm: 3, headDiameterMaxMm: 5.5, headDiameterKnurledMaxMm: 5.68, headHeightMaxMm: 3, counterboreDiameterMm: 6.5 },
  M4: { nominalMm: 4, headDiameterMaxMm: 7, headDiameterKnurledMaxMm: 7.22, headHeightMaxMm: 4, counterboreDiameterMm: 8 },
  M5: { nominalMm: 5, headDiameterMaxMm: 8.5, headDiameterKnurledMaxMm: 8.72, headHeightMaxMm: 5, counterboreDiameterMm: 10 },
  M6: { nominalMm: 6, headDiameterMaxMm: 10, headDiameterKnurledMaxMm: 10.22, headHeightMaxMm: 6, counterboreDiameterMm: 11 },
  M8: { nominalMm: 8, headDiameterMaxMm: 13, headDiameterKnurledMaxMm: 13.27, headHeightMaxMm: 8, counterboreDiameterMm: 15 },
  M10: { nominalMm: 10, headDiameterMaxMm: 16, headDiameterKnurledMaxMm: 16.27, headHeightMaxMm: 10, counterboreDiameterMm: 18 },
  M12: { nominalMm: 12, headDiameterMaxMm: 18, headDiameterKnurledMaxMm: 18.27, headHeightMaxMm: 12, counterboreDiameterMm: 20 },
};

/** How far below the face the head sits with the common-practice depth, mm. */
export const HEAD_BELOW_FACE_MM = 0.5;
