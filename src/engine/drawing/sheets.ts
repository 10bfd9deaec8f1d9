/**
 * Sheet sizes and the drawing frame.
 *
 * ISO 5457: A4 297 × 210 and A3 420 × 297 mm (landscape here); the frame leaves a 20 mm filing margin on
 * the left and 10 mm on the other edges. Letter (8.5 × 11 in) and Tabloid (11 × 17 in) are the ANSI sheets
 * inch users print on; the same margins are used.
 */
import { sheetPoint, type SheetPoint, type SheetSize, type SheetSizeName } from "./model";

export const SHEET_SIZES: Record<SheetSizeName, SheetSize> = {
  A4: { name: "A4", widthMm: 297, heightMm: 210 },
  A3: { name: "A3", widthMm: 420, heightMm: 297 },
  Letter: { name: "Letter", widthMm: 279.4, heightMm: 215.9 },
  Tabloid: { name: "Tabloid", widthMm: 431.8, heightMm: 279.4 },
};

/** The sheet sizes tried in order, small first, for the given units. */
export function sheetSeries(units: "mm" | "in"): SheetSize[] {
  return units === "in" ? [SHEET_SIZES.Letter, SHEET_SIZES.Tabloid] : [SHEET_SIZES.A4, SHEET_SIZES.A3];
}

export const FILING_MARGIN_MM = 20;
export const MARGIN_MM = 10;

/** Inside corner points of the frame. */
export function frameRect(size: SheetSize): { min: SheetPoint; max: SheetPoint } {
  return { min: sheetPoint(FILING_MARGIN_MM, MARGIN_MM), max: sheetPoint(size.widthMm - MARGIN_MM, size.heightMm - MARGIN_MM) };
}
