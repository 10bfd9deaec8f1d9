import { lazy, Suspense } from "react";
import { cn } from "@/components/ui/cn";
import { convertLength, formatNumber, newtonToLbf, NEWTON_PER_LBF, type LengthUnit } from "@/engine/units";
import type { CamAnalysis } from "../model/cam-analysis";
import { CautionsList } from "./cautions-list";

/** The chart library is big: it arrives in its own chunk, after the figures are already on screen. */
const CamCurveChart = lazy(() =>
  import("@/components/charts/cam-curve-chart").then((m) => ({ default: m.CamCurveChart })),
);

function ChartPlaceholder() {
  return (
    <div
      className="flex h-[22rem] items-center justify-center rounded-lg border border-steel-200 bg-white text-steel-600"
      role="status"
    >
      Loading the chart…
    </div>
  );
}

function Figure({
  label,
  value,
  detail,
  tone,
}: {
  label: string;
  value: string;
  detail?: string;
  tone?: "holds" | "fault" | "caution";
}) {
  return (
    <div className="rounded-md border border-steel-200 bg-steel-50 px-3 py-2">
      <dt className="text-sm text-steel-700">{label}</dt>
      <dd
        className={cn(
          "figure text-xl font-medium",
          tone === "holds"
            ? "text-holds-700"
            : tone === "fault"
              ? "text-fault-700"
              : tone === "caution"
                ? "text-caution-700"
                : "text-steel-950",
        )}
      >
        {value}
      </dd>
      {detail ? <dd className="text-sm text-steel-600">{detail}</dd> : null}
    </div>
  );
}

const pct = (ratio: number) => `${formatNumber(ratio * 100, 0)} %`;
const force = (n: number, units: LengthUnit) =>
  units === "in"
    ? `${formatNumber(n, 0)} N (${formatNumber(newtonToLbf(n), 1)} lbf)`
    : `${formatNumber(n, 0)} N`;

/**
 * A cam analysis: throw, where the cam meets the work, whether it holds itself shut and by how much, the
 * clamping force the hand produces, and the chart of lift and force over the turn — with the cautions
 * beside the figures, never below the fold on their own.
 */
export function CamAnalysisView({
  id,
  cam,
  units,
  handForceN,
}: {
  id: string;
  cam: CamAnalysis;
  units: LengthUnit;
  handForceN?: number;
}) {
  const lengthDecimals = units === "in" ? 4 : 2;
  const locks = cam.selfLocking && cam.selfLockingOverZone;
  return (
    <div className="space-y-4">
      <div className="grid gap-4 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div>
          <dl className="grid grid-cols-2 gap-2" aria-label="Cam figures">
            <Figure
              label="Throw"
              value={`${formatNumber(convertLength(cam.throwMm, "mm", units), lengthDecimals)} ${units}`}
              detail="twice the eccentricity"
            />
            <Figure
              label="Meets the work at"
              value={`${formatNumber(cam.engageAngleDeg, 1)}°`}
              detail={
                cam.workingZone.engagementInZone
                  ? `inside the ${formatNumber(cam.workingZone.startDeg, 0)}–${formatNumber(cam.workingZone.endDeg, 0)}° working zone`
                  : `outside the ${formatNumber(cam.workingZone.startDeg, 0)}–${formatNumber(cam.workingZone.endDeg, 0)}° working zone`
              }
              tone={cam.workingZone.engagementInZone ? undefined : "caution"}
            />
            <Figure
              label="Self-locking"
              value={
                cam.selfLocking ? `yes, margin ${pct(cam.selfLockMargin)}` : `no (${pct(cam.selfLockMargin)})`
              }
              detail={
                cam.selfLockingOverZone
                  ? `over the working zone: margin ${pct(cam.selfLockMarginOverZone)}`
                  : `not everywhere in the working zone (worst ${pct(cam.selfLockMarginOverZone)})`
              }
              tone={locks ? "holds" : cam.selfLocking ? "caution" : "fault"}
            />
            <Figure
              label={
                handForceN !== undefined
                  ? `Clamping force at ${force(handForceN, units)} by hand`
                  : "Clamping force"
              }
              value={force(cam.clampForceN, units)}
              detail={`lever torque ${formatNumber(cam.torqueNm, 2)} N·m · D/e ${formatNumber(cam.ratioDiameterToEccentricity, 1)}`}
            />
          </dl>
          {cam.explanation ? <p className="mt-3 text-steel-800">{cam.explanation}</p> : null}
        </div>
        <CautionsList cautions={cam.cautions} headingId={`${id}-cautions`} />
      </div>
      <Suspense fallback={<ChartPlaceholder />}>
        <CamCurveChart
          curve={cam.curve}
          engageAngleDeg={cam.engageAngleDeg}
          throwMm={cam.throwMm}
          workingZone={cam.workingZone}
          length={
            units === "in"
              ? { symbol: "in", perBase: 1 / 25.4, decimals: 4 }
              : { symbol: "mm", perBase: 1, decimals: 2 }
          }
          force={
            units === "in"
              ? { symbol: "lbf", perBase: 1 / NEWTON_PER_LBF, decimals: 1 }
              : { symbol: "N", perBase: 1, decimals: 0 }
          }
        />
      </Suspense>
    </div>
  );
}
