/**
 * The fonts embedded in PDF drawings: Barlow from @fontsource/barlow as WOFF (WOFF2 is accepted by pdfkit
 * but renders blank in common viewers, GEOMETRY.md item 10). Its Latin subset has Ø ± ° × µ.
 */
import { createRequire } from "node:module";

const require = createRequire(import.meta.url);

/** Font name used by the drawing model → file path. */
export const DRAWING_FONTS = {
  regular: require.resolve("@fontsource/barlow/files/barlow-latin-400-normal.woff"),
  bold: require.resolve("@fontsource/barlow/files/barlow-latin-600-normal.woff"),
} as const;

export type DrawingFontName = keyof typeof DRAWING_FONTS;
