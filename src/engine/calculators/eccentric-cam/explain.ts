/**
 * Plain shop-language account of why a cam holds or slips, written for a learner, with the numbers.
 */
import type { EccentricCamInput } from "./schema";
import type { CamCore } from "./compute";

/** Rounds for display: `digits` decimals, trailing zeros dropped. */
export function fmt(value: number, digits = 2): string {
  return Number(value.toFixed(digits)).toString();
}

/** Signed percentage, e.g. "+39 %" or "−12 %". */
export function pct(fraction: number): string {
  const p = Math.round(fraction * 100);
  return `${p >= 0 ? "+" : "−"}${Math.abs(p)} %`;
}

/** Which holding term is larger, in words. */
function dominantHold(core: CamCore, input: EccentricCamInput): string {
  const { contactFrictionMm, pivotFrictionMm } = core.armsAtEngagement;
  if (contactFrictionMm === 0 && pivotFrictionMm === 0) return "There is no friction to hold it at all.";
  if (contactFrictionMm >= 2 * pivotFrictionMm) return "Friction where the cam rim presses on the work does most of the holding.";
  if (pivotFrictionMm >= 2 * contactFrictionMm) {
    return `Friction in the Ø${fmt(input.pivotDiameter, 1)} mm pivot pin does most of the holding, so a worn or oily pin matters.`;
  }
  return "Friction at the work face and in the pivot pin share the holding about equally.";
}

export function explainCam(core: CamCore, input: EccentricCamInput): string {
  const a = core.armsAtEngagement;
  const hold = a.contactFrictionMm + a.pivotFrictionMm;
  const sentences: string[] = [];
  sentences.push(
    `Turning the lever takes up the ${fmt(input.gap)} mm gap after ${fmt(core.engageAngleDeg, 1)}° from the cam's lowest point; ` +
      `there the cam meets the work at a rise angle of ${fmt(core.riseAngleDeg, 1)}°.`,
  );
  sentences.push(
    `The clamping load pushes back on the cam ${fmt(a.drivingMm, 3)} mm to the side of the pivot (eccentricity × sin of the angle), ` +
      `trying to turn it open. Friction at the face resists with an arm of ${fmt(a.contactFrictionMm, 3)} mm and friction in the pivot ` +
      `with ${fmt(a.pivotFrictionMm, 3)} mm, together ${fmt(hold, 3)} mm.`,
  );
  if (core.selfLocking) {
    sentences.push(
      `That is ${Math.round(core.selfLockMargin * 100)} % more than needed, so the cam should stay put when you let go of the lever. ${dominantHold(core, input)}`,
    );
  } else {
    sentences.push(
      `That is ${Math.round(-core.selfLockMargin * 100)} % short of what is needed, so the cam will turn back and let go when you release the lever ` +
        "or when the cut vibrates it. " +
        dominantHold(core, input),
    );
  }
  const zone = core.workingZone;
  sentences.push(
    `Anywhere in the working zone ${fmt(zone.startDeg, 0)}°–${fmt(zone.endDeg, 0)}° the weakest point is at ${fmt(zone.worstAngleDeg, 1)}°, ` +
      `with a margin of ${pct(core.selfLockMarginOverZone)}` +
      (core.selfLockingOverZone ? "." : ": the cam does not lock everywhere it may be used, for instance after the work or the cam wears."),
  );
  if (!zone.engagementInZone) {
    sentences.push(
      core.engageAngleDeg < zone.startDeg
        ? `It engages early in its travel (${fmt(core.engageAngleDeg, 1)}°), where a little wear or a thinner workpiece already changes the lock a lot; a smaller gap setting or smaller eccentricity moves it into the zone.`
        : `It engages late in its travel (${fmt(core.engageAngleDeg, 1)}°), with little lift left to take up wear or a thinner workpiece; set the cam closer to the work.`,
    );
  }
  const ratioText =
    core.contactOnlyMinRatio === null
      ? ""
      : ` Friction at the face alone would need D/e of at least ${fmt(core.contactOnlyMinRatio, 1)}.`;
  sentences.push(
    `Its diameter is ${fmt(core.ratioDiameterToEccentricity, 1)} times its eccentricity; handbooks reckon circular cams need about 14–20 to self-lock.` +
      ratioText,
  );
  sentences.push(
    `A ${fmt(input.handForce, 0)} N push on the ${fmt(input.leverLength, 0)} mm lever gives ${fmt(core.torqueNm, 2)} N·m and presses ` +
      `the work with about ${fmt(core.clampForceN, 0)} N at engagement.`,
  );
  return sentences.join(" ");
}
