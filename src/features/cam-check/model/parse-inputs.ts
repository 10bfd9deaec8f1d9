import { eccentricCamInputSchema, type EccentricCamInput } from "@/engine/calculators/eccentric-cam/schema";
import { camFields, type CamFieldKey } from "./fields";
import { toBase, trimNumber, unitOf, type UnitSystem } from "./units";

export type CamTexts = Record<CamFieldKey, string>;
export type CamFieldErrors = Partial<Record<CamFieldKey, string>>;

/** Reads "1.5" or "1,5" (a decimal comma is common on workshop keyboards); null when it is not a number. */
export function readNumber(text: string): number | null {
  const t = text.trim().replace(",", ".");
  if (t === "" || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
}

/** The default cam as text in the given system. */
export function defaultTexts(system: UnitSystem): CamTexts {
  const out = {} as CamTexts;
  for (const f of camFields) {
    const info = unitOf(system, f.quantity);
    out[f.key] = trimNumber(f.defaultBase * info.fromBase, info.decimals);
  }
  return out;
}

/** Converts every number in place to the other system; text that is not a number is left as typed. */
export function convertTexts(texts: CamTexts, from: UnitSystem, to: UnitSystem): CamTexts {
  const out = { ...texts };
  for (const f of camFields) {
    const n = readNumber(texts[f.key]);
    if (n === null) continue;
    const info = unitOf(to, f.quantity);
    out[f.key] = trimNumber(toBase(from, f.quantity, n) * info.fromBase, info.decimals);
  }
  return out;
}

/**
 * The calculator input in mm and N, or the problem with each field. The field rules are the
 * calculator's own schema; problems that need two fields (eccentricity against radius, gap against
 * throw) come back from the server and are shown the same way.
 */
export function parseCamTexts(
  texts: CamTexts,
  system: UnitSystem,
): { input: EccentricCamInput; errors: null } | { input: null; errors: CamFieldErrors } {
  const errors: CamFieldErrors = {};
  const raw: Record<string, number> = {};
  for (const f of camFields) {
    const n = readNumber(texts[f.key]);
    if (n === null) {
      errors[f.key] =
        texts[f.key].trim() === "" ? `Enter the ${f.label.toLowerCase()}.` : "Enter a number, like 1.5.";
      continue;
    }
    raw[f.key] = toBase(system, f.quantity, n);
  }
  if (Object.keys(errors).length > 0) return { input: null, errors };
  const parsed = eccentricCamInputSchema.safeParse(raw);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = issue.path[0] as CamFieldKey | undefined;
      if (key && !errors[key]) errors[key] = issue.message;
    }
    return { input: null, errors };
  }
  return { input: parsed.data, errors: null };
}
