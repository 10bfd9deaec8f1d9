/**
 * Whitelist compiler: mathjs syntax tree → plain closures.
 *
 * Allowed: number, boolean and string literals; names known to the template; `name.field` on analysis
 * results (own data fields only); + − × ÷ ^ % (floored modulo, as mathjs), unary − and +; == != < > <= >=
 * (chains like `0 < x <= 5` too); and / or / not; `cond ? a : b`; parentheses; the functions of
 * `functions.ts` (degrees for trigonometry) and the constant `pi`.
 * Strings may only be compared with == / != or chosen by a conditional (`material == "brass" ? 1 : 2`).
 *
 * Refused, each with its position: assignment of values or functions, several statements, matrices and
 * ranges, objects, bracket indexing, implicit multiplication (`2 x`), percentages, factorial, transpose,
 * bitwise and unit operators, `??`, any function not on the list (import, createUnit, evaluate, parse,
 * simplify, derivative, resolve, config…), calling anything but a plain function name, unknown names,
 * `constructor`/`__proto__`-style fields, and non-finite literals.
 */
import type { MathNode } from "mathjs";
import { ExpressionError, ExpressionEvaluationError, UnavailableValueError } from "./errors";
import { CONSTANTS, FUNCTIONS, isFunctionName, type UnitFactors } from "./functions";
import { maskStrings, parseExpression } from "./parse";

/** A value an expression can produce or read. Records are analysis results (plain JSON data). */
export type ExprValue = number | boolean | string | { readonly [key: string]: unknown } | readonly unknown[];

/** Names → values. Read with own-property lookup only: nothing from a prototype is ever visible. */
export type Scope = Readonly<Record<string, unknown>>;

/** Placed in a scope for a name whose computation failed; reading it raises {@link UnavailableValueError}. */
export class Unavailable {
  constructor(readonly reason: string) {}
}

export interface CompileOptions {
  /** Where the expression sits, for messages: `"derived.slotLength"`, `"checks[2].condition"`. */
  context?: string;
  /** Whether a bare name is defined at this point of the template. Omit to allow any name (resolved at run time). */
  isKnownName?: (name: string) => boolean;
  /** Names whose value is a record that may be read with `name.field` (analysis ids). */
  isNamespace?: (name: string) => boolean;
  factors?: UnitFactors;
}

export type StaticKind = "number" | "boolean" | "string" | "unknown";

export interface CompiledExpression {
  readonly source: string;
  /** Root names it reads (parameters, derived values, analyses), for dependency listing. */
  readonly names: readonly string[];
  /** The kind of value when it can be told without running it. */
  readonly kind: StaticKind;
  evaluate(scope: Scope): ExprValue;
}

type Fn = (scope: Scope) => unknown;
interface Compiled {
  fn: Fn;
  kind: StaticKind;
}

/** Field names that are never readable, even if some record had them as own data. */
const FORBIDDEN_FIELDS = new Set(["constructor", "prototype", "toString", "valueOf", "hasOwnProperty", "isPrototypeOf", "propertyIsEnumerable", "toLocaleString", "then"]);
const NAME_RE = /^[A-Za-z][A-Za-z0-9]*$/;

const BINARY: Record<string, (a: number, b: number) => number> = {
  add: (a, b) => a + b,
  subtract: (a, b) => a - b,
  multiply: (a, b) => a * b,
  divide: (a, b) => a / b,
  pow: (a, b) => Math.pow(a, b),
  /** Floored modulo (the sign follows the divisor), as mathjs defines `%` and `mod`. */
  mod: (a, b) => a - b * Math.floor(a / b),
};
const COMPARE: Record<string, (a: number, b: number) => boolean> = {
  smaller: (a, b) => a < b,
  larger: (a, b) => a > b,
  smallerEq: (a, b) => a <= b,
  largerEq: (a, b) => a >= b,
};
const REFUSED_OPERATORS: Record<string, string> = {
  factorial: "factorial (!) is not allowed",
  ctranspose: "transpose (') is not allowed",
  transpose: "transpose is not allowed",
  bitAnd: "bitwise & is not allowed; use 'and'",
  bitOr: "bitwise | is not allowed; use 'or'",
  bitXor: "bitwise operators are not allowed",
  bitNot: "bitwise ~ is not allowed; use 'not'",
  leftShift: "shift operators are not allowed",
  rightArithShift: "shift operators are not allowed",
  rightLogShift: "shift operators are not allowed",
  to: "unit conversion ('to') is not allowed; lengths are plain numbers in the template's units",
  xor: "'xor' is not allowed; write (a or b) and not (a and b)",
  nullish: "'??' is not allowed",
  dotMultiply: "element-wise operators are not allowed",
  dotDivide: "element-wise operators are not allowed",
  dotPow: "element-wise operators are not allowed",
};

