/**
 * Compiles the expressions inside a (schema-valid) template part once, into a tree that is cheap to resolve
 * for each set of parameters.
 *
 * Which strings are expressions follows features.ts: a string in a numeric field is an expression; a
 * `when` string is a condition; any other string is literal text unless it starts with `=`. Enumerations
 * (`kind`, `direction`, `along`…) never start with `=`, so they stay literal.
 */
import { compileExpression, type CompileOptions, type CompiledExpression, type Scope } from "../expressions";
import { ExpressionEvaluationError } from "../expressions";

/** Every field of the vocabulary whose template form is "number or expression". */
export const NUMERIC_FIELDS: ReadonlySet<string> = new Set([
  "x", "y", "z", "diameter", "length", "depth", "drillDepth", "chamfer", "angleDeg", "eccentricity", "width", "u", "v",
  "cornerRadius", "count", "size", "quantity", "allowance", "boreDiameter", "pitch", "minorDiameter",
]);
/** Numeric fields that are not lengths (not scaled when an inch template is converted to mm). */
export const NON_LENGTH_FIELDS: ReadonlySet<string> = new Set(["angleDeg", "count", "quantity", "step"]);

export type ValueNode =
  | { t: "const"; value: unknown }
  | { t: "num" | "text" | "bool"; expr: CompiledExpression; path: string }
  | { t: "object"; entries: Array<[string, ValueNode]>; when?: ValueNode }
  | { t: "array"; items: ValueNode[] };

/** Returned by {@link resolveValue} for an object whose `when` is false: it is left out of its list. */
export const DROPPED: unique symbol = Symbol("dropped");

/** A field of a part that could not be resolved, with its path (`parts[1].features[3].depth`). */
export class PartFieldError extends Error {
  constructor(
    readonly path: string,
    readonly reason: string,
  ) {
    super(`${path}: ${reason}`);
    this.name = "PartFieldError";
  }
}

/** Compiles one value of a template part; expression refusals carry the path as their context. */
export function compileValue(value: unknown, path: string, key: string | undefined, options: Omit<CompileOptions, "context">): ValueNode {
  if (Array.isArray(value)) return { t: "array", items: value.map((v, i) => compileValue(v, `${path}[${i}]`, undefined, options)) };
  if (value !== null && typeof value === "object") {
    const entries: Array<[string, ValueNode]> = [];
    let when: ValueNode | undefined;
    // `datums` holds enumerations (min / max) under x, y, z: literal, never expressions.
    if (key === "datums") return { t: "const", value };
    for (const [k, v] of Object.entries(value)) {
      const node = compileValue(v, `${path}.${k}`, k, options);
      if (k === "when") when = node;
      else entries.push([k, node]);
    }
    return when ? { t: "object", entries, when } : { t: "object", entries };
  }
  if (typeof value === "string") {
    if (key === "when") return { t: "bool", expr: compileExpression(value, { ...options, context: path }), path };
    if (key !== undefined && NUMERIC_FIELDS.has(key)) return { t: "num", expr: compileExpression(value, { ...options, context: path }), path };
    if (value.startsWith("=")) return { t: "text", expr: compileExpression(value.slice(1), { ...options, context: path }), path };
  }
  return { t: "const", value };
}

/** Evaluates a compiled value tree; throws {@link PartFieldError} naming the field that failed. */
export function resolveValue(node: ValueNode, scope: Scope): unknown {
  switch (node.t) {
    case "const":
      return node.value;
    case "num":
    case "text":
    case "bool": {
      let v: unknown;
      try {
        v = node.expr.evaluate(scope);
      } catch (err) {
        throw new PartFieldError(node.path, err instanceof ExpressionEvaluationError ? err.reason : err instanceof Error ? err.message : String(err));
      }
      const want = node.t === "num" ? "number" : node.t === "text" ? "string" : "boolean";
      if (typeof v !== want) throw new PartFieldError(node.path, `"${node.expr.source}" should give ${want === "string" ? "text" : want === "boolean" ? "true or false" : "a number"}, got ${JSON.stringify(v)}`);
      return v;
    }
    case "array": {
      const out: unknown[] = [];
      for (const item of node.items) {
        const v = resolveValue(item, scope);
        if (v !== DROPPED) out.push(v);
      }
      return out;
    }
    case "object": {
      if (node.when) {
        const keep = resolveValue(node.when, scope);
        if (keep === false) return DROPPED;
      }
      const out: Record<string, unknown> = {};
      for (const [k, v] of node.entries) out[k] = resolveValue(v, scope);
      return out;
    }
  }
}

/**
 * Multiplies every length field of a resolved value by `factor` (inch template → mm). Angles, counts,
 * quantities and step indices are left alone.
 */
export function scaleLengths(value: unknown, factor: number, key?: string): unknown {
  if (factor === 1) return value;
  if (typeof value === "number") return key !== undefined && NON_LENGTH_FIELDS.has(key) ? value : value * factor;
  if (Array.isArray(value)) return value.map((v) => scaleLengths(v, factor, key));
  if (value !== null && typeof value === "object") {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = scaleLengths(v, factor, k);
    return out;
  }
  return value;
}

/** Every name the expressions of a value tree read. */
export function namesIn(node: ValueNode, out = new Set<string>(), skipKeys: readonly string[] = []): Set<string> {
  switch (node.t) {
    case "const":
      break;
    case "num":
    case "text":
    case "bool":
      for (const n of node.expr.names) out.add(n);
      break;
    case "array":
      for (const item of node.items) namesIn(item, out, skipKeys);
      break;
    case "object":
      if (node.when) namesIn(node.when, out, skipKeys);
      for (const [k, v] of node.entries) if (!skipKeys.includes(k)) namesIn(v, out, skipKeys);
      break;
  }
  return out;
}
