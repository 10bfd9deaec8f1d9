import { QueryStatus } from "@/components/ui/query-status";
import { machineFieldsSchema } from "@/shared/profiles";
import { useCreateMachine } from "../api/create-machine";
import { useDeleteMachine } from "../api/delete-machine";
import { useMachines } from "../api/get-machines";
import { useUpdateMachine } from "../api/update-machine";
import { machineFields } from "../model/fields";
import { ProfileTable } from "./profile-table";

/** "Machines": the signed-in user's machines with loading, error and empty states. */
export function MachinesSection() {
  const machines = useMachines();
  const create = useCreateMachine();
  const update = useUpdateMachine();
  const remove = useDeleteMachine();
  return (
    <section aria-labelledby="machines-heading" className="space-y-3">
      <div>
        <h2 id="machines-heading" className="text-2xl">
          Machines
        </h2>
        <p className="text-steel-700">
          Take the top spindle speed from the machine's plate or its maker's manual, and keep to the maker's
          guidance when you choose a speed. "Works in" records the units you set the machine up in.
        </p>
      </div>
      <QueryStatus
        query={machines}
        loading="Loading your machines"
        failed="Your machines could not be loaded"
      />
      {machines.data ? (
        <ProfileTable
          caption="Your machines"
          noun="machine"
          rows={machines.data}
          fields={machineFields}
          schema={machineFieldsSchema}
          onCreate={(values) => create.mutateAsync(values)}
          onUpdate={(id, changes) => update.mutateAsync({ id, changes })}
          onDelete={(id) => remove.mutateAsync(id)}
          empty={
            <>
              <p className="font-semibold">No machines yet.</p>
              <p>Add your mill or lathe with its top spindle speed.</p>
            </>
          }
        />
      ) : null}
    </section>
  );
}
