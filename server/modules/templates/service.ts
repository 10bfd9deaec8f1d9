/**
 * The template catalogue's business logic: list, describe for a form, evaluate. Plain arguments in, plain
 * data out; failures are typed HttpErrors (404 unknown template, 400 with one detail per bad parameter).
 */
import { choiceValues, type CompiledTemplate, type Evaluation, type ParameterSpec, type UnitSystem } from "@/engine";
import { getMaterial, isMaterialKey } from "@/engine/materials";
import { convertLength } from "@/engine/units";
import type { EvaluateRequest } from "@/shared/templates";
import { notFound } from "@server/lib/errors";
import { evaluateForRequest, type TemplateStore } from "@server/templates";

export interface TemplateSummaryDto {
  id: string;
  version: string;
  name: string;
  family: string;
  summary: string;
}

export interface ParameterDto {
  key: string;
  label: string;
  kind: ParameterSpec["kind"];
  group?: string;
  help?: string;
  default: number | string | boolean;
  min?: number;
  max?: number;
  step?: number;
  /** Unit of the numbers shown: the requested length unit, "deg", "N", or null for plain numbers. */
  unit: string | null;
  choices?: Array<{ value: string; label: string }>;
  materials?: Array<{ key: string; name: string }>;
}

/** The evaluation as the API sends it: the resolved parts (kernel input) stay on the server. */
export type EvaluationDto = Omit<Evaluation, "parts" | "geometryIssues">;

function materialName(key: string): string {
  return isMaterialKey(key) ? getMaterial(key).name : key;
}

function parameterDto(spec: ParameterSpec, templateUnits: UnitSystem, units: UnitSystem): ParameterDto {
  const base = { key: spec.key, label: spec.label, kind: spec.kind, ...(spec.group ? { group: spec.group } : {}), ...(spec.help ? { help: spec.help } : {}) };
  switch (spec.kind) {
    case "length": {
      const c = (v: number) => convertLength(v, templateUnits, units);
      return { ...base, default: c(spec.default), min: c(spec.min), max: c(spec.max), ...(spec.step !== undefined ? { step: c(spec.step) } : {}), unit: units };
    }
    case "angle":
    case "force":
    case "ratio":
    case "count":
      return {
        ...base,
        default: spec.default,
        min: spec.min,
        max: spec.max,
        ...(spec.step !== undefined ? { step: spec.step } : {}),
        unit: spec.kind === "angle" ? "deg" : spec.kind === "force" ? "N" : null,
      };
    case "choice":
      return { ...base, default: spec.default, unit: null, choices: spec.choices.map((c) => (typeof c === "string" ? { value: c, label: c } : c)) };
    case "material":
      return { ...base, default: spec.default, unit: null, materials: (spec.materials ?? []).map((key) => ({ key, name: materialName(key) })) };
    case "boolean":
      return { ...base, default: spec.default, unit: null };
  }
}

