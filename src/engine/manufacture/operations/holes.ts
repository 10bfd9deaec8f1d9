/**
 * Operations for holes, tapped holes and eccentric bores: spot or centre drill, pilot, drill (to size, to the
 * reaming pre-drill, to the tap drill or under a bore), bore, ream, counterbore, countersink or chamfer, tap.
 * Pre-drill and tap-drill sizes come from the engine's ream and thread calculators (../hole-data).
 */
import type { EccentricBoreFeature, HoleFeature, InternalThreadFeature } from "../../parts/features";
import { dia, len, NO_SPEED, speed, type DraftOperation, type OpContext } from "./context";
import { PILOT_ABOVE_MM, pilotDrillFor, spotDrillFor } from "./tools";
import type { Machine } from "./types";

/** Where a hole is made and how many times. */
export interface HoleSite {
  machine: Machine;
  count: number;
  feature: string;
}

/** Order of hole stages: every hole is spotted before any is drilled, and so on (fewer tool changes). */
export const HOLE_STAGE_ORDER = [
  "centre-drill",
  "spot-drill",
  "pilot-drill",
  "drill",
  "bore",
  "ream",
  "counterbore",
  "countersink",
  "chamfer-hole",
  "tap",
] as const;

/** Boring leaves this much on the diameter after drilling (common practice for small work). */
export const BORING_ALLOWANCE_MM = 1;

const base = (site: HoleSite) => ({ count: site.count, features: [site.feature], notes: [] as string[] });

function startOp(ctx: OpContext, site: HoleSite, holeDiameterMm: number): DraftOperation {
  if (site.machine === "lathe") {
    // Centre drill type A (ISO 866): pilot 1.6 / body 4 for small holes, pilot 2.5 / body 6.3 otherwise.
    const pilot = holeDiameterMm < 5 ? 1.6 : 2.5;
    return {
      ...base(site),
      kind: "centre-drill",
      machine: "lathe",
      description: `Centre drill (${dia(ctx, pilot)} pilot) to start the hole on centre`,
      tool: `Centre drill, type A, ${dia(ctx, pilot)} pilot`,
      toolDiameterMm: pilot,
      ...speed(ctx, "drill", pilot),
    };
  }
  const spot = spotDrillFor(holeDiameterMm);
  return {
    ...base(site),
    kind: "spot-drill",
    machine: site.machine,
    description: "Spot drill the hole position (the spot, a little larger than the hole, leaves a small chamfer)",
    tool: `90° spot drill ${dia(ctx, spot)}`,
    toolDiameterMm: spot,
    ...speed(ctx, "drill", spot),
  };
}

function depthText(ctx: OpContext, through: boolean | undefined, depthMm: number | undefined): string {
  if (through) return "through";
  return depthMm !== undefined ? `${len(ctx, depthMm)} deep` : "to depth";
}

function drillOps(ctx: OpContext, site: HoleSite, drillMm: number, depth: string, purpose: string): DraftOperation[] {
  const ops: DraftOperation[] = [];
  if (drillMm > PILOT_ABOVE_MM) {
    const pilot = pilotDrillFor(drillMm);
    ops.push({
      ...base(site),
      kind: "pilot-drill",
      machine: site.machine,
      description: `Pilot drill ${dia(ctx, pilot)} ${depth}`,
      tool: `Twist drill ${dia(ctx, pilot)}`,
      toolDiameterMm: pilot,
      ...speed(ctx, "drill", pilot),
      notes: [`Holes above ${len(ctx, PILOT_ABOVE_MM)} are pilot drilled first so the big drill's chisel edge does not wander (common practice).`],
    });
  }
  ops.push({
    ...base(site),
    kind: "drill",
    machine: site.machine,
    description: `Drill ${dia(ctx, drillMm)} ${depth}${purpose ? ` (${purpose})` : ""}`,
    tool: `Twist drill ${dia(ctx, drillMm)}`,
    toolDiameterMm: drillMm,
    ...speed(ctx, "drill", drillMm),
  });
  return ops;
}