/** Compiles an expression, refusing anything off the whitelist. Pure; cache the result per template. */
export function compileExpression(source: string, options: CompileOptions = {}): CompiledExpression {
  const ast = parseExpression(source, options.context);
  const masked = maskStrings(source);
  const names = new Set<string>();
  const factors = options.factors ?? { mmPerTemplateUnit: 1 };

  const refuse = (position: number, reason: string): never => {
    throw new ExpressionError(source, position, reason, options.context);
  };
  const fail = (reason: string): never => {
    throw new ExpressionEvaluationError(source, reason, options.context);
  };
  const num = (v: unknown, what: string): number => {
    if (typeof v !== "number") fail(`${what} needs a number, got ${describe(v)}`);
    return v as number;
  };
  const finite = (v: number, what: string): number => {
    if (!Number.isFinite(v)) fail(`${what} gives ${v} (not a finite number)`);
    return v;
  };
  const bool = (v: unknown, what: string): boolean => {
    if (typeof v !== "boolean") fail(`${what} needs true or false, got ${describe(v)}`);
    return v as boolean;
  };

  const compile = (node: MathNode, depth: number): Compiled => {
    switch (node.type) {
      case "ConstantNode": {
        const value = (node as unknown as { value: unknown }).value;
        if (typeof value === "number") {
          if (!Number.isFinite(value)) refuse(locateWord(masked, String(value)) ?? 1, `the number ${value} is not finite`);
          return { fn: () => value, kind: "number" };
        }
        if (typeof value === "boolean") return { fn: () => value, kind: "boolean" };
        if (typeof value === "string") return { fn: () => value, kind: "string" };
        return refuse(locateWord(masked, String(value)) ?? 1, `"${String(value)}" is not allowed`);
      }
      case "SymbolNode": {
        const name = (node as unknown as { name: string }).name;
        return compileName(name);
      }
      case "ParenthesisNode":
        return compile((node as unknown as { content: MathNode }).content, depth + 1);
      case "OperatorNode":
        return compileOperator(node as unknown as OperatorLike, depth);
      case "RelationalNode":
        return compileChain(node as unknown as { conditionals: string[]; params: MathNode[] }, depth);
      case "ConditionalNode": {
        const n = node as unknown as { condition: MathNode; trueExpr: MathNode; falseExpr: MathNode };
        const c = compile(n.condition, depth + 1);
        const a = compile(n.trueExpr, depth + 1);
        const b = compile(n.falseExpr, depth + 1);
        if (c.kind !== "boolean" && c.kind !== "unknown") refuse(locateChar(masked, "?") ?? 1, "the condition before '?' must be true or false");
        const kind: StaticKind = a.kind === b.kind ? a.kind : "unknown";
        return { fn: (s) => (bool(c.fn(s), "the condition before '?'") ? a.fn(s) : b.fn(s)), kind };
      }
      case "FunctionNode":
        return compileCall(node as unknown as { fn: MathNode; args: MathNode[] }, depth);
      case "AccessorNode":
        return compileAccessor(node, depth);
      case "AssignmentNode":
        return refuse(locateAssignment(masked) ?? 1, "assigning values is not allowed; declare a derived value instead");
      case "FunctionAssignmentNode":
        return refuse(locateAssignment(masked) ?? 1, "defining functions is not allowed");
      case "BlockNode":
        return refuse(locateChar(masked, ";") ?? 1, "only one expression is allowed");
      case "ArrayNode":
        return refuse(locateChar(masked, "[") ?? 1, "matrices and lists are not allowed");
      case "ObjectNode":
        return refuse(locateChar(masked, "{") ?? 1, "objects are not allowed");
      case "RangeNode":
        return refuse(locateChar(masked, ":") ?? 1, "ranges (a:b) are not allowed");
      case "IndexNode":
        return refuse(locateChar(masked, "[") ?? 1, "indexing is not allowed");
      default:
        return refuse(1, `${node.type} is not allowed`);
    }
  };

  const compileName = (name: string): Compiled => {
    const pos = () => locateWord(masked, name) ?? 1;
    if (Object.prototype.hasOwnProperty.call(CONSTANTS, name)) {
      const value = CONSTANTS[name]!;
      return { fn: () => value, kind: "number" };
    }
    if (isFunctionName(name)) refuse(pos(), `${name} is a function; call it with brackets, e.g. ${name}(…)`);
    if (!NAME_RE.test(name)) refuse(pos(), `"${name}" is not a valid name`);
    if (options.isKnownName && !options.isKnownName(name)) refuse(pos(), `unknown name "${name}"`);
    names.add(name);
    return {
      fn: (scope) => {
        if (!Object.prototype.hasOwnProperty.call(scope, name)) fail(`unknown name "${name}"`);
        const v = scope[name];
        if (v instanceof Unavailable) throw new UnavailableValueError(source, name, v.reason, options.context);
        return v;
      },
      kind: "unknown",
    };
  };

  interface OperatorLike {
    fn: string;
    op: string;
    args: MathNode[];
    implicit: boolean;
    isPercentage?: boolean;
  }

  const compileOperator = (n: OperatorLike, depth: number): Compiled => {
    const pos = () => locateOperator(masked, n.op) ?? 1;
    if (n.implicit) refuse(implicitPosition(masked) ?? 1, "implicit multiplication is not allowed; write the '*' (e.g. 2 * x)");
    if (n.isPercentage) refuse(locateChar(masked, "%") ?? 1, "percentages are not allowed; divide by 100");
    const refused = REFUSED_OPERATORS[n.fn];
    if (refused) refuse(pos(), refused);
    const args = n.args.map((a) => compile(a, depth + 1));
    const noStrings = () => {
      if (args.some((a) => a.kind === "string")) refuse(locateChar(masked, '"') ?? locateChar(masked, "'") ?? pos(), `text can only be compared with == or !=, not used with '${n.op}'`);
    };
    const [a, b] = args as [Compiled, Compiled | undefined];
    const op = n.op;
    // The operator as messages name it, made once here: the closures below run on every evaluation.
    const what = `'${op}'`;
    if (args.length === 1) {
      noStrings();
      if (n.fn === "unaryMinus") return { fn: (s) => -num(a.fn(s), "'-'"), kind: "number" };
      if (n.fn === "unaryPlus") return { fn: (s) => num(a.fn(s), "'+'"), kind: "number" };
      if (n.fn === "not") return { fn: (s) => !bool(a.fn(s), "'not'"), kind: "boolean" };
      return refuse(pos(), `the operator '${op}' is not allowed`);
    }
    if (args.length !== 2 || !b) return refuse(pos(), `the operator '${op}' is not allowed`);
    const arith = BINARY[n.fn];
    if (arith) {
      noStrings();
      return { fn: (s) => finite(arith(num(a.fn(s), what), num(b.fn(s), what)), what), kind: "number" };
    }
    const cmp = COMPARE[n.fn];
    if (cmp) {
      noStrings();
      return { fn: (s) => cmp(num(a.fn(s), what), num(b.fn(s), what)), kind: "boolean" };
    }
    if (n.fn === "equal" || n.fn === "unequal") {
      const want = n.fn === "equal";
      return { fn: (s) => equalValues(a.fn(s), b.fn(s), op, fail) === want, kind: "boolean" };
    }
    if (n.fn === "and") {
      noStrings();
      return { fn: (s) => bool(a.fn(s), "'and'") && bool(b.fn(s), "'and'"), kind: "boolean" };
    }
    if (n.fn === "or") {
      noStrings();
      return { fn: (s) => bool(a.fn(s), "'or'") || bool(b.fn(s), "'or'"), kind: "boolean" };
    }
    return refuse(pos(), `the operator '${op}' is not allowed`);
  };

  const compileChain = (n: { conditionals: string[]; params: MathNode[] }, depth: number): Compiled => {
    const parts = n.params.map((p) => compile(p, depth + 1));
    const tests = n.conditionals.map((c) => {
      const t = COMPARE[c];
      if (!t) refuse(1, "only <, >, <= and >= can be chained");
      return t!;
    });
    if (parts.some((p) => p.kind === "string")) refuse(locateChar(masked, '"') ?? 1, "text cannot be ordered with < or >");
    return {
      fn: (s) => {
        let left = num(parts[0]!.fn(s), "a comparison");
        for (let i = 0; i < tests.length; i++) {
          const right = num(parts[i + 1]!.fn(s), "a comparison");
          if (!tests[i]!(left, right)) return false;
          left = right;
        }
        return true;
      },
      kind: "boolean",
    };
  };

  const compileCall = (n: { fn: MathNode; args: MathNode[] }, depth: number): Compiled => {
    if (n.fn.type !== "SymbolNode") refuse(locateChar(masked, "(") ?? 1, "only named functions can be called");
    const name = (n.fn as unknown as { name: string }).name;
    const pos = locateCall(masked, name) ?? 1;
    if (!isFunctionName(name)) refuse(pos, `the function "${name}" is not allowed (allowed: ${Object.keys(FUNCTIONS).join(", ")})`);
    const spec = FUNCTIONS[name]!;
    if (n.args.length < spec.minArgs || n.args.length > spec.maxArgs) {
      const range = spec.maxArgs === Infinity ? `at least ${spec.minArgs}` : spec.minArgs === spec.maxArgs ? `${spec.minArgs}` : `${spec.minArgs} or ${spec.maxArgs}`;
      refuse(pos, `${name} takes ${range} argument${spec.maxArgs === 1 ? "" : "s"}, got ${n.args.length}`);
    }
    const args = n.args.map((a) => compile(a, depth + 1));
    if (args.some((a) => a.kind === "string")) refuse(pos, `${name} takes numbers, not text`);
    const what = `${name}()`;
    return {
      fn: (s) => {
        const values: number[] = new Array<number>(args.length);
        for (let i = 0; i < args.length; i++) values[i] = num(args[i]!.fn(s), what);
        const bad = spec.domain?.(values);
        if (bad) fail(bad);
        return finite(spec.apply(values, factors), what);
      },
      kind: "number",
    };
  };

  const compileAccessor = (node: MathNode, _depth: number): Compiled => {
    // Only `name.field(.field…)` with dot notation; the root must be an analysis (namespace).
    const fields: string[] = [];
    let cur: MathNode = node;
    while (cur.type === "AccessorNode") {
      const acc = cur as unknown as { object: MathNode; index: { dotNotation: boolean; dimensions: MathNode[] } };
      const dim = acc.index.dimensions[0];
      const key = dim && dim.type === "ConstantNode" ? (dim as unknown as { value: unknown }).value : undefined;
      if (!acc.index.dotNotation || acc.index.dimensions.length !== 1 || typeof key !== "string") {
        refuse(locateChar(masked, "[") ?? 1, "bracket indexing is not allowed; read fields with a dot, e.g. cam.throwMm");
      }
      const field = key as string;
      if (FORBIDDEN_FIELDS.has(field) || field.startsWith("__") || !NAME_RE.test(field)) {
        refuse(locateField(masked, field) ?? 1, `the field "${field}" cannot be read`);
      }
      fields.unshift(field);
      cur = acc.object;
    }
    if (cur.type !== "SymbolNode") refuse(locateChar(masked, ".") ?? 1, "fields can only be read from a named analysis, e.g. cam.throwMm");
    const root = (cur as unknown as { name: string }).name;
    if (options.isNamespace && !options.isNamespace(root)) {
      refuse(locateField(masked, fields[0]!) ?? 1, `"${root}" has no fields (only analyses do, e.g. cam.throwMm)`);
    }
    const base = compileName(root);
    const path = `${root}.${fields.join(".")}`;
    return {
      fn: (s) => {
        let v: unknown = base.fn(s);
        for (const f of fields) {
          if (v === null || typeof v !== "object" || Array.isArray(v) || !isPlainRecord(v)) fail(`${path}: there is no record to read "${f}" from`);
          if (!Object.prototype.hasOwnProperty.call(v, f)) fail(`${path}: the result has no field "${f}"`);
          v = (v as Record<string, unknown>)[f];
        }
        if (v instanceof Unavailable) throw new UnavailableValueError(source, path, v.reason, options.context);
        return v;
      },
      kind: "unknown",
    };
  };

  const top = compile(ast, 0);
  return {
    source,
    names: [...names],
    kind: top.kind,
    evaluate: (scope) => {
      const v = top.fn(scope);
      if (typeof v === "number" && !Number.isFinite(v)) fail(`the result ${v} is not a finite number`);
      if (v === undefined || v === null || typeof v === "function") fail(`the result ${describe(v)} is not a value`);
      return v as ExprValue;
    },
  };
}

