import { useCallback, useEffect, useMemo, type ReactNode } from "react";
import { Link, useLocation } from "react-router";
import { buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { ApiError } from "@/lib/api-error";
import { useTemplateDetail, type TemplateDetail } from "../api/template-detail";
import { useConfiguration } from "../hooks/use-configuration";
import { useLiveEvaluation } from "../hooks/use-live-evaluation";
import { AnalysisPanel } from "./analysis-panel";
import { ChecksPanel } from "./checks-panel";
import { DownloadsPanel } from "./downloads-panel";
import { EvaluationStatusLine } from "./evaluation-status";
import { fieldId } from "./parameter-field";
import { ParameterForm } from "./parameter-form";
import { PartsList } from "./parts-list";
import { ResultsPlaceholder } from "./results-placeholder";
import { SaveDesignForm } from "./save-design-form";
import { UnitSwitch } from "./unit-switch";
import { ViseFill } from "./vise-fill";

/** What the page hands the 3D preview (composed in by the route, so the viewer's code loads on its own). */
export interface ViewerSlotProps {
  templateId: string;
  /** The settled configuration in the user's units; null until the form first holds valid values. */
  request: { parameters: Record<string, ParameterValue>; units: LengthUnit } | null;
}

/** What the page hands a "save back onto the design it was opened from" panel (composed in by the route). */
export interface SaveTargetSlotProps {
  /** The template version shown, the one a save puts the design on. */
  templateVersion: string;
  /** In the template's own units; null while a field has a problem. */
  parameters: Record<string, ParameterValue> | null;
  units: LengthUnit;
}

export interface ConfiguratorPageProps {
  templateId: string;
  /** Null while the sign-in is still being checked (nothing account-related is shown yet). */
  signedIn: boolean | null;
  renderViewer: (props: ViewerSlotProps) => ReactNode;
  /** Shown to a signed-in user above "Save this design" when the page was opened from a saved design. */
  renderSaveTarget?: (props: SaveTargetSlotProps) => ReactNode;
  links: { catalogue: string; signIn: string; vises: string };
}

/** The configurator for one template: loads it, then shows the form beside the preview and the results. */
export function ConfiguratorPage(props: ConfiguratorPageProps) {
  const detail = useTemplateDetail(props.templateId);
  useEffect(() => {
    // Set while loading too, so the title announced on arrival names this page, not the one before.
    document.title = detail.data
      ? `${detail.data.name} · Jigwright`
      : detail.isError
        ? "Template not loaded · Jigwright"
        : "Loading a template · Jigwright";
  }, [detail.data, detail.isError]);

  if (detail.isPending) {
    return (
      <div className="mx-auto max-w-7xl px-4 py-10">
        <Spinner label="Loading the template" />
      </div>
    );
  }
  if (detail.isError) {
    const notFound = detail.error instanceof ApiError && detail.error.status === 404;
    return (
      <div className="mx-auto max-w-3xl px-4 py-10">
        <h1 className="text-3xl">{notFound ? "No such template" : "The template could not be loaded"}</h1>
        <Notice tone={notFound ? "info" : "fault"} className="mt-4">
          {notFound
            ? `There is no published template “${props.templateId}”. It may have been retired or the link mistyped.`
            : detail.error.message}
        </Notice>
        <div className="mt-6 flex flex-wrap gap-3">
          {!notFound ? (
            <button type="button" className={buttonClasses("primary")} onClick={() => void detail.refetch()}>
              Try again
            </button>
          ) : null}
          <Link to={props.links.catalogue} className={buttonClasses("secondary")}>
            Back to the templates
          </Link>
        </div>
      </div>
    );
  }
  return <Configurator {...props} template={detail.data} />;
}

function Configurator({
  template,
  signedIn,
  renderViewer,
  renderSaveTarget,
  links,
}: ConfiguratorPageProps & { template: TemplateDetail }) {
  const config = useConfiguration(template);
  const { specs, units, form } = config;
  const location = useLocation();
  const live = useLiveEvaluation(template.id, config.userParameters, units, config.showServerProblems);
  const evaluation = live.shown?.evaluation ?? null;
  const shownUnits = evaluation?.units ?? units;

  const labels = useMemo(() => new Map(specs.map((s) => [s.key, s.label])), [specs]);
  const labelOf = useCallback((key: string) => labels.get(key), [labels]);
  const focusField = useCallback(
    (key: string) => {
      const el = document.getElementById(fieldId(key));
      el?.scrollIntoView({ block: "center", behavior: "smooth" });
      form.setFocus(key);
    },
    [form],
  );
  const analysisMeta = useMemo(
    () =>
      Object.fromEntries(
        (template.analyses ?? []).map((a) => [
          a.id,
          { ...(a.label ? { label: a.label } : {}), ...(a.calculator ? { calculator: a.calculator } : {}) },
        ]),
      ),
    [template.analyses],
  );
  const hand = evaluation?.parameters.handForce;
  const failingErrors = (evaluation?.checks ?? [])
    .filter((c) => c.severity === "error" && !c.passed)
    .map((c) => c.message);
  const signInHref = `${links.signIn}?next=${encodeURIComponent(location.pathname + location.search)}`;

  return (
    <div className="mx-auto max-w-7xl px-4 py-6">
      <nav aria-label="Breadcrumb" className="text-sm text-steel-600">
        <Link to={links.catalogue} className="font-semibold text-spark-700 underline">
          Templates
        </Link>
        <span aria-hidden="true"> / </span>
        <span>{template.name}</span>
      </nav>
      <div className="mt-2 flex flex-wrap items-end justify-between gap-4">
        <div className="max-w-3xl">
          <h1 className="text-3xl sm:text-4xl">{template.name}</h1>
          <p className="mt-1 text-steel-700">{template.summary}</p>
          <p className="figure mt-1 text-sm text-steel-600">
            {template.family} · version {template.version}
          </p>
        </div>
        <UnitSwitch value={units} onChange={config.switchUnits} />
      </div>

      <div className="mt-6 grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <div className="space-y-4">
          <a href="#results" className="inline-block font-semibold text-spark-700 underline lg:hidden">
            Jump to the checks and figures
          </a>
          {signedIn ? (
            <ViseFill
              parameterKeys={new Set(specs.map((s) => s.key))}
              labelOf={labelOf}
              onFill={config.fillFromMm}
              visesHref={links.vises}
            />
          ) : signedIn === null ? null : (
            <p className="rounded-lg border border-steel-200 bg-white p-3 text-sm text-steel-700">
              <Link to={signInHref} className="font-semibold text-spark-700 underline">
                Sign in
              </Link>{" "}
              to fill the jaw sizes from a vise you have recorded, save the design and download drawings.
            </p>
          )}
          <ParameterForm
            specs={specs}
            form={form}
            templateUnits={template.units}
            units={units}
            {...(template.materialNames ? { materialNames: template.materialNames } : {})}
          />
        </div>

        <div id="results" className="scroll-mt-4 space-y-4">
          <EvaluationStatusLine status={live.status} />
          {renderViewer({ templateId: template.id, request: live.settled })}
          {evaluation ? (
            <>
              <ChecksPanel checks={evaluation.checks} labelOf={labelOf} onFocusField={focusField} />
              <AnalysisPanel
                analyses={evaluation.analyses}
                meta={analysisMeta}
                units={shownUnits}
                {...(typeof hand === "number" ? { handForceN: hand } : {})}
              />
              <PartsList parts={evaluation.partSummaries} units={shownUnits} />
              {evaluation.cautions.length > 0 ? (
                <p className="text-sm text-steel-700">
                  <strong className="text-steel-900">Safety: </strong>
                  {evaluation.cautions.join(" ")}
                </p>
              ) : null}
            </>
          ) : (
            <ResultsPlaceholder failed={live.status.kind === "server-problem" ? live.status.message : null} />
          )}
          <div className="space-y-4">
            {signedIn && renderSaveTarget
              ? renderSaveTarget({
                  templateVersion: template.version,
                  parameters: config.templateParameters,
                  units,
                })
              : null}
            {signedIn ? (
              <SaveDesignForm
                templateId={template.id}
                templateName={template.name}
                parameters={config.templateParameters}
                units={units}
                asNew={Boolean(renderSaveTarget)}
              />
            ) : null}
            {signedIn === null ? null : (
              <DownloadsPanel
                templateId={template.id}
                parameters={config.userParameters}
                units={units}
                signedIn={signedIn}
                failingErrors={failingErrors}
                signInHref={signInHref}
              />
            )}
          </div>
        </div>
      </div>
    </div>
  );
}
