/**
 * `cutting-speed`: spindle speed n = 1000·v / (π·D) (rev/min; v in m/min, D in mm — the tool diameter for
 * drilling, reaming and milling, the work diameter for turning) from a starting cutting speed v by work
 * material, tool material and operation (./table), capped by the machine's top speed.
 * `spindleSpeed()` is the plain function other engine modules (the operation sheet) call.
 */
import { z } from "zod";
import { getMaterial, MATERIAL_KEYS, type MaterialKey } from "../../materials";
import { SETUP_CAUTION, type Calculator, type CalculatorResultMeta } from "../types";
import { cuttingSpeedSources, OPERATIONS, startingCuttingSpeedMpm, TOOL_MATERIALS, type Operation, type ToolMaterial } from "./table";

export * from "./table";

/** n = 1000·v/(π·D) in rev/min. */
export function rpmFromCuttingSpeed(cuttingSpeedMpm: number, diameterMm: number): number {
  return (1000 * cuttingSpeedMpm) / (Math.PI * diameterMm);
}

/** v = π·D·n/1000 in m/min. */
export function cuttingSpeedFromRpm(rpm: number, diameterMm: number): number {
  return (Math.PI * diameterMm * rpm) / 1000;
}

export interface SpindleSpeedRequest {
  material: MaterialKey;
  tool: ToolMaterial;
  operation: Operation;
  diameterMm: number;
  /** The machine's top spindle speed; the result is capped at it. */
  machineMaxRpm?: number;
  /** Use this cutting speed instead of the table's (m/min). */
  cuttingSpeedMpm?: number;
}

export interface SpindleSpeed {
  /** The cutting speed aimed at (table or given), m/min. */
  cuttingSpeedMpm: number;
  /** Spindle speed to set, whole rev/min, after the cap. */
  rpm: number;
  /** 1000·v/(π·D) before rounding and capping. */
  rpmExact: number;
  capped: boolean;
  /** Cutting speed actually reached at `rpm`, m/min. */
  effectiveCuttingSpeedMpm: number;
  cuttingGroup: string;
}

/** Spindle speed for one tool and material (pure; throws CalculatorInputError for an unknown material). */
export function spindleSpeed(req: SpindleSpeedRequest): SpindleSpeed {
  const material = getMaterial(req.material);
  const cuttingSpeedMpm = req.cuttingSpeedMpm ?? startingCuttingSpeedMpm(material.cuttingGroup, req.tool, req.operation);
  const rpmExact = rpmFromCuttingSpeed(cuttingSpeedMpm, req.diameterMm);
  const capped = req.machineMaxRpm !== undefined && rpmExact > req.machineMaxRpm;
  const ceiling = req.machineMaxRpm !== undefined ? Math.floor(req.machineMaxRpm) : Number.POSITIVE_INFINITY;
  const rpm = Math.min(Math.round(rpmExact), ceiling);
  return {
    cuttingSpeedMpm,
    rpm,
    rpmExact,
    capped,
    effectiveCuttingSpeedMpm: cuttingSpeedFromRpm(rpm, req.diameterMm),
    cuttingGroup: material.cuttingGroup,
  };
}

export const cuttingSpeedInputSchema = z.strictObject({
  material: z.enum(MATERIAL_KEYS, { error: `Material must be one of: ${MATERIAL_KEYS.join(", ")}.` }),
  tool: z.enum(TOOL_MATERIALS, { error: 'Tool must be "hss" or "carbide".' }),
  operation: z.enum(OPERATIONS, { error: `Operation must be one of: ${OPERATIONS.join(", ")}.` }),
  /** Tool diameter (drill, ream, mill) or work diameter (turn), mm. */
  diameter: z.number({ error: "Diameter must be a number (mm)." }).positive("Diameter must be greater than 0 mm.").max(2000, "Diameter above 2000 mm is outside this calculator."),
  machineMaxRpm: z.number({ error: "Machine top speed must be a number (rev/min)." }).positive("Machine top speed must be greater than 0 rev/min.").optional(),
  /** Override the table's cutting speed, m/min. */
  cuttingSpeed: z.number({ error: "Cutting speed must be a number (m/min)." }).positive("Cutting speed must be greater than 0 m/min.").max(2000).optional(),
});
export type CuttingSpeedInput = z.infer<typeof cuttingSpeedInputSchema>;

export interface CuttingSpeedResult extends SpindleSpeed, CalculatorResultMeta {
  material: MaterialKey;
  tool: ToolMaterial;
  operation: Operation;
  diameterMm: number;
}

export const SPEED_CAUTION =
  "Speeds are starting values: adjust for the machine's rigidity, the tool's condition, coolant and the chip you see; " +
  "the tool maker's data for the actual tool comes first.";

export const cuttingSpeedCalculator: Calculator<typeof cuttingSpeedInputSchema, CuttingSpeedResult> = {
  kind: "cutting-speed",
  label: "Cutting speed",
  summary: "Spindle speed from a starting cutting speed for the work material, tool material and operation, capped by the machine's top speed.",
  inputSchema: cuttingSpeedInputSchema,
  sources: cuttingSpeedSources,
  compute(input) {
    const speed = spindleSpeed({
      material: input.material,
      tool: input.tool,
      operation: input.operation,
      diameterMm: input.diameter,
      ...(input.machineMaxRpm !== undefined ? { machineMaxRpm: input.machineMaxRpm } : {}),
      ...(input.cuttingSpeed !== undefined ? { cuttingSpeedMpm: input.cuttingSpeed } : {}),
    });
    const cautions = [SETUP_CAUTION, SPEED_CAUTION];
    if (speed.capped) {
      cautions.push(
        `The machine tops out at ${speed.rpm} rev/min, below the ${Math.round(speed.rpmExact)} rev/min wanted: the tool cuts at ` +
          `${speed.effectiveCuttingSpeedMpm.toFixed(0)} m/min instead of ${speed.cuttingSpeedMpm} m/min` +
          (input.tool === "carbide" ? "; carbide run slow may rub rather than cut — keep the feed up." : "."),
      );
    }
    if (input.operation === "drill" && input.diameter < 3) {
      cautions.push("Small drills break easily: peck often to clear chips, and let the drill cut rather than forcing it.");
    }
    return {
      ...speed,
      material: input.material,
      tool: input.tool,
      operation: input.operation,
      diameterMm: input.diameter,
      cautions,
      sources: cuttingSpeedSources,
    };
  },
};
