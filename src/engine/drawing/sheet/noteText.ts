/**
 * Note text (template/notes.ts) rendered for one sheet: `{<mm>:len}` markers become lengths in the
 * sheet's units, `{{` and `}}` single braces. Lengths follow the dimension style (format.ts) without a unit
 * symbol, with enough places for small tolerances to keep a significant figure: millimetres to 0.01 or
 * finer (0.002), decimal inches to three places or finer (.0004), no leading zero (ASME Y14.5 §1.6.2).
 */
import { MM_PER_INCH, type Formatter } from "../format";

const MARKER = /^(-?\d+(?:\.\d+)?(?:e[+-]?\d+)?):len(?:\.(\d))?$/;

/** Places needed to show |v| with one significant figure (at least `min`, at most 6). */
function placesFor(v: number, min: number): number {
  const a = Math.abs(v);
  if (a === 0) return min;
  return Math.min(6, Math.max(min, Math.ceil(-Math.log10(a) - 1e-9)));
}

/** A length in a note, in the formatter's units; `minMmDecimals` from a `.N` in the template. */
export function noteLength(fmt: Formatter, mm: number, minMmDecimals?: number): string {
  if (fmt.units === "mm") {
    const d = Math.max(placesFor(mm, 2) + 1, minMmDecimals ?? 0);
    const s = mm.toFixed(Math.min(6, d));
    // Trim zeros beyond what was asked for.
    const keep = minMmDecimals ?? 0;
    const [whole, frac = ""] = s.split(".");
    let f = frac;
    while (f.length > keep && f.endsWith("0")) f = f.slice(0, -1);
    return f ? `${whole}.${f}` : whole!;
  }
  const inch = mm / MM_PER_INCH;
  return inch.toFixed(placesFor(inch, 3)).replace(/^(-?)0\./, "$1.");
}

/** Renders note text for a sheet. Text without markers comes back as it is (a lone brace included). */
export function renderNote(text: string, fmt: Formatter): string {
  let out = "";
  let i = 0;
  while (i < text.length) {
    const c = text[i]!;
    if ((c === "{" || c === "}") && text[i + 1] === c) {
      out += c;
      i += 2;
      continue;
    }
    if (c === "{") {
      const end = text.indexOf("}", i + 1);
      const m = end > 0 ? MARKER.exec(text.slice(i + 1, end)) : null;
      if (m) {
        out += noteLength(fmt, Number(m[1]), m[2] !== undefined ? Number(m[2]) : undefined);
        i = end + 1;
        continue;
      }
    }
    out += c;
    i++;
  }
  return out;
}
