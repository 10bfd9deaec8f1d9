import { expandPattern } from "@/engine/parts/patterns";
import type { ToolBuilder, ToolResult } from "./types";

/**
 * `count` copies about the axis through `centre` (parallel to the copied feature's direction), `angleDeg`
 * apart (default 360° / count). Copies are the engine's expansion (`at` turned about the axis; copy 0 is
 * the feature itself), the same list the drawings and the analytic volume use.
 */
export const circularPatternBuilder: ToolBuilder<"pattern-circular"> = {
  kind: "pattern-circular",
  role: "tool",
  tool(feature, ctx) {
    const out: ToolResult = { tools: [], threads: [] };
    for (const copy of expandPattern(feature)) {
      const r = ctx.buildTool(copy);
      out.tools.push(...r.tools);
      out.threads.push(...r.threads);
    }
    return out;
  },
};
