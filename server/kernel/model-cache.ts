import { LRUCache } from "lru-cache";
import { canonicalHash } from "./canonical";

/**
 * Bump when the solids or their encoding change, so entries made by older code (in a shared cache) are
 * never served.
 */
export const MODEL_FORMAT_VERSION = 1;

/**
 * The cache key of a template's model: SHA-256 of the canonical JSON of (format, template id, template
 * version, parameters normalised to mm with defaults filled). It depends on nothing local to the process,
 * so every server computes the same key and a shared cache can sit behind this one later.
 */
export function modelCacheKey(templateId: string, version: string, parametersMm: Readonly<Record<string, unknown>>): string {
  return canonicalHash({ format: MODEL_FORMAT_VERSION, template: templateId, version, parameters: parametersMm });
}

/** A bounded in-memory cache of encoded results (strings or byte arrays), sized by their length in bytes. */
export function createResultCache<V extends string | Uint8Array>(maxMb: number): LRUCache<string, V> {
  return new LRUCache<string, V>({
    maxSize: Math.max(1, Math.floor(maxMb * 1024 * 1024)),
    sizeCalculation: (v) => Math.max(1, typeof v === "string" ? v.length : v.byteLength),
  });
}
