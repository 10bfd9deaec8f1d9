/**
 * The catalogue templates' parts built by the solid kernel (OpenCascade): for each template at its defaults
 * and at the other parameter sets of its golden tests, every buildable part must be one valid solid whose
 * volume agrees with the engine's analytic volume (src/engine/parts/analytic.ts) within 0.5 %, the tolerance
 * the product brief sets. The analytic volumes themselves are checked by hand in tests/golden.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { partVolumeMm3 } from "@/engine/parts/analytic";
import { buildPart } from "@server/kernel/build-part";
import { loadKernel, type LoadedKernel } from "@server/kernel/oc";
import { builtIn, evaluate } from "../golden/catalogue-helpers";

let kernel: LoadedKernel;
beforeAll(async () => {
  kernel = await loadKernel();
});

const cases: Array<[string, string, Record<string, unknown>]> = [
  ["v-block defaults", "blocks/v-block.yaml", {}],
  ["v-block 120° V", "blocks/v-block.yaml", { vAngle: 120, vDepth: 10, blockHeight: 40, blockWidth: 70, smallestRound: 10, largestRound: 30 }],
  ["v-block 60° V", "blocks/v-block.yaml", { vAngle: 60, vDepth: 20, blockHeight: 60, blockWidth: 70, blockLength: 80, smallestRound: 8, largestRound: 25 }],
  ["soft jaws with a step", "soft-jaws/vise-soft-jaws.yaml", {}],
  ["soft jaws, upright V", "soft-jaws/vise-soft-jaws.yaml", { screw: "M8", jawThickness: 16, screwSpacing: 80, screwHeight: 14, screwLength: 20, tappedDepth: 16, holding: "v-upright", roundDiameter: 25, vDepth: 10 }],
  ["soft jaws, V along the jaw", "soft-jaws/vise-soft-jaws.yaml", { jawHeight: 45, holding: "v-along", roundDiameter: 16, vDepth: 6, vHeight: 32 }],
  ["soft jaws, rectangular pocket", "soft-jaws/vise-soft-jaws.yaml", { screw: "M5", jawWidth: 120, jawHeight: 35, jawThickness: 14, screwSpacing: 90, screwHeight: 10, holding: "pocket-rect", pocketWidth: 50, pocketHeight: 14, pocketCornerRadius: 3, pocketDepth: 4, pocketCentreHeight: 24 }],
  ["soft jaws, round pocket", "soft-jaws/vise-soft-jaws.yaml", { holding: "pocket-round" }],
  ["parallels defaults", "parallels/matched-parallels.yaml", {}],
  ["parallels, aluminium six pairs", "parallels/matched-parallels.yaml", { material: "aluminium-6082", pairCount: 6, parallelThickness: 6, firstHeight: 10, heightStep: 2, parallelLength: 100, holeCount: 3, holeDiameter: 4, minWeb: 3 }],
  ["strap clamp defaults", "clamps/strap-clamp.yaml", {}],
  ["strap clamp, 14 mm slot, five steps", "clamps/strap-clamp.yaml", { tSlot: "14", stud: "M12", spannerForce: 200, spannerLength: 200, studToWork: 40, studToHeel: 60, strapThickness: 25, workHeight: 40, heelSteps: 5 }],
  ["cam edge clamp defaults", "clamps/cam-edge-clamp.yaml", {}],
  ["cam edge clamp, 14 mm slot", "clamps/cam-edge-clamp.yaml", { tSlot: "14", bolt: "M12", camDiameter: 40, camEccentricity: 2, bossDiameter: 12, pivotThread: "M10", gap: 1.2, leverLength: 100, leverRod: 8, handForce: 50, spannerForce: 200, spannerLength: 200, baseLength: 110, baseWidth: 50, pivotInset: 15, camThickness: 14, baseThickness: 14, workMinHeight: 20 }],
];

describe("catalogue templates in the solid kernel", () => {
  it.each(cases)("%s: every part builds, volume within 0.5 % of the analytic one", (_name, file, parameters) => {
    const e = evaluate(builtIn(file), parameters);
    expect(e.buildable).toBe(true);
    expect(e.parts.length).toBeGreaterThan(0);
    for (const p of e.parts) {
      const built = buildPart(kernel, p);
      try {
        const analytic = partVolumeMm3(p);
        expect(Math.abs(built.volumeMm3 - analytic) / analytic, `${p.id}: kernel ${built.volumeMm3.toFixed(2)} vs analytic ${analytic.toFixed(2)}`).toBeLessThan(0.005);
      } finally {
        built.shape.delete();
      }
    }
  });
});
