import type { Database } from "../index";
import type { MigrationModule } from "../migrator";
import { demoAccountsSeeder } from "./0001-demo-accounts";

/**
 * Demo data, run once per database by `seedDemo()` (umzug, recorded in `seeder_runs`), so deleting a demo
 * account is not undone by the next start. Vises and machines come with the profiles issue, which makes
 * their tables; their demo rows belong there.
 */
export const seeders = (db: Database): MigrationModule[] => [demoAccountsSeeder(db)];
