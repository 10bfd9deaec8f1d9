/**
 * Input of the `eccentric-cam` calculator. Keys are the CLI contract (`--pivot-diameter`, `--mu-contact`, …).
 * Lengths in mm, forces in N, angles in degrees.
 */
import { z } from "zod";

const lengthMm = (what: string) => z.number({ error: `${what} must be a number (mm).` }).positive(`${what} must be greater than 0 mm.`);
const coefficient = (what: string) =>
  z.number({ error: `${what} must be a number.` }).min(0, `${what} cannot be negative.`).max(1, `${what} above 1 is not a realistic friction coefficient.`);
const angleDeg = (what: string) => z.number({ error: `${what} must be a number (degrees).` });

export const eccentricCamInputSchema = z.strictObject({
  /** Cam disc diameter D. */
  diameter: lengthMm("Cam diameter"),
  /** Offset e between the disc's centre and the pivot. */
  eccentricity: lengthMm("Eccentricity"),
  /** Pivot pin diameter d (0 leaves pivot friction out). */
  pivotDiameter: z.number({ error: "Pivot diameter must be a number (mm)." }).min(0, "Pivot diameter cannot be negative."),
  /** Lever length L, pivot centre to where the hand pushes. */
  leverLength: lengthMm("Lever length"),
  /** Hand force F at the lever end, perpendicular to the lever. */
  handForce: z.number({ error: "Hand force must be a number (N)." }).positive("Hand force must be greater than 0 N."),
  /** Friction coefficient between the cam rim and the face (0.1 is a cautious steel-on-steel figure). */
  muContact: coefficient("Contact friction coefficient").default(0.1),
  /** Friction coefficient in the pivot pin. */
  muPivot: coefficient("Pivot friction coefficient").default(0.1),
  /** Set gap g between the cam's lowest point and the face, 0 < g < 2e. */
  gap: lengthMm("Gap"),
  /** Start of the working zone (rotation from the lowest point); 45° by common practice. */
  workingZoneStartDeg: angleDeg("Working zone start").min(0).max(180).default(45),
  /** End of the working zone; 135° by common practice. */
  workingZoneEndDeg: angleDeg("Working zone end").min(0).max(180).default(135),
  /**
   * Where the lever should end up at engagement, as its angle above the face: 0 = lying parallel to the face,
   * pointing the way the hand pushes it down; 90 = standing straight up from the face.
   */
  leverEndAngleDeg: angleDeg("Lever end angle").min(-45).max(135).default(0),
});

export type EccentricCamInput = z.infer<typeof eccentricCamInputSchema>;
