/**
 * Text measurement for layout, from the embedded font's advance widths (exact for the PDF; the SVG and DXF
 * use the same font name or a close sans).
 *
 * Text height on a drawing is the capital height h (ISO 3098-0, nominal sizes 1.8, 2.5, 3.5, 5, 7 mm);
 * Barlow's capitals are 0.7 of its font size, so the font size for height h is h / 0.7.
 */
import { FONT_ADVANCES } from "./fontMetrics";

export type FontWeight = "regular" | "bold";

/** Capital height / font size of the drawing font (Barlow: cap height 700 of 1000 units). */
export const CAP_HEIGHT_RATIO = 0.7;

/** Font size (em, mm) that gives capitals of height `heightMm`. */
export function fontSizeForCapHeight(heightMm: number): number {
  return heightMm / CAP_HEIGHT_RATIO;
}

/** Width of `text` in mm at capital height `heightMm`. Unknown characters count as a capital "M". */
export function textWidthMm(text: string, heightMm: number, weight: FontWeight = "regular"): number {
  const table = FONT_ADVANCES[weight] ?? FONT_ADVANCES.regular!;
  let units = 0;
  for (const ch of text) units += table[ch] ?? table.M ?? 800;
  return (units / 1000) * fontSizeForCapHeight(heightMm);
}
