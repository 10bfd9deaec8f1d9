import { Page } from "@/components/layouts/page";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useCamCheck } from "../hooks/use-cam-check";
import { CamInputs } from "./cam-inputs";
import { CamResults } from "./cam-results";
import { ResultStatus } from "./result-status";
import { UnitSwitch } from "./unit-switch";

/** The cam check: a circular eccentric cam's lock, force and curve, for anyone, no sign-in. */
export function CamCheckPage() {
  const { form, fieldErrors, status, shown, urlNotes, dismissUrlNotes } = useCamCheck();
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
          {urlNotes.length > 0 ? (
            <Notice tone="caution" title="Some values in the link could not be used">
              <ul className="list-disc space-y-1 pl-5">
                {urlNotes.map((note) => (
                  <li key={note}>{note}</li>
                ))}
              </ul>
              <Button variant="quiet" className="mt-2" onClick={dismissUrlNotes}>
                Dismiss
              </Button>
            </Notice>
          ) : null}
          <form
            onSubmit={(e) => e.preventDefault()}
            noValidate
            aria-labelledby="inputs-heading"
            className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
          >
            <CamInputs system={form.system} texts={form.texts} errors={fieldErrors} onChange={form.setText} />
            <Button variant="quiet" className="mt-4" onClick={form.reset}>
              Back to the starting cam
            </Button>
          </form>
        </section>

        <section
          aria-labelledby="results-heading"
          className="min-w-0 space-y-6"
          data-testid="cam-results"
          data-status={status.kind}
        >
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="results-heading" className="text-xl">
              Results
            </h2>
            <div className="min-h-6" aria-live="polite">
              {status.kind === "updating" || status.kind === "current" ? (
                <ResultStatus status={status} hasResult={Boolean(shown)} />
              ) : null}
            </div>
          </div>
          {status.kind === "input-problem" ||
          status.kind === "server-problem" ||
          status.kind === "first-load" ? (
            <ResultStatus status={status} hasResult={Boolean(shown)} />
          ) : null}
          {shown ? (
            <CamResults
              shown={shown}
              system={form.system}
              stale={stale}
              updating={status.kind === "updating"}
              onTry={form.setBaseValue}
            />
          ) : null}
        </section>
      </div>
    </Page>
  );
}
