import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { roles, type Role } from "@/shared/auth";
import {
  deleteDesignResponseSchema,
  designListResponseSchema,
  designResponseSchema,
  designUndoWindowHours,
  maxDesignsPerUser,
  type Design,
} from "@/shared/designs";
import { apiErrorBodySchema } from "@/shared/errors";
import { createDesignService } from "@server/modules/designs";
import { designBody, TestCatalogue, testTemplateId } from "./design-helpers";
import { createTestApp, signedInAs, TestAgent, type TestApp } from "./helpers";

const catalogue = new TestCatalogue();
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ deps: { templateCatalogue: catalogue } });
});
afterAll(async () => {
  await t.close();
});
beforeEach(() => {
  catalogue.publish(testTemplateId, "1.0.0", "Test vise stop");
});

const errorOf = (res: { body: unknown }) => apiErrorBodySchema.parse(res.body).error;
const pathsOf = (res: { body: unknown }) =>
  errorOf(res)
    .details.map((d) => d.path)
    .sort();
const designOf = (res: { body: unknown }): Design => designResponseSchema.parse(res.body).design;
const listOf = async (agent: TestAgent) =>
  designListResponseSchema.parse((await agent.get("/api/designs").expect(200)).body).designs;

async function saved(agent: TestAgent, overrides = {}) {
  const res = await agent.post("/api/designs", designBody(overrides));
  expect(res.status).toBe(201);
  return designOf(res);
}

describe("guests", () => {
  const routes = [
    ["get", "/api/designs"],
    ["post", "/api/designs"],
    ["get", "/api/designs/1"],
    ["patch", "/api/designs/1"],
    ["delete", "/api/designs/1"],
    ["post", "/api/designs/1/duplicate"],
    ["post", "/api/designs/1/restore"],
    ["post", "/api/designs/1/share"],
    ["delete", "/api/designs/1/share"],
  ] as const;
  it.each(routes)("get 401 from %s %s", async (method, url) => {
    const agent = new TestAgent(t.app);
    const res =
      method === "get"
        ? await agent.get(url)
        : method === "delete"
          ? await agent.delete(url)
          : await agent[method](url, designBody());
    expect(res.status).toBe(401);
    expect(errorOf(res).code).toBe("unauthenticated");
  });
});

describe.each(roles)("a signed-in %s", (role: Role) => {
  it("saves, lists, opens, renames, duplicates and deletes a design", async () => {
    const { agent } = await signedInAs(t.app, t.db, role);
    const d = await saved(agent);
    expect(d).toMatchObject({
      ...designBody(),
      templateVersion: "1.0.0",
      templateName: "Test vise stop",
      newerVersion: null,
      share: null,
    });
    expect(JSON.stringify(d)).not.toMatch(/owner/i);

    expect((await listOf(agent)).map((x) => x.id)).toEqual([d.id]);
    expect(designOf(await agent.get(`/api/designs/${d.id}`).expect(200))).toEqual(d);

    const renamed = designOf(
      await agent.patch(`/api/designs/${d.id}`, { name: "  Stop, left jaw  ", notes: "" }),
    );
    expect(renamed).toMatchObject({ name: "Stop, left jaw", notes: "", parameters: d.parameters });

    const dup = await agent.post(`/api/designs/${d.id}/duplicate`);
    expect(dup.status).toBe(201);
    const copy = designOf(dup);
    expect(copy.id).not.toBe(d.id);
    expect(copy).toMatchObject({
      name: "Copy of Stop, left jaw",
      parameters: d.parameters,
      templateVersion: "1.0.0",
      units: "mm",
    });

    const del = await agent.delete(`/api/designs/${d.id}`);
    expect(del.status).toBe(200);
    expect(deleteDesignResponseSchema.parse(del.body).deleted.id).toBe(d.id);
    expect((await agent.get(`/api/designs/${d.id}`)).status).toBe(404);
    expect((await listOf(agent)).map((x) => x.id)).toEqual([copy.id]);

    const restored = await agent.post(`/api/designs/${d.id}/restore`);
    expect(restored.status).toBe(200);
    expect((await listOf(agent)).map((x) => x.id).sort()).toEqual([d.id, copy.id].sort());
  });
});

