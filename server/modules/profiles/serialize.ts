import type { Machine, Vise } from "@/shared/profiles";
import type { MachineRecord } from "@server/db/models/machine";
import type { ViseRecord } from "@server/db/models/vise";

/** The API view of a vise row: never the owner. */
export function toApiVise(v: ViseRecord): Vise {
  return {
    id: v.id,
    name: v.name,
    jawWidthMm: Number(v.jawWidthMm),
    jawHeightMm: Number(v.jawHeightMm),
    jawThicknessMm: Number(v.jawThicknessMm),
    maxOpeningMm: Number(v.maxOpeningMm),
    createdAt: v.createdAt.toISOString(),
    updatedAt: v.updatedAt.toISOString(),
  };
}

/** The API view of a machine row: never the owner. */
export function toApiMachine(m: MachineRecord): Machine {
  return {
    id: m.id,
    name: m.name,
    maxSpindleRpm: Number(m.maxSpindleRpm),
    units: m.units,
    createdAt: m.createdAt.toISOString(),
    updatedAt: m.updatedAt.toISOString(),
  };
}
