/**
 * Errors of the solid kernel. Every failure a kernel job can meet becomes a {@link KernelError} with a stable
 * `code` and, where a part is involved, which part and which feature failed and with which values, so the
 * HTTP layer can answer with a clear 4xx/5xx and the user knows what to change.
 *
 * Errors cross the worker boundary as plain data ({@link SerializedKernelError}): structured cloning drops
 * custom fields of an Error, and kernel exceptions arrive as empty objects.
 */

export const kernelErrorCodes = [
  /** The part was refused before the kernel: a size is zero, negative, not finite, or out of range. */
  "kernel_input",
  /** The kernel threw while building a feature. */
  "kernel_build",
  /** The build finished but the shape is not one valid solid with a positive volume. */
  "kernel_invalid",
  /** The task ran past its time limit; its worker was stopped and replaced. */
  "kernel_timeout",
  /** The worker thread died during the task; it was replaced. */
  "kernel_crash",
  /** The pool's queue is full. */
  "kernel_busy",
  /** The pool is closed. */
  "kernel_closed",
  /** Anything else a task refused or failed at (unknown task name, bad task input, export failure). */
  "kernel_task",
] as const;
export type KernelErrorCode = (typeof kernelErrorCodes)[number];

/** Which part and feature a failure belongs to, with the feature's own values. */
export interface KernelErrorDetails {
  partId?: string;
  partName?: string;
  /** 0-based index in the part's `features` list (0 is the base). */
  featureIndex?: number;
  featureKind?: string;
  featureId?: string;
  /** The feature's resolved values, as given to the builder. */
  parameters?: Record<string, unknown>;
  /** The kernel's own words (e.g. `Standard_DomainError`), for logs. */
  kernelMessage?: string;
}

export class KernelError extends Error {
  readonly code: KernelErrorCode;
  readonly details: KernelErrorDetails;

  constructor(code: KernelErrorCode, message: string, details: KernelErrorDetails = {}) {
    super(message);
    this.name = "KernelError";
    this.code = code;
    this.details = details;
  }
}

export interface SerializedKernelError {
  code: KernelErrorCode;
  message: string;
  details: KernelErrorDetails;
}

export function serializeKernelError(err: KernelError): SerializedKernelError {
  return { code: err.code, message: err.message, details: err.details };
}

export function deserializeKernelError(data: SerializedKernelError): KernelError {
  const code = (kernelErrorCodes as readonly string[]).includes(data.code) ? data.code : "kernel_task";
  return new KernelError(code, String(data.message), data.details ?? {});
}

/** Formats a feature's values compactly for an error message: `diameter=5, at=(10, 15, 20)`. */
export function formatParameters(values: Record<string, unknown>): string {
  const fmt = (v: unknown): string => {
    if (typeof v === "number") return String(Number.isInteger(v) ? v : Number(v.toPrecision(6)));
    if (v && typeof v === "object" && !Array.isArray(v)) {
      const o = v as Record<string, unknown>;
      if ("x" in o && "y" in o && "z" in o && Object.keys(o).length === 3) return `(${fmt(o.x)}, ${fmt(o.y)}, ${fmt(o.z)})`;
      return `{ ${Object.entries(o).map(([k, x]) => `${k}=${fmt(x)}`).join(", ")} }`;
    }
    if (Array.isArray(v)) return `[${v.map(fmt).join(", ")}]`;
    return String(v);
  };
  return Object.entries(values)
    .filter(([k]) => k !== "kind" && k !== "label")
    .map(([k, v]) => `${k}=${fmt(v)}`)
    .join(", ");
}

/** "feature 3 (hole \"clamp-hole\")" */
export function describeFeature(index: number, kind: string, id?: string): string {
  return `feature ${index} (${kind}${id ? ` "${id}"` : ""})`;
}