describe("saving", () => {
  it("gives one detail per bad field", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const res = await agent.post("/api/designs", {
      templateId: "Vise Stop!",
      name: "",
      notes: "n".repeat(2001),
      units: "cm",
      parameters: { jawWidth: "x".repeat(201), "Bad-Key": 1, ok: 3, nested: { a: 1 }, nothing: null },
    });
    expect(res.status).toBe(400);
    expect(pathsOf(res)).toEqual([
      "name",
      "notes",
      "parameters.Bad-Key",
      "parameters.jawWidth",
      "parameters.nested",
      "parameters.nothing",
      "templateId",
      "units",
    ]);
    const message = (p: string) => errorOf(res).details.find((d) => d.path === p)?.message;
    expect(message("notes")).toBe("Notes must be at most 2000 characters.");
    expect(message("name")).toBe("Name is required.");
  });

  it("refuses parameters that are not an object, and more than 200 of them", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const arr = await agent.post("/api/designs", designBody({ parameters: [1, 2] as never }));
    expect(pathsOf(arr)).toEqual(["parameters"]);
    const many = Object.fromEntries(Array.from({ length: 201 }, (_, i) => [`p${i}`, i]));
    const tooMany = await agent.post("/api/designs", designBody({ parameters: many }));
    expect(tooMany.status).toBe(400);
    expect(errorOf(tooMany).details).toEqual([
      { path: "parameters", message: "A design holds at most 200 parameters." },
    ]);
    const exactly200 = Object.fromEntries(Array.from({ length: 200 }, (_, i) => [`p${i}`, i]));
    expect((await agent.post("/api/designs", designBody({ parameters: exactly200 }))).status).toBe(201);
  });

  it("refuses a template the catalogue does not list, on the templateId field", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const res = await agent.post("/api/designs", designBody({ templateId: "no-such-template" }));
    expect(res.status).toBe(400);
    expect(errorOf(res).details).toEqual([
      { path: "templateId", message: 'There is no template "no-such-template" in the catalogue.' },
    ]);
  });

  it("lets the client neither choose the pinned version nor an owner", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const res = await agent.post("/api/designs", { ...designBody(), templateVersion: "0.0.1", ownerId: 1 });
    expect(res.status).toBe(400);
    expect(errorOf(res).details).toEqual([
      { path: "", message: "Unknown fields: templateVersion, ownerId." },
    ]);
  });

  it("keeps numbers exactly", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    // 1/3 has no short decimal form: JSON carries the shortest text that round-trips the double
    // (ECMA-262 Number::toString), and the JSON column must give that same double back.
    const a = await saved(agent, { name: "A", parameters: { third: 1 / 3, neg: -0.5, big: 1e21 } });
    expect(a.parameters).toEqual({ third: 1 / 3, neg: -0.5, big: 1e21 });
    expect(designOf(await agent.get(`/api/designs/${a.id}`)).parameters).toEqual({
      third: 1 / 3,
      neg: -0.5,
      big: 1e21,
    });
  });

  it("lists the most recently changed first", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const a = await saved(agent, { name: "A" });
    const b = await saved(agent, { name: "B" });
    // Make B an hour older than A directly (times are whole seconds, so two saves may share one).
    const age = (id: number, seconds: number) =>
      t.db.sequelize.query("UPDATE designs SET updated_at = NOW() - INTERVAL ? SECOND WHERE id = ?", {
        replacements: [seconds, id],
      });
    await age(b.id, 3600);
    expect((await listOf(agent)).map((d) => d.id)).toEqual([a.id, b.id]);
    await age(a.id, 7200);
    expect((await listOf(agent)).map((d) => d.id)).toEqual([b.id, a.id]);
  });

  it(`keeps at most ${maxDesignsPerUser} designs per account (409 beyond)`, async () => {
    const { agent, user } = await signedInAs(t.app, t.db, "machinist");
    await t.db.models.Design.bulkCreate(
      Array.from({ length: maxDesignsPerUser }, (_, i) => ({
        ownerId: user.id,
        name: `D${i}`,
        notes: "",
        templateId: testTemplateId,
        templateVersion: "1.0.0",
        parameters: {},
        units: "mm" as const,
      })),
    );
    const res = await agent.post("/api/designs", designBody());
    expect(res.status).toBe(409);
    expect(errorOf(res).code).toBe("conflict");
  });
});

