import type { CamResult } from "../api/cam-result-schema";
import { toShown, type UnitSystem } from "../model/units";

export interface ChartRow {
  angleDeg: number;
  lift: number;
  /** Clamping force from engagement on (null before). */
  force: number | null;
  /** The same force before engagement: what a thicker workpiece would get. */
  forceBefore: number | null;
}

/** The curve in shown units; the engagement point is inserted so both force lines meet there. */
export function chartRows(result: CamResult, system: UnitSystem): ChartRow[] {
  const rows: ChartRow[] = [];
  const e = result.engageAngleDeg;
  for (const p of result.curve) {
    const force = p.clampForceN === null ? null : toShown(system, "force", p.clampForceN);
    rows.push({
      angleDeg: p.angleDeg,
      lift: toShown(system, "length", p.liftMm),
      force: p.engaged ? force : null,
      forceBefore: p.engaged && p.angleDeg > e + 1e-9 ? null : force,
    });
  }
  return rows;
}

/** Rotation ranges where the cam would not lock, each widened by half a curve step so single points show. */
export function slipRanges(result: CamResult): Array<[number, number]> {
  const ranges: Array<[number, number]> = [];
  const half = 2.5;
  let start: number | null = null;
  let last = 0;
  for (const p of result.curve) {
    if (!p.selfLocking && start === null) start = p.angleDeg;
    if (p.selfLocking && start !== null) {
      ranges.push([Math.max(0, start - half), Math.min(180, last + half)]);
      start = null;
    }
    last = p.angleDeg;
  }
  if (start !== null) ranges.push([Math.max(0, start - half), 180]);
  return ranges;
}