function isPlainRecord(v: object): boolean {
  const proto = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
}

function equalValues(a: unknown, b: unknown, op: string, fail: (reason: string) => never): boolean {
  const ta = typeof a;
  if (ta !== typeof b || (ta !== "number" && ta !== "string" && ta !== "boolean")) {
    fail(`'${op}' compares two numbers, two texts or two true/false values; got ${describe(a)} and ${describe(b)}`);
  }
  return a === b;
}

function describe(v: unknown): string {
  if (typeof v === "string") return `the text "${v}"`;
  if (typeof v === "number" || typeof v === "boolean") return String(v);
  if (v === undefined || v === null) return String(v);
  if (Array.isArray(v)) return "a list";
  return `a ${typeof v === "object" ? "record" : typeof v}`;
}

// --- locating the offending token (mathjs trees carry no positions; the first match is reported) ---

function at(index: number): number | undefined {
  return index >= 0 ? index + 1 : undefined;
}
function escapeRe(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}
function locateChar(masked: string, ch: string): number | undefined {
  return at(masked.indexOf(ch));
}
function locateWord(masked: string, word: string): number | undefined {
  const m = new RegExp(`(?<![A-Za-z0-9_$.])${escapeRe(word)}(?![A-Za-z0-9_$])`).exec(masked);
  return m ? m.index + 1 : undefined;
}
function locateCall(masked: string, name: string): number | undefined {
  const m = new RegExp(`(?<![A-Za-z0-9_$.])${escapeRe(name)}\\s*\\(`).exec(masked);
  return m ? m.index + 1 : locateWord(masked, name);
}
function locateField(masked: string, field: string): number | undefined {
  const m = new RegExp(`\\.\\s*${escapeRe(field)}(?![A-Za-z0-9_$])`).exec(masked);
  return m ? m.index + 1 : undefined;
}
function locateAssignment(masked: string): number | undefined {
  const m = /(?<![=!<>])=(?!=)/.exec(masked);
  return m ? m.index + 1 : undefined;
}
function locateOperator(masked: string, op: string): number | undefined {
  if (/^[a-z]+$/.test(op)) return locateWord(masked, op);
  return at(masked.indexOf(op));
}
/** Where two operands touch without an operator: `2 x`, `2(3)`, `(a)(b)`. */
function implicitPosition(masked: string): number | undefined {
  const m = /(?:[0-9.)]|[A-Za-z_$][A-Za-z0-9_$]*)\s*(?=[A-Za-z_$(])/g;
  let hit: RegExpExecArray | null;
  while ((hit = m.exec(masked))) {
    const token = hit[0].trim();
    const next = masked.slice(hit.index + hit[0].length);
    // A function call `name(`, or a keyword operator, is not implicit multiplication.
    if (/^[A-Za-z_$]/.test(token) && next.startsWith("(")) continue;
    if (/^(and|or|not|xor|mod|to|in)$/.test(token) || /^(and|or|not|xor|mod|to|in)\b/.test(next)) continue;
    if (/^[A-Za-z_$]/.test(token) && /^[A-Za-z]/.test(next) && !/\s$/.test(hit[0])) continue;
    return hit.index + hit[0].length + 1;
  }
  return undefined;
}
