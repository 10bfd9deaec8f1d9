/**
 * `eccentric-cam`: a circular cam on a pivot pin, pressing on a flat face — engagement, self-locking with
 * contact and pivot friction, clamping force from the hand on the lever, lever placement, and a 5° curve.
 * Formulas and their derivation: ./model.
 */
import { SETUP_CAUTION, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { computeCamCore, type CamCore } from "./compute";
import { explainCam, fmt } from "./explain";
import { eccentricCamInputSchema, type EccentricCamInput } from "./schema";
import { suggestCamChanges, type CamSuggestion } from "./suggest";

export { eccentricCamInputSchema, type EccentricCamInput } from "./schema";
export type { CamCore, CamCurvePoint, CamWorkingZone } from "./compute";
export type { CamSuggestion } from "./suggest";

export interface EccentricCamResult extends CamCore, CalculatorResultMeta {
  explanation: string;
  suggestions: CamSuggestion[];
}

export const CAM_CLAMPING_CAUTION =
  "A hand-tightened cam is for light work-holding and stops: never rely on it for heavy cuts, and check on the " +
  "machine that it holds, and stays locked, before cutting.";

export const eccentricCamSources: Source[] = [
  {
    title: "Meriam & Kraige, Engineering Mechanics: Statics — friction chapter (dry friction, wedges, journal bearings, friction circle)",
    kind: "from memory",
    note: "Textbook statics; the moment balance about the pivot and the friction-circle radius r·sin(atan μ) ≈ μ·r.",
  },
  {
    title: "Jig and fixture design handbooks — circular eccentric cams: self-locking needs a diameter-to-eccentricity ratio of about 14–20, depending on friction",
    kind: "from memory",
  },
  { title: "Working zone of about 45°–135° from the cam's lowest point", kind: "common practice" },
];

function cautionsFor(core: CamCore, input: EccentricCamInput): string[] {
  const cautions = [SETUP_CAUTION, CAM_CLAMPING_CAUTION];
  if (!core.selfLocking) {
    cautions.push(`This cam does not self-lock at engagement (margin ${fmt(core.selfLockMargin * 100, 0)} %): it can spring open under load.`);
  } else if (!core.selfLockingOverZone) {
    cautions.push("This cam does not self-lock everywhere in its working zone: wear or a different workpiece can bring it to a point where it slips.");
  }
  if (core.selfLocking && core.selfLockMargin < 0.2) {
    cautions.push("The self-locking margin is small: vibration, oil or polish on the contact lower friction and can let the cam slip.");
  }
  if (input.muContact > 0.2 || input.muPivot > 0.2) {
    cautions.push(
      "A friction coefficient above 0.2 is optimistic for locking: shop surfaces are often oily; check the lock with a low figure (about 0.1).",
    );
  }
  if (input.leverLength <= input.diameter / 2) {
    cautions.push("The lever is no longer than the cam radius: the hand cannot reach past the cam to push it.");
  }
  return cautions;
}

export const eccentricCamCalculator: Calculator<typeof eccentricCamInputSchema, EccentricCamResult> = {
  kind: "eccentric-cam",
  label: "Eccentric cam",
  summary:
    "Circular cam on a pivot pin pressing on a flat face: throw, engagement angle for a set gap, rise angle, self-locking with " +
    "contact and pivot friction, clamping force from the hand on the lever, where to fix the lever, and a curve every 5°.",
  inputSchema: eccentricCamInputSchema,
  sources: eccentricCamSources,
  compute(input) {
    const core = computeCamCore(input);
    return {
      ...core,
      explanation: explainCam(core, input),
      suggestions: suggestCamChanges(input, core),
      cautions: cautionsFor(core, input),
      sources: eccentricCamSources,
    };
  },
};
