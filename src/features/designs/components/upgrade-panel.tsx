import { Link } from "react-router";
import { buttonClasses } from "@/components/ui/button";
import { QueryStatus } from "@/components/ui/query-status";
import type { DesignUpgrade } from "@/shared/design-upgrade";
import type { Design } from "@/shared/designs";
import { useDesignUpgrade } from "../api/get-design-upgrade";
import { configuratorHref } from "../model/configurator-link";
import { needsAttention } from "../model/upgrade-text";
import { UpgradeChecks, UpgradeParameters } from "./upgrade-lists";

/**
 * "What changes on the new version": the differences the server found between the design's pinned
 * template version and the current one, and the way on — open the configurator on the new version with
 * the saved values carried over. Nothing changes until the person saves there.
 */
export function UpgradePanel({ design }: { design: Design }) {
  const upgrade = useDesignUpgrade(design.id, design.units);
  const headingId = `design-${design.id}-upgrade`;
  return (
    <section
      aria-labelledby={headingId}
      className="space-y-3 rounded-md border border-steel-200 bg-steel-50 p-3"
    >
      <h4 id={headingId} className="text-lg font-semibold">
        What changes on version {design.newerVersion}
      </h4>
      <QueryStatus
        query={upgrade}
        loading="Comparing the two versions"
        failed="The versions could not be compared"
      />
      {upgrade.data ? <UpgradeReport design={design} report={upgrade.data} /> : null}
    </section>
  );
}

function UpgradeReport({ design, report }: { design: Design; report: DesignUpgrade }) {
  if (!report.to) {
    return <p className="text-steel-700">This design is already on the current version; nothing to move.</p>;
  }
  const to = report.to.version;
  const attention = report.parameters.filter(needsAttention);
  const others = report.parameters.filter((c) => !needsAttention(c));
  const failing = report.checks.failingErrorsOnNew;
  return (
    <div className="space-y-4">
      <p className="text-steel-800" data-testid="upgrade-summary">
        {attention.length > 0
          ? `${attention.length} saved ${attention.length === 1 ? "value needs" : "values need"} your decision on version ${to}.`
          : `Every saved value fits version ${to}.`}{" "}
        {report.checks.evaluatedOnNew
          ? failing > 0
            ? `${failing} error ${failing === 1 ? "check fails" : "checks fail"} on version ${to}.`
            : `Version ${to}'s error checks pass with these values.`
          : null}
      </p>
      {attention.length > 0 ? (
        <UpgradeParameters title="Needs your decision" tone="caution" changes={attention} report={report} />
      ) : null}
      {others.length > 0 ? (
        <UpgradeParameters title="Other changes" changes={others} report={report} />
      ) : null}
      <UpgradeChecks report={report} />
      <div className="space-y-2">
        <Link
          to={configuratorHref(design.templateId, report.units, report.carried, { savedDesignId: design.id })}
          className={buttonClasses("primary")}
        >
          Open on version {to}
        </Link>
        <p className="text-sm text-steel-700">
          The configurator opens version {to} with your values carried over as listed above. Your saved design
          stays on version {report.from.version}, unchanged, until you save it there. Check the results on the
          machine before you cut metal: they are computed figures, not a guarantee.
        </p>
      </div>
    </div>
  );
}
