import type { Model, ModelStatic, WhereOptions } from "sequelize";
import type { Models } from "@server/db/models";
import type { MachineFields, ViseFields } from "@/shared/profiles";

/** Data access for rows that belong to one user; every read is scoped by owner, so nobody reaches another's rows. */
export interface OwnedRepository<R, F> {
  list(ownerId: number): Promise<R[]>;
  /** The row, or null when it does not exist or belongs to someone else (the caller cannot tell which). */
  find(ownerId: number, id: number): Promise<R | null>;
  count(ownerId: number): Promise<number>;
  create(ownerId: number, fields: F): Promise<R>;
  update(record: R, fields: Partial<F>): Promise<R>;
  remove(record: R): Promise<void>;
}

type Owned = Model & { ownerId: number };

/** An {@link OwnedRepository} over a model with `ownerId` and `name` attributes, listed by name. */
export function ownedRepository<M extends Owned, F extends object>(
  model: ModelStatic<M>,
): OwnedRepository<M, F> {
  const byOwner = (ownerId: number) => ({ ownerId }) as unknown as WhereOptions<M>;
  // Sequelize's generic creation type cannot be named for an unknown M; the fields were validated upstream.
  const insert = model.create.bind(model) as unknown as (values: object) => Promise<M>;
  return {
    list: (ownerId) =>
      model.findAll({
        where: byOwner(ownerId),
        order: [
          ["name", "ASC"],
          ["id", "ASC"],
        ],
      }),
    find: (ownerId, id) => model.findOne({ where: { ...byOwner(ownerId), id } as WhereOptions<M> }),
    count: (ownerId) => model.count({ where: byOwner(ownerId) }),
    // Re-read after each write so times come back at the column's precision (whole seconds), as later reads do.
    create: async (ownerId, fields) => (await insert({ ...fields, ownerId })).reload(),
    update: async (record, fields) => (await record.update(fields as Partial<M["_attributes"]>)).reload(),
    remove: (record) => record.destroy(),
  };
}

export const viseRepository = (models: Models) =>
  ownedRepository<InstanceType<Models["Vise"]>, ViseFields>(models.Vise);
export const machineRepository = (models: Models) =>
  ownedRepository<InstanceType<Models["Machine"]>, MachineFields>(models.Machine);
