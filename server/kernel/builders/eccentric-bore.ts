import type { EccentricBoreFeature } from "@/engine/parts/features";
import { KernelError } from "../errors";
import { toolFrame } from "../frame";
import { holeProfile } from "./hole";
import { revolvedTool, throughDepthMm } from "./tools";
import type { BaseInfo, ToolBuilder } from "./types";

/** Entry point and direction of an eccentric bore: offset e at angle θ from the axis, from the top or bottom face. */
export function eccentricBoreEntry(f: EccentricBoreFeature, base: BaseInfo) {
  const a = ((f.angleDeg ?? 0) * Math.PI) / 180;
  const fromTop = (f.from ?? "top") === "top";
  return {
    at: { x: f.eccentricity * Math.cos(a), y: f.eccentricity * Math.sin(a), z: fromTop ? base.max[2] : 0 },
    direction: fromTop ? ("-z" as const) : ("+z" as const),
  };
}

/** A bore parallel to a turned part's axis, offset by the eccentricity, optionally counterbored. */
export const eccentricBoreBuilder: ToolBuilder<"eccentric-bore"> = {
  kind: "eccentric-bore",
  role: "tool",
  tool(feature, { kernel, base }) {
    if (base.kind !== "turned") throw new KernelError("kernel_input", "An eccentric bore needs a turned base.");
    const { at, direction } = eccentricBoreEntry(feature, base);
    const frame = toolFrame(at, direction);
    const depth = feature.through || feature.depth === undefined ? throughDepthMm(base, frame.origin, frame.w) : feature.depth;
    const tool = revolvedTool(kernel, frame, holeProfile({ diameter: feature.diameter, counterbore: feature.counterbore }, depth));
    return { tools: [tool], threads: [] };
  },
};
