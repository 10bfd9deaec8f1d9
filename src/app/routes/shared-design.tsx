import { useParams } from "react-router";
import { useMe } from "@/features/auth/api/get-me";
import { SharedDesignView } from "@/features/designs/components/shared-design-view";
import { designsPath } from "@/features/designs/paths";

/** The public page of a share link: no sign-in needed; signed-in visitors may save a copy. */
export function Component() {
  const { token = "" } = useParams();
  const me = useMe();
  return (
    // Not the shared Page layout: the design's own name is the page heading, once it has loaded.
    <div className="mx-auto max-w-6xl px-4 py-8">
      <SharedDesignView token={token} signedIn={Boolean(me.data)} designsHref={designsPath} />
    </div>
  );
}
