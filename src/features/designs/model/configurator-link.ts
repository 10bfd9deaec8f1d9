import type { DesignParameters } from "@/shared/designs";
import type { UnitPreference } from "@/shared/profiles";

/** The configurator's page of a template (its own route; this feature only links to it). */
export const configuratorPath = (templateId: string) => `/templates/${encodeURIComponent(templateId)}`;

/**
 * A link that opens the configurator with a design's values in the address, the way the configurator
 * reads it: `units=<mm|in>` first, then `<parameter>=<value>` in the template's own units (numbers as
 * JavaScript prints them, which round-trip exactly; booleans as true/false). A parameter that happens to
 * be called `units` is left out rather than clash with the unit switch.
 */
export function configuratorHref(
  templateId: string,
  units: UnitPreference,
  parameters: DesignParameters,
): string {
  const q = new URLSearchParams();
  q.set("units", units);
  for (const [key, value] of Object.entries(parameters)) {
    if (key === "units") continue;
    q.set(key, String(value));
  }
  return `${configuratorPath(templateId)}?${q.toString()}`;
}
