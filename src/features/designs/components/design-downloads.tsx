import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { isApiError } from "@/lib/api-error";
import type { Design } from "@/shared/designs";
import { downloadDesignFile, type DesignExportFormat } from "../api/download-design";
import { saveBlob } from "../model/save-blob";

/** A machine the operation sheet can be made for (from the user's machine profiles). */
export interface MachineChoice {
  id: number;
  name: string;
  maxSpindleRpm: number;
}

const files: Array<{ format: DesignExportFormat; label: string }> = [
  { format: "pdf", label: "Drawing pack (PDF)" },
  { format: "zip", label: "Everything (ZIP)" },
  { format: "svg", label: "Sheet (SVG)" },
  { format: "dxf", label: "Outline (DXF)" },
  { format: "step", label: "Solid (STEP)" },
  { format: "stl", label: "Mesh (STL)" },
  { format: "csv", label: "Cut list (CSV)" },
];

/**
 * The files of a saved design, drawn on the version it is pinned to, in the units it works in. A design
 * pinned to an older version must be saved on the current one first: the server only draws that.
 */
export function DesignDownloads({
  design,
  machines,
}: {
  design: Design;
  machines: readonly MachineChoice[];
}) {
  const id = useId();
  const [machineId, setMachineId] = useState<string>("");
  const [busy, setBusy] = useState<DesignExportFormat | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const abort = useRef<AbortController | null>(null);

  if (design.templateName === null) return null;
  if (design.newerVersion) {
    return (
      <p className="text-sm text-steel-700">
        Files are drawn on the current template version only: see what changes in version{" "}
        {design.newerVersion} (above), open the design on it and save it there, then download.
      </p>
    );
  }

  async function get(format: DesignExportFormat) {
    abort.current?.abort();
    const ctl = new AbortController();
    abort.current = ctl;
    setBusy(format);
    setProblem(null);
    setDone(null);
    try {
      const { blob, fileName } = await downloadDesignFile(
        design.id,
        format,
        machineId ? { machineId: Number(machineId) } : {},
        ctl.signal,
      );
      saveBlob(blob, fileName);
      setDone(`Downloaded ${fileName}.`);
    } catch (error) {
      if (error instanceof DOMException && error.name === "AbortError") return;
      setProblem(isApiError(error) ? error.message : "The file could not be made. Try again.");
    } finally {
      if (abort.current === ctl) setBusy(null);
    }
  }

  return (
    <div className="space-y-3">
      {machines.length > 0 ? (
        <div className="flex flex-wrap items-center gap-2">
          <label htmlFor={`${id}-machine`} className="text-sm font-semibold">
            Operation sheet for
          </label>
          <select
            id={`${id}-machine`}
            value={machineId}
            onChange={(e) => setMachineId(e.target.value)}
            className="min-h-11 rounded-md border border-steel-300 bg-white px-2"
          >
            <option value="">no particular machine</option>
            {machines.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name} (up to {m.maxSpindleRpm} rpm)
              </option>
            ))}
          </select>
        </div>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {files.map((f) => (
          <Button key={f.format} variant="secondary" disabled={busy !== null} onClick={() => get(f.format)}>
            {f.label}
          </Button>
        ))}
      </div>
      <div aria-live="polite" className="space-y-2">
        {busy ? (
          <Spinner
            label={`Making the ${files.find((f) => f.format === busy)?.label ?? busy}; a drawing pack can take a minute`}
          />
        ) : null}
        {done ? <Notice tone="holds">{done}</Notice> : null}
        {problem ? <Notice tone="fault">{problem}</Notice> : null}
      </div>
      <p className="text-sm text-steel-600">
        Drawings are in {design.units === "in" ? "inches" : "millimetres"}. If an error check fails, every
        sheet is stamped “NOT CHECKED — ERRORS”: open the design in the configurator to see which check and
        why.
      </p>
    </div>
  );
}
