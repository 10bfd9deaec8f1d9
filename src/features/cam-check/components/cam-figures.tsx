import type { CamResult } from "../api/cam-result-schema";
import { formatQuantity, trimNumber, type UnitSystem } from "../model/units";
import { FigureList } from "./figure-list";

/** The cam's numbers, in the chosen units. */
export function CamFigures({ result, system }: { result: CamResult; system: UnitSystem }) {
  const len = (mm: number) => formatQuantity(system, "length", mm);
  const deg = (d: number) => `${trimNumber(d, 1)}°`;
  return (
    <FigureList
      items={[
        {
          id: "clamp-force",
          term: "Clamping force",
          value: formatQuantity(system, "force", result.clampForceN, 0),
          note: "at engagement, for the hand force on the lever",
        },
        {
          id: "torque",
          term: "Torque on the cam",
          value: formatQuantity(system, "torque", result.torqueNm),
          note: "hand force × lever length",
        },
        {
          id: "throw",
          term: "Throw",
          value: len(result.throwMm),
          note: "2 × eccentricity: the most it can lift",
        },
        {
          id: "engage-angle",
          term: "Engages at",
          value: deg(result.engageAngleDeg),
          note: "rotation from the lowest point where the gap is taken up",
        },
        {
          id: "rise-angle",
          term: "Rise angle there",
          value: deg(result.riseAngleDeg),
          note: `largest ${deg(result.maxRiseAngleDeg)}, at ${deg(result.maxRiseAtAngleDeg)}`,
        },
        {
          id: "ratio",
          term: "Diameter ÷ eccentricity",
          value: trimNumber(result.ratioDiameterToEccentricity, 1),
          note: "handbooks reckon about 14–20 for a cam that locks",
        },
        {
          id: "max-locking-eccentricity",
          term: "Largest eccentricity that locks",
          value: len(result.maxSelfLockingEccentricityMm),
          note: "over the whole working zone, everything else as entered",
        },
        {
          id: "lever-angle",
          term: "Where to fix the lever",
          value: deg(result.leverAngleDeg),
          note: `ahead of the pivot-to-centre line, in the clamping direction; released, it stands ${deg(result.leverReleasedAngleDeg)} above the work`,
        },
      ]}
    />
  );
}
