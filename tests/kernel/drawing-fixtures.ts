/**
 * Hand-built resolved parts for the drawing tests: our own invented workshop pieces (a stop body with
 * reamed cross holes, a slot and an underside recess; an eccentric cam disc; a threaded pivot pin), in the
 * resolved form the template engine hands to the kernel and the drawings.
 */
import type { ResolvedPart } from "@/engine/parts/features";

export const stopBody: ResolvedPart = {
  id: "body",
  name: "Stop body",
  quantity: 1,
  material: "mild-steel",
  datums: { x: "min", y: "min", z: "min" },
  features: [
    { kind: "block", id: "stock", size: { x: 60, y: 30, z: 20 } },
    { kind: "hole", id: "pivotHole", at: { x: 15, y: 0, z: 10 }, direction: "+y", diameter: 8, through: true, fit: "H7", finish: "reamed" },
    { kind: "hole", id: "rodHole", at: { x: 45, y: 0, z: 12 }, direction: "+y", diameter: 5, through: true, fit: "H7", finish: "reamed" },
    { kind: "slot", id: "clampSlot", at: { x: 15, y: 15, z: 20 }, direction: "-z", along: "x", length: 30, width: 4, depth: 6 },
    { kind: "pocket", id: "recess", at: { x: 30, y: 15, z: 0 }, direction: "+z", shape: { kind: "rect", u: 40, v: 16 }, depth: 3 },
    { kind: "thread", id: "lockThread", form: "internal", at: { x: 52, y: 15, z: 20 }, direction: "-z", designation: "M4", depth: 8, drillDepth: 11 },
    { kind: "chamfer", id: "topEdges", size: 0.5, faces: ["+z"] },
  ],
};

export const camDisc: ResolvedPart = {
  id: "cam",
  name: "Eccentric cam",
  quantity: 1,
  material: "tool-steel",
  heatTreatment: "harden and temper to 55–58 HRC after machining",
  features: [
    { kind: "turned", id: "disc", steps: [{ diameter: 20, length: 8 }] },
    { kind: "eccentric-bore", id: "bore", eccentricity: 1, diameter: 8, through: true, fit: "H7", finish: "reamed", counterbore: { diameter: 12, depth: 2 } },
  ],
};

export const pivotPin: ResolvedPart = {
  id: "pin",
  name: "Pivot pin",
  quantity: 1,
  material: "mild-steel",
  datums: { z: "min" },
  features: [
    { kind: "turned", id: "pin", steps: [{ diameter: 12, length: 3, label: "flange" }, { diameter: 8, length: 9, label: "boss" }, { diameter: 4, length: 14, label: "thread" }] },
    { kind: "thread", id: "pinThread", form: "external", step: 2, designation: "M4", length: 10, from: "end" },
    { kind: "hole", id: "crossHole", at: { x: 0, y: 4, z: 7.5 }, direction: "-y", diameter: 3, through: true },
    { kind: "chamfer", id: "endChamfer", size: 0.5, faces: ["+z"] },
  ],
};
