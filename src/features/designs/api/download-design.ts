import { ApiError, apiErrorFromResponse } from "@/lib/api-error";
import type { designExportFormats } from "@/shared/designs";
import type { UnitPreference } from "@/shared/profiles";

export type DesignExportFormat = (typeof designExportFormats)[number];

export interface DesignExportOptions {
  units?: UnitPreference;
  projection?: "first" | "third";
  /** One of the user's machines: its top spindle speed goes on the operation sheet. */
  machineId?: number;
}

/** `GET /api/designs/:id/export?format=…` with the chosen options. */
export function designExportUrl(
  id: number,
  format: DesignExportFormat,
  options: DesignExportOptions = {},
): string {
  const q = new URLSearchParams({ format });
  if (options.units) q.set("units", options.units);
  if (options.projection) q.set("projection", options.projection);
  if (options.machineId !== undefined) q.set("machine", String(options.machineId));
  return `/api/designs/${id}/export?${q.toString()}`;
}

/** The file name the server gave (Content-Disposition), or a fallback. */
function fileNameOf(response: Response, fallback: string): string {
  const plain = /filename="?([^";]+)"?/i.exec(response.headers.get("content-disposition") ?? "");
  return plain?.[1] ?? fallback;
}

/**
 * Fetches one file of a saved design. A binary answer cannot go through the JSON wrapper
 * (src/lib/api-client), but a refusal becomes the same typed ApiError, so the page shows the server's words.
 */
export async function downloadDesignFile(
  id: number,
  format: DesignExportFormat,
  options: DesignExportOptions = {},
  signal?: AbortSignal,
): Promise<{ blob: Blob; fileName: string }> {
  let response: Response;
  try {
    response = await fetch(designExportUrl(id, format, options), { credentials: "same-origin", signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === "AbortError") throw cause;
    throw new ApiError(0, "network_error", "Cannot reach the server. Check the connection and try again.");
  }
  if (!response.ok) throw await apiErrorFromResponse(response);
  return { blob: await response.blob(), fileName: fileNameOf(response, `design-${id}.${format}`) };
}
