import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { designUpgradeResponseSchema, type DesignUpgrade } from "@/shared/design-upgrade";
import type { UnitPreference } from "@/shared/profiles";
import { designKeys } from "./keys";

/** `GET /api/designs/:id/upgrade?units=…`: what changes for the design on the current template version. */
export async function getDesignUpgrade(
  id: number,
  units: UnitPreference,
  signal?: AbortSignal,
): Promise<DesignUpgrade> {
  return (
    await api.get(`/api/designs/${id}/upgrade?units=${units}`, {
      schema: designUpgradeResponseSchema,
      signal,
    })
  ).upgrade;
}

export const designUpgradeQueryOptions = (id: number, units: UnitPreference) =>
  queryOptions({
    queryKey: designKeys.upgrade(id, units),
    queryFn: ({ signal }) => getDesignUpgrade(id, units, signal),
  });

export function useDesignUpgrade(id: number, units: UnitPreference) {
  return useQuery(designUpgradeQueryOptions(id, units));
}
