/**
 * Evaluation as the server's routes use it: one place that runs the engine, remembers recent answers and
 * turns the engine's refusals into HTTP errors.
 *
 * Why a cache: one configuration is evaluated several times in a row — the evaluate route on every form
 * change, then the model route for the 3D preview and the download routes for the same values, a shared
 * link opened by several people, a page reload. Evaluation is pure (same template version, values and
 * units give the same answer), so recent answers are kept per template in a small LRU, keyed by the
 * template's id and version, the units and the values in a canonical order. Answers are deep-frozen
 * before they are kept: a caller that tried to change one would throw instead of corrupting the next
 * request's answer.
 */
import { LRUCache } from "lru-cache";
import { evaluateTemplate, ParameterResolutionError, type CompiledTemplate, type EvaluateInput, type Evaluation } from "@/engine";
import { freezeUnderTest } from "@/engine/freeze";
import { badRequest } from "@server/lib/errors";

/** Configurations kept per template (an answer with its parts is some tens of kB). */
const PER_TEMPLATE = 64;

const caches = new WeakMap<CompiledTemplate, LRUCache<string, Evaluation>>();

/** JSON with object keys sorted, so `{a,b}` and `{b,a}` give one key. */
function canonical(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) return `[${value.map(canonical).join(",")}]`;
  const entries = Object.keys(value)
    .sort()
    .map((k) => `${JSON.stringify(k)}:${canonical((value as Record<string, unknown>)[k])}`);
  return `{${entries.join(",")}}`;
}

/** The cache key of an evaluation: template id and version, units, values in canonical order. */
export function evaluationKey(compiled: CompiledTemplate, input: EvaluateInput): string {
  const t = compiled.template;
  return `${t.id}@${t.version}|${input.units ?? t.units}|${canonical(input.parameters ?? {})}`;
}

/**
 * {@link evaluateTemplate} with recent answers remembered. The answer is shared: read it, never change it.
 * Refusals (bad parameters) are not cached; they throw as the engine throws them.
 */
export function evaluateCached(compiled: CompiledTemplate, input: EvaluateInput): Evaluation {
  let cache = caches.get(compiled);
  if (!cache) {
    cache = new LRUCache<string, Evaluation>({ max: PER_TEMPLATE });
    caches.set(compiled, cache);
  }
  const key = evaluationKey(compiled, input);
  const hit = cache.get(key);
  if (hit) return hit;
  const evaluation = evaluateTemplate(compiled, input);
  cache.set(key, freezeUnderTest(evaluation));
  return evaluation;
}

export interface RefusalMessages {
  /** The error's message when several parameters are bad (one bad parameter gives its own message). */
  several?: string;
  /** The error's message whatever the number of bad parameters (each is still in the details). */
  always?: string;
}

/** Evaluates for a route: bad parameters become a 400 with one detail per bad parameter. */
export function evaluateForRequest(compiled: CompiledTemplate, input: EvaluateInput, messages: RefusalMessages = {}): Evaluation {
  try {
    return evaluateCached(compiled, input);
  } catch (err) {
    if (err instanceof ParameterResolutionError) {
      throw badRequest(
        messages.always ?? (err.issues.length === 1 ? err.issues[0]!.message : (messages.several ?? "Some parameters are not acceptable.")),
        err.issues.map((i) => ({ path: i.path, message: i.message })),
      );
    }
    throw err;
  }
}

/** 400 when the values give parts that cannot be made, with one detail per blocking issue. */
export function requireBuildable(evaluation: Evaluation, message = "These parameters give parts that cannot be made; see the details."): void {
  if (evaluation.buildable) return;
  const issues = evaluation.geometryIssues.filter((i) => i.blocking);
  throw badRequest(
    issues.length === 1 ? issues[0]!.message : message,
    issues.map((i) => ({ path: `parts.${i.partId}${i.featureIndex !== undefined ? `.features.${i.featureIndex}` : ""}`, message: i.message })),
  );
}
