import type { ResolvedPart } from "@/engine/parts/features";
import { buildPart, type BuiltPart } from "./build-part";
import { partShapeHash } from "./canonical";
import { kernelHeapBytes, type LoadedKernel, type OpenCascade, type Replicad } from "./oc";

/**
 * What a kernel task receives: the loaded kernel and a part builder that remembers recent parts, so a
 * drawing task after a model task for the same parameters does not rebuild the solid.
 */
export interface KernelContext {
  kernel: LoadedKernel;
  oc: OpenCascade;
  r: Replicad;
  /**
   * Builds (or returns the remembered) solid of a resolved part. The shape stays valid until the current
   * task ends; do not delete it, and copy (`clone()`) anything you keep.
   */
  buildPart(part: ResolvedPart): BuiltPart;
  /** Bytes reserved by the kernel's heap now. */
  heapBytes(): number;
}

/**
 * Least-recently-used solids by the hash of the part's canonical JSON. Evictions (which delete the shape)
 * happen only between tasks, so a task never loses a shape it is still using.
 */
export class PartShapeCache {
  private readonly map = new Map<string, BuiltPart>();
  constructor(private readonly maxEntries: number) {}

  get(kernel: LoadedKernel, part: ResolvedPart): BuiltPart {
    const key = partShapeHash(part);
    const hit = this.map.get(key);
    if (hit) {
      this.map.delete(key);
      this.map.set(key, hit);
      return hit;
    }
    const built = buildPart(kernel, part);
    this.map.set(key, built);
    return built;
  }

  /** Deletes the oldest solids beyond the limit; call between tasks. */
  trim(): void {
    while (this.map.size > this.maxEntries) {
      const [key, oldest] = this.map.entries().next().value as [string, BuiltPart];
      this.map.delete(key);
      oldest.shape.delete();
    }
  }

  clear(): void {
    for (const b of this.map.values()) b.shape.delete();
    this.map.clear();
  }

  get size(): number {
    return this.map.size;
  }
}

export function createKernelContext(kernel: LoadedKernel, cache: PartShapeCache): KernelContext {
  return {
    kernel,
    oc: kernel.oc,
    r: kernel.r,
    buildPart: (part) => cache.get(kernel, part),
    heapBytes: () => kernelHeapBytes(kernel.oc),
  };
}
