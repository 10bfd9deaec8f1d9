/**
 * The cam check's inputs in the address bar, so a cam can be bookmarked or sent to someone:
 * `units=mm|in` (the same key and words as the configurator's) and every input, as the number shown in
 * that unit system (so the link gives back exactly what was on screen). What comes from an address is
 * checked like typing: a value that is not a number, or that the calculator would refuse on its own
 * (a negative diameter, friction above 1), falls back to the starting cam's value, with a note saying so.
 * Problems between two fields (an eccentricity beyond the radius) are left to the calculator, which marks
 * the field as it would for typing.
 */
import type { z } from "zod";
import { eccentricCamInputSchema } from "@/engine/calculators/eccentric-cam/schema";
import { readUnitsParam } from "@/lib/use-search-state";
import { camFields } from "./fields";
import { defaultTexts, readNumber, type CamTexts } from "./parse-inputs";
import { formatQuantity, toBase, type Quantity, type UnitSystem } from "./units";

export interface CamUrlState {
  system: UnitSystem;
  texts: CamTexts;
  /** One sentence per value of the address that could not be used (empty when all fitted). */
  notes: string[];
}

const systemOf = { mm: "mm", in: "inch" } as const;
const unitWord: Record<UnitSystem, "mm" | "in"> = { mm: "mm", inch: "in" };

/** The calculator's limit a value broke, in the shown unit: "it must be more than 0 in". */
function limitOf(issue: z.core.$ZodIssue | undefined, system: UnitSystem, quantity: Quantity): string {
  if (issue?.code === "too_big") {
    const limit = formatQuantity(system, quantity, Number(issue.maximum));
    return issue.inclusive === false ? `it must be less than ${limit}` : `it must be at most ${limit}`;
  }
  if (issue?.code === "too_small") {
    const limit = formatQuantity(system, quantity, Number(issue.minimum));
    return issue.inclusive === false ? `it must be more than ${limit}` : `it must be at least ${limit}`;
  }
  return (issue?.message ?? "the calculator refuses it").replace(/\.$/, "");
}

/** Reads the address; anything missing takes the starting cam's value, anything bad too, with a note. */
export function readCamUrl(params: URLSearchParams, fallbackSystem: UnitSystem = "mm"): CamUrlState {
  const notes: string[] = [];
  const unitsText = params.get("units");
  const units = readUnitsParam(params);
  const system: UnitSystem = units ? systemOf[units] : fallbackSystem;
  if (unitsText !== null && !units) {
    notes.push(`The link's units “${unitsText}” are not mm or in; the check uses ${unitWord[system]}.`);
  }
  const texts = defaultTexts(system);
  for (const field of camFields) {
    const text = params.get(field.key);
    if (text === null) continue;
    const fallback = formatQuantity(system, field.quantity, field.defaultBase);
    const value = readNumber(text);
    if (value === null) {
      notes.push(
        `${field.label}: “${text}” in the link is not a number; the starting value ${fallback} is used.`,
      );
      continue;
    }
    const alone = eccentricCamInputSchema.shape[field.key].safeParse(toBase(system, field.quantity, value));
    if (!alone.success) {
      const reason = limitOf(alone.error.issues[0], system, field.quantity);
      notes.push(
        `${field.label}: ${text} from the link cannot be used (${reason}); the starting value ${fallback} is used.`,
      );
      continue;
    }
    texts[field.key] = String(value);
  }
  return { system, texts, notes };
}

/** The query for inputs that make a whole cam: units, then every input as the number typed. */
export function writeCamUrl(system: UnitSystem, texts: CamTexts): URLSearchParams {
  const params = new URLSearchParams();
  params.set("units", unitWord[system]);
  for (const field of camFields) {
    const value = readNumber(texts[field.key]);
    if (value !== null) params.set(field.key, String(value));
  }
  return params;
}
