/** What every download route does with req/res: the title-block date, cancelling on disconnect, sending the file. */
import type { Response } from "express";
import type { ExportFile } from "@server/exporters/build-export";

/** Today's date as printed in the title block (the engine reads no clock; the server does). */
export function today(): string {
  return new Date().toISOString().slice(0, 10);
}

/** Cancels the kernel work when the client goes away before the file is ready. */
export function abortOnClose(res: Response): AbortSignal {
  const ctl = new AbortController();
  res.on("close", () => {
    if (!res.writableFinished) ctl.abort();
  });
  return ctl.signal;
}

/** Sends a finished file as an attachment, never cached or sniffed. */
export function sendDownload(res: Response, file: ExportFile): void {
  res.status(200);
  res.set("Content-Type", file.contentType);
  res.set("Content-Length", String(file.body.length));
  res.set("Content-Disposition", `attachment; filename="${file.fileName}"`);
  res.set("Cache-Control", "private, no-store");
  res.set("X-Content-Type-Options", "nosniff");
  res.end(file.body);
}
