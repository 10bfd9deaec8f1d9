/**
 * The hole sizes the operation sheet needs, taken from the engine's own calculators so the sheet, the
 * drawings and the calculator pages never disagree: tap drills and thread sizes from `thread`, reaming
 * pre-drills from `ream`. Passed in as an object so a caller (or a test) can see exactly what is used.
 */
import { predrillDiameterMm } from "../calculators/ream";
import { threadCalculator } from "../calculators/thread";

export interface ThreadData {
  designation: string;
  pitchMm: number;
  majorDiameterMm: number;
  /** d3, the external thread's root diameter. */
  minorDiameterExternalMm: number;
  tapDrillMm: number;
}

export interface HoleData {
  /** Drill size before reaming a hole of the given diameter. */
  reamPreDrillMm(diameterMm: number): number;
  /** Thread sizes for an ISO metric designation ("M6", "M8x1"); throws CalculatorInputError otherwise. */
  thread(designation: string): ThreadData;
}

function threadData(designation: string): ThreadData {
  const t = threadCalculator.compute({ designation });
  return {
    designation: t.designation,
    pitchMm: t.pitch,
    majorDiameterMm: t.majorDiameter,
    minorDiameterExternalMm: t.minorDiameterExternal,
    tapDrillMm: t.tapDrill,
  };
}

export const defaultHoleData: HoleData = {
  reamPreDrillMm: (diameterMm) => predrillDiameterMm(diameterMm, "machine"),
  thread: threadData,
};