function finishOps(
  ctx: OpContext,
  site: HoleSite,
  diameterMm: number,
  finish: "drilled" | "reamed" | "bored",
  fit: string | undefined,
  depth: string,
): DraftOperation[] {
  const fitText = fit ? ` ${fit}` : "";
  if (finish === "reamed") {
    const pre = ctx.holeData.reamPreDrillMm(diameterMm);
    return [
      ...drillOps(ctx, site, pre, depth, `pre-drill for the ${dia(ctx, diameterMm)} reamer`),
      {
        ...base(site),
        kind: "ream",
        machine: site.machine,
        description: `Ream ${dia(ctx, diameterMm)}${fitText} ${depth}`,
        tool: `Machine reamer ${dia(ctx, diameterMm)}${fitText}`,
        toolDiameterMm: diameterMm,
        ...speed(ctx, "ream", diameterMm),
        notes: ["Ream in one steady pass with cutting fluid and withdraw with the spindle still turning forward; never turn a reamer backwards (common practice)."],
      },
    ];
  }
  if (finish === "bored") {
    const pre = Math.max(diameterMm * 0.8, diameterMm - BORING_ALLOWANCE_MM);
    return [
      ...drillOps(ctx, site, Number(pre.toFixed(1)), depth, "leaves stock for boring"),
      {
        ...base(site),
        kind: "bore",
        machine: site.machine,
        description: `Bore to ${dia(ctx, diameterMm)}${fitText} ${depth}`,
        tool: site.machine === "lathe" ? "Boring bar" : "Boring head with boring bar",
        toolDiameterMm: diameterMm,
        ...speed(ctx, "turn", diameterMm),
        notes: ["Take light finishing cuts and measure before the last pass."],
      },
    ];
  }
  return drillOps(ctx, site, diameterMm, depth, "");
}

function counterboreOp(ctx: OpContext, site: HoleSite, cb: { diameter: number; depth: number }): DraftOperation {
  const onLathe = site.machine === "lathe";
  return {
    ...base(site),
    kind: "counterbore",
    machine: site.machine,
    description: `Counterbore ${dia(ctx, cb.diameter)} × ${len(ctx, cb.depth)} deep, flat bottom`,
    tool: onLathe ? "Boring bar (flat-bottom)" : `Piloted counterbore or end mill ${dia(ctx, cb.diameter)}`,
    toolDiameterMm: cb.diameter,
    ...speed(ctx, onLathe ? "turn" : "mill", cb.diameter),
  };
}

function countersinkOp(ctx: OpContext, site: HoleSite, diameterMm: number, kind: "countersink" | "chamfer-hole", what: string): DraftOperation {
  return {
    ...base(site),
    kind,
    machine: site.machine,
    description: what,
    tool: `90° countersink ${dia(ctx, diameterMm)}`,
    toolDiameterMm: diameterMm,
    // Countersinks chatter when run fast: reaming speed (common practice).
    ...speed(ctx, "ream", diameterMm),
    notes: ["Run the countersink slowly (about reaming speed) so it does not chatter (common practice)."],
  };
}

/** Operations for a plain, reamed or bored hole with its optional counterbore, countersink and chamfer. */
export function holeOperations(ctx: OpContext, hole: HoleFeature, site: HoleSite): DraftOperation[] {
  const finish = hole.finish ?? (hole.fit ? "reamed" : "drilled");
  const depth = depthText(ctx, hole.through, hole.depth);
  const ops = [startOp(ctx, site, hole.diameter), ...finishOps(ctx, site, hole.diameter, finish, hole.fit, depth)];
  if (hole.counterbore) ops.push(counterboreOp(ctx, site, hole.counterbore));
  if (hole.countersink) {
    ops.push(countersinkOp(ctx, site, hole.countersink.diameter, "countersink", `Countersink to ${dia(ctx, hole.countersink.diameter)} × ${hole.countersink.angleDeg ?? 90}°`));
  }
  if (hole.chamfer) {
    const d = hole.diameter + 2 * hole.chamfer;
    ops.push(countersinkOp(ctx, site, d, "chamfer-hole", `Chamfer the hole edge ${len(ctx, hole.chamfer)} × 45° (to ${dia(ctx, d)})`));
  }
  return ops;
}

