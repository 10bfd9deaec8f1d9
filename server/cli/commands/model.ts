/**
 * `model <template-id> [--set key=value]… [--units mm|in]`: builds every part with the solid kernel and
 * prints `{ parts: [{ id, name, volumeMm3, massKg, bbox: { x, y, z }, valid }] }` — volume, box and validity
 * from the exact solid (OpenCascade), mass from that volume and the catalogue density. Lengths out are mm
 * whatever `--units` says (it sets the unit of the `--set` values). A part that cannot be built is listed
 * with `valid: false`, null numbers and an `error` sentence, and the exit code is 1; bad input exits 2.
 * No database; the kernel runs in this process.
 */
import { evaluateTemplate, ParameterResolutionError } from "@/engine";
import { partMassKgOrUndefined } from "@/engine/parts/analytic";
import { createInProcessKernel, KernelError, type ModelTaskOutput } from "@server/kernel";
import { CliUsageError, parseArgs, rejectUnknown, type CliCommand } from "../args";
import { templateArguments } from "./evaluate";

const USAGE = "model <template-id> [--set key=value]… [--units mm|in]";

const round = (v: number, places: number) => Math.round(v * 10 ** places) / 10 ** places;

interface PartLine {
  id: string;
  name: string;
  volumeMm3: number | null;
  massKg: number | null;
  bbox: { x: number; y: number; z: number } | null;
  valid: boolean;
  error?: string;
}

export const modelCommand: CliCommand = {
  name: "model",
  usage: USAGE,
  summary: "Build every part with the solid kernel: volume, mass, bounding box and validity per part as JSON (exit 1 when a part cannot be built).",
  async run(args) {
    const parsed = parseArgs(args);
    rejectUnknown(parsed, ["set", "units"]);
    const { compiled, units, parameters } = templateArguments(parsed, USAGE);
    let evaluation;
    try {
      evaluation = evaluateTemplate(compiled, { parameters, ...(units ? { units } : {}) });
    } catch (err) {
      if (err instanceof ParameterResolutionError) throw new CliUsageError(err.issues.map((i) => i.message).join("\n"));
      throw err;
    }

    const kernel = createInProcessKernel();
    const blocked = new Map<string, string>();
    for (const issue of evaluation.geometryIssues) if (issue.blocking && !blocked.has(issue.partId)) blocked.set(issue.partId, issue.message);
    const lines: PartLine[] = [];
    try {
      for (const part of evaluation.parts) {
        const refused = blocked.get(part.id);
        if (refused !== undefined) {
          lines.push({ id: part.id, name: part.name, volumeMm3: null, massKg: null, bbox: null, valid: false, error: refused });
          continue;
        }
        try {
          const out = await kernel.run<ModelTaskOutput>("model", { parts: [part], mesh: false });
          const p = out.parts[0]!;
          const mass = partMassKgOrUndefined(part, p.volumeMm3);
          lines.push({
            id: part.id,
            name: part.name,
            volumeMm3: round(p.volumeMm3, 3),
            massKg: mass === undefined ? null : round(mass, 6),
            bbox: { x: round(p.bbox.max[0] - p.bbox.min[0], 4), y: round(p.bbox.max[1] - p.bbox.min[1], 4), z: round(p.bbox.max[2] - p.bbox.min[2], 4) },
            valid: p.valid,
          });
        } catch (err) {
          if (!(err instanceof KernelError)) throw err;
          lines.push({ id: part.id, name: part.name, volumeMm3: null, massKg: null, bbox: null, valid: false, error: err.message });
        }
      }
    } finally {
      await kernel.close();
    }
    // Parts the evaluator dropped entirely (no usable base) are reported too.
    for (const s of evaluation.partSummaries) {
      if (!lines.some((l) => l.id === s.id)) lines.push({ id: s.id, name: s.name, volumeMm3: null, massKg: null, bbox: null, valid: false, error: blocked.get(s.id) ?? "The part could not be resolved." });
    }
    process.stdout.write(`${JSON.stringify({ parts: lines }, null, 2)}\n`);
    return lines.every((l) => l.valid) ? 0 : 1;
  },
};
