import type { LengthUnit } from "@/engine/units";

/**
 * Query keys of the configurator, under the same `templates` root as the catalogue's list so one
 * invalidation of `["templates"]` refreshes both.
 */
export const configuratorKeys = {
  all: ["templates"] as const,
  detail: (id: string) => ["templates", "detail", id] as const,
  evaluation: (id: string, units: LengthUnit, parameters: unknown) =>
    ["templates", "evaluate", id, units, parameters] as const,
};
