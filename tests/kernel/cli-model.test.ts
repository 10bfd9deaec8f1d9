/**
 * The `model` CLI command (fixed contract): `{ parts: [{ id, name, volumeMm3, massKg, bbox: { x, y, z }, valid }] }`
 * with volume and validity from the kernel. Checked against the engine's analytic volumes (0.5 %) and the
 * density of the catalogue material (mass = ρ·V).
 */
import { afterEach, describe, expect, it, vi } from "vitest";
import { evaluateTemplate } from "@/engine";
import { getMaterial } from "@/engine/materials";
import { partVolumeMm3 } from "@/engine/parts/analytic";
import { CliUsageError } from "@server/cli/args";
import { modelCommand } from "@server/cli/commands/model";
import { builtInTemplates } from "@server/templates";

async function runModel(args: string[]): Promise<{ code: number; out: string }> {
  let out = "";
  const spy = vi.spyOn(process.stdout, "write").mockImplementation((chunk: string | Uint8Array) => {
    out += String(chunk);
    return true;
  });
  try {
    const code = await modelCommand.run(args);
    return { code, out };
  } finally {
    spy.mockRestore();
  }
}

afterEach(() => vi.restoreAllMocks());

describe("npm run cli -- model", () => {
  it("prints every part of the vise stop with kernel volume, mass, box and validity", async () => {
    const { code, out } = await runModel(["cam-vise-stop", "--set", "stopRodDiameter=10", "--set", "stopRodReach=50"]);
    expect(code).toBe(0);
    const result = JSON.parse(out) as { parts: { id: string; name: string; volumeMm3: number; massKg: number | null; bbox: { x: number; y: number; z: number }; valid: boolean }[] };
    const evaluation = evaluateTemplate(builtInTemplates().get("cam-vise-stop")!, { parameters: { stopRodDiameter: 10, stopRodReach: 50 } });
    expect(result.parts.map((p) => p.id)).toEqual(evaluation.parts.map((p) => p.id));
    for (const line of result.parts) {
      const part = evaluation.parts.find((p) => p.id === line.id)!;
      expect(Object.keys(line).sort()).toEqual(["bbox", "id", "massKg", "name", "valid", "volumeMm3"]);
      expect(line.valid).toBe(true);
      const analytic = partVolumeMm3(part);
      expect(Math.abs(line.volumeMm3 - analytic) / analytic).toBeLessThan(0.005);
      // m = ρ·V with ρ from the materials catalogue (kg/m³ → kg/mm³ is 1e-9).
      expect(line.massKg).toBeCloseTo(getMaterial(part.material).densityKgM3 * line.volumeMm3 * 1e-9, 5);
    }
    // The stop rod is a Ø10 bar: its box is 10 × 10 across.
    const rod = result.parts.find((p) => p.id === "stop-rod")!;
    expect(rod.bbox.x).toBeCloseTo(10, 3);
    expect(rod.bbox.y).toBeCloseTo(10, 3);
  });

  it("bad input is a usage error (exit 2 from the dispatcher)", async () => {
    await expect(runModel(["no-such-template"])).rejects.toBeInstanceOf(CliUsageError);
    await expect(runModel(["cam-vise-stop", "--set", "jawWidth=wide"])).rejects.toBeInstanceOf(CliUsageError);
    await expect(runModel(["cam-vise-stop", "--units", "ft"])).rejects.toBeInstanceOf(CliUsageError);
    await expect(runModel(["cam-vise-stop", "--colour", "red"])).rejects.toBeInstanceOf(CliUsageError);
  });
});
