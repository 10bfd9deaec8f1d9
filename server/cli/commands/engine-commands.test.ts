/**
 * The engine commands of the CLI, run in-process (stdout captured) and once as a real process for the exit
 * codes of the fixed contract.
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CliUsageError } from "../args";
import { calcCommand } from "./calc";
import { evaluateCommand } from "./evaluate";
import { listCommand } from "./list";
import { validateCommand } from "./validate";

async function capture(run: () => Promise<number>): Promise<{ code: number; out: string }> {
  let out = "";
  const spy = vi.spyOn(process.stdout, "write").mockImplementation((chunk: string | Uint8Array) => {
    out += String(chunk);
    return true;
  });
  try {
    return { code: await run(), out };
  } finally {
    spy.mockRestore();
  }
}
afterEach(() => vi.restoreAllMocks());

describe("list", () => {
  it("prints [{ id, version, name, family }]", async () => {
    const { code, out } = await capture(() => listCommand.run([]));
    expect(code).toBe(0);
    expect(JSON.parse(out)).toContainEqual({ id: "cam-vise-stop", version: "1.0.0", name: "Cam-lock vise stop", family: "stop" });
  });
});

describe("evaluate", () => {
  it("prints exactly the seven contract keys and exits 0 when ok", async () => {
    const { code, out } = await capture(() => evaluateCommand.run(["cam-vise-stop", "--set", "handForce=40", "--units", "mm"]));
    expect(code).toBe(0);
    const result = JSON.parse(out);
    expect(Object.keys(result)).toEqual(["template", "units", "parameters", "derived", "analyses", "checks", "ok"]);
    expect(result.parameters.handForce).toBe(40);
    expect(Object.keys(result.checks[0]).sort()).toEqual(["id", "message", "parameters", "passed", "severity"]);
  });

  it("exits 1 when an error check fails", async () => {
    const { code, out } = await capture(() => evaluateCommand.run(["cam-vise-stop", "--set", "jawThickness=35"]));
    expect(code).toBe(1);
    expect(JSON.parse(out).ok).toBe(false);
  });

  it("reads inch values and booleans by the parameter's kind", async () => {
    const { out } = await capture(() => evaluateCommand.run(["cam-vise-stop", "--units", "in", "--set", "jawThickness=0.75", "--set=camMaterial=mild-steel"]));
    const result = JSON.parse(out);
    expect(result.units).toBe("in");
    expect(result.parameters).toMatchObject({ jawThickness: 0.75, camMaterial: "mild-steel" });
  });

  it.each([
    [["cam-vise-stop", "--set", "jawThickness=abc"], /jawThickness \(Jaw thickness\) must be a length in mm between 8–40 mm; got "abc"/],
    [["cam-vise-stop", "--set", "nope=1"], /"nope" is not a parameter/],
    [["cam-vise-stop", "--set", "jawThickness"], /--set needs key=value/],
    [["cam-vise-stop", "--units", "cm"], /--units must be mm or in/],
    [["no-such-template"], /There is no template "no-such-template"/],
    [[], /Name a template/],
    [["cam-vise-stop", "--colour", "red"], /Unknown option: --colour/],
  ])("refuses bad input %j (exit 2)", async (args, pattern) => {
    await expect(capture(() => evaluateCommand.run(args))).rejects.toThrow(CliUsageError);
    await expect(capture(() => evaluateCommand.run(args))).rejects.toThrow(pattern);
  });
});

describe("calc", () => {
  it("takes the schema's keys in kebab-case (eccentric-cam)", async () => {
    const { code, out } = await capture(() =>
      calcCommand.run(["eccentric-cam", "--diameter", "20", "--eccentricity", "1", "--pivot-diameter", "8", "--lever-length", "60", "--hand-force", "30", "--mu-contact", "0.1", "--mu-pivot", "0.1", "--gap", "1"]),
    );
    expect(code).toBe(0);
    const r = JSON.parse(out);
    for (const key of ["throwMm", "engageAngleDeg", "riseAngleDeg", "maxRiseAngleDeg", "selfLocking", "selfLockMargin", "torqueNm", "clampForceN", "curve"]) expect(r).toHaveProperty(key);
    expect(r.throwMm).toBe(2);
  });

  // ISO 261 / ISO 724 (from memory): M6 coarse pitch 1 mm, D1 = 4.917 mm; tap drill 5.0 mm (common tap-drill tables).
  it("gives thread data for --designation M6", async () => {
    const r = JSON.parse((await capture(() => calcCommand.run(["thread", "--designation", "M6"]))).out);
    expect(r).toMatchObject({ pitch: 1, majorDiameter: 6, tapDrill: 5 });
    expect(r.minorDiameterInternal).toBeCloseTo(4.917, 3);
  });

  // ISO 2768-1 Table 1 (from memory): class m, over 6 up to 30 mm: ±0.2 mm.
  it("gives the general tolerance for --size 30 --class m", async () => {
    expect(JSON.parse((await capture(() => calcCommand.run(["general-tolerance", "--size", "30", "--class", "m"]))).out).plusMinus).toBe(0.2);
  });

  it.each([
    [["fit", "--size", "eight", "--hole", "H7", "--shaft", "g6"], /--size: /],
    [["fit", "--size", "8", "--hole", "H7", "--shaft", "g6", "--colour", "red"], /no input --colour/],
    [["eccentric-cam", "--diameter", "20", "--eccentricity", "12", "--pivot-diameter", "8", "--lever-length", "60", "--hand-force", "30", "--gap", "1"], /\(--eccentricity\)/],
    [["warp-drive"], /There is no calculator "warp-drive"/],
  ])("refuses bad input %j (exit 2)", async (args, pattern) => {
    await expect(capture(() => calcCommand.run(args))).rejects.toThrow(pattern);
  });
});

describe("validate", () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "jw-validate-"));
  it("says ok for the built-in template", async () => {
    const { code, out } = await capture(() => validateCommand.run([path.resolve(__dirname, "../../../templates/stops/cam-vise-stop.yaml")]));
    expect([code, out]).toEqual([0, "ok\n"]);
  });

  it("prints one reason per line and exits 1", async () => {
    const file = path.join(dir, "bad.yaml");
    fs.writeFileSync(file, "formatVersion: 1\nid: Bad Id\nversion: 1\n");
    const { code, out } = await capture(() => validateCommand.run([file]));
    expect(code).toBe(1);
    expect(out).toMatch(/^id: An id is lower case letters/m);
    expect(out).toMatch(/^version: /m);
    expect(out).toMatch(/^parameters: /m);
  });

  it("refuses a missing file (exit 2)", async () => {
    await expect(capture(() => validateCommand.run([path.join(dir, "missing.yaml")]))).rejects.toThrow(/no such file/);
  });
});

describe("the real command line", () => {
  const cli = (args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "server/cli/index.ts", ...args], { cwd: path.resolve(__dirname, "../../.."), encoding: "utf8" });
  it(
    "exits 0 / 1 / 2 as the contract says",
    () => {
      const ok = cli(["evaluate", "cam-vise-stop"]);
      expect(ok.status).toBe(0);
      expect(JSON.parse(ok.stdout).ok).toBe(true);
      expect(cli(["evaluate", "cam-vise-stop", "--set", "gap=3"]).status).toBe(1); // g ≥ 2e: the cam never engages
      const bad = cli(["evaluate", "cam-vise-stop", "--set", "gap=99"]);
      expect(bad.status).toBe(2);
      expect(bad.stderr).toMatch(/gap \(Set gap\) must be between 0.1–5 mm; got 99 mm/);
    },
    120_000,
  );
});
