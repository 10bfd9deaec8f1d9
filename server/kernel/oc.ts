import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import opencascade from "replicad-opencascadejs";
import * as replicad from "replicad";

/** The OpenCascade module instance (its generated typings are vast; we use a narrow slice through `any`). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type OpenCascade = any;

export type Replicad = typeof replicad;

export interface LoadedKernel {
  oc: OpenCascade;
  r: Replicad;
}

let loading: Promise<LoadedKernel> | null = null;

/**
 * Loads OpenCascade (replicad-opencascadejs, single-threaded WASM) once per thread and hands it to replicad.
 * The WASM file is read from the package (`wasmBinary`), so nothing is fetched; `print` is silenced because
 * the STEP translator writes banners on stdout (GEOMETRY.md pitfall 11).
 */
export function loadKernel(): Promise<LoadedKernel> {
  if (!loading) {
    loading = (async () => {
      const require = createRequire(import.meta.url);
      const wasmBinary = readFileSync(require.resolve("replicad-opencascadejs/wasm"));
      const factory = opencascade as unknown as (opts: object) => Promise<OpenCascade>;
      const oc = await factory({ wasmBinary, print: () => {}, printErr: () => {} });
      replicad.setOC(oc);
      return { oc, r: replicad };
    })();
    loading.catch(() => {
      loading = null;
    });
  }
  return loading;
}

/** Bytes currently reserved by the kernel's WASM heap (it grows and never shrinks). */
export function kernelHeapBytes(oc: OpenCascade): number {
  return (oc.wasmMemory as WebAssembly.Memory).buffer.byteLength;
}

/**
 * Turns whatever the kernel threw into a readable sentence. OpenCascade throws `WebAssembly.Exception`,
 * which crosses a thread boundary as an empty object, so it must be decoded in the thread that caught it
 * with `oc.getExceptionMessage` (GEOMETRY.md pitfall 5); replicad itself throws ordinary Errors.
 */
export function describeKernelException(oc: OpenCascade, err: unknown): string {
  // WebAssembly.Exception is in Node 20 but not yet in TypeScript's lib.
  const WasmException = (WebAssembly as unknown as { Exception?: new (...a: never[]) => object }).Exception;
  if (WasmException && err instanceof WasmException) {
    try {
      const [type, message] = oc.getExceptionMessage(err) as [string, string | undefined];
      return message ? `${type}: ${message}` : type || "unknown OpenCascade exception";
    } catch {
      return "unknown OpenCascade exception";
    }
  }
  if (err instanceof Error) return err.message;
  return String(err);
}
