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
  const { oc, r } = kernel;
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
    return r.cast(op.Shape()) as Shape3D;
  } finally {
    op.delete();
    progress.delete();
    toolList.delete();
    args.delete();
  }
}

/** Merges faces and edges that lie on the same surface (left behind by cuts), so a face is one face. */
export function unifyFaces(kernel: LoadedKernel, shape: Shape3D): Shape3D {
  const { oc, r } = kernel;
  const upgrader = new oc.ShapeUpgrade_UnifySameDomain(shape.wrapped, true, true, false);
  try {
    upgrader.Build();
    return r.cast(upgrader.Shape()) as Shape3D;
  } finally {
    upgrader.delete();
  }
}
