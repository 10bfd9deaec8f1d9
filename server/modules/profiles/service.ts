import { maxProfilesPerUser } from "@/shared/profiles";
import { conflict, notFound } from "@server/lib/errors";
import type { OwnedRepository } from "./repository";

export interface ProfileNouns {
  /** "vise" / "machine", for messages. */
  one: string;
  many: string;
}

/**
 * Vise or machine profiles of one signed-in user. Another user's profile is reported exactly like a
 * missing one (404), so ids reveal nothing.
 */
export function profileService<R, F, A>(
  repo: OwnedRepository<R, F>,
  toApi: (record: R) => A,
  nouns: ProfileNouns,
  limit = maxProfilesPerUser,
) {
  async function owned(ownerId: number, id: number): Promise<R> {
    const record = await repo.find(ownerId, id);
    if (!record) throw notFound(`You have no ${nouns.one} with id ${id}.`);
    return record;
  }
  return {
    async list(ownerId: number): Promise<A[]> {
      return (await repo.list(ownerId)).map(toApi);
    },
    async create(ownerId: number, fields: F): Promise<A> {
      if ((await repo.count(ownerId)) >= limit) {
        throw conflict(
          `You already keep ${limit} ${nouns.many}, the most one account may; delete one you no longer use first.`,
        );
      }
      return toApi(await repo.create(ownerId, fields));
    },
    async update(ownerId: number, id: number, fields: Partial<F>): Promise<A> {
      return toApi(await repo.update(await owned(ownerId, id), fields));
    },
    async remove(ownerId: number, id: number): Promise<void> {
      await repo.remove(await owned(ownerId, id));
    },
  };
}

export type ProfileService<F, A> = ReturnType<typeof profileService<unknown, F, A>>;
