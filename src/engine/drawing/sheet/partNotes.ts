/**
 * The general notes of a part drawing, in the order a machinist reads them: units and general
 * tolerances (ISO 2768-1 for lengths and angles without a tolerance), the standards the callouts refer
 * to, edge condition, finish, heat treatment, then the template's own notes and any failing checks.
 */
import type { ResolvedFeature, ResolvedPart } from "../../parts/features";
import type { Formatter } from "../format";
import { renderNote } from "./noteText";

export type ToleranceClass = "f" | "m" | "c" | "v";

export const TOLERANCE_CLASS_NAMES: Record<ToleranceClass, string> = { f: "fine", m: "medium", c: "coarse", v: "very coarse" };

export interface PartNoteInput {
  part: ResolvedPart;
  fmt: Formatter;
  generalTolerance: ToleranceClass;
  /** The material's own heat-treatment remark and whether it can be hardened in a small shop. */
  material?: { name: string; hardenable: boolean; heatTreatmentNote?: string };
  failingChecks: string[];
  /** Notes the template prints on every sheet (note text, template/notes.ts). Those about units or general
   * tolerances are left out: the drawing writes its own, in the units the user chose. */
  sheetNotes?: string[];
}

/** Ends a note with a full stop unless it already ends in punctuation. */
function sentence(s: string): string {
  const t = s.trim();
  return /[.!?:;)]$/.test(t) ? t : `${t}.`;
}

const EDGE_NOTE = /sharp edge|burr/i;

/** "Tool steel (O1, annealed)" → "tool steel (O1, annealed)": grades and acronyms keep their capitals. */
function lowerFirst(s: string): string {
  return /^[A-Z][a-z]/.test(s) ? s[0]!.toLowerCase() + s.slice(1) : s;
}

function features(part: ResolvedPart): ResolvedFeature[] {
  return part.features.flatMap((f): ResolvedFeature[] => (f.kind === "pattern-linear" || f.kind === "pattern-circular" ? [f, f.feature] : [f]));
}

export function partNotes(input: PartNoteInput): string[] {
  const { part, fmt } = input;
  const all = features(part);
  const notes: string[] = [];
  notes.push(`Dimensions in ${fmt.unitWord}. Do not scale the drawing.`);
  notes.push(
    `General tolerances ISO 2768-${input.generalTolerance} (${TOLERANCE_CLASS_NAMES[input.generalTolerance]}) for dimensions without a tolerance.`,
  );
  const hasFit = all.some((f) => (f.kind === "hole" || f.kind === "eccentric-bore") && f.fit);
  if (hasFit) notes.push("Fits (e.g. H7) to ISO 286-1/-2; check reamed and bored sizes with a gauge.");
  const hasThread = all.some((f) => f.kind === "thread");
  if (hasThread) notes.push("Threads ISO metric (ISO 261/965-1), tolerance class 6H internal, 6g external unless stated.");
  const partOwn = (part.drawing?.notes ?? []).map((n) => renderNote(n, fmt));
  // A part's own edge note (with its sizes) stands in for the template's general one.
  const partEdges = partOwn.some((n) => EDGE_NOTE.test(n));
  const sheetOwn = (input.sheetNotes ?? [])
    .map((n) => renderNote(n, fmt))
    .filter((n) => !/dimensions in|ISO 2768|general tolerance/i.test(n) && !(partEdges && EDGE_NOTE.test(n)));
  const own = [...partOwn, ...sheetOwn]
    .map((n) => n.trim())
    .filter(Boolean);
  // The template's own edge note replaces the generated one.
  if (!own.some((n) => EDGE_NOTE.test(n))) notes.push(`Remove burrs and break sharp edges about ${fmt.length(0.2)} × 45° unless shown otherwise.`);
  if (part.finish) notes.push(`Finish: ${sentence(part.finish)}`);
  if (part.heatTreatment) notes.push(`Heat treatment: ${sentence(part.heatTreatment)}`);
  else if (input.material?.hardenable) {
    notes.push(`Heat treatment: none specified; ${lowerFirst(input.material.name)} can be hardened and tempered where wear calls for it.`);
  }
  for (const n of own) if (!notes.includes(sentence(n))) notes.push(sentence(n));
  if (input.failingChecks.length > 0) notes.push(`Template checks failing: ${input.failingChecks.join("; ")}. Do not make this part until they are resolved.`);
  return notes;
}
