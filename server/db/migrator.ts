import mariadb from "mariadb";
import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug, type MigrationFn } from "umzug";
import type { Database } from "./index";

export type Migration = MigrationFn<QueryInterface>;
export interface MigrationModule {
  name: string;
  up: Migration;
  down: Migration;
}

/**
 * An umzug migrator over `modules`, recording what ran in the table `storageTable`.
 * Schema changes go through migrations only: the app never calls `sync()`.
 */
export function createMigrator(sequelize: Sequelize, modules: MigrationModule[], storageTable: string) {
  return new Umzug<QueryInterface>({
    migrations: modules.map((m) => ({
      name: m.name,
      up: (params) => m.up(params),
      down: (params) => m.down(params),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: storageTable }),
    logger: undefined,
  });
}

/**
 * Holds a MariaDB named lock (GET_LOCK) on a connection of its own while `fn` runs, so two processes
 * (say `npm start` and the CLI, or two test runs) never migrate the same database at once.
 */
export async function withMigrationLock<T>(db: Database, fn: () => Promise<T>): Promise<T> {
  const { host, port, user, password, database } = db.config;
  const conn = await mariadb.createConnection({ host, port, user, password, database, connectTimeout: 5000 });
  const lockName = `jigwright_migrate_${database}`;
  try {
    const rows = (await conn.query("SELECT GET_LOCK(?, 120) AS got", [lockName])) as Array<{
      got: number | bigint | null;
    }>;
    if (Number(rows[0]?.got) !== 1)
      throw new Error(`Could not take the migration lock of ${database} within 120 s.`);
    try {
      return await fn();
    } finally {
      await conn.query("SELECT RELEASE_LOCK(?)", [lockName]);
    }
  } finally {
    await conn.end();
  }
}
