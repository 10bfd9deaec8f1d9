import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError } from "./api-error";

/**
 * Puts a server's per-field problems onto the form's fields. Returns the message for the form as a
 * whole: problems with no matching field, or the error's own message when no field took it.
 */
export function applyServerFieldErrors<T extends FieldValues>(
  error: unknown,
  fields: ReadonlyArray<Path<T>>,
  setError: UseFormSetError<T>,
): string | null {
  if (!(error instanceof ApiError)) return "Something went wrong. Try again.";
  let placed = 0;
  const leftovers: string[] = [];
  for (const detail of error.details) {
    const field = fields.find((f) => f === detail.path);
    if (field) {
      setError(field, { type: "server", message: detail.message });
      placed += 1;
    } else if (detail.path === "") {
      leftovers.push(detail.message);
    }
  }
  if (leftovers.length > 0) return leftovers.join(" ");
  return placed > 0 ? null : error.message;
}
