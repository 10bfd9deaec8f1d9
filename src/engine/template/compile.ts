/**
 * Template compilation: a schema-valid template → a {@link CompiledTemplate} whose expressions are parsed,
 * whitelisted and turned into closures ONCE. Evaluating a compiled template for a set of parameters then
 * costs microseconds. Compilation also does the checks a schema cannot: every name is defined before it is
 * used, defaults lie inside their limits, calculators exist, materials are in the catalogue, ids are unique.
 */
import type { Calculator } from "../calculators/types";
import { compileExpression, ExpressionError, RESERVED_NAMES, type CompiledExpression, type CompileOptions } from "../expressions";
import { MATERIAL_KEYS } from "../materials";
import { compileValue, namesIn, type ValueNode } from "../parts/template-values";
import { mmPerUnit } from "../units";
import { compileMessage, messageNames, MessageTemplateError, type CompiledMessage } from "./message";
import { compileNote, noteNames, type CompiledNote } from "./notes";
import type { AnalysisSpec, CheckSpec, DerivedKind, ParameterSpec, Template } from "./schema";
import { TemplateValidationError, type TemplateIssue } from "./issues";

export interface CompiledDerived {
  key: string;
  kind: DerivedKind;
  label?: string;
  help?: string;
  expr: CompiledExpression;
}

export type CompiledInput = { key: string; literal: number | boolean } | { key: string; expr: CompiledExpression };

export interface CompiledAnalysis {
  spec: AnalysisSpec;
  calculator: Calculator;
  inputs: CompiledInput[];
  when?: CompiledExpression | boolean;
  /** The analysis's `parameters`, or the parameters its inputs depend on. */
  parameters: string[];
  /**
   * Recent results by their inputs (see {@link rememberResult}): when a user changes one value, most
   * analyses get the same inputs again (a thread, a fit, a cam whose sizes did not change).
   */
  recent: Map<string, Readonly<Record<string, unknown>>>;
}

/** How many recent results each analysis keeps. */
const RECENT_RESULTS = 16;

/**
 * Keeps a calculator result for its inputs, oldest out first. Calculators are pure, so the same inputs
 * give the same result. Later evaluations share the object: nothing may change it (the server's tests
 * run with every kept evaluation frozen, so a change would throw there).
 */
export function rememberResult<T>(owner: { recent: Map<string, T> }, key: string, result: T): T {
  if (owner.recent.size >= RECENT_RESULTS) owner.recent.delete(owner.recent.keys().next().value!);
  owner.recent.set(key, result);
  return result;
}

/** Identities of the objects in a scope (analysis results), for {@link scopeKey}. */
const identities = new WeakMap<object, number>();
let nextIdentity = 0;

/**
 * A key for the values a scope holds under `names`: numbers, text and true/false by value, objects
 * (analysis results, which are remembered and so shared while their inputs repeat) by identity. Two
 * scopes with the same key give the same answer to any expression reading only these names.
 */
export function scopeKey(names: readonly string[], scope: Readonly<Record<string, unknown>>, prefix = ""): string {
  let key = prefix;
  for (const name of names) {
    const v = scope[name];
    if (v !== null && typeof v === "object") {
      let id = identities.get(v);
      if (id === undefined) identities.set(v, (id = nextIdentity++));
      key += `|#${id}`;
    } else {
      key += `|${typeof v === "string" ? JSON.stringify(v) : String(v)}`;
    }
  }
  return key;
}

export interface CompiledCheck {
  spec: CheckSpec;
  condition: CompiledExpression | boolean;
  message: CompiledMessage;
  failMessage?: CompiledMessage;
  when?: CompiledExpression | boolean;
  /** Every name its condition, `when` and messages read: the same values give the same result. */
  reads: readonly string[];
  /** Recent results by the values it reads and the units (null: did not apply); see {@link rememberResult}. */
  recent: Map<string, unknown>;
}


export interface CompiledPart {
  id: string;
  /** The part without its assembly placement (`placement`, `explode`): what its shape depends on. */
  node: ValueNode;
  /** Where the part sits in the assembly and how far it moves out in the exploded layout, when given. */
  placement: ReadonlyArray<readonly [key: "placement" | "explode", node: ValueNode]>;
  /** The part's keys in the template's order (the resolved part keeps it). */
  keyOrder: readonly string[];
  /**
   * Every name (parameter, derived value, analysis) the part's shape and its drawing notes read: the same
   * values of these give the same part, whatever else changed.
   */
  reads: readonly string[];
  /** Parameters the part's expressions depend on (directly or through derived values and analyses). */
  parameters: string[];
  /**
   * Recently worked-out parts by the values they read (see {@link rememberResult}): moving the vise stop
   * for another jaw thickness changes where parts sit, not what they are.
   */
  recent: Map<string, unknown>;
}

