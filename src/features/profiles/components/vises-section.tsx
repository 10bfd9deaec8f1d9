import { QueryStatus } from "@/components/ui/query-status";
import { viseFieldsSchema } from "@/shared/profiles";
import { useCreateVise } from "../api/create-vise";
import { useDeleteVise } from "../api/delete-vise";
import { useVises } from "../api/get-vises";
import { useUpdateVise } from "../api/update-vise";
import { viseFields } from "../model/fields";
import { ProfileTable } from "./profile-table";

/** "Vises": the signed-in user's vises with loading, error and empty states. */
export function VisesSection() {
  const vises = useVises();
  const create = useCreateVise();
  const update = useUpdateVise();
  const remove = useDeleteVise();
  return (
    <section aria-labelledby="vises-heading" className="space-y-3">
      <div>
        <h2 id="vises-heading" className="text-2xl">
          Vises
        </h2>
        <p className="text-steel-700">
          Measure each vise once: the width and height of a jaw, its thickness front to back, and how far the
          jaws open. All sizes are in millimetres.
        </p>
      </div>
      <QueryStatus query={vises} loading="Loading your vises" failed="Your vises could not be loaded" />
      {vises.data ? (
        <ProfileTable
          caption="Your vises, sizes in millimetres"
          noun="vise"
          rows={vises.data}
          fields={viseFields}
          schema={viseFieldsSchema}
          onCreate={(values) => create.mutateAsync(values)}
          onUpdate={(id, changes) => update.mutateAsync({ id, changes })}
          onDelete={(id) => remove.mutateAsync(id)}
          empty={
            <>
              <p className="font-semibold">No vises yet.</p>
              <p>Add the vises you use, and a template can take their jaw sizes in one step.</p>
            </>
          }
        />
      ) : null}
    </section>
  );
}
