/**
 * JSON answers that are already text. `res.json` would serialise again and, through `res.send`, hash the
 * body for a weak ETag; a computed POST answer is never revalidated, so that hash is wasted work on the
 * busiest route.
 */
import type { Response } from "express";

/** Sends JSON text as the answer (200 unless a status was set). */
export function sendJsonText(res: Response, text: string): void {
  res.setHeader("Content-Type", "application/json; charset=utf-8");
  res.setHeader("Content-Length", Buffer.byteLength(text));
  res.end(text);
}
