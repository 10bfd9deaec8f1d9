import type { DbConfig } from "@server/config";
import { createDatabase } from "@server/db";
import { migrateUp, seedDemo } from "@server/db/migrate";
import { instance, type Instance } from "./instances";
import { dropDatabase, ensureDatabase, startInstance, type Log } from "./mariadb";

export interface PreparedDatabase {
  instance?: Instance;
  /** True when this call started mariadbd (so the caller may stop it on exit). */
  startedInstance: boolean;
  migrated: string[];
  seeded: string[];
}

/**
 * Gets a database ready to serve: when `managed`, starts the project's MariaDB instance `instanceName`
 * on `db.port` and creates the database and user; then applies pending migrations and, if `seed`,
 * the demo seeders that have not run yet. With `fresh`, drops the database first (test runs).
 */
export async function prepareDatabase(
  db: DbConfig,
  options: { managed: boolean; instanceName: string; seed: boolean; fresh?: boolean; log?: Log },
): Promise<PreparedDatabase> {
  const log = options.log ?? (() => {});
  let inst: Instance | undefined;
  let startedInstance = false;
  if (options.managed) {
    if (db.host !== "127.0.0.1" && db.host !== "localhost") {
      throw new Error(
        `DB_HOST is ${db.host}: a managed MariaDB only runs on loopback. Set DB_MANAGED=false for your own server.`,
      );
    }
    inst = instance(options.instanceName, { port: db.port });
    startedInstance = (await startInstance(inst, log)).started;
    if (options.fresh) await dropDatabase(inst, db.database);
    await ensureDatabase(inst, db);
  }
  const database = createDatabase(db);
  try {
    const migrated = await migrateUp(database);
    if (migrated.length > 0) log(`Applied migrations: ${migrated.join(", ")}.`);
    const seeded = options.seed ? await seedDemo(database) : [];
    if (seeded.length > 0) log(`Seeded demo data: ${seeded.join(", ")}.`);
    return { ...(inst ? { instance: inst } : {}), startedInstance, migrated, seeded };
  } finally {
    await database.close();
  }
}
