import { randomBytes } from "node:crypto";
import {
  designUndoWindowHours,
  maxDesignsPerUser,
  type CreateDesignBody,
  type DeleteDesignResponse,
  type Design,
  type ShareLink,
  type SharedDesign,
  type UpdateDesignBody,
} from "@/shared/designs";
import { profileNameMaxLength } from "@/shared/profiles";
import type { DesignRecord } from "@server/db/models/design";
import { badRequest, conflict, notFound } from "@server/lib/errors";
import type { DesignChanges, DesignRepository, ShareLinkRepository } from "./repository";
import { parameterProblems } from "./parameter-check";
import { parametersOf, toApiDesign, toApiShareLink, toSharedDesign } from "./serialize";
import type { CatalogueEntry, TemplateCatalogue } from "./template-catalogue";

export interface DesignServiceDeps {
  designs: DesignRepository;
  shares: ShareLinkRepository;
  catalogue: TemplateCatalogue;
  /** The clock (tests move it to cross the undo window). */
  now?: () => Date;
}

const undoWindowMs = designUndoWindowHours * 3600_000;

/** 24 random bytes from node:crypto, base64url: 32 characters, 192 bits, safe in a URL path. */
export function newShareToken(): string {
  return randomBytes(24).toString("base64url");
}

function copyName(name: string): string {
  const copy = `Copy of ${name}`;
  return copy.length <= profileNameMaxLength ? copy : `${copy.slice(0, profileNameMaxLength - 1)}…`;
}

/**
 * Saved designs and their share links. Deleting hides a design at once and keeps it restorable for
 * {@link designUndoWindowHours} hours (undo); after that it is purged the next time its owner lists or
 * deletes designs. `origin` is the site address the caller used, for share URLs.
 */