describe("template version pinning", () => {
  it("keeps the saved version and says when a newer one is published", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const d = await saved(agent);
    expect(d.templateVersion).toBe("1.0.0");

    catalogue.publish(testTemplateId, "1.1.0");
    const opened = designOf(await agent.get(`/api/designs/${d.id}`));
    expect(opened).toMatchObject({ templateVersion: "1.0.0", newerVersion: "1.1.0" });
    expect((await listOf(agent))[0]).toMatchObject({ templateVersion: "1.0.0", newerVersion: "1.1.0" });

    // Changing the values keeps the pin; only an explicit request moves it.
    const edited = designOf(await agent.patch(`/api/designs/${d.id}`, { parameters: { jawWidth: 125 } }));
    expect(edited).toMatchObject({
      templateVersion: "1.0.0",
      newerVersion: "1.1.0",
      parameters: { jawWidth: 125 },
    });

    // A design saved now pins the new version, and its duplicate keeps that pin.
    const fresh = await saved(agent);
    expect(fresh).toMatchObject({ templateVersion: "1.1.0", newerVersion: null });

    const moved = designOf(await agent.patch(`/api/designs/${d.id}`, { useCurrentTemplateVersion: true }));
    expect(moved).toMatchObject({
      templateVersion: "1.1.0",
      newerVersion: null,
      parameters: { jawWidth: 125 },
    });
  });

  it("keeps the pin of a duplicate at the original's version", async () => {
    const { agent } = await signedInAs(t.app, t.db, "designer");
    const d = await saved(agent);
    catalogue.publish(testTemplateId, "2.0.0");
    const copy = designOf(await agent.post(`/api/designs/${d.id}/duplicate`, { name: "Second stop" }));
    expect(copy).toMatchObject({ name: "Second stop", templateVersion: "1.0.0", newerVersion: "2.0.0" });
  });

  it("orders versions as Semantic Versioning 2.0.0 does (1.10.0 after 1.9.0; a pre-release before its release)", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    catalogue.publish(testTemplateId, "1.9.0");
    const d = await saved(agent);
    catalogue.publish(testTemplateId, "1.10.0");
    expect(designOf(await agent.get(`/api/designs/${d.id}`)).newerVersion).toBe("1.10.0");
    catalogue.publish(testTemplateId, "1.9.0-rc.1");
    expect(designOf(await agent.get(`/api/designs/${d.id}`)).newerVersion).toBeNull();
  });

  it("says when the catalogue no longer lists the template, and refuses to move the pin", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    // Not in the catalogue yet: refused.
    expect((await agent.post("/api/designs", designBody({ templateId: "test-retired-clamp" }))).status).toBe(
      400,
    );
    catalogue.publish("test-retired-clamp", "1.0.0", "Retired clamp");
    const kept = await saved(agent, { templateId: "test-retired-clamp" });
    catalogue.retire("test-retired-clamp");
    const opened = designOf(await agent.get(`/api/designs/${kept.id}`));
    expect(opened).toMatchObject({ templateName: null, newerVersion: null, templateVersion: "1.0.0" });
    const res = await agent.patch(`/api/designs/${kept.id}`, { useCurrentTemplateVersion: true });
    expect(res.status).toBe(409);
    expect(pathsOf(res)).toEqual(["useCurrentTemplateVersion"]);
  });
});

describe("deleting with undo", () => {
  it("hides the design at once and restores it on request", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const d = await saved(agent);
    const before = Date.now();
    const del = deleteDesignResponseSchema.parse((await agent.delete(`/api/designs/${d.id}`)).body);
    const windowMs = designUndoWindowHours * 3600_000;
    const until = Date.parse(del.deleted.restoreUntil);
    // Whole-second tolerance either side: the clock is read on the server.
    expect(until).toBeGreaterThanOrEqual(before + windowMs - 1000);
    expect(until).toBeLessThanOrEqual(Date.now() + windowMs + 1000);

    expect((await agent.patch(`/api/designs/${d.id}`, { name: "x" })).status).toBe(404);
    expect((await agent.delete(`/api/designs/${d.id}`)).status).toBe(404);

    const restored = await agent.post(`/api/designs/${d.id}/restore`);
    expect(restored.status).toBe(200);
    expect(designOf(restored)).toMatchObject({ id: d.id, name: d.name, parameters: d.parameters });
    expect((await listOf(agent)).map((x) => x.id)).toEqual([d.id]);
    // Nothing left to undo.
    expect((await agent.post(`/api/designs/${d.id}/restore`)).status).toBe(404);
  });

  it("cannot restore after the undo window, and then purges the row", async () => {
    const { agent, user } = await signedInAs(t.app, t.db, "machinist");
    const d = await saved(agent);
    expect((await agent.delete(`/api/designs/${d.id}`)).status).toBe(200);
    // The same service as the app's, with its clock one minute past the window.
    const later = createDesignService(
      t.db.models,
      catalogue,
      () => new Date(Date.now() + designUndoWindowHours * 3600_000 + 60_000),
    );
    await expect(later.restore(user.id, d.id, "http://x")).rejects.toMatchObject({ status: 404 });
    expect(await t.db.models.Design.findByPk(d.id)).not.toBeNull();
    await later.list(user.id, "http://x");
    expect(await t.db.models.Design.findByPk(d.id)).toBeNull();
  });
});

