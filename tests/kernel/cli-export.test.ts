/**
 * The `export` CLI command (fixed contract): `export <template-id> [--set k=v]… [--units mm|in]
 * [--projection first|third] --format pdf|svg|dxf|step|stl|csv|zip [--part <part-id>] --out <file>`.
 * Bad input is a CliUsageError (the dispatcher prints it and exits 2; one run through the real process
 * checks that); a file is written and exit 0 when the checks pass, exit 1 when they fail (the drawings
 * then carry the NOT CHECKED stamp). The failing setting is a cam with D/e = 8, far under the handbook
 * rule of thumb for self-locking (D/e about 14–20, PRODUCT.md).
 */
import { execFile } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CliUsageError } from "@server/cli/args";
import { exportCommand, parseSets } from "@server/cli/commands/export";

const dir = mkdtempSync(path.join(os.tmpdir(), "jigwright-export-"));
const out = (name: string) => path.join(dir, name);

async function run(args: string[]): Promise<{ code: number; err: string }> {
  let err = "";
  const spy = vi.spyOn(process.stderr, "write").mockImplementation((chunk: string | Uint8Array) => {
    err += String(chunk);
    return true;
  });
  try {
    return { code: await exportCommand.run(args), err };
  } finally {
    spy.mockRestore();
  }
}

afterEach(() => vi.restoreAllMocks());

describe("bad input", () => {
  const cases: [string, string[], RegExp][] = [
    ["no template", ["--format", "pdf", "--out", "x.pdf"], /Name a template/],
    ["unknown template", ["no-such", "--format", "pdf", "--out", "x.pdf"], /There is no template "no-such". Templates: .*cam-vise-stop/],
    ["missing format", ["cam-vise-stop", "--out", "x.pdf"], /--format is required: one of pdf, svg, dxf, step, stl, csv, zip/],
    ["unknown format", ["cam-vise-stop", "--format", "docx", "--out", "x"], /--format must be one of .* not "docx"/],
    ["bad units", ["cam-vise-stop", "--format", "csv", "--units", "cm", "--out", "x"], /--units must be one of mm, in/],
    ["bad projection", ["cam-vise-stop", "--format", "csv", "--projection", "second", "--out", "x"], /--projection must be one of first, third/],
    ["missing out", ["cam-vise-stop", "--format", "csv"], /--out <file> is required/],
    ["unknown option", ["cam-vise-stop", "--format", "csv", "--out", "x", "--colour", "red"], /Unknown option: --colour/],
    ["--set without =", ["cam-vise-stop", "--format", "csv", "--out", "x", "--set", "jawThickness"], /--set needs key=value/],
    ["out of range", ["cam-vise-stop", "--format", "csv", "--out", "x", "--set", "jawThickness=500"], /jawThickness/],
    ["one-part format without a part", ["cam-vise-stop", "--format", "dxf", "--out", out("x.dxf")], /choose one of body/],
    ["a part that does not exist", ["cam-vise-stop", "--format", "csv", "--part", "nope", "--out", out("x.csv")], /There is no part "nope"/],
  ];
  for (const [name, args, message] of cases) {
    it(name, async () => {
      await expect(run(args)).rejects.toThrow(CliUsageError);
      await expect(run(args)).rejects.toThrow(message);
    });
  }

  it("the real process exits 2 and says why", async () => {
    const exec = promisify(execFile);
    const err = await exec(process.execPath, ["--import", "tsx", "server/cli/index.ts", "export", "cam-vise-stop", "--format", "docx", "--out", "x"], { cwd: process.cwd() }).then(
      () => undefined,
      (e: { code: number; stderr: string }) => e,
    );
    expect(err?.code).toBe(2);
    expect(err?.stderr).toMatch(/--format must be one of pdf, svg, dxf, step, stl, csv, zip/);
  }, 60_000);
});

describe("files", () => {
  it("--set values are read as numbers, true/false or text", () => {
    expect(parseSets(["jawThickness=25", "rodMaterial=brass", "flag=true"])).toEqual({ jawThickness: 25, rodMaterial: "brass", flag: true });
  });

  it("writes the cut list (exit 0) in the chosen units", async () => {
    const file = out("cut.csv");
    const { code } = await run(["cam-vise-stop", "--format", "csv", "--units", "in", "--set", "jawThickness=0.75", "--out", file]);
    expect(code).toBe(0);
    expect(readFileSync(file, "utf8").split(/\r\n/)[0]).toMatch(/\(in\)/);
  });

  it("--units in: the template's notes show their lengths in decimal inches (0.01 mm = .0004 in, 1 in = 25.4 mm)", async () => {
    const file = out("cam-in.svg");
    const { code } = await run(["cam-vise-stop", "--format", "svg", "--part", "cam", "--units", "in", "--out", file]);
    expect(code).toBe(0);
    const svg = readFileSync(file, "utf8");
    // "Bore the eccentric hole in a four-jaw chuck, dialled to within {0.01:len} of the offset."
    expect(svg).toMatch(/within[\s\S]{0,80}\.0004/);
    expect(svg).not.toMatch(/0\.01 mm/);
    expect(svg).not.toMatch(/:len/);
    expect(svg).toContain("Dimensions in inches");
  }, 120_000);

  it("writes a part's SVG through the kernel; failing checks give exit 1 and a warning", async () => {
    const file = out("washer.svg");
    const { code, err } = await run(["cam-vise-stop", "--format", "svg", "--part", "washer", "--set", "camEccentricity=2.5", "--projection", "third", "--out", file]);
    expect(code).toBe(1);
    expect(err).toMatch(/error check.*failed.*NOT CHECKED/s);
    const svg = readFileSync(file, "utf8");
    expect(svg.startsWith("<svg ")).toBe(true);
    expect(svg).toContain("NOT CHECKED — ERRORS");
    expect(svg).toContain("Projection: third angle");
  }, 120_000);
});
