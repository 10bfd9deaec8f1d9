import { Page } from "@/components/layouts/page";
import { Button } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import { useCamCheck } from "../hooks/use-cam-check";
import { CamChart } from "./cam-chart";
import { CamFigures } from "./cam-figures";
import { CamInputs } from "./cam-inputs";
import { Cautions } from "./cautions";
import { Explanation } from "./explanation";
import { MomentBalance } from "./moment-balance";
import { ResultStatus } from "./result-status";
import { Sources } from "./sources";
import { Suggestions } from "./suggestions";
import { UnitSwitch } from "./unit-switch";
import { Verdict } from "./verdict";

/** The cam check: a circular eccentric cam's lock, force and curve, for anyone, no sign-in. */
export function CamCheckPage() {
  const { form, fieldErrors, status, shown } = useCamCheck();
  // The last good result stays on screen, a little faded, while the inputs do not match it.
  const stale = status.kind === "input-problem" || status.kind === "server-problem";
  return (
    <Page
      title="Cam check"
      lead="Will a circular cam clamp hold by itself, and how hard does it press? Enter the cam, the lever and the friction; the figures follow as you type."
    >
      <div className="grid gap-8 lg:grid-cols-[minmax(20rem,26rem)_1fr]">
        <section aria-labelledby="inputs-heading" className="space-y-5">
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="inputs-heading" className="text-xl">
              Your cam
            </h2>
            <UnitSwitch value={form.system} onChange={form.setSystem} />
          </div>
          <form onSubmit={(e) => e.preventDefault()} noValidate aria-labelledby="inputs-heading" className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm">
            <CamInputs system={form.system} texts={form.texts} errors={fieldErrors} onChange={form.setText} />
            <Button variant="quiet" className="mt-4" onClick={form.reset}>
              Back to the starting cam
            </Button>
          </form>
        </section>

        <section aria-labelledby="results-heading" className="min-w-0 space-y-6" data-testid="cam-results" data-status={status.kind}>
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="results-heading" className="text-xl">
              Results
            </h2>
            <div className="min-h-6" aria-live="polite">
              {status.kind === "updating" || status.kind === "current" ? <ResultStatus status={status} hasResult={Boolean(shown)} /> : null}
            </div>
          </div>
          {status.kind === "input-problem" || status.kind === "server-problem" || status.kind === "first-load" ? (
            <ResultStatus status={status} hasResult={Boolean(shown)} />
          ) : null}
          {shown ? (
            <div
              className={cn("space-y-6 transition-opacity", stale ? "opacity-70" : undefined)}
              aria-busy={status.kind === "updating"}
            >
              <div aria-live="polite">
                <Verdict result={shown.result} system={form.system} />
              </div>
              <div className="grid gap-6 xl:grid-cols-[1fr_20rem]">
                <CamFigures result={shown.result} system={form.system} />
                <Cautions cautions={shown.result.cautions} />
              </div>
              <Explanation result={shown.result}>
                <MomentBalance result={shown.result} system={form.system} />
              </Explanation>
              <CamChart result={shown.result} system={form.system} gapMm={shown.input.gap} />
              <Suggestions suggestions={shown.result.suggestions} system={form.system} onTry={form.setBaseValue} />
              <Sources sources={shown.result.sources} zoneBasis={shown.result.workingZone.basis} />
            </div>
          ) : null}
        </section>
      </div>
    </Page>
  );
}
