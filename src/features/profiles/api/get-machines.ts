import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { machineListResponseSchema, type Machine } from "@/shared/profiles";
import { profileKeys } from "./keys";

/** `GET /api/machines`: the signed-in user's machines, by name. */
export async function getMachines(signal?: AbortSignal): Promise<Machine[]> {
  return (await api.get("/api/machines", { schema: machineListResponseSchema, signal })).machines;
}

export const machinesQueryOptions = () =>
  queryOptions({ queryKey: profileKeys.machines(), queryFn: ({ signal }) => getMachines(signal) });

export function useMachines() {
  return useQuery(machinesQueryOptions());
}
