import { WorkshopPage } from "@/features/profiles/components/workshop-page";
import { SignedInPage } from "../signed-in-page";

/** "My vises and machines" (signed-in users of any role). */
export function Component() {
  return (
    <SignedInPage
      title="My vises and machines"
      lead="Your workshop's vises and machines, kept with your account so a template can be sized from them in one step."
    >
      <WorkshopPage />
    </SignedInPage>
  );
}
