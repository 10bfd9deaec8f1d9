import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { Design } from "@/shared/designs";
import { useShareDesign } from "../api/share-design";
import { useUnshareDesign } from "../api/unshare-design";
import { formatWhen } from "../model/present";
import { CopyField } from "./copy-field";

/** Make, show, copy and revoke a design's read-only link. Revoking asks once to confirm. */
export function SharePanel({ design }: { design: Design }) {
  const share = useShareDesign();
  const unshare = useUnshareDesign();
  const [confirming, setConfirming] = useState(false);
  const error = share.error ?? unshare.error;

  if (!design.share) {
    return (
      <div className="space-y-2">
        <p className="text-sm text-steel-700">
          A share link opens a read-only page with this design's name, notes and values, for anyone who has
          the link. It shows nothing about your account.
        </p>
        <Button variant="secondary" onClick={() => share.mutate(design.id)} disabled={share.isPending}>
          {share.isPending ? "Making a link…" : "Make a share link"}
        </Button>
        {error ? <Notice tone="fault">{error.message}</Notice> : null}
      </div>
    );
  }
  return (
    <div className="space-y-2">
      <CopyField label={`Share link (made ${formatWhen(design.share.createdAt)})`} value={design.share.url} />
      {confirming ? (
        <div
          role="group"
          aria-label="Confirm revoking the link"
          className="flex flex-wrap items-center gap-2"
        >
          <span className="text-sm font-semibold text-fault-700">
            Anyone holding this link will lose access.
          </span>
          <Button
            variant="danger"
            disabled={unshare.isPending}
            onClick={() => unshare.mutate(design.id, { onSettled: () => setConfirming(false) })}
          >
            {unshare.isPending ? "Revoking…" : "Revoke link"}
          </Button>
          <Button variant="quiet" onClick={() => setConfirming(false)} autoFocus>
            Keep it
          </Button>
        </div>
      ) : (
        <Button variant="quiet" onClick={() => setConfirming(true)}>
          Revoke link…
        </Button>
      )}
      {error ? <Notice tone="fault">{error.message}</Notice> : null}
    </div>
  );
}
