import { useParams } from "react-router";
import { Page } from "@/components/layouts/page";
import { useMe } from "@/features/auth/api/get-me";
import { SharedDesignView } from "@/features/designs/components/shared-design-view";
import { designsPath } from "@/features/designs/paths";

/** The public page of a share link: no sign-in needed; signed-in visitors may save a copy. */
export function Component() {
  const { token = "" } = useParams();
  const me = useMe();
  return (
    <Page title="Shared design">
      <SharedDesignView token={token} signedIn={Boolean(me.data)} designsHref={designsPath} />
    </Page>
  );
}
