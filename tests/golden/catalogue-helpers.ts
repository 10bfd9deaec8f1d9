/**
 * Helpers for the catalogue templates' golden tests: load a built-in template file once, evaluate it through
 * the engine's public `evaluateTemplate`, and look up checks, parts and analyses by id.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { evaluateTemplate, loadTemplate, type Evaluation, type Template } from "@/engine";
import type { ResolvedPart } from "@/engine/parts/features";

const cache = new Map<string, Template>();

/** A template from `templates/<relativePath>`, parsed and validated once per test file. */
export function builtIn(relativePath: string): Template {
  let t = cache.get(relativePath);
  if (!t) {
    const file = fileURLToPath(new URL(`../../templates/${relativePath}`, import.meta.url));
    t = loadTemplate(readFileSync(file, "utf8"), relativePath);
    cache.set(relativePath, t);
  }
  return t;
}

export function evaluate(template: Template, parameters: Record<string, unknown> = {}, units?: "mm" | "in"): Evaluation {
  return evaluateTemplate(template, { parameters, ...(units ? { units } : {}) });
}

export function check(e: Evaluation, id: string) {
  const c = e.checks.find((x) => x.id === id);
  if (!c) throw new Error(`No check "${id}" in this evaluation (have: ${e.checks.map((x) => x.id).join(", ")}).`);
  return c;
}

/** Whether the check passed; throws when the check did not run. */
export function passed(e: Evaluation, id: string): boolean {
  return check(e, id).passed;
}

export function part(e: Evaluation, id: string): ResolvedPart {
  const p = e.parts.find((x) => x.id === id);
  if (!p) throw new Error(`No part "${id}" (have: ${e.parts.map((x) => x.id).join(", ")}).`);
  return p;
}

export function summary(e: Evaluation, id: string) {
  const s = e.partSummaries.find((x) => x.id === id);
  if (!s) throw new Error(`No part summary "${id}".`);
  return s;
}

/** An analysis result as plain data (throws when the analysis failed or did not run). */
export function analysis<T = Record<string, unknown>>(e: Evaluation, id: string): T {
  const a = e.analyses[id];
  if (!a) throw new Error(`No analysis "${id}".`);
  if ("error" in a && typeof a.error === "string") throw new Error(`Analysis "${id}" failed: ${a.error}`);
  return a as T;
}

export const failedErrors = (e: Evaluation) => e.checks.filter((c) => c.severity === "error" && !c.passed).map((c) => `${c.id}: ${c.message}`);
export const failedAny = (e: Evaluation) => e.checks.filter((c) => !c.passed).map((c) => `${c.id}: ${c.message}`);

/** 45° chamfer of leg c along the edges of one face of a box a × b: c²/2 over the perimeter, less c³/3 at each of the 4 corners. */
export const faceChamferMm3 = (c: number, a: number, b: number) => ((c * c) / 2) * 2 * (a + b) - (4 * c ** 3) / 3;

/** Extra volume of a 45° entry chamfer of leg c on a hole Ø d: frustum Ø(d + 2c)→Ø d over c, less the cylinder. */
export const holeChamferMm3 = (d: number, c: number) => {
  const D = d + 2 * c;
  return ((Math.PI * c) / 12) * (D * D + D * d + d * d) - (Math.PI / 4) * d * d * c;
};

/** ISO 68-1 basic minor diameter of the nut thread, D1 = d − 1.082532·P (the modelled tap-drill bore). */
export const d1 = (d: number, p: number) => d - 1.0825317547 * p;
