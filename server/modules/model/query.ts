import type { CompiledTemplate } from "@/engine";
import { badRequest } from "@server/lib/errors";

/**
 * Parameters given in a query string (`?units=in&jawWidth=4&rodMaterial=brass`): each value is read by
 * its parameter's kind (numbers for lengths, angles, forces, ratios and counts; true/false for booleans;
 * text for choices and materials). Unknown keys are passed on, so the evaluator names them in its error.
 */
export function parametersFromQuery(compiled: CompiledTemplate, query: Record<string, unknown>): { parameters: Record<string, number | string | boolean>; units?: "mm" | "in" } {
  const kinds = new Map(compiled.parameters.map((p) => [p.key, p.kind]));
  const parameters: Record<string, number | string | boolean> = {};
  let units: "mm" | "in" | undefined;
  const details: { path: string; message: string }[] = [];
  for (const [key, raw] of Object.entries(query)) {
    if (Array.isArray(raw)) {
      details.push({ path: `query.${key}`, message: `Give ${key} once.` });
      continue;
    }
    const value = String(raw);
    if (key === "units") {
      if (value !== "mm" && value !== "in") details.push({ path: "query.units", message: 'units must be "mm" or "in".' });
      else units = value;
      continue;
    }
    const kind = kinds.get(key);
    if (kind === "boolean") {
      if (["true", "1", "yes"].includes(value)) parameters[key] = true;
      else if (["false", "0", "no"].includes(value)) parameters[key] = false;
      else details.push({ path: `query.${key}`, message: `${key} must be true or false.` });
    } else if (kind === "choice" || kind === "material" || kind === undefined) {
      parameters[key] = value;
    } else {
      const n = value.trim() === "" ? Number.NaN : Number(value);
      if (!Number.isFinite(n)) details.push({ path: `query.${key}`, message: `${key} must be a number.` });
      else parameters[key] = n;
    }
  }
  if (details.length > 0) throw badRequest(details.length === 1 ? details[0]!.message : "Some parameters are not acceptable.", details);
  return { parameters, ...(units ? { units } : {}) };
}
