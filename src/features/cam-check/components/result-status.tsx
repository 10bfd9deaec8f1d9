import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import type { CamStatus } from "../hooks/use-cam-check";

/** One line above the results saying whether they match the inputs. */
export function ResultStatus({ status, hasResult }: { status: CamStatus; hasResult: boolean }) {
  switch (status.kind) {
    case "first-load":
      return <Spinner label="Working out the cam" />;
    case "updating":
      return <Spinner label="Updating" className="text-sm" />;
    case "current":
      return (
        <p role="status" className="text-sm text-steel-600">
          Up to date with the inputs.
        </p>
      );
    case "input-problem":
      return (
        <Notice tone="caution" title="Fix the marked input">
          {hasResult
            ? "The results below are for the last complete cam you entered."
            : "Results appear once every input is valid."}
        </Notice>
      );
    case "server-problem":
      return (
        <Notice tone="fault" title="The calculation could not be made">
          {status.message}
          {hasResult ? " The results below are for the last cam that worked." : ""}
        </Notice>
      );
  }
}
