import type { Design, DesignParameters, ShareLink, SharedDesign } from "@/shared/designs";
import type { DesignRecord } from "@server/db/models/design";
import type { ShareLinkRecord } from "@server/db/models/share-link";
import { isNewerVersion } from "./semver";
import type { CatalogueEntry } from "./template-catalogue";

/** Where the read-only page of a token lives, on the origin the owner used. */
export function shareUrl(origin: string, token: string): string {
  return `${origin}/shared/${encodeURIComponent(token)}`;
}

export function toApiShareLink(link: ShareLinkRecord, origin: string): ShareLink {
  return { token: link.token, url: shareUrl(origin, link.token), createdAt: link.createdAt.toISOString() };
}

/** Parameters as stored; the JSON column may come back as text depending on the connector. */
export function parametersOf(d: DesignRecord): DesignParameters {
  const raw: unknown = d.parameters;
  return (typeof raw === "string" ? JSON.parse(raw) : raw) as DesignParameters;
}

/** The pinned version compared with the catalogue's current entry (null when the catalogue lacks it). */
function templateStatus(d: DesignRecord, current: CatalogueEntry | null) {
  return {
    templateVersion: d.templateVersion,
    templateName: current?.name ?? null,
    newerVersion: current && isNewerVersion(current.version, d.templateVersion) ? current.version : null,
  };
}

/** A design as its owner sees it. */
export function toApiDesign(
  d: DesignRecord,
  current: CatalogueEntry | null,
  share: ShareLink | null,
): Design {
  return {
    id: d.id,
    name: d.name,
    notes: d.notes,
    templateId: d.templateId,
    ...templateStatus(d, current),
    parameters: parametersOf(d),
    units: d.units,
    share,
    createdAt: d.createdAt.toISOString(),
    updatedAt: d.updatedAt.toISOString(),
  };
}

/**
 * A design as anyone with its link sees it. Built field by field (never by spreading the row) so nothing
 * about the owner — account id, e-mail, name — nor the design's own id can leak into it.
 */
export function toSharedDesign(
  d: DesignRecord,
  link: ShareLinkRecord,
  current: CatalogueEntry | null,
): SharedDesign {
  return {
    name: d.name,
    notes: d.notes,
    templateId: d.templateId,
    ...templateStatus(d, current),
    parameters: parametersOf(d),
    units: d.units,
    updatedAt: d.updatedAt.toISOString(),
    sharedAt: link.createdAt.toISOString(),
  };
}
