import type { ReactNode } from "react";
import { Notice } from "@/components/ui/notice";

/**
 * Which template version a design is pinned to, and what to know when the catalogue has moved on or no
 * longer lists the template.
 */
export function VersionNote({
  templateId,
  templateName,
  templateVersion,
  newerVersion,
  action,
}: {
  templateId: string;
  templateName: string | null;
  templateVersion: string;
  newerVersion: string | null;
  /** Offered beside a newer version (e.g. "What changes in version 1.1.0?"). */
  action?: ReactNode;
}) {
  return (
    <div className="space-y-2">
      <p className="text-steel-700">
        {templateName ?? templateId}{" "}
        <span className="figure rounded bg-steel-100 px-1.5 py-0.5 text-sm text-steel-800">
          v{templateVersion}
        </span>
      </p>
      {newerVersion ? (
        <Notice tone="caution" title={`Version ${newerVersion} of this template is out`}>
          {action ? (
            <p>
              This design was saved on version {templateVersion} and stays on it until you save it on a newer
              one. The new version may size or check the part differently: see what changes, then open the
              design on it and save it there if the results suit you.
            </p>
          ) : (
            <p>
              This design was saved on version {templateVersion}. The current version may size or check the
              part differently: compare its results before you cut metal.
            </p>
          )}
          {action ? <div className="mt-2">{action}</div> : null}
        </Notice>
      ) : null}
      {templateName === null ? (
        <Notice tone="caution" title="This template is no longer in the catalogue">
          The saved values are kept, but the configurator cannot open them until the template is published
          again.
        </Notice>
      ) : null}
    </div>
  );
}
