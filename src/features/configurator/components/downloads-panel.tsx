import { useRef, useState } from "react";
import { Link } from "react-router";
import { Button, buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { ApiError } from "@/lib/api-error";
import {
  exportUrl,
  fetchDownload,
  saveBlob,
  type DownloadProgress,
  type ExportFormat,
  type Projection,
} from "../api/download-file";

const files: Array<{ format: ExportFormat; label: string; detail: string }> = [
  { format: "pdf", label: "Drawing (PDF)", detail: "every sheet, cut list and operation sheet" },
  { format: "zip", label: "Whole pack (ZIP)", detail: "every file below in one archive" },
  { format: "svg", label: "Drawing (SVG)", detail: "sheets as vector images" },
  { format: "dxf", label: "Outlines (DXF)", detail: "1:1, one layer per line type" },
  { format: "step", label: "Solid model (STEP)", detail: "for CAM" },
  { format: "stl", label: "Mesh (STL)", detail: "for printing or viewing" },
  { format: "csv", label: "Cut list (CSV)", detail: "stock sizes and weights" },
];

type Job = { format: ExportFormat; progress: DownloadProgress | null } | null;

const kb = (bytes: number) => `${Math.max(1, Math.round(bytes / 1024))} KB`;

/**
 * The download pack for the current configuration (signed-in users). Each file is fetched with progress
 * shown; when error checks fail the person is told before downloading that the drawing carries the
 * "NOT CHECKED — ERRORS" stamp, and why.
 */
export function DownloadsPanel({
  templateId,
  parameters,
  units,
  signedIn,
  failingErrors,
  signInHref,
}: {
  templateId: string;
  /** In the user's units; null while a field has a problem. */
  parameters: Record<string, ParameterValue> | null;
  units: LengthUnit;
  signedIn: boolean;
  /** Messages of the error checks that fail. */
  failingErrors: readonly string[];
  signInHref: string;
}) {
  const [projection, setProjection] = useState<Projection>("first");
  const [job, setJob] = useState<Job>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const abort = useRef<AbortController | null>(null);

  if (!signedIn) {
    return (
      <section
        aria-labelledby="downloads-heading"
        className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
      >
        <h2 id="downloads-heading" className="text-xl">
          Drawings and files
        </h2>
        <p className="mt-1 text-steel-700">
          Sign in to download the drawing, cut list, STEP and STL files for this configuration, and to save
          it.
        </p>
        <Link to={signInHref} className={buttonClasses("primary", "mt-3")}>
          Sign in to download
        </Link>
      </section>
    );
  }

  async function download(format: ExportFormat) {
    if (!parameters) return;
    abort.current?.abort();
    const controller = new AbortController();
    abort.current = controller;
    setProblem(null);
    setDone(null);
    setJob({ format, progress: null });
    try {
      const url = exportUrl(templateId, format, parameters, units, projection);
      const { blob, fileName } = await fetchDownload(
        url,
        `${templateId}.${format}`,
        (progress) => setJob({ format, progress }),
        controller.signal,
      );
      saveBlob(blob, fileName);
      setDone(`${fileName} downloaded (${kb(blob.size)}).`);
    } catch (error) {
      if (error instanceof DOMException && error.name === "AbortError") return;
      setProblem(error instanceof ApiError ? error.message : "The download failed. Try again.");
    } finally {
      if (abort.current === controller) setJob(null);
    }
  }

  const busy = job !== null;
  const pct = job?.progress?.totalBytes
    ? Math.round((100 * job.progress.receivedBytes) / job.progress.totalBytes)
    : null;
  return (
    <section
      aria-labelledby="downloads-heading"
      className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
    >
      <h2 id="downloads-heading" className="text-xl">
        Drawings and files
      </h2>
      {failingErrors.length > 0 ? (
        <Notice tone="caution" className="mt-2" title={`The drawing will be stamped “NOT CHECKED — ERRORS”`}>
          <p>
            {failingErrors.length === 1
              ? "One error check fails:"
              : `${failingErrors.length} error checks fail:`}
          </p>
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {failingErrors.map((m) => (
              <li key={m}>{m}</li>
            ))}
          </ul>
          <p className="mt-1">You can still download it, but fix the errors before making the part.</p>
        </Notice>
      ) : null}
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <label htmlFor="projection" className="font-semibold text-steel-900">
          Projection
        </label>
        <select
          id="projection"
          value={projection}
          onChange={(e) => setProjection(e.target.value as Projection)}
          className="min-h-11 rounded-md border border-steel-300 bg-white px-3"
        >
          <option value="first">First-angle projection</option>
          <option value="third">Third-angle projection</option>
        </select>
      </div>
      <ul className="mt-3 grid gap-2 sm:grid-cols-2 xl:grid-cols-3">
        {files.map((f) => (
          <li key={f.format}>
            <Button
              variant={f.format === "pdf" ? "primary" : "secondary"}
              className="w-full flex-col items-start gap-0 text-left"
              disabled={!parameters || busy}
              onClick={() => void download(f.format)}
              aria-describedby={`download-${f.format}-detail`}
            >
              <span>{f.label}</span>
              <span id={`download-${f.format}-detail`} className="text-sm font-normal opacity-80">
                {f.detail}
              </span>
            </Button>
          </li>
        ))}
      </ul>
      <div aria-live="polite" className="mt-3 min-h-6">
        {job ? (
          <div className="space-y-1">
            <p className="text-steel-800">
              {job.progress === null
                ? `Making the ${files.find((f) => f.format === job.format)?.label ?? job.format}…`
                : pct !== null
                  ? `Receiving: ${pct} %`
                  : `Receiving: ${kb(job.progress.receivedBytes)}`}
            </p>
            <div
              role="progressbar"
              aria-label="Download progress"
              aria-valuemin={0}
              aria-valuemax={100}
              {...(pct !== null ? { "aria-valuenow": pct } : {})}
              className="h-2 overflow-hidden rounded bg-steel-200"
            >
              <div
                className={
                  pct === null
                    ? "h-full w-1/3 animate-pulse bg-spark-500 motion-reduce:animate-none"
                    : "h-full bg-spark-500"
                }
                style={pct === null ? undefined : { width: `${pct}%` }}
              />
            </div>
          </div>
        ) : done ? (
          <p className="text-holds-700">{done}</p>
        ) : null}
      </div>
      {problem ? (
        <Notice tone="fault" className="mt-2" title="Download failed">
          {problem}
        </Notice>
      ) : null}
      {!parameters ? <p className="mt-2 text-sm text-steel-600">Fix the marked fields to download.</p> : null}
    </section>
  );
}
