import type { ResolvedPart } from "@/engine/parts/features";

/**
 * Representative parts each worker builds before it takes work (GEOMETRY.md pitfall 1: the first calls in
 * a thread run 5–15× slower while V8 tiers up the WASM). Together they exercise every builder, the Boolean
 * cut, face unification, the validity check, meshing and the STEP writer.
 */
export const warmUpParts: ResolvedPart[] = [
  {
    id: "warm-block",
    name: "Warm-up block",
    material: "mild-steel",
    features: [
      { kind: "block", size: { x: 60, y: 30, z: 20 } },
      { kind: "hole", at: { x: 12, y: 15, z: 20 }, direction: "-z", diameter: 5, through: true, chamfer: 0.5 },
      { kind: "hole", at: { x: 48, y: 15, z: 20 }, direction: "-z", diameter: 5.5, depth: 12, counterbore: { diameter: 10, depth: 5 } },
      { kind: "thread", form: "internal", at: { x: 0, y: 15, z: 10 }, direction: "+x", designation: "M6", depth: 10 },
      { kind: "slot", at: { x: 22, y: 15, z: 20 }, direction: "-z", along: "x", length: 14, width: 6, depth: 4 },
      { kind: "pocket", at: { x: 30, y: 15, z: 0 }, direction: "+z", shape: { kind: "rect", u: 20, v: 10, cornerRadius: 2 }, depth: 3 },
      { kind: "v-groove", at: { x: 30, y: 30, z: 10 }, direction: "-y", along: "x", angleDeg: 90, depth: 2 },
      { kind: "chamfer", size: 1, faces: ["+z"] },
      { kind: "pattern-linear", count: 2, spacing: { x: 40, y: 0, z: 0 }, feature: { kind: "hole", at: { x: 10, y: 0, z: 6 }, direction: "+y", diameter: 3, depth: 6 } },
    ],
  },
  {
    id: "warm-cam",
    name: "Warm-up cam",
    material: "mild-steel",
    features: [
      { kind: "turned", steps: [{ diameter: 20, length: 10 }] },
      { kind: "eccentric-bore", eccentricity: 1, diameter: 8, through: true, counterbore: { diameter: 12, depth: 2 } },
      { kind: "chamfer", size: 0.5, faces: ["+z", "-z"] },
    ],
  },
  {
    id: "warm-pin",
    name: "Warm-up pin",
    material: "mild-steel",
    features: [
      { kind: "turned", steps: [{ diameter: 12, length: 2 }, { diameter: 8, length: 10 }, { diameter: 4, length: 10 }] },
      { kind: "thread", form: "external", step: 2, designation: "M4", length: 8, from: "end" },
      { kind: "hole", at: { x: 0, y: 0, z: 7 }, direction: "-x", diameter: 2, through: true },
    ],
  },
];
