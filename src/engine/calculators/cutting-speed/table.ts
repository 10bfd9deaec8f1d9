/**
 * Starting cutting speeds (m/min) by work-material cutting group, tool material and operation.
 *
 * These are typical STARTING values of the kind printed in machining handbooks' speed tables and tool
 * makers' catalogues for general-purpose tools, flood or mist coolant, moderate depth of cut — recalled
 * from that family of tables ("from memory"), rounded, and set at the cautious end for the light, less
 * rigid machines of a small shop. The tool maker's figure for the actual tool always wins.
 *
 * Reaming runs at about half to two-thirds of the drilling speed (common practice); 0.6 × drilling is used.
 */
import type { CuttingGroup } from "../../materials";
import type { Source } from "../types";

export const TOOL_MATERIALS = ["hss", "carbide"] as const;
export type ToolMaterial = (typeof TOOL_MATERIALS)[number];

export const OPERATIONS = ["drill", "ream", "mill", "turn"] as const;
export type Operation = (typeof OPERATIONS)[number];

/** Reaming speed as a fraction of drilling speed (common practice: 1/2 to 2/3). */
export const REAM_FRACTION_OF_DRILL = 0.6;

type Tabled = Exclude<Operation, "ream">;

/** m/min: [turn, drill, mill] for HSS and for carbide. */
const TABLE: Record<CuttingGroup, Record<ToolMaterial, Record<Tabled, number>>> = {
  "steel-low-carbon": { hss: { turn: 30, drill: 25, mill: 25 }, carbide: { turn: 150, drill: 70, mill: 120 } },
  "steel-free-cutting": { hss: { turn: 40, drill: 30, mill: 35 }, carbide: { turn: 180, drill: 90, mill: 150 } },
  "tool-steel": { hss: { turn: 20, drill: 15, mill: 15 }, carbide: { turn: 100, drill: 50, mill: 80 } },
  stainless: { hss: { turn: 18, drill: 12, mill: 15 }, carbide: { turn: 100, drill: 50, mill: 80 } },
  bronze: { hss: { turn: 40, drill: 30, mill: 35 }, carbide: { turn: 150, drill: 80, mill: 120 } },
  brass: { hss: { turn: 70, drill: 50, mill: 60 }, carbide: { turn: 200, drill: 100, mill: 180 } },
  aluminium: { hss: { turn: 100, drill: 70, mill: 90 }, carbide: { turn: 300, drill: 150, mill: 250 } },
  "cast-iron": { hss: { turn: 25, drill: 20, mill: 20 }, carbide: { turn: 100, drill: 60, mill: 90 } },
  plastic: { hss: { turn: 100, drill: 50, mill: 80 }, carbide: { turn: 200, drill: 100, mill: 150 } },
};

/** The starting cutting speed for a group, tool and operation (m/min). */
export function startingCuttingSpeedMpm(group: CuttingGroup, tool: ToolMaterial, operation: Operation): number {
  const row = TABLE[group][tool];
  return operation === "ream" ? row.drill * REAM_FRACTION_OF_DRILL : row[operation];
}

export const cuttingSpeedSources: Source[] = [
  {
    title: "Machining handbooks' and tool makers' starting cutting-speed tables for HSS and carbide (drilling, milling, turning)",
    kind: "from memory",
    note: "Typical starting values, rounded and kept at the cautious end for light machines.",
  },
  { title: "Reaming at about one half to two thirds of the drilling speed (0.6 used)", kind: "common practice" },
  { title: "Spindle speed n = 1000·v/(π·D), v in m/min, D in mm", kind: "textbook" },
];
