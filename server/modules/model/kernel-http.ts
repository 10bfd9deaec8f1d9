/**
 * How kernel failures reach HTTP clients: the part could not be built from these parameters → 400 with the
 * part and feature as the detail path; the kernel was busy, slow, restarted or absent → 503. The messages
 * are the kernel's own sentences (they name the part, feature and values, never internals).
 */
import type { ResolvedPart } from "@/engine/parts/features";
import { KernelError } from "@server/kernel";
import { validatePartForKernel } from "@server/kernel/validate";
import { HttpError } from "@server/lib/errors";

export function kernelErrorToHttp(err: unknown): unknown {
  if (!(err instanceof KernelError)) return err;
  const d = err.details;
  const path = d.partId !== undefined ? `parts.${d.partId}${d.featureIndex !== undefined ? `.features.${d.featureIndex}` : ""}` : "";
  switch (err.code) {
    case "kernel_input":
    case "kernel_build":
    case "kernel_invalid":
      return new HttpError("validation_error", err.message, [{ path, message: err.message }]);
    case "kernel_timeout":
      return new HttpError("service_unavailable", "Building the solid model took too long and was stopped; try again, or check the parameters.");
    case "kernel_busy":
      return new HttpError("service_unavailable", "The solid modeller is busy; try again in a moment.");
    case "kernel_crash":
    case "kernel_closed":
      return new HttpError("service_unavailable", "The solid modeller restarted while building this model; try again.");
    case "kernel_task":
      return new HttpError("internal_error", "The solid modeller could not finish this job.");
  }
}

/**
 * The kernel's own pre-check of every part on the web thread, before any job is queued: a refusal becomes
 * the 400 of {@link kernelErrorToHttp}. `schema: false` skips the schema re-parse for engine-made parts.
 */
export function guardPartsForKernel(parts: readonly ResolvedPart[], options: { schema?: boolean } = {}): void {
  try {
    for (const part of parts) validatePartForKernel(part, options);
  } catch (err) {
    throw kernelErrorToHttp(err);
  }
}
