/**
 * The 3D model of a configured template: evaluate the parameters, refuse unbuildable parts before the
 * kernel, build, mesh and encode every part on the kernel pool (spread over its workers), and splice the
 * encoded parts into the answer (src/shared/model.ts). Answers are cached as bytes by
 * {@link modelCacheKey} (template id, version, parameters in mm), and identical requests in flight share
 * one kernel job. The web thread never holds the meshes as JavaScript strings.
 */
import type { CompiledTemplate, Evaluation } from "@/engine";
import { evaluateForRequest, requireBuildable } from "@server/templates";
import type { ResolvedPart } from "@/engine/parts/features";
import type { EvaluateRequest } from "@/shared/templates";
import type { KernelPool } from "@server/kernel";
import { createResultCache, modelCacheKey } from "@server/kernel/model-cache";
import type { ModelJsonTaskOutput } from "@server/kernel/tasks";
import { HttpError, notFound } from "@server/lib/errors";
import type { TemplateStore } from "@server/templates";
import { guardPartsForKernel, kernelErrorToHttp } from "./kernel-http";

export interface ModelServiceDeps {
  templates: TemplateStore;
  /** Absent: the model routes answer 503 (e.g. a server started without kernel workers). */
  kernel?: KernelPool;
  /** Size of the encoded-model cache, MB (default 64). */
  cacheMb?: number;
}

/** What a kernel job for a configured template needs, after evaluation and the pre-kernel guard. */
export interface PreparedModel {
  compiled: CompiledTemplate;
  evaluation: Evaluation;
  /** Parts to build (all of them: an unbuildable part refuses the whole request). */
  parts: ResolvedPart[];
  cacheKey: string;
}

/** Rough relative cost of building and meshing a part: its features, patterns counted per copy. */
function partCost(part: ResolvedPart): number {
  return part.features.reduce((s, f) => s + (f.kind === "pattern-linear" || f.kind === "pattern-circular" ? Math.max(1, f.count) : 1), 1);
}

/**
 * Builds and encodes the parts on as many workers as the pool has, in balanced groups (largest first onto
 * the lightest group), so one request uses every core; the encoded parts come back in the parts' order.
 */
async function buildSpread(kernel: KernelPool, parts: ResolvedPart[]): Promise<Uint8Array[]> {
  const groups = Math.max(1, Math.min(kernel.stats().size, parts.length));
  if (groups === 1) return (await kernel.run<ModelJsonTaskOutput>("model-json", { parts })).parts;
  const bins = Array.from({ length: groups }, () => ({ cost: 0, indices: [] as number[] }));
  parts
    .map((p, i) => ({ i, cost: partCost(p) }))
    .sort((a, b) => b.cost - a.cost)
    .forEach(({ i, cost }) => {
      const bin = bins.reduce((lo, b) => (b.cost < lo.cost ? b : lo));
      bin.cost += cost;
      bin.indices.push(i);
    });
  const results = await Promise.all(bins.map((b) => kernel.run<ModelJsonTaskOutput>("model-json", { parts: b.indices.map((i) => parts[i]!) })));
  const out = new Array<Uint8Array>(parts.length);
  bins.forEach((b, k) => b.indices.forEach((i, j) => (out[i] = results[k]!.parts[j]!)));
  return out;
}

export function modelService(deps: ModelServiceDeps) {
  const cache = createResultCache<Uint8Array>(deps.cacheMb ?? 64);
  const inflight = new Map<string, Promise<Uint8Array>>();

  const find = (id: string): CompiledTemplate => {
    const compiled = deps.templates.get(id);
    if (!compiled) throw notFound(`There is no template "${id}".`);
    return compiled;
  };

  /** The kernel's own guard, on this thread: a degenerate part never reaches a worker. */
  const guard = (parts: ResolvedPart[]): void => guardPartsForKernel(parts, { schema: false });

  /**
   * Evaluates and guards; throws 404/400 HttpErrors. Shared with the download routes. With
   * `kernelGuard: false` the kernel's own pre-check is left to the caller (done before building).
   */
  function prepare(id: string, body: EvaluateRequest, { kernelGuard = true } = {}): PreparedModel {
    const compiled = find(id);
    const evaluation = evaluateForRequest(compiled, { parameters: body.parameters, ...(body.units ? { units: body.units } : {}) });
    requireBuildable(evaluation);
    if (kernelGuard) guard(evaluation.parts);
    const t = compiled.template;
    return { compiled, evaluation, parts: evaluation.parts, cacheKey: modelCacheKey(t.id, t.version, evaluation.parametersMm) };
  }

  /** The answer without `units`, as UTF-8 JSON bytes: `{"template":…,"cacheKey":…,"parts":[…],"fixtures":[…]}`. */
  async function build(prepared: PreparedModel): Promise<Uint8Array> {
    if (!deps.kernel) throw new HttpError("service_unavailable", "The solid modeller is not running on this server.");
    guard(prepared.parts);
    let parts: Uint8Array[];
    try {
      parts = await buildSpread(deps.kernel, prepared.parts);
    } catch (err) {
      throw kernelErrorToHttp(err);
    }
    const t = prepared.compiled.template;
    const fixtures = prepared.evaluation.assembly.fixtures.map((f) => ({ id: f.id, label: f.label, positionMm: f.positionMm, sizeMm: f.sizeMm }));
    const head = Buffer.from(`{"template":${JSON.stringify({ id: t.id, version: t.version })},"cacheKey":${JSON.stringify(prepared.cacheKey)},"parts":[`);
    const comma = Buffer.from(",");
    const tail = Buffer.from(`],"fixtures":${JSON.stringify(fixtures)}}`);
    const chunks: Uint8Array[] = [head];
    parts.forEach((p, i) => chunks.push(...(i > 0 ? [comma] : []), p));
    chunks.push(tail);
    return Buffer.concat(chunks);
  }

  return {
    has: (id: string) => deps.templates.get(id) !== undefined,
    find,
    prepare,

    /**
     * The encoded model (UTF-8 JSON of {@link ModelResponse}) for these parameters; from the cache when the
     * same template, version and normalised parameters were built before. Identical requests in flight
     * share one kernel job (so a job is not cancelled when one of its callers goes away).
     */
    async modelJson(id: string, body: EvaluateRequest): Promise<{ json: Buffer; cacheKey: string; cached: boolean }> {
      // A cached answer was guarded when it was built: skip the kernel guard until a miss.
      const prepared = prepare(id, body, { kernelGuard: false });
      const units = body.units ?? prepared.compiled.template.units;
      const withUnits = (rest: Uint8Array) => Buffer.concat([Buffer.from(`{"units":${JSON.stringify(units)},`), rest.subarray(1)]);
      const hit = cache.get(prepared.cacheKey);
      if (hit !== undefined) return { json: withUnits(hit), cacheKey: prepared.cacheKey, cached: true };
      let job = inflight.get(prepared.cacheKey);
      if (!job) {
        job = build(prepared).then((bytes) => {
          cache.set(prepared.cacheKey, bytes);
          return bytes;
        });
        job.finally(() => inflight.delete(prepared.cacheKey)).catch(() => undefined);
        inflight.set(prepared.cacheKey, job);
      }
      return { json: withUnits(await job), cacheKey: prepared.cacheKey, cached: false };
    },

    /** How many encoded models the cache holds, and their size in bytes (for health and benchmarks). */
    cacheStats: () => ({ entries: cache.size, bytes: cache.calculatedSize }),
  };
}

export type ModelService = ReturnType<typeof modelService>;
