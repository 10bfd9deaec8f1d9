/**
 * The kernel pool's guarantees, exercised on real worker threads: failures become clear errors for the one
 * request, hung and crashed workers are replaced, a worker past its heap limit is retired and replaced,
 * and bad parts never reach the kernel. (No timing assertions: the time limits here only choose which
 * behaviour is exercised.)
 */
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ResolvedPart } from "@/engine/parts/features";
import { createKernelPool, KernelError, type KernelPool, type ModelTaskOutput, type InfoTaskOutput } from "@server/kernel";

const failingTasks = fileURLToPath(new URL("./fixtures/failing-tasks.ts", import.meta.url));

const block: ResolvedPart = {
  id: "stop-body",
  name: "Stop body",
  material: "mild-steel",
  features: [
    { kind: "block", size: { x: 40, y: 20, z: 15 } },
    { kind: "hole", id: "rod-hole", at: { x: 10, y: 10, z: 15 }, direction: "-z", diameter: 5, through: true },
  ],
};

async function failure(p: Promise<unknown>): Promise<KernelError> {
  try {
    await p;
  } catch (err) {
    return err as KernelError;
  }
  throw new Error("expected the task to fail");
}

describe("kernel pool", () => {
  let pool: KernelPool;
  beforeAll(async () => {
    pool = createKernelPool({ poolSize: 1, warmupRounds: 0, taskTimeoutMs: 60_000, extraTaskModules: [failingTasks] });
    await pool.ready();
  });
  afterAll(async () => {
    await pool?.close();
  });

  it("builds a part and transfers its mesh as typed arrays", async () => {
    const out = await pool.run<ModelTaskOutput>("model", { parts: [block] });
    const p = out.parts[0]!;
    // 40 × 20 × 15 less a Ø5 through hole (π/4·d²·h).
    expect(p.volumeMm3).toBeCloseTo(40 * 20 * 15 - (Math.PI / 4) * 25 * 15, 3);
    expect(p.mesh?.positions).toBeInstanceOf(Float32Array);
    expect(p.mesh?.indices).toBeInstanceOf(Uint32Array);
    expect(p.mesh!.indices.length % 3).toBe(0);
  });

  it("a kernel exception inside the worker comes back as a readable Error", async () => {
    const err = await failure(pool.run("test-kernel-throw", {}));
    expect(err).toBeInstanceOf(KernelError);
    expect(err.code).toBe("kernel_task");
    expect(err.message).toContain("test-kernel-throw");
    expect(err.message).toContain("Standard_ConstructionError");
  });

  it("a part that falls apart names the part, the feature and its values", async () => {
    const bad: ResolvedPart = { ...block, features: [block.features[0]!, { kind: "hole", id: "rod-hole", at: { x: 20, y: 10, z: 15 }, direction: "-z", diameter: 30, through: true }] };
    const err = await failure(pool.run("model", { parts: [bad] }));
    expect(err.code).toBe("kernel_invalid");
    expect(err.message).toContain('Part "stop-body" (Stop body), feature 1 (hole "rod-hole")');
    expect(err.message).toContain("diameter=30");
    expect(err.details).toMatchObject({ partId: "stop-body", featureIndex: 1, featureKind: "hole" });
  });

  it("a degenerate part is refused before the kernel and the worker stays", async () => {
    const before = await pool.run<InfoTaskOutput>("info", {});
    const flat: ResolvedPart = { ...block, features: [{ kind: "block", size: { x: 40, y: 0, z: 15 } }] };
    const err = await failure(pool.run("model", { parts: [flat] }));
    expect(err.code).toBe("kernel_input");
    expect(err.message).toContain("size.y must be at least");
    const after = await pool.run<InfoTaskOutput>("info", {});
    expect(after.threadId).toBe(before.threadId);
  });

  it("an unknown task is a clear error", async () => {
    const err = await failure(pool.run("no-such-task", {}));
    expect(err.code).toBe("kernel_task");
    expect(err.message).toContain('no kernel task "no-such-task"');
  });

  it("a hung task is stopped by its time limit, its worker replaced, and the pool keeps working", async () => {
    const before = await pool.run<InfoTaskOutput>("info", {});
    const err = await failure(pool.run("test-hang", {}, { timeoutMs: 1500 }));
    expect(err.code).toBe("kernel_timeout");
    expect(err.message).toContain("test-hang");
    const out = await pool.run<ModelTaskOutput>("model", { parts: [block] });
    expect(out.parts[0]!.valid).toBe(true);
    const after = await pool.run<InfoTaskOutput>("info", {});
    expect(after.threadId).not.toBe(before.threadId);
    expect(pool.stats().timedOut).toBe(1);
  });

  it("a worker that dies mid-task gives kernel_crash and is replaced", async () => {
    const err = await failure(pool.run("test-crash", {}));
    expect(err.code).toBe("kernel_crash");
    const out = await pool.run<InfoTaskOutput>("info", {});
    expect(out.heapBytes).toBeGreaterThan(0);
  });
});

describe("heap-limit retirement", () => {
  let pool: KernelPool;
  beforeAll(async () => {
    // Every worker starts above a 1 MB limit, so each is retired after one task.
    pool = createKernelPool({ poolSize: 1, warmupRounds: 0, heapLimitMb: 1 });
    await pool.ready();
  });
  afterAll(async () => {
    await pool?.close();
  });

  it("a worker past the limit is replaced by a fresh one and work goes on", async () => {
    const first = await pool.run<InfoTaskOutput>("info", {});
    const second = await pool.run<InfoTaskOutput>("info", {});
    expect(second.threadId).not.toBe(first.threadId);
    const out = await pool.run<ModelTaskOutput>("model", { parts: [block], mesh: false });
    expect(out.parts[0]!.valid).toBe(true);
    expect(pool.stats().retired).toBeGreaterThanOrEqual(2);
    expect(pool.stats().crashed).toBe(0);
  });
});