export interface CompiledTemplate {
  readonly template: Template;
  /** Parameter specs with `materials` filled in (the whole catalogue when the template named none). */
  readonly parameters: readonly ParameterSpec[];
  readonly derived: readonly CompiledDerived[];
  readonly analyses: readonly CompiledAnalysis[];
  readonly checks: readonly CompiledCheck[];
  readonly parts: readonly CompiledPart[];
  readonly fixtures: readonly { id: string; label: string; node: ValueNode }[];
  /** Drawing notes with their placeholders compiled: every sheet's, the assembly sheet's, each part's. */
  readonly notes: CompiledNotes;
  /** Millimetres per template length unit. */
  readonly mmPerTemplateUnit: number;
}

export interface CompiledNotes {
  sheet: readonly CompiledNote[];
  assembly: readonly CompiledNote[];
  /** By part id. */
  parts: Readonly<Record<string, readonly CompiledNote[]>>;
}

export interface CompileDeps {
  /** Looks up a calculator by kind (the registry in production; a test double in tests). */
  getCalculator(kind: string): Calculator | undefined;
  /** Known material keys (defaults to the catalogue). */
  materialKeys?: readonly string[];
}

/**
 * Compiles a validated template.
 * @throws TemplateValidationError listing every problem, each with its path and reason.
 */
