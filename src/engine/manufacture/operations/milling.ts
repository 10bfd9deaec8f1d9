/** Milling operations: slot, pocket or recess, step, V-groove, edge chamfers; and lathe chamfers. */
import type { ChamferFeature, PocketFeature, SlotFeature, StepFeature, VGrooveFeature } from "../../parts/features";
import { dia, len, speed, type DraftOperation, type OpContext } from "./context";
import { pocketMillFor, slotMillFor, smallestNotBelow, stepMillFor, V_CUTTERS_MM } from "./tools";

const base = (count: number, feature: string) => ({ count, features: [feature], notes: [] as string[] });

export function slotOperation(ctx: OpContext, slot: SlotFeature, count: number, feature: string): DraftOperation {
  const mill = slotMillFor(slot.width);
  const depth = slot.through ? "through" : slot.depth !== undefined ? `${len(ctx, slot.depth)} deep` : "to depth";
  const notes: string[] = [];
  if (mill < slot.width - 1e-9) notes.push(`Mill with the ${dia(ctx, mill)} cutter first, then widen to ${len(ctx, slot.width)} with light finishing passes on each side.`);
  notes.push("Take the depth in several passes; a full-width slot loads the cutter on both sides.");
  return {
    ...base(count, feature),
    kind: "mill-slot",
    machine: "mill",
    description: `Mill slot ${len(ctx, slot.width)} wide × ${len(ctx, slot.length + slot.width)} long overall (${len(ctx, slot.length)} between end centres), ${depth}`,
    tool: `End mill ${dia(ctx, mill)}`,
    toolDiameterMm: mill,
    ...speed(ctx, "mill", mill),
    notes,
  };
}

export function pocketOperation(ctx: OpContext, pocket: PocketFeature, count: number, feature: string): DraftOperation {
  const shape = pocket.shape;
  const size = shape.kind === "rect" ? `${len(ctx, shape.u)} × ${len(ctx, shape.v)}` : dia(ctx, shape.diameter);
  const smaller = shape.kind === "rect" ? Math.min(shape.u, shape.v) : shape.diameter;
  const mill = pocketMillFor(smaller, shape.kind === "rect" ? shape.cornerRadius : undefined);
  const notes: string[] = [];
  if (shape.kind === "rect" && !(shape.cornerRadius && shape.cornerRadius > 0)) {
    notes.push(`Inside corners come out with the cutter's radius (${len(ctx, mill / 2)}); square corners need filing.`);
  }
  return {
    ...base(count, feature),
    kind: "mill-pocket",
    machine: "mill",
    description: `Mill ${shape.kind === "rect" ? "recess" : "round recess"} ${size} × ${len(ctx, pocket.depth)} deep`,
    tool: `End mill ${dia(ctx, mill)}`,
    toolDiameterMm: mill,
    ...speed(ctx, "mill", mill),
    notes,
  };
}

export function stepOperation(ctx: OpContext, step: StepFeature, feature: string): DraftOperation {
  const dx = Math.abs(step.to.x - step.from.x);
  const dy = Math.abs(step.to.y - step.from.y);
  const dz = Math.abs(step.to.z - step.from.z);
  const mill = stepMillFor(Math.max(dx, dy, dz));
  return {
    ...base(1, feature),
    kind: "mill-step",
    machine: "mill",
    description: `Mill step ${len(ctx, dx)} × ${len(ctx, dy)} × ${len(ctx, dz)} (x × y × z) from (${len(ctx, Math.min(step.from.x, step.to.x))}, ${len(ctx, Math.min(step.from.y, step.to.y))}, ${len(ctx, Math.min(step.from.z, step.to.z))})`,
    tool: `End mill ${dia(ctx, mill)}`,
    toolDiameterMm: mill,
    ...speed(ctx, "mill", mill),
    notes: ["Measure the step from the datum faces."],
  };
}

export function vGrooveOperation(ctx: OpContext, groove: VGrooveFeature, feature: string): DraftOperation {
  const widthMm = 2 * groove.depth * Math.tan((groove.angleDeg * Math.PI) / 360);
  const cutter = smallestNotBelow(V_CUTTERS_MM, widthMm + 2);
  return {
    ...base(1, feature),
    kind: "mill-v-groove",
    machine: "mill",
    description: `Mill ${groove.angleDeg}° V-groove ${len(ctx, groove.depth)} deep (${len(ctx, widthMm)} wide at the face) along ${groove.along}`,
    tool: `${groove.angleDeg}° V-cutter ${dia(ctx, cutter)}`,
    toolDiameterMm: cutter,
    ...speed(ctx, "mill", cutter),
    notes: [],
  };
}

export function chamferOperation(ctx: OpContext, chamfer: ChamferFeature, feature: string, onLathe: { diameterMm: number } | null): DraftOperation {
  if (onLathe) {
    return {
      ...base(1, feature),
      kind: "chamfer",
      machine: "lathe",
      description: `Chamfer ${len(ctx, chamfer.size)} × 45° on the ${chamfer.faces.join(", ")} end${chamfer.faces.length > 1 ? "s" : ""}`,
      tool: "Turning tool set at 45°",
      toolDiameterMm: null,
      ...speed(ctx, "turn", onLathe.diameterMm),
      notes: [],
    };
  }
  const cutter = 10;
  return {
    ...base(1, feature),
    kind: "chamfer",
    machine: "mill",
    description: `Chamfer the edges of the ${chamfer.faces.join(", ")} face${chamfer.faces.length > 1 ? "s" : ""} ${len(ctx, chamfer.size)} × 45°`,
    tool: `90° chamfer mill ${dia(ctx, cutter)}`,
    toolDiameterMm: cutter,
    ...speed(ctx, "mill", cutter),
    notes: ["Small chamfers can be filed instead."],
  };
}
