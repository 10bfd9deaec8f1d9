import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { designResponseSchema } from "@/shared/designs";
import { apiErrorBodySchema } from "@/shared/errors";
import { builtInTemplates } from "@server/templates";
import { createTestApp, signedInAs, type TestApp } from "./helpers";

// The app as it runs: designs checked against the built-in catalogue (templates/**/*.yaml).
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

describe("saved designs on the built-in catalogue", () => {
  it("pin the version the catalogue holds for a real template, with its name", async () => {
    const compiled = builtInTemplates().get("cam-vise-stop");
    expect(compiled).toBeDefined();
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const res = await agent.post("/api/designs", {
      templateId: "cam-vise-stop",
      name: "Stop for the 100 mm vise",
      units: "mm",
      parameters: { jawWidth: 100, jawThickness: 20 },
    });
    expect(res.status).toBe(201);
    expect(designResponseSchema.parse(res.body).design).toMatchObject({
      templateVersion: compiled!.template.version,
      templateName: compiled!.template.name,
      newerVersion: null,
    });
  });

  it("refuse a parameter the template does not have, and a template that does not exist", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const res = await agent.post("/api/designs", {
      templateId: "cam-vise-stop",
      name: "Typo",
      units: "mm",
      parameters: { jawWidht: 100 },
    });
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(res.body).error.details).toEqual([
      {
        path: "parameters.jawWidht",
        message: `The template "${builtInTemplates().get("cam-vise-stop")!.template.name}" has no parameter "jawWidht".`,
      },
    ]);
    const missing = await agent.post("/api/designs", {
      templateId: "no-such-jig",
      name: "X",
      units: "mm",
      parameters: {},
    });
    expect(apiErrorBodySchema.parse(missing.body).error.details.map((d) => d.path)).toEqual(["templateId"]);
  });
});
