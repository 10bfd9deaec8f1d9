import { MachinesSection } from "./machines-section";
import { VisesSection } from "./vises-section";

/** "My vises and machines": both profile tables, one above the other. */
export function WorkshopPage() {
  return (
    <div className="space-y-10">
      <VisesSection />
      <MachinesSection />
    </div>
  );
}
