import { Notice } from "@/components/ui/notice";
import type { LengthUnit } from "@/engine/units";
import { readAnalyses } from "../model/cam-analysis";
import { describeFigure } from "../model/figure-format";
import { CamAnalysisView } from "./cam-analysis-view";
import { CautionsList } from "./cautions-list";

/** Every analysis of the evaluation: cams get their figures and chart, other calculators a list of figures. */
export function AnalysisPanel({
  analyses,
  labels,
  units,
  handForceN,
}: {
  analyses: Readonly<Record<string, Record<string, unknown>>>;
  /** Analysis id → the template's label for it. */
  labels: Readonly<Record<string, string>>;
  units: LengthUnit;
  handForceN?: number;
}) {
  const views = readAnalyses(analyses);
  if (views.length === 0) return null;
  return (
    <section
      aria-labelledby="analysis-heading"
      className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
    >
      <h2 id="analysis-heading" className="text-xl">
        Engineering figures
      </h2>
      <div className="mt-3 space-y-6">
        {views.map((view) => (
          <div key={view.id} data-analysis={view.id}>
            <h3 className="mb-2 text-lg">{labels[view.id] ?? view.id}</h3>
            {view.kind === "cam" ? (
              <CamAnalysisView
                id={view.id}
                cam={view.cam}
                units={units}
                {...(handForceN !== undefined ? { handForceN } : {})}
              />
            ) : view.kind === "failed" ? (
              <Notice tone="fault" title="Could not be worked out for these values">
                {view.reason}
              </Notice>
            ) : (
              <div className="grid gap-4 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
                <dl className="grid grid-cols-2 gap-2">
                  {view.figures.map((f) => {
                    const shown = describeFigure(f.key, f.value, units);
                    return (
                      <div key={f.key} className="rounded-md border border-steel-200 bg-steel-50 px-3 py-2">
                        <dt className="text-sm text-steel-700">{shown.words}</dt>
                        <dd className="figure font-medium text-steel-950">{shown.text}</dd>
                      </div>
                    );
                  })}
                </dl>
                <CautionsList cautions={view.cautions} headingId={`${view.id}-cautions`} />
              </div>
            )}
          </div>
        ))}
      </div>
    </section>
  );
}
