import { Notice } from "@/components/ui/notice";
import type { LengthUnit } from "@/engine/units";
import { analysisFigures } from "../model/analysis-figures";
import { readAnalyses, type AnalysisView } from "../model/cam-analysis";
import { CamAnalysisView } from "./cam-analysis-view";
import { CautionsList } from "./cautions-list";

export interface AnalysisMeta {
  label?: string;
  calculator?: string;
}

/**
 * Every analysis of the evaluation. A cam gets its figures, chart and cautions side by side; the other
 * calculators get compact cards with their headline figures. A caution already shown beside the cam is
 * not repeated on every card; each card adds only the cautions that are its own.
 */
export function AnalysisPanel({
  analyses,
  meta,
  units,
  handForceN,
}: {
  analyses: Readonly<Record<string, Record<string, unknown>>>;
  meta: Readonly<Record<string, AnalysisMeta>>;
  units: LengthUnit;
  handForceN?: number;
}) {
  const views = readAnalyses(analyses, (id) => meta[id]?.calculator);
  if (views.length === 0) return null;
  const cams = views.filter((v): v is Extract<AnalysisView, { kind: "cam" }> => v.kind === "cam");
  const others = views.filter((v) => v.kind !== "cam");
  const shown = new Set(cams.flatMap((c) => c.cam.cautions));
  // Cautions every other card shares (the general setup caution) are shown once, above the cards.
  const cardCautions = others.map((v) =>
    v.kind === "figures" ? v.cautions.filter((c) => !shown.has(c)) : [],
  );
  const shared =
    cardCautions.length > 1
      ? cardCautions[0]!.filter((c) => cardCautions.every((list) => list.includes(c)))
      : [];
  const sharedSet = new Set(shared);
  const title = (id: string) => meta[id]?.label ?? id;

  return (
    <section
      aria-labelledby="analysis-heading"
      className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
    >
      <h2 id="analysis-heading" className="text-xl">
        Engineering figures
      </h2>
      <div className="mt-3 space-y-6">
        {cams.map((view) => (
          <div key={view.id} data-analysis={view.id}>
            <h3 className="mb-2 text-lg">{title(view.id)}</h3>
            <CamAnalysisView
              id={view.id}
              cam={view.cam}
              units={units}
              {...(handForceN !== undefined ? { handForceN } : {})}
            />
          </div>
        ))}
        {others.length > 0 ? (
          <div className="space-y-3">
            {cams.length > 0 ? <h3 className="text-lg">Parts and fits</h3> : null}
            {shared.length > 0 ? (
              <CautionsList cautions={shared} headingId="analysis-shared-cautions" />
            ) : null}
            <ul className="grid gap-3 md:grid-cols-2">
              {others.map((view, i) => (
                <li
                  key={view.id}
                  data-analysis={view.id}
                  className="rounded-md border border-steel-200 bg-steel-50 p-3"
                >
                  <h4 className="font-semibold text-steel-950">{title(view.id)}</h4>
                  {view.kind === "failed" ? (
                    <Notice tone="fault" className="mt-2" title="Could not be worked out for these values">
                      {view.reason}
                    </Notice>
                  ) : view.kind === "figures" ? (
                    <>
                      <dl className="mt-1 divide-y divide-steel-200">
                        {analysisFigures(view.calculator, view.result, units).map((f) => (
                          <div key={f.label} className="flex items-baseline justify-between gap-3 py-1">
                            <dt className="text-sm text-steel-700">{f.label}</dt>
                            <dd className="figure text-right font-medium text-steel-950">{f.text}</dd>
                          </div>
                        ))}
                      </dl>
                      {(cardCautions[i] ?? []).filter((c) => !sharedSet.has(c)).length > 0 ? (
                        <ul className="mt-2 space-y-1 text-sm text-caution-700">
                          {(cardCautions[i] ?? [])
                            .filter((c) => !sharedSet.has(c))
                            .map((c) => (
                              <li key={c} className="flex gap-1.5">
                                <span aria-hidden="true">⚠</span>
                                <span className="text-steel-800">
                                  <span className="sr-only">Caution: </span>
                                  {c}
                                </span>
                              </li>
                            ))}
                        </ul>
                      ) : null}
                    </>
                  ) : null}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
      </div>
    </section>
  );
}