export function designService(deps: DesignServiceDeps) {
  const { designs, shares, catalogue } = deps;
  const now = deps.now ?? (() => new Date());

  /** Catalogue lookups for a set of template ids, each asked once. */
  async function catalogueEntries(ids: Iterable<string>): Promise<Map<string, CatalogueEntry | null>> {
    const unique = [...new Set(ids)];
    const entries = await Promise.all(unique.map((id) => catalogue.current(id)));
    return new Map(unique.map((id, i) => [id, entries[i] ?? null]));
  }

  async function view(d: DesignRecord, origin: string): Promise<Design> {
    const [current, link] = await Promise.all([
      catalogue.current(d.templateId),
      shares.activeForDesign(d.id),
    ]);
    return toApiDesign(d, current, link ? toApiShareLink(link, origin) : null);
  }

  async function owned(ownerId: number, id: number): Promise<DesignRecord> {
    const d = await designs.findLive(ownerId, id);
    if (!d) throw notFound(`You have no saved design with id ${id}.`);
    return d;
  }

  async function requireRoom(ownerId: number): Promise<void> {
    if ((await designs.countLive(ownerId)) >= maxDesignsPerUser) {
      throw conflict(
        `You already keep ${maxDesignsPerUser} designs, the most one account may; delete some you no longer need first.`,
      );
    }
  }

  async function purgeExpired(ownerId: number): Promise<void> {
    await designs.purgeDeletedBefore(ownerId, new Date(now().getTime() - undoWindowMs));
  }

  return {
    async list(ownerId: number, origin: string): Promise<Design[]> {
      await purgeExpired(ownerId);
      const rows = await designs.listLive(ownerId);
      const [entries, links] = await Promise.all([
        catalogueEntries(rows.map((d) => d.templateId)),
        shares.activeForDesigns(rows.map((d) => d.id)),
      ]);
      const linkOf = new Map<number, ShareLink>();
      for (const l of links) if (!linkOf.has(l.designId)) linkOf.set(l.designId, toApiShareLink(l, origin));
      return rows.map((d) => toApiDesign(d, entries.get(d.templateId) ?? null, linkOf.get(d.id) ?? null));
    },

    async get(ownerId: number, id: number, origin: string): Promise<Design> {
      return view(await owned(ownerId, id), origin);
    },

    /** Saves a configuration pinned to the template's current version. */
    async create(ownerId: number, body: CreateDesignBody): Promise<Design> {
      const current = await catalogue.current(body.templateId);
      if (!current) {
        throw badRequest("Some fields are not valid.", [
          { path: "templateId", message: `There is no template "${body.templateId}" in the catalogue.` },
        ]);
      }
      const problems = parameterProblems(body.parameters, current);
      if (problems.length > 0) throw badRequest("Some fields are not valid.", problems);
      await requireRoom(ownerId);
      const d = await designs.create({
        ownerId,
        name: body.name,
        notes: body.notes ?? "",
        templateId: current.id,
        templateVersion: current.version,
        parameters: body.parameters,
        units: body.units,
      });
      return toApiDesign(d, current, null);
    },

    async update(ownerId: number, id: number, body: UpdateDesignBody, origin: string): Promise<Design> {
      const d = await owned(ownerId, id);
      const { useCurrentTemplateVersion, ...fields } = body;
      const changes: DesignChanges = fields;
      const current = await catalogue.current(d.templateId);
      if (useCurrentTemplateVersion) {
        if (!current) {
          throw conflict(
            `The catalogue no longer lists the template "${d.templateId}", so this design stays on version ${d.templateVersion}.`,
            [{ path: "useCurrentTemplateVersion", message: "There is no current version to move to." }],
          );
        }
        changes.templateVersion = current.version;
      }
      // Values are checked against the template they will be pinned to, when the catalogue has that version.
      if (
        current &&
        (changes.parameters || useCurrentTemplateVersion) &&
        current.version === (changes.templateVersion ?? d.templateVersion)
      ) {
        const problems = parameterProblems(changes.parameters ?? parametersOf(d), current);
        if (problems.length > 0) throw badRequest("Some fields are not valid.", problems);
      }
      return view(await designs.update(d, changes), origin);
    },

    /** A new design with the same template, pinned version, parameters, units and notes; never the share link. */
    async duplicate(ownerId: number, id: number, name: string | undefined, origin: string): Promise<Design> {
      const d = await owned(ownerId, id);
      await requireRoom(ownerId);
      const copy = await designs.create({
        ownerId,
        name: name ?? copyName(d.name),
        notes: d.notes,
        templateId: d.templateId,
        templateVersion: d.templateVersion,
        parameters: parametersOf(d),
        units: d.units,
      });
      return view(copy, origin);
    },

    async remove(ownerId: number, id: number): Promise<DeleteDesignResponse> {
      const d = await owned(ownerId, id);
      const at = now();
      await designs.markDeleted(d, at);
      await purgeExpired(ownerId);
      return { deleted: { id: d.id, restoreUntil: new Date(at.getTime() + undoWindowMs).toISOString() } };
    },

    /** Undo of a delete, inside the window; its share link (if any) works again. */
    async restore(ownerId: number, id: number, origin: string): Promise<Design> {
      const d = await designs.findRestorable(ownerId, id, new Date(now().getTime() - undoWindowMs));
      if (!d) throw notFound(`You have no deleted design with id ${id} that can still be restored.`);
      return view(await designs.restore(d), origin);
    },

    /** The design's active share link, made if there is none (one active link per design). */
    async share(ownerId: number, id: number, origin: string): Promise<{ link: ShareLink; created: boolean }> {
      return designs.transaction(async (t) => {
        // Locking the design row makes two concurrent "share" clicks end with one link, not two.
        const d = await designs.findLive(ownerId, id, t);
        if (!d) throw notFound(`You have no saved design with id ${id}.`);
        const existing = await shares.activeForDesign(d.id, t);
        if (existing) return { link: toApiShareLink(existing, origin), created: false };
        const link = await shares.create(d.id, newShareToken(), t);
        return { link: toApiShareLink(link, origin), created: true };
      });
    },

    /** Revokes the design's share link; anyone holding it gets 404 from then on. Idempotent. */
    async unshare(ownerId: number, id: number): Promise<void> {
      const d = await owned(ownerId, id);
      await shares.revokeAll(d.id, now());
    },

    /** The public, read-only view behind a token: 404 when unknown, revoked, or its design is deleted. */
    async shared(token: string): Promise<SharedDesign> {
      const found = await shares.findActiveByToken(token);
      if (!found) throw notFound("This share link does not exist or has been revoked by its owner.");
      return toSharedDesign(found.design, found.link, await catalogue.current(found.design.templateId));
    },
  };
}

export type DesignService = ReturnType<typeof designService>;