export function compileTemplate(template: Template, deps: CompileDeps): CompiledTemplate {
  const issues: TemplateIssue[] = [];
  const materialKeys = deps.materialKeys ?? MATERIAL_KEYS;
  const factors = { mmPerTemplateUnit: mmPerUnit(template.units) };
  const known = new Set<string>();
  const namespaces = new Set<string>();
  const options = (): Omit<CompileOptions, "context"> => {
    // Snapshot: a name must be defined before the expression that uses it.
    const names = new Set(known);
    const spaces = new Set(namespaces);
    return { isKnownName: (n) => names.has(n), isNamespace: (n) => spaces.has(n), factors };
  };
  const attempt = <T>(path: string, fn: () => T): T | undefined => {
    try {
      return fn();
    } catch (err) {
      if (err instanceof ExpressionError || err instanceof MessageTemplateError) issues.push({ path, message: err.message });
      else if (err instanceof TemplateValidationError) issues.push(...err.issues);
      else throw err;
      return undefined;
    }
  };
  // Which parameters each name depends on, for linking results back to the form.
  const dependsOn = new Map<string, Set<string>>();
  const paramsOf = (names: Iterable<string>): Set<string> => {
    const out = new Set<string>();
    for (const n of names) for (const p of dependsOn.get(n) ?? []) out.add(p);
    return out;
  };
  const claim = (name: string, path: string, what: string) => {
    if (RESERVED_NAMES.has(name)) issues.push({ path, message: `"${name}" is a reserved word of the expression language; choose another ${what}.` });
    else if (known.has(name)) issues.push({ path, message: `"${name}" is already defined; every parameter, derived value and analysis needs its own name.` });
    known.add(name);
  };

  // Parameters.
  const parameters: ParameterSpec[] = [];
  template.parameters.forEach((spec, i) => {
    const path = `parameters[${i}]`;
    claim(spec.key, `${path}.key`, "key");
    dependsOn.set(spec.key, new Set([spec.key]));
    switch (spec.kind) {
      case "length":
      case "angle":
      case "force":
      case "ratio":
      case "count":
        if (spec.min > spec.max) issues.push({ path: `${path}.min`, message: `${spec.key}: min (${spec.min}) is above max (${spec.max}).` });
        if (spec.default < spec.min || spec.default > spec.max) {
          issues.push({ path: `${path}.default`, message: `${spec.key}: the default ${spec.default} is outside ${spec.min}–${spec.max}.` });
        }
        parameters.push(spec);
        break;
      case "choice": {
        const values = spec.choices.map((c) => (typeof c === "string" ? c : c.value));
        if (new Set(values).size !== values.length) issues.push({ path: `${path}.choices`, message: `${spec.key}: a choice is listed twice.` });
        if (!values.includes(spec.default)) issues.push({ path: `${path}.default`, message: `${spec.key}: the default "${spec.default}" is not one of the choices (${values.join(", ")}).` });
        parameters.push(spec);
        break;
      }
      case "material": {
        const allowed = spec.materials ?? [...materialKeys];
        allowed.forEach((m, j) => {
          if (!materialKeys.includes(m)) issues.push({ path: `${path}.materials[${j}]`, message: `${spec.key}: "${m}" is not in the materials catalogue (${materialKeys.join(", ")}).` });
        });
        if (!allowed.includes(spec.default)) issues.push({ path: `${path}.default`, message: `${spec.key}: the default "${spec.default}" is not an allowed material.` });
        parameters.push({ ...spec, materials: allowed });
        break;
      }
      case "boolean":
        parameters.push(spec);
        break;
    }
  });
  const parameterKeys = new Set(template.parameters.map((p) => p.key));

  // Derived values, in order: each may use parameters and the derived values above it.
  const derived: CompiledDerived[] = [];
  for (const [key, entry] of Object.entries(template.derived)) {
    const path = `derived.${key}`;
    const long = typeof entry === "string" ? { expression: entry } : entry;
    const expr = attempt(path, () => compileExpression(long.expression, { ...options(), context: path }));
    claim(key, path, "name");
    if (expr) dependsOn.set(key, paramsOf(expr.names));
    if (expr) {
      derived.push({
        key,
        kind: long.kind ?? (expr.kind === "boolean" ? "boolean" : expr.kind === "string" ? "text" : "number"),
        ...(long.label ? { label: long.label } : {}),
        ...(long.help ? { help: long.help } : {}),
        expr,
      });
    }
  }

  // Analyses, in order: inputs may use parameters, derived values and earlier analyses.
  const analyses: CompiledAnalysis[] = [];
  template.analyses.forEach((spec, i) => {
    const path = `analyses[${i}]`;
    const calculator = deps.getCalculator(spec.calculator);
    if (!calculator) issues.push({ path: `${path}.calculator`, message: `Unknown calculator "${spec.calculator}".` });
    const opts = options();
    const inputs: CompiledInput[] = [];
    for (const [key, value] of Object.entries(spec.inputs)) {
      if (typeof value === "string") {
        const expr = attempt(`${path}.inputs.${key}`, () => compileExpression(value, { ...opts, context: `${path}.inputs.${key}` }));
        if (expr) inputs.push({ key, expr });
      } else inputs.push({ key, literal: value });
    }
    if (calculator) {
      const shape = (calculator.inputSchema as { shape?: Record<string, unknown> }).shape;
      if (shape) {
        for (const key of Object.keys(spec.inputs)) {
          if (!(key in shape)) issues.push({ path: `${path}.inputs.${key}`, message: `The ${spec.calculator} calculator has no input "${key}" (it takes ${Object.keys(shape).join(", ")}).` });
        }
      }
    }
    const when = spec.when === undefined || typeof spec.when === "boolean" ? spec.when : attempt(`${path}.when`, () => compileExpression(spec.when as string, { ...opts, context: `${path}.when` }));
    (spec.parameters ?? []).forEach((p, j) => {
      if (!parameterKeys.has(p)) issues.push({ path: `${path}.parameters[${j}]`, message: `"${p}" is not a parameter of this template.` });
    });
    claim(spec.id, `${path}.id`, "analysis id");
    namespaces.add(spec.id);
    const inputParams = paramsOf(inputs.flatMap((i) => ("expr" in i ? i.expr.names : [])));
    dependsOn.set(spec.id, inputParams);
    const parameters = spec.parameters ? [...spec.parameters] : [...inputParams];
    if (calculator) analyses.push({ spec, calculator, inputs, parameters, recent: new Map(), ...(when !== undefined ? { when } : {}) });
  });

  // Checks, parts and fixtures see everything.
  const all = options();
  const checkIds = new Set<string>();
  const checks: CompiledCheck[] = [];
  template.checks.forEach((spec, i) => {
    const path = `checks[${i}]`;
    if (checkIds.has(spec.id)) issues.push({ path: `${path}.id`, message: `The check id "${spec.id}" is used twice.` });
    checkIds.add(spec.id);
    const condition = typeof spec.condition === "boolean" ? spec.condition : attempt(`${path}.condition`, () => compileExpression(spec.condition as string, { ...all, context: `${path}.condition` }));
    const message = attempt(`${path}.message`, () => compileMessage(spec.message, { ...all, context: `${path}.message` }));
    const failMessage = spec.failMessage ? attempt(`${path}.failMessage`, () => compileMessage(spec.failMessage!, { ...all, context: `${path}.failMessage` })) : undefined;
    const when = spec.when === undefined || typeof spec.when === "boolean" ? spec.when : attempt(`${path}.when`, () => compileExpression(spec.when as string, { ...all, context: `${path}.when` }));
    spec.parameters.forEach((p, j) => {
      if (!parameterKeys.has(p)) issues.push({ path: `${path}.parameters[${j}]`, message: `"${p}" is not a parameter of this template.` });
    });
    if (condition !== undefined && message) {
      const reads = new Set([...(typeof condition === "boolean" ? [] : condition.names), ...(when === undefined || typeof when === "boolean" ? [] : when.names), ...messageNames(message), ...messageNames(failMessage)]);
      checks.push({ spec, condition, message, ...(failMessage ? { failMessage } : {}), ...(when !== undefined ? { when } : {}), reads: [...reads], recent: new Map() });
    }
  });

  const compileNotes = (list: readonly string[] | undefined, path: string): CompiledNote[] =>
    (list ?? []).flatMap((n, j) => {
      const c = attempt(`${path}[${j}]`, () => compileNote(n, { ...all, context: `${path}[${j}]` }));
      return c ? [c] : [];
    });
  const notes: { sheet: CompiledNote[]; assembly: CompiledNote[]; parts: Record<string, CompiledNote[]> } = {
    sheet: compileNotes(template.drawing.notes, "drawing.notes"),
    assembly: compileNotes(template.assembly.notes, "assembly.notes"),
    parts: {},
  };
  const partIds = new Set<string>();
  const parts: CompiledPart[] = [];
  template.parts.forEach((part, i) => {
    const path = `parts[${i}]`;
    if (partIds.has(part.id)) issues.push({ path: `${path}.id`, message: `The part id "${part.id}" is used twice.` });
    partIds.add(part.id);
    const base = part.features[0];
    if (base && base.kind !== "block" && base.kind !== "turned") {
      issues.push({ path: `${path}.features[0]`, message: `The first feature of part "${part.id}" must be its base (block or turned), not ${base.kind}.` });
    }
    part.features.slice(1).forEach((f, j) => {
      if (f.kind === "block" || f.kind === "turned") issues.push({ path: `${path}.features[${j + 1}]`, message: `Part "${part.id}" has a second base (${f.kind}); only the first feature is a base.` });
    });
    if (typeof part.material === "string" && !part.material.startsWith("=") && !materialKeys.includes(part.material)) {
      issues.push({ path: `${path}.material`, message: `"${part.material}" is not in the materials catalogue (${materialKeys.join(", ")}).` });
    }
    // Notes are compiled as messages on their own (below); the part's value tree leaves them out.
    const { notes: partNotes, ...drawingRest } = part.drawing ?? {};
    const geometry = part.drawing ? { ...part, drawing: drawingRest } : part;
    notes.parts[part.id] = compileNotes(partNotes, `${path}.drawing.notes`);
    const node = attempt(path, () => compileValue(geometry, path, undefined, all));
    if (node && node.t === "object") {
      const placement = node.entries.filter((e): e is ["placement" | "explode", ValueNode] => e[0] === "placement" || e[0] === "explode");
      const shape: ValueNode = { ...node, entries: node.entries.filter((e) => e[0] !== "placement" && e[0] !== "explode") };
      const reads = namesIn(shape);
      for (const n of notes.parts[part.id]!) for (const name of noteNames(n)) reads.add(name);
      parts.push({
        id: part.id,
        node: shape,
        placement,
        keyOrder: node.entries.map((e) => e[0]),
        reads: [...reads],
        parameters: [...paramsOf(namesIn(shape))],
        recent: new Map(),
      });
    }
  });

  const fixtures: { id: string; label: string; node: ValueNode }[] = [];
  template.assembly.fixtures.forEach((f, i) => {
    const path = `assembly.fixtures[${i}]`;
    const node = attempt(path, () => compileValue(f, path, undefined, all));
    if (node) fixtures.push({ id: f.id, label: f.label, node });
  });

  if (issues.length > 0) throw new TemplateValidationError(issues);
  return { template, parameters, derived, analyses, checks, parts, fixtures, notes, mmPerTemplateUnit: factors.mmPerTemplateUnit };
}
