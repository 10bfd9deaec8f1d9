import { templatesPath } from "@/features/catalogue/paths";
import { DesignsPage } from "@/features/designs/components/designs-page";
import { useMachines } from "@/features/profiles/api/get-machines";
import { SignedInPage } from "../signed-in-page";

/** The saved designs, composed with the machine profiles (their top speeds go on operation sheets). */
function SavedDesigns() {
  const machines = useMachines();
  return <DesignsPage catalogueHref={templatesPath} machines={machines.data ?? []} />;
}

/** "Saved designs" (signed-in users of any role). */
export function Component() {
  return (
    <SignedInPage
      title="Saved designs"
      lead="Configurations you kept, each pinned to the template version it was saved on."
    >
      <SavedDesigns />
    </SignedInPage>
  );
}
