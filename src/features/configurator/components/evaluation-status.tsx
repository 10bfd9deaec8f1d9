import { Spinner } from "@/components/ui/spinner";
import type { EvaluationStatus } from "../hooks/use-live-evaluation";

/** One line saying whether the figures on screen belong to what is in the form (a polite live region). */
export function EvaluationStatusLine({ status }: { status: EvaluationStatus }) {
  return (
    <div
      aria-live="polite"
      className="flex min-h-8 items-center text-sm"
      data-testid="evaluation-status"
      data-status={status.kind}
    >
      {status.kind === "first-load" ? <Spinner label="Working out the checks and figures" /> : null}
      {status.kind === "updating" ? <Spinner label="Updating for your changes" /> : null}
      {status.kind === "current" ? (
        <span className="font-semibold text-holds-700">Figures match the form.</span>
      ) : null}
      {status.kind === "input-problem" ? (
        <span className="font-semibold text-caution-700">
          Fix the marked fields; the figures shown are for the last complete values.
        </span>
      ) : null}
      {status.kind === "server-problem" ? (
        <span className="font-semibold text-fault-700">
          Could not work these values out: {status.message}
        </span>
      ) : null}
    </div>
  );
}
