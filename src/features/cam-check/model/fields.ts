import type { Quantity } from "./units";

/** The calculator input keys the cam check asks for. */
export type CamFieldKey =
  | "diameter"
  | "eccentricity"
  | "pivotDiameter"
  | "leverLength"
  | "handForce"
  | "muContact"
  | "muPivot"
  | "gap"
  | "leverEndAngleDeg";

export interface CamField {
  key: CamFieldKey;
  label: string;
  /** Letter used in the formulas and the sketch. */
  symbol?: string;
  quantity: Quantity;
  /** Default in the calculator's units (mm, N). */
  defaultBase: number;
  /** Input step in mm/N units; the inch system uses its own steps. */
  step: number;
  inchStep: number;
  help: string;
  group: "cam" | "lever" | "friction";
}

/**
 * Our own starting cam: Ø24 mm with 1.2 mm eccentricity (D/e = 20, the ratio that common practice says
 * locks well by hand), on an 8 mm pin, 70 mm lever, 60 N push, set 0.6 mm off the work.
 */
export const camFields: CamField[] = [
  {
    key: "diameter",
    label: "Cam diameter",
    symbol: "D",
    quantity: "length",
    defaultBase: 24,
    step: 0.5,
    inchStep: 0.01,
    group: "cam",
    help: "Outside diameter of the circular cam.",
  },
  {
    key: "eccentricity",
    label: "Eccentricity",
    symbol: "e",
    quantity: "length",
    defaultBase: 1.2,
    step: 0.05,
    inchStep: 0.001,
    group: "cam",
    help: "Offset from the cam's centre to the pivot. The throw is twice this.",
  },
  {
    key: "pivotDiameter",
    label: "Pivot pin diameter",
    symbol: "d",
    quantity: "length",
    defaultBase: 8,
    step: 0.5,
    inchStep: 0.01,
    group: "cam",
    help: "The pin the cam turns on; 0 leaves pivot friction out.",
  },
  {
    key: "gap",
    label: "Set gap",
    symbol: "g",
    quantity: "length",
    defaultBase: 0.6,
    step: 0.05,
    inchStep: 0.001,
    group: "cam",
    help: "Clearance between the cam's lowest point and the work; more than 0 and less than the throw.",
  },
  {
    key: "leverLength",
    label: "Lever length",
    symbol: "L",
    quantity: "length",
    defaultBase: 70,
    step: 5,
    inchStep: 0.1,
    group: "lever",
    help: "From the pivot centre to where your hand pushes.",
  },
  {
    key: "handForce",
    label: "Hand force",
    symbol: "F",
    quantity: "force",
    defaultBase: 60,
    step: 5,
    inchStep: 1,
    group: "lever",
    help: "A firm one-handed push is roughly 50–100 N (common practice).",
  },
  {
    key: "leverEndAngleDeg",
    label: "Lever angle when clamped",
    quantity: "angle",
    defaultBase: 0,
    step: 5,
    inchStep: 5,
    group: "lever",
    help: "Where the lever should end up: 0° lies along the work, 90° stands straight up.",
  },
  {
    key: "muContact",
    label: "Friction at the work face",
    symbol: "μc",
    quantity: "coefficient",
    defaultBase: 0.1,
    step: 0.01,
    inchStep: 0.01,
    group: "friction",
    help: "Steel on steel, dry: 0.1 is a cautious figure; oil lowers it.",
  },
  {
    key: "muPivot",
    label: "Friction in the pivot",
    symbol: "μp",
    quantity: "coefficient",
    defaultBase: 0.1,
    step: 0.01,
    inchStep: 0.01,
    group: "friction",
    help: "Between the pin and the cam's bore.",
  },
];

export const camGroups: Array<{ id: CamField["group"]; title: string }> = [
  { id: "cam", title: "The cam" },
  { id: "lever", title: "Lever and hand" },
  { id: "friction", title: "Friction" },
];
