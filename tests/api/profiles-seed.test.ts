import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { designListResponseSchema } from "@/shared/designs";
import { machineListResponseSchema, viseListResponseSchema } from "@/shared/profiles";
import { evaluateTemplate } from "@/engine";
import { builtInTemplates } from "@server/templates";
import { demoDesignName } from "@server/db/seeders/0011-demo-workshop-design";
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

  it("give the demo machinist one saved design, pinned to the catalogue's version, that evaluates and builds", async () => {
    const agent = new TestAgent(t.app);
    await agent.login(machinist.email, machinist.password);
    const designs = designListResponseSchema.parse((await agent.get("/api/designs")).body).designs;
    const compiled = builtInTemplates().get("cam-vise-stop")!;
    expect(designs.map((d) => d.name)).toEqual([demoDesignName]);
    const [d] = designs;
    expect(d).toMatchObject({
      templateId: "cam-vise-stop",
      templateVersion: compiled.template.version,
      newerVersion: null,
    });
    // Sized from the 100 mm vise profile; the values are inside the template's limits and make buildable parts.
    expect(d!.parameters).toEqual({
      jawWidth: demoVises[0]!.jawWidthMm,
      jawHeight: demoVises[0]!.jawHeightMm,
      jawThickness: demoVises[0]!.jawThicknessMm,
    });
    const evaluation = evaluateTemplate(compiled, { parameters: d!.parameters });
    expect(evaluation.buildable).toBe(true);
    expect(evaluation.checks.filter((c) => c.severity === "error" && !c.passed)).toEqual([]);
  });
});
