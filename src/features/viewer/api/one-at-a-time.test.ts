import { describe, expect, it } from "vitest";
import { createSerialQueue } from "./one-at-a-time";

describe("one-at-a-time queue for catalogue pictures", () => {
  it("runs jobs in order, never two at once, and drops a job whose signal aborted while it waited", async () => {
    const run = createSerialQueue();
    const log: string[] = [];
    let running = 0;
    const job = (name: string) => async () => {
      running += 1;
      expect(running).toBe(1);
      log.push(`start ${name}`);
      await new Promise((r) => setTimeout(r, 5));
      log.push(`end ${name}`);
      running -= 1;
      return name;
    };
    const left = new AbortController();
    const a = run(job("a"));
    const b = run(job("b"), left.signal);
    const c = run(job("c"));
    left.abort();
    expect(await a).toBe("a");
    await expect(b).rejects.toMatchObject({ name: "AbortError" });
    expect(await c).toBe("c");
    expect(log).toEqual(["start a", "end a", "start c", "end c"]);
  });
});
