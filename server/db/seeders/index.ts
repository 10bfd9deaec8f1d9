import type { Database } from "../index";
import type { MigrationModule } from "../migrator";
import { demoAccountsSeeder } from "./0001-demo-accounts";
import { demoWorkshopProfilesSeeder } from "./0010-demo-workshop-profiles";
import { demoWorkshopDesignSeeder } from "./0011-demo-workshop-design";

/**
 * Demo data, run once per database by `seedDemo()` (umzug, recorded in `seeder_runs`), so deleting a demo
 * account is not undone by the next start. The workshop's vises and machines (0010) and one saved design
 * (0011) go to its machinist.
 */
export const seeders = (db: Database): MigrationModule[] => [
  demoAccountsSeeder(db),
  demoWorkshopProfilesSeeder(db),
  demoWorkshopDesignSeeder(db),
];
