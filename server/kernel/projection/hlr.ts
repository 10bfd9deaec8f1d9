/**
 * Exact hidden-line removal through OpenCascade's `HLRBRep_Algo`, called on the `oc` object directly (see
 * GEOMETRY.md item 7). Returns the raw projected edges of one view, classified into lines, circles and arcs;
 * `cleanEdges` then removes the duplicates.
 *
 * Only sharp edges (V/H compounds) and silhouettes (OutLine compounds) are taken: after
 * `BRepLib.EncodeRegularity`, the seams between tangent faces (a slot's flat sides running into its round
 * ends) are "smooth" edges, which ISO 128 does not draw.
 *
 * Side effect: `EncodeRegularity` marks the continuity of the shape's edges in place (harmless to later
 * operations). Every OpenCascade object made here is deleted before returning.
 */
import type { OpenCascadeInstance, TopoDS_Edge, TopoDS_Shape } from "replicad-opencascadejs";
import type { ViewEdge, ViewPoint } from "@/engine/drawing/projection";
import { axisVector } from "@/engine/drawing/projection";
import type { ViewFrame } from "@/engine/drawing/views";
import { arcThrough, classifySamples } from "./classify";

const SAMPLES_PER_CURVE = 24;

export interface Deletable {
  delete(): void;
}

/** Marks tangent-continuous edges as smooth, once per shape, before any view is projected. */
export function encodeRegularity(oc: OpenCascadeInstance, shape: TopoDS_Shape): void {
  oc.BRepLib.EncodeRegularity(shape, 1e-10);
}

/**
 * `HLRBRep_Algo` loaded with `shape` and our camera for `frame`, updated (outlines found) but not yet
 * hidden; it and its helpers go to `trash`.
 */
export function preparedAlgo(oc: OpenCascadeInstance, shape: TopoDS_Shape, frame: ViewFrame, trash: Deletable[]) {
  const keep = <T extends Deletable>(o: T): T => {
    trash.push(o);
    return o;
  };
  const t = axisVector(frame.towardViewer);
  const r = axisVector(frame.right);
  // The projector's main direction points toward the eye; its X direction is the view's right, and
  // Y = main × X is then the view's up (right × up = toward the viewer).
  const origin = keep(new oc.gp_Pnt(0, 0, 0));
  const main = keep(new oc.gp_Dir(t.x, t.y, t.z));
  const xDir = keep(new oc.gp_Dir(r.x, r.y, r.z));
  const ax2 = keep(new oc.gp_Ax2(origin, main, xDir));
  const projector = keep(new oc.HLRAlgo_Projector(ax2));
  const algo = keep(new oc.HLRBRep_Algo());
  algo.Add(shape, 0);
  algo.Projector(projector);
  algo.Update();
  return algo;
}

/** Projects `shape` as seen in `frame`; edges in the view's frame (x = frame.right, y = frame.up), mm. */
export function projectEdges(oc: OpenCascadeInstance, shape: TopoDS_Shape, frame: ViewFrame): ViewEdge[] {
  const trash: Deletable[] = [];
  const keep = <T extends Deletable>(o: T): T => {
    trash.push(o);
    return o;
  };
  try {
    const algo = preparedAlgo(oc, shape, frame, trash);
    algo.Hide();
    const toShape = keep(new oc.HLRBRep_HLRToShape(algo));
    const compounds: [TopoDS_Shape, "visible" | "hidden"][] = [
      [toShape.VCompound(), "visible"],
      [toShape.OutLineVCompound(), "visible"],
      [toShape.HCompound(), "hidden"],
      [toShape.OutLineHCompound(), "hidden"],
    ];
    const edges: ViewEdge[] = [];
    for (const [compound, visibility] of compounds) {
      trash.push(compound);
      if (compound.IsNull()) continue;
      const explorer = keep(new oc.TopExp_Explorer(compound, oc.TopAbs_ShapeEnum.TopAbs_EDGE, oc.TopAbs_ShapeEnum.TopAbs_SHAPE));
      for (; explorer.More(); explorer.Next()) {
        const current = explorer.Current();
        const edge = oc.TopoDS.Edge(current);
        oc.BRepLib.BuildCurves3d(edge);
        const curve = edgeCurve(oc, edge);
        if (curve) edges.push({ visibility, curve });
        edge.delete();
        current.delete();
      }
    }
    return edges;
  } finally {
    for (const o of trash.reverse()) o.delete();
  }
}

function edgeCurve(oc: OpenCascadeInstance, edge: TopoDS_Edge): ViewEdge["curve"] | undefined {
  const adaptor = new oc.BRepAdaptor_Curve(edge);
  try {
    const u0 = adaptor.FirstParameter();
    const u1 = adaptor.LastParameter();
    const at = (u: number): ViewPoint => {
      const p = adaptor.Value(u);
      const v = { x: p.X(), y: p.Y() };
      p.delete();
      return v;
    };
    const type = adaptor.GetType();
    if (type === oc.GeomAbs_CurveType.GeomAbs_Line) {
      const a = at(u0);
      const b = at(u1);
      return Math.hypot(a.x - b.x, a.y - b.y) > 1e-9 ? { type: "line", from: a, to: b } : undefined;
    }
    if (type === oc.GeomAbs_CurveType.GeomAbs_Circle) {
      const circ = adaptor.Circle();
      const loc = circ.Location();
      const centre = { x: loc.X(), y: loc.Y() };
      const radius = circ.Radius();
      loc.delete();
      circ.delete();
      if (Math.abs(u1 - u0) >= 2 * Math.PI - 1e-9) return { type: "circle", centre, radius };
      return arcThrough(centre, radius, at(u0), at((u0 + u1) / 2), at(u1));
    }
    const samples: ViewPoint[] = [];
    for (let i = 0; i <= SAMPLES_PER_CURVE; i++) samples.push(at(u0 + ((u1 - u0) * i) / SAMPLES_PER_CURVE));
    const spread = Math.max(...samples.map((p) => Math.hypot(p.x - samples[0]!.x, p.y - samples[0]!.y)));
    if (spread < 1e-9) return undefined;
    return classifySamples(samples);
  } finally {
    adaptor.delete();
  }
}
