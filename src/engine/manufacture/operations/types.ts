/** The operation sheet's data: per part, the ordered steps a machinist follows, with tools and speeds. */
import type { Source } from "../../calculators/types";
import type { ToolMaterial } from "../../calculators/cutting-speed";
import type { StockChoice } from "../stock";

export const OPERATION_KINDS = [
  "saw",
  "square-up",
  "face-and-turn",
  "hold-four-jaw",
  "spot-drill",
  "centre-drill",
  "pilot-drill",
  "drill",
  "bore",
  "ream",
  "counterbore",
  "countersink",
  "chamfer-hole",
  "tap",
  "thread-die",
  "single-point-thread",
  "mill-slot",
  "mill-pocket",
  "mill-step",
  "mill-v-groove",
  "chamfer",
  "part-off",
  "face-to-length",
  "deburr",
] as const;
export type OperationKind = (typeof OPERATION_KINDS)[number];

export type Machine = "saw" | "lathe" | "mill" | "bench";

export interface MachiningOperation {
  /** 1-based position within the part. */
  step: number;
  kind: OperationKind;
  machine: Machine;
  /** What to do, in shop words with sizes. */
  description: string;
  tool: string | null;
  toolDiameterMm: number | null;
  toolMaterial: ToolMaterial | null;
  /** Spindle speed to set (rev/min), null for hand work and sawing. */
  rpm: number | null;
  /** Cutting speed aimed at (m/min), null where no speed applies. */
  cuttingSpeedMpm: number | null;
  /** True when the machine's top speed limited `rpm`. */
  capped: boolean;
  /** How many times the operation is repeated on one part (holes of a pattern, identical holes). */
  count: number;
  /** Ids or labels of the features the operation serves. */
  features: string[];
  notes: string[];
}

export interface PartOperations {
  partId: string;
  name: string;
  material: string;
  quantity: number;
  stock: StockChoice;
  operations: MachiningOperation[];
}

export interface OperationSheet {
  toolMaterial: ToolMaterial;
  machineMaxRpm: number | null;
  parts: PartOperations[];
  cautions: string[];
  sources: Source[];
}

export interface OperationSheetOptions {
  /** The machine's top spindle speed; every speed is capped at it. */
  machineMaxRpm?: number;
  /** Cutting-tool material for drills, mills and turning tools (default HSS). */
  tool?: ToolMaterial;
  /** Size system for the stock to buy (default metric). */
  units?: "mm" | "in";
}