export function templatesService(store: TemplateStore) {
  const find = (id: string): CompiledTemplate => {
    const compiled = store.get(id);
    if (!compiled) throw notFound(`There is no template "${id}".`);
    return compiled;
  };

  return {
    has(id: string): boolean {
      return store.get(id) !== undefined;
    },

    list(): TemplateSummaryDto[] {
      return store.list().map(({ template: t }) => ({ id: t.id, version: t.version, name: t.name, family: t.family, summary: t.summary }));
    },

    /** Everything a form needs, with lengths in the requested units. */
    detail(id: string, units?: UnitSystem) {
      const compiled = find(id);
      const t = compiled.template;
      const shown = units ?? t.units;
      const parameters = compiled.parameters.map((p) => parameterDto(p, t.units, shown));
      const groups: string[] = [];
      for (const p of parameters) if (p.group && !groups.includes(p.group)) groups.push(p.group);
      const materialNames: Record<string, string> = {};
      for (const p of compiled.parameters) if (p.kind === "material") for (const m of p.materials ?? []) materialNames[m] = materialName(m);
      return {
        formatVersion: t.formatVersion,
        id: t.id,
        version: t.version,
        name: t.name,
        family: t.family,
        summary: t.summary,
        /** The template's own unit system; `shownIn` is the unit of the lengths below. */
        units: t.units,
        shownIn: shown,
        parameters,
        groups,
        materialNames,
        defaults: Object.fromEntries(parameters.map((p) => [p.key, p.default])),
        derived: compiled.derived.map((d) => ({ key: d.key, kind: d.kind, ...(d.label ? { label: d.label } : {}), ...(d.help ? { help: d.help } : {}) })),
        analyses: compiled.analyses.map((a) => ({
          id: a.spec.id,
          calculator: a.spec.calculator,
          label: a.spec.label ?? a.calculator.label,
          ...(a.spec.summary ? { summary: a.spec.summary } : { summary: a.calculator.summary }),
          parameters: a.parameters,
        })),
        checks: compiled.checks.map((c) => ({ id: c.spec.id, severity: c.spec.severity, parameters: c.spec.parameters, message: c.spec.message })),
        parts: t.parts.map((p) => ({ id: p.id, name: p.name })),
        drawing: t.drawing,
        cautions: [...(t.cautions ?? [])],
        choiceValues: Object.fromEntries(compiled.parameters.filter((p) => p.kind === "choice").map((p) => [p.key, choiceValues(p as Extract<ParameterSpec, { kind: "choice" }>)])),
      };
    },

    /**
     * Evaluates with the user's parameters (400 with one detail per bad parameter) and answers the
     * evaluation as the route sends it (without the resolved parts), as JSON text. A remembered evaluation
     * (server/templates/evaluation.ts) keeps its text too, so a repeated configuration (a reload, a shared
     * link) is not serialised again.
     */
    evaluateJson(id: string, body: EvaluateRequest): string {
      const evaluation = evaluateForRequest(find(id), { parameters: body.parameters, ...(body.units ? { units: body.units } : {}) });
      return sharedJson(evaluation, evaluationJson);
    },
  };
}

/** The evaluation as the route answers it: without the resolved parts and their geometry issues. */
function evaluationDto(evaluation: Evaluation): EvaluationDto {
  const { parts: _parts, geometryIssues: _issues, ...rest } = evaluation;
  return rest;
}

/**
 * JSON text of objects the engine and the server remember and share (evaluations, calculator results,
 * part summaries, check results), dropped with them. A form change usually leaves most analyses and parts as they were
 * (the same objects), so only what changed is serialised again.
 */
const jsonOf = new WeakMap<object, string>();

function sharedJson<T extends object>(value: T, write: (value: T) => string = JSON.stringify): string {
  let text = jsonOf.get(value);
  if (text === undefined) jsonOf.set(value, (text = write(value)));
  return text;
}

/**
 * `JSON.stringify(evaluationDto(evaluation))`, byte for byte, with the text of shared analyses, part
 * summaries and check results reused.
 */
export function evaluationJson(evaluation: Evaluation): string {
  const members: string[] = [];
  for (const [key, value] of Object.entries(evaluationDto(evaluation))) {
    if (value === undefined) continue;
    let text: string;
    if (key === "analyses") {
      const entries = Object.entries(value as Evaluation["analyses"]).filter(([, r]) => r !== undefined);
      text = `{${entries.map(([id, r]) => `${JSON.stringify(id)}:${sharedJson(r)}`).join(",")}}`;
    } else if (key === "partSummaries" || key === "checks") {
      text = `[${(value as object[]).map((item) => sharedJson(item)).join(",")}]`;
    } else {
      text = JSON.stringify(value);
    }
    members.push(`${JSON.stringify(key)}:${text}`);
  }
  return `{${members.join(",")}}`;
}

export type TemplatesService = ReturnType<typeof templatesService>;
