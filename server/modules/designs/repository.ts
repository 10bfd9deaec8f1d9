import { Op, type Transaction } from "sequelize";
import type { Models } from "@server/db/models";
import type { DesignRecord } from "@server/db/models/design";
import type { ShareLinkRecord } from "@server/db/models/share-link";
import type { DesignParameters } from "@/shared/designs";
import type { UnitPreference } from "@/shared/profiles";

export interface NewDesign {
  ownerId: number;
  name: string;
  notes: string;
  templateId: string;
  templateVersion: string;
  parameters: DesignParameters;
  units: UnitPreference;
}

export type DesignChanges = Partial<Omit<NewDesign, "ownerId">>;

/**
 * Data access for designs. "Live" means not deleted; every read is scoped by owner, so another user's
 * design is indistinguishable from a missing one.
 */
export function designRepository(models: Models) {
  const { Design } = models;
  return {
    listLive: (ownerId: number) =>
      Design.findAll({
        where: { ownerId, deletedAt: null },
        order: [
          ["updatedAt", "DESC"],
          ["id", "DESC"],
        ],
      }),
    findLive: (ownerId: number, id: number, transaction?: Transaction) =>
      Design.findOne({
        where: { id, ownerId, deletedAt: null },
        transaction,
        lock: transaction ? true : undefined,
      }),
    /** A deleted design of this owner, deleted at or after `since` (still inside the undo window). */
    findRestorable: (ownerId: number, id: number, since: Date) =>
      Design.findOne({ where: { id, ownerId, deletedAt: { [Op.gte]: since } } }),
    countLive: (ownerId: number) => Design.count({ where: { ownerId, deletedAt: null } }),
    // Re-read after each write so times come back at the column's precision (whole seconds), as later reads do.
    create: async (fields: NewDesign) => (await Design.create(fields)).reload(),
    update: async (record: DesignRecord, changes: DesignChanges) => (await record.update(changes)).reload(),
    markDeleted: (record: DesignRecord, at: Date) => record.update({ deletedAt: at }),
    restore: async (record: DesignRecord) => (await record.update({ deletedAt: null })).reload(),
    /** Hard-deletes this owner's designs deleted before `before` (their share links go by cascade). */
    purgeDeletedBefore: (ownerId: number, before: Date) =>
      Design.destroy({ where: { ownerId, deletedAt: { [Op.lt]: before } } }),
    transaction: <T>(fn: (t: Transaction) => Promise<T>) => Design.sequelize!.transaction(fn),
  };
}
export type DesignRepository = ReturnType<typeof designRepository>;

/** Data access for share links. "Active" means not revoked. */
export function shareLinkRepository(models: Models) {
  const { ShareLink, Design } = models;
  return {
    activeForDesigns: (designIds: number[]) =>
      designIds.length === 0
        ? Promise.resolve([] as ShareLinkRecord[])
        : ShareLink.findAll({
            where: { designId: { [Op.in]: designIds }, revokedAt: null },
            order: [["id", "ASC"]],
          }),
    activeForDesign: (designId: number, transaction?: Transaction) =>
      ShareLink.findOne({ where: { designId, revokedAt: null }, order: [["id", "ASC"]], transaction }),
    create: async (designId: number, token: string, transaction?: Transaction) =>
      (await ShareLink.create({ designId, token }, { transaction })).reload({ transaction }),
    /** Revokes every active link of a design; returns how many were active. */
    revokeAll: async (designId: number, at: Date) => {
      const [count] = await ShareLink.update({ revokedAt: at }, { where: { designId, revokedAt: null } });
      return count;
    },
    /** The active link with this token and its design, when that design is not deleted. */
    findActiveByToken: async (token: string) => {
      const link = await ShareLink.findOne({ where: { token, revokedAt: null } });
      if (!link) return null;
      const design = await Design.findOne({ where: { id: link.designId, deletedAt: null } });
      return design ? { link, design } : null;
    },
  };
}
export type ShareLinkRepository = ReturnType<typeof shareLinkRepository>;
