/**
 * Annotators for the base of a part and the features that change how the base is dimensioned.
 *
 *  - Block: the three overall sizes (ISO 129-1 §4: overall dimensions outermost), length and height in
 *    the front view, width in the top (or end) view.
 *  - Turned: every step's diameter (Ø with its ISO 286 shaft class and limits where the step has a fit,
 *    "Ø8 g6 (−0.005/−0.014)", or the thread designation where an external thread is cut on it)
 *    and its shoulder positions measured from the datum end, plus the overall length. External threads
 *    add their length when shorter than their step, and the ISO 6410 thread marks.
 */
import type { BlockFeature, ExternalThreadFeature, TurnedFeature } from "../../parts/features";
import { threadLabel, sizeWithFit } from "./callouts";
import { faceRegion, locationFromDatum, sizeBetween, spanRegion } from "./helpers";
import type { AnnotateContext, AnnotationRequest } from "./types";

export function annotateBlock(f: BlockFeature, ctx: AnnotateContext, name: string): AnnotationRequest[] {
  const { fmt } = ctx;
  const dim = (axis: "x" | "y" | "z", prefer: ("-y" | "+z" | "+x")[]) =>
    sizeBetween(name, axis, 0, f.size[axis], faceRegion(ctx, axis, 0), faceRegion(ctx, axis, f.size[axis]), fmt.length(f.size[axis]), prefer, "overall");
  return [dim("x", ["-y", "+z"]), dim("z", ["-y", "+x"]), dim("y", ["+z", "+x"])];
}

/** z range of each step of a turned base. */
export function stepRanges(f: TurnedFeature): { z0: number; z1: number; diameter: number }[] {
  let z = 0;
  return f.steps.map((s) => {
    const r = { z0: z, z1: z + s.length, diameter: s.diameter };
    z += s.length;
    return r;
  });
}

export function annotateTurned(f: TurnedFeature, ctx: AnnotateContext, name: string, threads: ExternalThreadFeature[]): AnnotationRequest[] {
  const { fmt } = ctx;
  const ranges = stepRanges(f);
  const total = ranges[ranges.length - 1]!.z1;
  const out: AnnotationRequest[] = [];
  const front: ["+y"] = ["+y"];
  ranges.forEach((r, i) => {
    const rad = r.diameter / 2;
    const thread = threads.find((t) => t.step === i);
    const stepName = f.steps[i]!.label ?? `${name} step ${i + 1}`;
    const text = thread ? threadLabel(thread.designation) : sizeWithFit(ctx, r.diameter, f.steps[i]!.fit, "shaft");
    // The extension lines may start anywhere along the step's outline; the layout picks the free end.
    out.push(
      sizeBetween(
        stepName,
        "x",
        -rad,
        rad,
        spanRegion({ x: -rad, y: 0, z: r.z0 }, { x: -rad, y: 0, z: r.z1 }),
        spanRegion({ x: rad, y: 0, z: r.z0 }, { x: rad, y: 0, z: r.z1 }),
        text,
        front,
      ),
    );
    if (i < ranges.length - 1) {
      const shoulder = r.z1;
      const region = spanRegion({ x: -maxRad(ranges, i), y: 0, z: shoulder }, { x: maxRad(ranges, i), y: 0, z: shoulder });
      out.push(...locationFromDatum(ctx, stepName, "z", shoulder, region, front));
    }
  });
  out.push(sizeBetween(name, "z", 0, total, faceRegion(ctx, "z", 0), faceRegion(ctx, "z", total), fmt.length(total), front, "overall"));
  return out;
}

/** The larger radius either side of the shoulder after step i (where its face ends). */
function maxRad(ranges: { diameter: number }[], i: number): number {
  return Math.max(ranges[i]!.diameter, ranges[i + 1]?.diameter ?? 0) / 2;
}

export function annotateExternalThread(f: ExternalThreadFeature, base: TurnedFeature, ctx: AnnotateContext, name: string): AnnotationRequest[] {
  const ranges = stepRanges(base);
  const r = ranges[f.step];
  if (!r) return [];
  const info = ctx.threads(f.designation);
  const fromEnd = (f.from ?? "end") === "end";
  const length = Math.min(f.length, r.z1 - r.z0);
  const start = fromEnd ? r.z1 : r.z0;
  const stop = fromEnd ? r.z1 - length : r.z0 + length;
  const out: AnnotationRequest[] = [
    {
      kind: "thread-mark",
      feature: name,
      form: "external",
      start: { x: 0, y: 0, z: start },
      direction: fromEnd ? "-z" : "+z",
      lengthMm: length,
      majorMm: info.nominalMm,
      minorMm: info.externalMinorMm,
    },
  ];
  if (length < r.z1 - r.z0 - 1e-6) {
    const rad = r.diameter / 2;
    out.push(
      sizeBetween(name, "z", start, stop, spanRegion({ x: -rad, y: 0, z: start }, { x: rad, y: 0, z: start }), spanRegion({ x: -rad, y: 0, z: stop }, { x: rad, y: 0, z: stop }), ctx.fmt.length(length), ["+y"]),
    );
  }
  return out;
}
