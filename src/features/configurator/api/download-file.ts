import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { ApiError, apiErrorFromResponse } from "@/lib/api-error";

export const exportFormats = ["pdf", "svg", "dxf", "step", "stl", "csv", "zip"] as const;
export type ExportFormat = (typeof exportFormats)[number];
export type Projection = "first" | "third";

/** `GET /api/templates/:id/export?format=…&units=…&projection=…&<param>=…` for the current configuration. */
export function exportUrl(
  templateId: string,
  format: ExportFormat,
  parameters: Readonly<Record<string, ParameterValue>>,
  units: LengthUnit,
  projection: Projection,
): string {
  const query = new URLSearchParams({ format, units, projection });
  for (const [key, value] of Object.entries(parameters)) query.set(key, String(value));
  return `/api/templates/${encodeURIComponent(templateId)}/export?${query.toString()}`;
}

export interface DownloadProgress {
  receivedBytes: number;
  /** From Content-Length; null when the server streams without announcing a size. */
  totalBytes: number | null;
}

/** The file name the server gave (Content-Disposition), or a fallback. */
function fileNameOf(response: Response, fallback: string): string {
  const header = response.headers.get("content-disposition") ?? "";
  const star = /filename\*=UTF-8''([^;]+)/i.exec(header);
  if (star?.[1]) return decodeURIComponent(star[1]);
  const plain = /filename="?([^";]+)"?/i.exec(header);
  return plain?.[1] ?? fallback;
}

/**
 * Fetches a download with progress. Binary answers cannot go through the JSON wrapper (src/lib/api-client),
 * but failures become the same typed ApiError, so the page shows the server's own message.
 */
export async function fetchDownload(
  url: string,
  fallbackName: string,
  onProgress: (progress: DownloadProgress) => void,
  signal?: AbortSignal,
): Promise<{ blob: Blob; fileName: string }> {
  let response: Response;
  try {
    response = await fetch(url, { credentials: "same-origin", signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === "AbortError") throw cause;
    throw new ApiError(0, "network_error", "Cannot reach the server. Check the connection and try again.");
  }
  if (!response.ok) throw await apiErrorFromResponse(response);
  const totalText = response.headers.get("content-length");
  const totalBytes = totalText && Number(totalText) > 0 ? Number(totalText) : null;
  const chunks: BlobPart[] = [];
  let receivedBytes = 0;
  onProgress({ receivedBytes, totalBytes });
  if (response.body) {
    const reader = response.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      chunks.push(value);
      receivedBytes += value.byteLength;
      onProgress({ receivedBytes, totalBytes });
    }
  } else {
    const buffer = await response.arrayBuffer();
    chunks.push(buffer);
    onProgress({ receivedBytes: buffer.byteLength, totalBytes });
  }
  const type = response.headers.get("content-type") ?? "application/octet-stream";
  return { blob: new Blob(chunks, { type }), fileName: fileNameOf(response, fallbackName) };
}

/** Hands a fetched file to the browser as a download. */
export function saveBlob(blob: Blob, fileName: string): void {
  const href = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = href;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(href), 10_000);
}
