import { createHash } from "node:crypto";

/**
 * Canonical JSON: object keys sorted, no whitespace, `undefined` members dropped, numbers as JavaScript
 * prints them (shortest round-trip form, identical on every platform), -0 written as 0. Two equal values
 * always give the same text, on every process, so its hash can key a cache shared between servers.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") {
    if (typeof value === "number") {
      if (!Number.isFinite(value)) throw new TypeError(`Cannot key a cache on the non-finite number ${value}.`);
      return Object.is(value, -0) ? "0" : JSON.stringify(value);
    }
    if (value === undefined || typeof value === "function" || typeof value === "symbol") return "null";
    return JSON.stringify(value);
  }
  if (Array.isArray(value)) return `[${value.map((v) => (v === undefined ? "null" : canonicalJson(v))).join(",")}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(",")}}`;
}

/** SHA-256 (hex) of the canonical JSON of `value`. */
export function canonicalHash(value: unknown): string {
  return createHash("sha256").update(canonicalJson(value)).digest("hex");
}

/**
 * The hash of what a part's solid and its drawing views depend on: the part without its assembly
 * placement (`placement`, `explode`), so a part that only moves (a thicker jaw slides the cam along its
 * slot) keeps its remembered solid and projections.
 */
export function partShapeHash(part: object): string {
  const { placement: _placement, explode: _explode, ...shape } = part as Record<string, unknown>;
  return canonicalHash(shape);
}
