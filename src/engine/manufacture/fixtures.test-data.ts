/**
 * Small hand-built resolved parts for the cut-list and operation-sheet tests (an invented model-engineering
 * workshop's parts, our own proportions).
 */
import type { ResolvedPart } from "../parts/features";

/** A 60 × 30 × 20 mild-steel block with a Ø4 H7 reamed through hole and an M4 tapped hole 8 deep. */
export const block: ResolvedPart = {
  id: "stop-body",
  name: "Stop body",
  quantity: 1,
  material: "mild-steel",
  features: [
    { kind: "block", size: { x: 60, y: 30, z: 20 } },
    { kind: "hole", id: "rod-hole", at: { x: 15, y: 15, z: 20 }, direction: "-z", diameter: 4, through: true, fit: "H7" },
    { kind: "thread", id: "clamp-screw", form: "internal", at: { x: 45, y: 15, z: 20 }, direction: "-z", designation: "M4", depth: 8 },
  ],
};

/** A free-cutting steel pin Ø12 × 3, Ø8 × 10, Ø4 × 12 with an M4 thread 10 long on its small end; two off. */
export const pin: ResolvedPart = {
  id: "carrier",
  name: "Cam carrier",
  quantity: 2,
  material: "free-cutting-steel",
  features: [
    { kind: "turned", steps: [{ diameter: 12, length: 3 }, { diameter: 8, length: 10 }, { diameter: 4, length: 12 }] },
    { kind: "thread", id: "nut-thread", form: "external", step: 2, designation: "M4", length: 10, from: "end" },
  ],
};

/** A Ø20 × 8 tool-steel cam disc with an Ø8 H7 bore 1 mm off its axis. */
export const disc: ResolvedPart = {
  id: "cam",
  name: "Cam",
  quantity: 1,
  material: "tool-steel",
  features: [
    { kind: "turned", steps: [{ diameter: 20, length: 8 }] },
    { kind: "eccentric-bore", id: "pivot-bore", eccentricity: 1, diameter: 8, through: true, fit: "H7" },
  ],
};
