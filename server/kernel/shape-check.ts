import type { Shape3D } from "replicad";
import { countSolids } from "./boolean";
import type { LoadedKernel } from "./oc";

export interface ShapeCheck {
  valid: boolean;
  solidCount: number;
  volumeMm3: number;
  /** Why the shape is not acceptable, in words; null when valid. */
  problem: string | null;
}

/** Volume by Gauss integration over the exact B-rep (BRepGProp). */
export function volumeOf(kernel: LoadedKernel, shape: Shape3D): number {
  const { oc } = kernel;
  const props = new oc.GProp_GProps();
  oc.BRepGProp.VolumeProperties(shape.wrapped, props, false, false, false);
  const v = props.Mass() as number;
  props.delete();
  return v;
}

/** Exact axis-aligned bounding box (BRepBndLib.AddOptimal, without tolerances). */
export function boundsOf(shape: Shape3D): { min: [number, number, number]; max: [number, number, number] } {
  const box = shape.boundingBox;
  const [min, max] = box.bounds;
  box.delete();
  return { min: [min[0], min[1], min[2]], max: [max[0], max[1], max[2]] };
}

/**
 * The acceptance test after a part is built (GEOMETRY.md pitfall 6): BRepCheck_Analyzer says valid, there is
 * exactly one solid (a hole larger than the block leaves several; a bore larger than a disc leaves none),
 * and the volume is positive.
 */
export function checkShape(kernel: LoadedKernel, shape: Shape3D): ShapeCheck {
  const { oc } = kernel;
  const solidCount = countSolids(kernel, shape);
  const analyzer = new oc.BRepCheck_Analyzer(shape.wrapped, true, false);
  const topoValid = analyzer.IsValid() as boolean;
  analyzer.delete();
  const volumeMm3 = solidCount > 0 ? volumeOf(kernel, shape) : 0;
  let problem: string | null = null;
  if (solidCount === 0) problem = "nothing solid is left";
  else if (solidCount > 1) problem = `it falls apart into ${solidCount} separate pieces`;
  else if (!topoValid) problem = "the kernel's validity check fails";
  else if (!(volumeMm3 > 0)) problem = `its volume is ${volumeMm3} mm³`;
  return { valid: problem === null, solidCount, volumeMm3, problem };
}
