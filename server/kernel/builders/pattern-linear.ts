import { expandPattern } from "@/engine/parts/patterns";
import type { ToolBuilder, ToolResult } from "./types";

/** `count` copies of a hole, thread, slot or pocket, each `spacing` further on (the engine's expansion). */
export const linearPatternBuilder: ToolBuilder<"pattern-linear"> = {
  kind: "pattern-linear",
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
