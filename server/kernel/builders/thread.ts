import type { ExternalThreadFeature, InternalThreadFeature } from "@/engine/parts/features";
import { internalThreadBore } from "@/engine/parts/analytic";
import { metricThread, type MetricThreadGeometry } from "@/engine/parts/threads";
import { KernelError } from "../errors";
import { holeAxis, holeProfile } from "./hole";
import { revolvedTool } from "./tools";
import type { BuildContext, CosmeticThread, ToolBuilder } from "./types";

export function metricThreadOf(designation: string): MetricThreadGeometry {
  const t = metricThread(designation);
  if (!t) throw new KernelError("kernel_input", `"${designation}" is not an ISO metric thread designation (M6 or M6x0.75)`);
  return t;
}

/**
 * Internal thread: the modelled hole is the engine's bore (`boreDiameter`, by default the basic minor
 * diameter D1) to the drill depth (by default the thread depth plus three pitches), with its entry chamfer;
 * the thread itself is recorded for the drawing.
 */
function internalThread(f: InternalThreadFeature, ctx: BuildContext) {
  const t = metricThreadOf(f.designation);
  const ax = holeAxis(f, ctx.base);
  const { boreDiameterMm, drillDepthMm, through } = internalThreadBore(f, ctx.base.geometry);
  const drill = through ? ax.throughMm : drillDepthMm;
  const chamfer = ax.radial ? undefined : f.chamfer;
  const tool = revolvedTool(ctx.kernel, ax.frame, holeProfile({ diameter: boreDiameterMm, chamfer }, drill));
  const thread: CosmeticThread = {
    featureIndex: ctx.featureIndex,
    featureId: f.id,
    form: "internal",
    designation: t.designation,
    nominalDiameterMm: t.nominalDiameterMm,
    minorDiameterMm: boreDiameterMm,
    pitchMm: f.pitch ?? t.pitchMm,
    lengthMm: through ? ax.throughMm - 1 : (f.depth ?? drillDepthMm),
    origin: { ...ax.entry },
    direction: { x: ax.frame.w[0], y: ax.frame.w[1], z: ax.frame.w[2] },
    through,
  };
  return { tools: [tool], threads: [thread] };
}

/** External thread: the step stays at its (major) diameter; the thread is recorded from the chosen end. */
function externalThread(f: ExternalThreadFeature, ctx: BuildContext) {
  const t = metricThreadOf(f.designation);
  if (ctx.base.kind !== "turned") throw new KernelError("kernel_input", "an external thread needs a turned base");
  const steps = ctx.base.steps;
  const step = steps[f.step];
  if (!step) throw new KernelError("kernel_input", `the thread names step ${f.step}, but the part has ${steps.length} steps`);
  const z0 = steps.slice(0, f.step).reduce((s, x) => s + x.length, 0);
  const fromEnd = f.from === "end";
  const pitch = f.pitch ?? t.pitchMm;
  const thread: CosmeticThread = {
    featureIndex: ctx.featureIndex,
    featureId: f.id,
    form: "external",
    designation: t.designation,
    nominalDiameterMm: step.diameter,
    minorDiameterMm: f.minorDiameter ?? step.diameter - (t.nominalDiameterMm - t.externalMinorDiameterMm),
    pitchMm: pitch,
    lengthMm: f.length,
    origin: { x: 0, y: 0, z: fromEnd ? z0 + step.length : z0 },
    direction: { x: 0, y: 0, z: fromEnd ? -1 : 1 },
    through: false,
  };
  return { tools: [], threads: [thread] };
}

/** Threads are cosmetic (ISO 6410): see {@link internalThread} and {@link externalThread}. */
export const threadBuilder: ToolBuilder<"thread"> = {
  kind: "thread",
  role: "tool",
  tool(feature, ctx) {
    return feature.form === "internal" ? internalThread(feature, ctx) : externalThread(feature, ctx);
  },
};