describe("another user's design", () => {
  it("can be neither read, changed, copied, shared nor deleted: 404, like a missing one", async () => {
    const owner = await signedInAs(t.app, t.db, "machinist");
    const d = await saved(owner.agent);
    for (const role of roles) {
      const { agent } = await signedInAs(t.app, t.db, role);
      expect(await listOf(agent)).toEqual([]);
      const answers = [
        await agent.get(`/api/designs/${d.id}`),
        await agent.patch(`/api/designs/${d.id}`, { name: "Taken" }),
        await agent.post(`/api/designs/${d.id}/duplicate`),
        await agent.post(`/api/designs/${d.id}/share`),
        await agent.delete(`/api/designs/${d.id}/share`),
        await agent.delete(`/api/designs/${d.id}`),
        await agent.post(`/api/designs/${d.id}/restore`),
      ];
      for (const res of answers) {
        expect(res.status).toBe(404);
        expect(errorOf(res).code).toBe("not_found");
      }
      // Same words as for an id that exists nowhere.
      const missing = await agent.get("/api/designs/4294967295");
      expect(errorOf(answers[0]!).message).toBe(errorOf(missing).message.replace("4294967295", String(d.id)));
    }
    expect(designOf(await owner.agent.get(`/api/designs/${d.id}`))).toEqual(d);
    expect(await listOf(owner.agent)).toHaveLength(1);
  });

  it("cannot be restored by someone else after its owner deletes it", async () => {
    const owner = await signedInAs(t.app, t.db, "machinist");
    const d = await saved(owner.agent);
    expect((await owner.agent.delete(`/api/designs/${d.id}`)).status).toBe(200);
    const other = await signedInAs(t.app, t.db, "admin");
    expect((await other.agent.post(`/api/designs/${d.id}/restore`)).status).toBe(404);
    expect((await owner.agent.post(`/api/designs/${d.id}/restore`)).status).toBe(200);
  });
});

describe("values checked against the template's parameters", () => {
  const parameters = [
    { key: "jawWidth", label: "Jaw width", value: "number" },
    { key: "padMaterial", label: "Pad material", value: "text" },
    { key: "withPad", label: "With pad", value: "boolean" },
  ] as const;

  it("refuses a name the template does not have and a value of the wrong type, one detail each", async () => {
    catalogue.publish("test-checked-stop", "1.0.0", "Checked stop", parameters);
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const res = await agent.post(
      "/api/designs",
      designBody({
        templateId: "test-checked-stop",
        parameters: { jawWidth: "wide", withPad: 1, jawWidht: 100, padMaterial: "brass" },
      }),
    );
    expect(res.status).toBe(400);
    expect(errorOf(res).details).toEqual([
      { path: "parameters.jawWidth", message: "Jaw width must be a number." },
      { path: "parameters.withPad", message: "With pad must be true or false." },
      { path: "parameters.jawWidht", message: 'The template "Checked stop" has no parameter "jawWidht".' },
    ]);
    const ok = await agent.post(
      "/api/designs",
      designBody({ templateId: "test-checked-stop", parameters: { jawWidth: 100, withPad: false } }),
    );
    expect(ok.status).toBe(201);
  });

  it("checks new values on PATCH, and old values when the pin moves to a version without them", async () => {
    catalogue.publish("test-moving-stop", "1.0.0", "Moving stop", parameters);
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const d = await saved(agent, {
      templateId: "test-moving-stop",
      parameters: { jawWidth: 100, withPad: true },
    });
    const bad = await agent.patch(`/api/designs/${d.id}`, { parameters: { jawWidth: true } });
    expect(errorOf(bad).details).toEqual([
      { path: "parameters.jawWidth", message: "Jaw width must be a number." },
    ]);

    // Version 2 drops "withPad": moving the pin is refused until the value is gone.
    catalogue.publish("test-moving-stop", "2.0.0", "Moving stop", parameters.slice(0, 2));
    const move = await agent.patch(`/api/designs/${d.id}`, { useCurrentTemplateVersion: true });
    expect(move.status).toBe(400);
    expect(pathsOf(move)).toEqual(["parameters.withPad"]);
    // A rename alone still works on the old pin.
    expect((await agent.patch(`/api/designs/${d.id}`, { name: "Still on 1.0.0" })).status).toBe(200);
    const moved = await agent.patch(`/api/designs/${d.id}`, {
      useCurrentTemplateVersion: true,
      parameters: { jawWidth: 100 },
    });
    expect(designOf(moved)).toMatchObject({ templateVersion: "2.0.0", parameters: { jawWidth: 100 } });
  });
});
