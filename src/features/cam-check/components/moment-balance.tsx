import type { CamResult } from "../api/cam-result-schema";
import { formatQuantity, type UnitSystem } from "../model/units";

/**
 * The lock as two bars: the arm with which the clamping load turns the cam back (e·sin φ) against the
 * arms with which friction at the face and in the pivot hold it. Holding longer than opening = locks.
 */
export function MomentBalance({ result, system }: { result: CamResult; system: UnitSystem }) {
  const { drivingMm, contactFrictionMm, pivotFrictionMm } = result.armsAtEngagement;
  const holding = contactFrictionMm + pivotFrictionMm;
  const scale = Math.max(drivingMm, holding, 1e-9);
  const width = (mm: number) => `${(mm / scale) * 100}%`;
  const len = (mm: number) => formatQuantity(system, "length", mm, system === "inch" ? 5 : 3);
  return (
    <figure className="space-y-3 self-start rounded-lg bg-steel-50 p-4">
      <figcaption className="font-semibold text-steel-950">
        The moments about the pivot where it engages
      </figcaption>
      <div>
        <p className="flex justify-between gap-3 text-sm text-steel-700">
          <span>Load turning it open (e · sin φ)</span>
          <span className="figure">{len(drivingMm)}</span>
        </p>
        <div className="mt-1 h-4 rounded bg-steel-100">
          <div className="h-4 rounded bg-fault-700" style={{ width: width(drivingMm) }} />
        </div>
      </div>
      <div>
        <p className="flex justify-between gap-3 text-sm text-steel-700">
          <span>Friction holding it</span>
          <span className="figure">{len(holding)}</span>
        </p>
        <div className="mt-1 flex h-4 overflow-hidden rounded bg-steel-100">
          <div className="h-4 bg-holds-600" style={{ width: width(contactFrictionMm) }} />
          <div className="h-4 bg-steel-500" style={{ width: width(pivotFrictionMm) }} />
        </div>
        <p className="mt-1 flex flex-wrap gap-x-4 text-sm text-steel-700">
          <span className="inline-flex items-center gap-1.5">
            <span aria-hidden="true" className="size-3 rounded-sm bg-holds-600" />
            at the face <span className="figure">{len(contactFrictionMm)}</span>
          </span>
          <span className="inline-flex items-center gap-1.5">
            <span aria-hidden="true" className="size-3 rounded-sm bg-steel-500" />
            in the pivot <span className="figure">{len(pivotFrictionMm)}</span>
          </span>
        </p>
      </div>
      <p className="text-sm text-steel-600">
        Each is a lever arm: multiplied by the clamping force it gives a moment. The cam stays put while the
        friction bar is the longer one.
      </p>
    </figure>
  );
}
