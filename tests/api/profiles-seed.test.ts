import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { machineListResponseSchema, viseListResponseSchema } from "@/shared/profiles";
import { seedDemo } from "@server/db/migrate";
import { demoAccounts } from "@server/db/seeders/demo-accounts";
import {
  demoMachines,
  demoVises,
  demoWorkshopProfilesSeeder,
} from "@server/db/seeders/0010-demo-workshop-profiles";
import { createTestApp, TestAgent, type TestApp } from "./helpers";

// Its own database: the demo accounts use fixed e-mails, which must not meet other suites' rows.
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ isolatedDatabase: "jigwright_test_demo_profiles" });
});
afterAll(async () => {
  await t.close();
});

const machinist = demoAccounts.find((a) => a.role === "machinist")!;

describe("demo workshop profiles", () => {
  it("give the demo machinist the workshop's vises and machines, seen through the API", async () => {
    const ran = await seedDemo(t.db);
    expect(ran).toContain("0010-demo-workshop-profiles");
    const agent = new TestAgent(t.app);
    expect((await agent.login(machinist.email, machinist.password)).status).toBe(200);
    const vises = viseListResponseSchema.parse((await agent.get("/api/vises")).body).vises;
    expect(
      vises.map(({ name, jawWidthMm, jawHeightMm, jawThicknessMm, maxOpeningMm }) => ({
        name,
        jawWidthMm,
        jawHeightMm,
        jawThicknessMm,
        maxOpeningMm,
      })),
    ).toEqual([...demoVises].sort((a, b) => a.name.localeCompare(b.name)));
    const machines = machineListResponseSchema.parse((await agent.get("/api/machines")).body).machines;
    expect(machines.map((m) => m.name).sort()).toEqual(demoMachines.map((m) => m.name).sort());
  });

  it("never duplicates a profile when run again, and gives the other demo accounts none", async () => {
    await demoWorkshopProfilesSeeder(t.db).up({ name: "again", context: t.db.sequelize.getQueryInterface() });
    expect(await t.db.models.Vise.count()).toBe(demoVises.length);
    expect(await t.db.models.Machine.count()).toBe(demoMachines.length);
    const designer = demoAccounts.find((a) => a.role === "designer")!;
    const agent = new TestAgent(t.app);
    await agent.login(designer.email, designer.password);
    expect(viseListResponseSchema.parse((await agent.get("/api/vises")).body).vises).toEqual([]);
  });
});
