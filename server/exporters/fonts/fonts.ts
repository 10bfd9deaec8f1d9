/**
 * The fonts embedded in PDF drawings: Barlow from @fontsource/barlow as WOFF (WOFF2 is accepted by pdfkit
 * but renders blank in common viewers, GEOMETRY.md item 10). Its Latin subset has Ø ± ° × µ.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { woffToSfnt } from "./woff";

const require = createRequire(import.meta.url);

/** Font name used by the drawing model → file path. */
export const DRAWING_FONTS = {
  regular: require.resolve("@fontsource/barlow/files/barlow-latin-400-normal.woff"),
  bold: require.resolve("@fontsource/barlow/files/barlow-latin-600-normal.woff"),
} as const;

export type DrawingFontName = keyof typeof DRAWING_FONTS;

const decoded = new Map<DrawingFontName, Buffer>();

/** The font as plain SFNT bytes, decoded from its WOFF once per process (see woff.ts). */
export function drawingFontData(name: DrawingFontName): Buffer {
  let data = decoded.get(name);
  if (!data) {
    data = woffToSfnt(readFileSync(DRAWING_FONTS[name]));
    decoded.set(name, data);
  }
  return data;
}
