import { DesignsPage } from "@/features/designs/components/designs-page";
import { templatesPath } from "@/features/catalogue/paths";
import { SignedInPage } from "../signed-in-page";

/** "Saved designs" (signed-in users of any role). */
export function Component() {
  return (
    <SignedInPage
      title="Saved designs"
      lead="Configurations you kept, each pinned to the template version it was saved on."
    >
      <DesignsPage catalogueHref={templatesPath} />
    </SignedInPage>
  );
}