/** Operations for a tapped hole: spot, tap drill (from the thread calculator), countersink to the major diameter, tap. */
export function tappedHoleOperations(ctx: OpContext, thread: InternalThreadFeature, site: HoleSite): DraftOperation[] {
  const data = ctx.holeData.thread(thread.designation);
  const drillDepth = thread.through ? undefined : (thread.drillDepth ?? (thread.depth !== undefined ? thread.depth + 3 * data.pitchMm : undefined));
  const depth = depthText(ctx, thread.through, drillDepth);
  const threadDepth = depthText(ctx, thread.through, thread.depth);
  const sinkMm = data.majorDiameterMm + 2 * (thread.chamfer ?? 0);
  const ops: DraftOperation[] = [
    startOp(ctx, site, data.tapDrillMm),
    ...drillOps(ctx, site, data.tapDrillMm, depth, `tap drill for ${data.designation}`),
    countersinkOp(ctx, site, sinkMm, "chamfer-hole", `Countersink the tap-drill hole to ${dia(ctx, sinkMm)} so the tap starts true and raises no burr`),
    {
      ...base(site),
      kind: "tap",
      machine: site.machine,
      description: `Tap ${data.designation} ${threadDepth}`,
      tool: thread.through ? `${data.designation} taper and plug taps` : `${data.designation} taper, second and bottoming taps`,
      toolDiameterMm: data.majorDiameterMm,
      ...NO_SPEED,
      notes: [
        "Tap by hand, started square from the spindle or a tap guide; use cutting paste and break the chip every turn or so.",
        ...(thread.through ? [] : [`Blind hole: the tap-drill hole runs about 3 pitches deeper than the full thread (${depth}) so the tap does not bottom (common practice).`]),
      ],
    },
  ];
  return ops;
}

/** The work-holding step and hole operations for a bore offset from a turned part's axis. */
export function eccentricBoreOperations(ctx: OpContext, bore: EccentricBoreFeature, feature: string, turnedDiameterMm: number): DraftOperation[] {
  const site: HoleSite = { machine: "lathe", count: 1, feature };
  const end = bore.from === "bottom" ? "bottom" : "top";
  const angle = bore.angleDeg ?? 0;
  const hold: DraftOperation = {
    ...base(site),
    kind: "hold-four-jaw",
    machine: "lathe",
    description:
      `Hold the part in the four-jaw chuck, ${end} end out, with the bore centre ${len(ctx, bore.eccentricity)} off the part's axis ` +
      `(toward ${angle}° from +x) on the spindle axis: adjust the jaws until a dial indicator on the ${dia(ctx, turnedDiameterMm)} ` +
      `diameter shows ${len(ctx, 2 * bore.eccentricity)} total run-out, lowest reading on the offset side`,
    tool: "Four-jaw independent chuck, dial indicator",
    toolDiameterMm: null,
    ...NO_SPEED,
    notes: [
      "Within 0.01 mm of the offset is plenty for a bearing face (common practice).",
      "Face the reference end first, then bore, so the bore stays square to the face it bears on.",
      "An offset part in a four-jaw chuck runs out of balance: keep the speed down and check the jaws are tight before starting.",
    ],
  };
  const finish = bore.finish ?? (bore.fit ? "reamed" : "drilled");
  const depth = depthText(ctx, bore.through, bore.depth);
  const ops = [hold, startOp(ctx, site, bore.diameter), ...finishOps(ctx, site, bore.diameter, finish, bore.fit, depth)];
  if (bore.counterbore) ops.push(counterboreOp(ctx, site, bore.counterbore));
  return ops;
}
