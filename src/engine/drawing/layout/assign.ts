/**
 * Which view shows each annotation: the first view in the request's preference list that is drawn; else a
 * view looking along the same axis from the other side; else any drawn view that can show it (a linear
 * dimension needs its axis in the view plane). Within a view each span along an axis is dimensioned once
 * (ISO 129-1: no dimension repeated; two features at the same position share one dimension); a feature
 * shown in another view keeps its own dimension there, so each feature is located where it is seen.
 * Thread marks go to every view.
 */
import type { AnnotationRequest, CalloutRequest, LinearRequest, ThreadMarkRequest } from "../annotations/types";
import type { ProjectedView, SignedAxis, ViewName } from "../projection";
import { signedAxisOf } from "../projection";

export interface ViewAnnotations {
  linear: LinearRequest[];
  callouts: CalloutRequest[];
  threads: ThreadMarkRequest[];
}

function pick(views: ProjectedView[], prefer: SignedAxis[], canShow: (v: ProjectedView) => boolean): ProjectedView | undefined {
  const toward = (v: ProjectedView) => signedAxisOf(v.towardViewer);
  for (const p of prefer) {
    const v = views.find((x) => toward(x) === p && canShow(x));
    if (v) return v;
  }
  for (const p of prefer) {
    const v = views.find((x) => toward(x)[1] === p[1] && canShow(x));
    if (v) return v;
  }
  return views.find(canShow);
}

const key = (view: ViewName, r: LinearRequest) => `${view}:${r.axis}:${Math.min(r.a, r.b).toFixed(4)}:${Math.max(r.a, r.b).toFixed(4)}`;

export function assignToViews(requests: AnnotationRequest[], views: ProjectedView[]): { byView: Map<ViewName, ViewAnnotations>; unplaced: AnnotationRequest[] } {
  const byView = new Map<ViewName, ViewAnnotations>(views.map((v) => [v.name, { linear: [], callouts: [], threads: [] }]));
  const unplaced: AnnotationRequest[] = [];
  const seen = new Set<string>();
  for (const r of requests) {
    if (r.kind === "thread-mark") {
      for (const v of views) byView.get(v.name)!.threads.push(r);
      continue;
    }
    if (r.kind === "linear") {
      const v = pick(views, r.prefer, (x) => x.right[1] === r.axis || x.up[1] === r.axis);
      if (!v) {
        unplaced.push(r);
        continue;
      }
      if (seen.has(key(v.name, r))) continue;
      seen.add(key(v.name, r));
      byView.get(v.name)!.linear.push(r);
      continue;
    }
    const axisPrefer: SignedAxis[] = r.round ? [...r.prefer.filter((p) => p[1] === r.round!.axis), ...r.prefer] : r.prefer;
    const v = pick(views, axisPrefer, () => true);
    if (!v) unplaced.push(r);
    else byView.get(v.name)!.callouts.push(r);
  }
  return { byView, unplaced };
}
