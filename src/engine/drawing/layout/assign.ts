/**
 * Which view shows each annotation: the first view in the request's preference list that is drawn; else a
 * view looking along the same axis from the other side; else any drawn view that can show it (a linear
 * dimension needs its axis in the view plane). Within a view each span along an axis is dimensioned once
 * (ISO 129-1: no dimension repeated; two features at the same position share one dimension); a feature
 * shown in another view keeps its own dimension there, so each feature is located where it is seen.
 * Thread marks go to every view.
 */
import type { AngularRequest, AnnotationRequest, CalloutRequest, LinearRequest, ThreadMarkRequest } from "../annotations/types";
import type { ProjectedView, SignedAxis, ViewName } from "../projection";
import { signedAxisOf } from "../projection";

export interface ViewAnnotations {
  linear: LinearRequest[];
  callouts: CalloutRequest[];
  threads: ThreadMarkRequest[];
  angular: AngularRequest[];
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
  const byView = new Map<ViewName, ViewAnnotations>(views.map((v) => [v.name, { linear: [], callouts: [], threads: [], angular: [] }]));
  const unplaced: AnnotationRequest[] = [];
  const seen = new Set<string>();
  const unseenAngles: AngularRequest[] = [];
  for (const r of requests) {
    if (r.kind === "angular") {
      // Only a view looking along the axis shows the angle true.
      const v = pick(views, r.prefer, (x) => Math.abs(x.towardViewer[r.axis]) > 0.5);
      if (v && Math.abs(v.towardViewer[r.axis]) > 0.5) byView.get(v.name)!.angular.push(r);
      else unseenAngles.push(r);
      continue;
    }
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
  // An angle no drawn view shows true is stated in words in its feature's callout (a copy: the same
  // requests are laid out again at other scales).
  for (const a of unseenAngles) {
    const holder = [...byView.values()].find((ann) => ann.callouts.some((c) => c.feature === a.feature));
    if (!holder) {
      unplaced.push(a);
      continue;
    }
    holder.callouts = holder.callouts.map((c) => (c.feature === a.feature ? { ...c, lines: [...c.lines, a.fallbackLine] } : c));
  }
  return { byView, unplaced };
}
