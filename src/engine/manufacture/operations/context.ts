/** Shared context of one part's operations: material, tool material, speed cap, units, hole data. */
import { spindleSpeed, startingCuttingSpeedMpm, type Operation, type ToolMaterial } from "../../calculators/cutting-speed";
import { getMaterial, type MaterialKey } from "../../materials";
import type { HoleData } from "../hole-data";
import type { MachiningOperation } from "./types";

export interface OpContext {
  material: MaterialKey;
  tool: ToolMaterial;
  machineMaxRpm?: number;
  units: "mm" | "in";
  holeData: HoleData;
}

export type DraftOperation = Omit<MachiningOperation, "step">;

/** A length in the user's units: "12 mm" or `0.472"`. */
export function len(ctx: OpContext, mm: number): string {
  return ctx.units === "in" ? `${(mm / 25.4).toFixed(3)}"` : `${Number(mm.toFixed(2))} mm`;
}

/** A diameter in the user's units: "Ø12 mm" or `Ø0.472"`. */
export function dia(ctx: OpContext, mm: number): string {
  return `Ø${len(ctx, mm)}`;
}

/** Speed fields for a powered cut (cutting-speed calculator, capped by the machine). */
export function speed(
  ctx: OpContext,
  operation: Operation,
  diameterMm: number,
  fraction = 1,
): Pick<MachiningOperation, "rpm" | "cuttingSpeedMpm" | "capped" | "toolMaterial"> {
  const group = getMaterial(ctx.material).cuttingGroup;
  const cuttingSpeedMpm = startingCuttingSpeedMpm(group, ctx.tool, operation) * fraction;
  const s = spindleSpeed({
    material: ctx.material,
    tool: ctx.tool,
    operation,
    diameterMm,
    cuttingSpeedMpm,
    ...(ctx.machineMaxRpm !== undefined ? { machineMaxRpm: ctx.machineMaxRpm } : {}),
  });
  return { rpm: s.rpm, cuttingSpeedMpm: s.cuttingSpeedMpm, capped: s.capped, toolMaterial: ctx.tool };
}

/** Fields for hand work or sawing: no spindle speed. */
export const NO_SPEED: Pick<MachiningOperation, "rpm" | "cuttingSpeedMpm" | "capped" | "toolMaterial"> = {
  rpm: null,
  cuttingSpeedMpm: null,
  capped: false,
  toolMaterial: null,
};
