import type { Shape3D } from "replicad";
import { KernelError } from "./errors";
import type { LoadedKernel } from "./oc";

/**
 * Cuts every tool out of `shape` in one Boolean operation (OpenCascade's general fuse treats the tools as
 * one group, so tools may overlap each other). Inputs are left alone; the caller deletes them.
 * replicad's own `cut` also unifies same-domain faces after every cut, which costs as much as the cut; we
 * unify once per part instead ({@link unifyFaces}).
 */
export function cutMany(kernel: LoadedKernel, shape: Shape3D, tools: Shape3D[]): Shape3D {
  const { oc } = kernel;
  const args = new oc.NCollection_List_TopoDS_Shape();
  const toolList = new oc.NCollection_List_TopoDS_Shape();
  const progress = new oc.Message_ProgressRange();
  const op = new oc.BRepAlgoAPI_Cut();
  try {
    args.Append(shape.wrapped);
    for (const t of tools) toolList.Append(t.wrapped);
    op.SetArguments(args);
    op.SetTools(toolList);
    op.SetRunParallel(false);
    op.Build(progress);
    if (!op.IsDone() || op.HasErrors()) throw new KernelError("kernel_build", "the Boolean cut failed");
    return castOwned(kernel, op.Shape());
  } finally {
    op.delete();
    progress.delete();
    toolList.delete();
    args.delete();
  }
}

/** Merges faces and edges that lie on the same surface (left behind by cuts), so a face is one face. */
export function unifyFaces(kernel: LoadedKernel, shape: Shape3D): Shape3D {
  const { oc } = kernel;
  const upgrader = new oc.ShapeUpgrade_UnifySameDomain(shape.wrapped, true, true, false);
  try {
    upgrader.Build();
    return castOwned(kernel, upgrader.Shape());
  } finally {
    upgrader.delete();
  }
}

/**
 * Wraps a raw shape returned by value from the kernel in a replicad shape and frees the raw handle.
 * replicad's `cast` makes a downcast copy and leaves the original handle alive, which keeps the whole
 * B-rep (and any triangulation on it) in the heap for ever.
 */
export function castOwned(kernel: LoadedKernel, raw: { delete(): void }): Shape3D {
  const shape = kernel.r.cast(raw as never) as Shape3D;
  if ((shape.wrapped as unknown) !== raw) raw.delete();
  return shape;
}

/** Number of solids in a shape, without leaking explorer items (replicad's `.solids` does). */
export function countSolids(kernel: LoadedKernel, shape: Shape3D): number {
  const { oc } = kernel;
  const exp = new oc.TopExp_Explorer(shape.wrapped, oc.TopAbs_ShapeEnum.TopAbs_SOLID, oc.TopAbs_ShapeEnum.TopAbs_SHAPE);
  let n = 0;
  try {
    for (; exp.More(); exp.Next()) n++;
  } finally {
    exp.delete();
  }
  return n;
}

/** The first solid of a shape as a replicad Solid (caller deletes), or null. */
export function firstSolid(kernel: LoadedKernel, shape: Shape3D): Shape3D | null {
  const { oc, r } = kernel;
  const exp = new oc.TopExp_Explorer(shape.wrapped, oc.TopAbs_ShapeEnum.TopAbs_SOLID, oc.TopAbs_ShapeEnum.TopAbs_SHAPE);
  try {
    if (!exp.More()) return null;
    const raw = exp.Current();
    const solid = new r.Solid(oc.TopoDS.Solid(raw));
    raw.delete();
    return solid;
  } finally {
    exp.delete();
  }
}
