import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { QueryTypes, UniqueConstraintError } from "sequelize";
import { createDatabase, type Database } from "@server/db";
import { migrateDown, migrateUp, migrationTable, schemaMigrator, seedDemo } from "@server/db/migrate";
import { migrations } from "@server/db/migrations";
import { demoAccounts } from "@server/db/seeders/demo-accounts";
import { seeders } from "@server/db/seeders";
import { prepareTestDatabase, testDbConfig } from "./helpers";

// A database of its own: migrating down drops every table, which the shared test database cannot allow.
const config = testDbConfig("jigwright_test_migrations");
let db: Database;

async function tables(): Promise<string[]> {
  const rows = await db.sequelize.query<{ name: string }>(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = ? ORDER BY table_name",
    { type: QueryTypes.SELECT, replacements: [config.database] },
  );
  return rows.map((r) => r.name);
}

beforeAll(async () => {
  await prepareTestDatabase(config, true);
  db = createDatabase(config);
});
afterAll(async () => {
  await db.close();
});

describe("migrations", () => {
  it("are all applied by prepare, and none is pending", async () => {
    expect((await schemaMigrator(db).pending()).map((m) => m.name)).toEqual([]);
    expect((await schemaMigrator(db).executed()).map((m) => m.name)).toEqual(migrations.map((m) => m.name));
    expect(await tables()).toEqual(
      expect.arrayContaining(["users", "sessions", "user_tokens", migrationTable]),
    );
  });

  it("go all the way down (leaving only the bookkeeping table) and back up", async () => {
    const reverted = await migrateDown(db, { to: 0 });
    expect(reverted).toEqual(migrations.map((m) => m.name).reverse());
    expect(await tables()).toEqual([migrationTable]);

    const applied = await migrateUp(db);
    expect(applied).toEqual(migrations.map((m) => m.name));
    expect(await tables()).toEqual(expect.arrayContaining(["users", "sessions", "user_tokens"]));
    expect(await migrateUp(db)).toEqual([]);
  });

  it("enforce a unique e-mail in the schema itself, not only in the service", async () => {
    const row = { email: "same@api.test", displayName: "A", passwordHash: "x", role: "machinist" as const };
    await db.models.User.create(row);
    await expect(db.models.User.create(row)).rejects.toBeInstanceOf(UniqueConstraintError);
  });

  it("seed the demo data once (the accounts: one per role), and not again", async () => {
    const all = seeders(db).map((m) => m.name);
    expect(all).toContain("0001-demo-accounts");
    expect(await seedDemo(db)).toEqual(all);
    const users = await db.models.User.findAll({ where: { email: demoAccounts.map((a) => a.email) } });
    expect(users.map((u) => u.role).sort()).toEqual(["admin", "designer", "machinist", "reviewer"]);
    expect(await seedDemo(db)).toEqual([]);
  });
});
