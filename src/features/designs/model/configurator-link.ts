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
  options: { savedDesignId?: number } = {},
): string {
  const q = new URLSearchParams();
  q.set("units", units);
  for (const [key, value] of Object.entries(parameters)) {
    if (key === "units") continue;
    q.set(key, String(value));
  }
  if (options.savedDesignId !== undefined) q.set(savedDesignParam, String(options.savedDesignId));
  return `${configuratorPath(templateId)}?${q.toString()}`;
}

/**
 * The query entry that tells the configurator which saved design it was opened from, so it can offer to
 * save the values back onto that design (on the current template version). Not a parameter key — those
 * are lower camel case without hyphens — so it can never clash with one, and the configurator keeps it.
 */
export const savedDesignParam = "saved-design";

/** The saved design's id in a configurator address, or null when there is none (or it is not an id). */
export function savedDesignIdOf(params: URLSearchParams): number | null {
  const text = params.get(savedDesignParam);
  if (text === null || !/^[1-9]\d{0,9}$/.test(text)) return null;
  const id = Number(text);
  return id <= 4_294_967_295 ? id : null;
}
