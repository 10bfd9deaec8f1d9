/**
 * The drawing's links to the shop calculators: thread data from the ISO metric thread calculator
 * (ISO 261 pitches, ISO 724 diameters, tap drill d − P) and hole/shaft limits from the ISO 286 fit
 * calculator. The drawing never keeps tables of its own.
 */
import { basicProfile, parseThread, tapDrillMm } from "../calculators/thread";
import { holeLimits, shaftLimits } from "../calculators/fit";
import type { FitLookup, ThreadInfo, ThreadLookup } from "./annotations/types";

export const engineThreads: ThreadLookup = (designation: string): ThreadInfo => {
  const spec = parseThread(designation);
  const profile = basicProfile(spec.majorDiameter, spec.pitch);
  return {
    designation: spec.designation,
    nominalMm: spec.majorDiameter,
    pitchMm: spec.pitch,
    internalMinorMm: profile.minorDiameterInternal,
    externalMinorMm: profile.minorDiameterExternal,
    tapDrillMm: tapDrillMm(spec.majorDiameter, spec.pitch),
    coarse: spec.series === "coarse",
  };
};

/** ISO 286 limits, or undefined for a class the fit tables do not cover (the callout then shows the class only). */
export const engineFits: FitLookup = (nominalMm, toleranceClass, kind) => {
  try {
    const l = kind === "hole" ? holeLimits(nominalMm, toleranceClass) : shaftLimits(nominalMm, toleranceClass);
    return { upper: l.upper, lower: l.lower };
  } catch {
    return undefined;
  }
};
