import { cn } from "@/components/ui/cn";
import { countFailures, orderChecks, type CheckResultView } from "../model/check-order";

const look: Record<CheckResultView["severity"], { word: string; box: string; mark: string }> = {
  error: { word: "Error", box: "border-fault-700 bg-fault-50", mark: "bg-fault-700 text-white" },
  warning: { word: "Warning", box: "border-caution-700 bg-caution-50", mark: "bg-caution-700 text-white" },
  note: { word: "Note", box: "border-steel-400 bg-steel-50", mark: "bg-steel-600 text-white" },
};

/**
 * The check results: what fails first, errors before warnings before notes, each with buttons that take
 * the person to the fields it concerns. What passes is listed below, folded away.
 */
export function ChecksPanel({
  checks,
  labelOf,
  onFocusField,
}: {
  checks: readonly CheckResultView[];
  /** Parameter key → its label; keys the form does not have are not linked. */
  labelOf: (key: string) => string | undefined;
  onFocusField: (key: string) => void;
}) {
  const ordered = orderChecks(checks);
  const failing = ordered.filter((c) => !c.passed);
  const passing = ordered.filter((c) => c.passed);
  const counts = countFailures(checks);
  return (
    <section
      aria-labelledby="checks-heading"
      className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
    >
      <h2 id="checks-heading" className="text-xl">
        Checks
      </h2>
      <p className="mt-1 text-steel-700" data-testid="checks-summary">
        {failing.length === 0
          ? `All ${checks.length} checks pass.`
          : [
              counts.error ? `${counts.error} error${counts.error > 1 ? "s" : ""}` : null,
              counts.warning ? `${counts.warning} warning${counts.warning > 1 ? "s" : ""}` : null,
              counts.note ? `${counts.note} note${counts.note > 1 ? "s" : ""}` : null,
            ]
              .filter(Boolean)
              .join(", ") + ` to look at; ${passing.length} pass.`}
      </p>
      {failing.length > 0 ? (
        <ol className="mt-3 space-y-2" aria-label="Checks that fail">
          {failing.map((check) => (
            <CheckItem key={check.id} check={check} labelOf={labelOf} onFocusField={onFocusField} />
          ))}
        </ol>
      ) : null}
      {passing.length > 0 ? (
        <details className="mt-3" open={failing.length === 0}>
          <summary className="cursor-pointer rounded font-semibold text-holds-700">
            {passing.length} check{passing.length > 1 ? "s" : ""} pass
          </summary>
          <ol className="mt-2 space-y-1.5" aria-label="Checks that pass">
            {passing.map((check) => (
              <li key={check.id} className="flex gap-2 text-sm text-steel-800">
                <span aria-hidden="true" className="mt-0.5 font-bold text-holds-600">
                  ✓
                </span>
                <span>
                  <span className="sr-only">Passes: </span>
                  {check.message}
                </span>
              </li>
            ))}
          </ol>
        </details>
      ) : null}
    </section>
  );
}

function CheckItem({
  check,
  labelOf,
  onFocusField,
}: {
  check: CheckResultView;
  labelOf: (key: string) => string | undefined;
  onFocusField: (key: string) => void;
}) {
  const l = look[check.severity];
  const linked = check.parameters.filter((key) => labelOf(key) !== undefined);
  return (
    <li className={cn("rounded-md border-l-4 px-3 py-2", l.box)} data-severity={check.severity}>
      <p className="flex flex-wrap items-start gap-2 text-steel-900">
        <span className={cn("rounded px-1.5 py-0.5 text-xs font-bold uppercase tracking-wide", l.mark)}>
          {l.word}
        </span>
        <span className="min-w-0 flex-1">{check.message}</span>
      </p>
      {linked.length > 0 ? (
        <p className="mt-1.5 flex flex-wrap items-center gap-1.5 text-sm text-steel-700">
          <span>Change:</span>
          {linked.map((key) => (
            <button
              key={key}
              type="button"
              onClick={() => onFocusField(key)}
              className="rounded border border-steel-300 bg-white px-2 py-0.5 font-semibold text-steel-900 underline-offset-2 hover:underline"
            >
              {labelOf(key)}
            </button>
          ))}
        </p>
      ) : null}
    </li>
  );
}
