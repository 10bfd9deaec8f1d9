import { cn } from "@/components/ui/cn";
import type { DesignUpgrade, ParameterChange } from "@/shared/design-upgrade";
import { checkHeading, checkShift, parameterSentence } from "../model/upgrade-text";

/** A list of parameter differences, each in one plain sentence. */
export function UpgradeParameters({
  title,
  tone,
  changes,
  report,
}: {
  title: string;
  tone?: "caution";
  changes: readonly ParameterChange[];
  report: DesignUpgrade;
}) {
  const to = report.to?.version ?? "";
  return (
    <div>
      <h5 className={cn("font-semibold", tone === "caution" ? "text-caution-700" : "text-steel-900")}>
        {title}
      </h5>
      <ul className="mt-1 list-disc space-y-1 pl-5 text-steel-800">
        {changes.map((c) => (
          <li key={`${c.kind}-${c.key}`} data-change={c.kind} data-key={c.key}>
            {parameterSentence(c, report.from, to)}
          </li>
        ))}
      </ul>
    </div>
  );
}

const shiftTone = {
  "now-fails": "border-fault-700",
  "fails-on-new": "border-fault-700",
  "now-passes": "border-holds-600",
  "no-longer-checked": "border-steel-400",
} as const;

/** The checks whose outcome moves between the versions, or why they could not be compared. */
export function UpgradeChecks({ report }: { report: DesignUpgrade }) {
  const { checks } = report;
  const to = report.to?.version ?? "";
  return (
    <div>
      <h5 className="font-semibold text-steel-900">Checks</h5>
      {checks.note ? <p className="mt-1 text-sm text-steel-700">{checks.note}</p> : null}
      {checks.evaluatedOnNew && checks.changes.length === 0 ? (
        <p className="mt-1 text-steel-800">
          {checks.compared
            ? "Every check gives the same result on both versions."
            : `No check fails on version ${to}.`}
        </p>
      ) : null}
      {checks.changes.length > 0 ? (
        <ul className="mt-1 space-y-2">
          {checks.changes.map((c) => {
            const shift = checkShift(c, checks.compared);
            const message = (c.after ?? c.before)?.message ?? "";
            return (
              <li
                key={c.id}
                data-check={c.id}
                data-shift={shift}
                className={cn("border-l-4 bg-white py-1 pl-3", shiftTone[shift])}
              >
                <p className="text-sm font-semibold text-steel-900">{checkHeading(c, checks.compared, to)}</p>
                <p className="text-steel-800">{message}</p>
              </li>
            );
          })}
        </ul>
      ) : null}
    </div>
  );
}
