import type { Database } from "./index";
import { createMigrator, withMigrationLock } from "./migrator";
import { migrations } from "./migrations";
import { seeders } from "./seeders";

/** Table recording which schema migrations have run. */
export const migrationTable = "schema_migrations";
/** Table recording which seeders have run, so demo data is made once (on first start) and never again. */
export const seederTable = "seeder_runs";

export const schemaMigrator = (db: Database) => createMigrator(db.sequelize, migrations, migrationTable);

/** Applies every pending migration; returns the names applied. Safe to call on every start. */
export async function migrateUp(db: Database): Promise<string[]> {
  return withMigrationLock(db, async () => (await schemaMigrator(db).up()).map((m) => m.name));
}

/** Reverts migrations down to (and including) `to`, or everything with `to: 0`. For tests and rollbacks. */
export async function migrateDown(db: Database, options: { to?: string | 0 } = { to: 0 }): Promise<string[]> {
  return withMigrationLock(db, async () => (await schemaMigrator(db).down(options)).map((m) => m.name));
}

/** Runs the demo seeders that have not run yet; returns their names. */
export async function seedDemo(db: Database): Promise<string[]> {
  return withMigrationLock(db, async () => {
    const seeder = createMigrator(db.sequelize, seeders(db), seederTable);
    return (await seeder.up()).map((m) => m.name);
  });
}
