import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { roles, type Role } from "@/shared/auth";
import { apiErrorBodySchema } from "@/shared/errors";
import {
  machineListResponseSchema,
  machineResponseSchema,
  maxProfilesPerUser,
  viseListResponseSchema,
  viseResponseSchema,
} from "@/shared/profiles";
import { createTestApp, signedInAs, TestAgent, type TestApp } from "./helpers";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

// Invented sizes of a small milling vise (demo values, not a reference).
const vise = {
  name: "Bench vise 100",
  jawWidthMm: 100,
  jawHeightMm: 32,
  jawThicknessMm: 12,
  maxOpeningMm: 90,
};
const machine = { name: "Small bench mill", maxSpindleRpm: 3000, units: "mm" };

function errorOf(res: { body: unknown }) {
  return apiErrorBodySchema.parse(res.body).error;
}
function pathsOf(res: { body: unknown }) {
  return errorOf(res)
    .details.map((d) => d.path)
    .sort();
}

describe("guests", () => {
  it.each(["/api/vises", "/api/machines"])("get 401 from GET %s", async (url) => {
    const res = await new TestAgent(t.app).get(url);
    expect(res.status).toBe(401);
    expect(errorOf(res).code).toBe("unauthenticated");
  });

  it.each([
    ["post", "/api/vises"],
    ["patch", "/api/vises/1"],
    ["delete", "/api/vises/1"],
    ["post", "/api/machines"],
    ["patch", "/api/machines/1"],
    ["delete", "/api/machines/1"],
  ] as const)("get 401 from %s %s even with a valid CSRF token", async (method, url) => {
    const agent = new TestAgent(t.app);
    const res = method === "delete" ? await agent.delete(url) : await agent[method](url, vise);
    expect(res.status).toBe(401);
  });

  it("are refused a state change without the CSRF header before anything else (403)", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const res = await agent.http.post("/api/vises").send(vise);
    expect(res.status).toBe(403);
    expect(errorOf(res).code).toBe("csrf_invalid");
    const list = viseListResponseSchema.parse((await agent.get("/api/vises").expect(200)).body);
    expect(list.vises).toEqual([]);
  });
});

describe.each(roles)("a signed-in %s", (role: Role) => {
  it("creates, lists, edits and deletes a vise", async () => {
    const { agent } = await signedInAs(t.app, t.db, role);
    const created = await agent.post("/api/vises", vise);
    expect(created.status).toBe(201);
    const v = viseResponseSchema.parse(created.body).vise;
    expect(v).toMatchObject(vise);
    expect(JSON.stringify(created.body)).not.toMatch(/owner/i);

    const list = viseListResponseSchema.parse((await agent.get("/api/vises").expect(200)).body);
    expect(list.vises.map((x) => x.id)).toEqual([v.id]);

    const patched = await agent.patch(`/api/vises/${v.id}`, { jawWidthMm: 125, name: "  Bench vise 125  " });
    expect(patched.status).toBe(200);
    expect(viseResponseSchema.parse(patched.body).vise).toMatchObject({
      ...vise,
      jawWidthMm: 125,
      name: "Bench vise 125",
    });

    expect((await agent.delete(`/api/vises/${v.id}`)).status).toBe(204);
    expect(viseListResponseSchema.parse((await agent.get("/api/vises")).body).vises).toEqual([]);
    expect((await agent.delete(`/api/vises/${v.id}`)).status).toBe(404);
  });

  it("creates, lists, edits and deletes a machine", async () => {
    const { agent } = await signedInAs(t.app, t.db, role);
    const created = await agent.post("/api/machines", machine);
    expect(created.status).toBe(201);
    const m = machineResponseSchema.parse(created.body).machine;
    expect(m).toMatchObject(machine);

    const patched = await agent.patch(`/api/machines/${m.id}`, { units: "in", maxSpindleRpm: 2500 });
    expect(machineResponseSchema.parse(patched.body).machine).toMatchObject({
      name: machine.name,
      units: "in",
      maxSpindleRpm: 2500,
    });
    const list = machineListResponseSchema.parse((await agent.get("/api/machines").expect(200)).body);
    expect(list.machines).toHaveLength(1);

    expect((await agent.delete(`/api/machines/${m.id}`)).status).toBe(204);
    expect(machineListResponseSchema.parse((await agent.get("/api/machines")).body).machines).toEqual([]);
  });
});

describe("lists", () => {
  it("come sorted by name, and give back exactly the millimetres sent", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    // 4 in = 101.6 mm exactly (1 in = 25.4 mm, the international inch of 1959); 0.1 mm steps are not
    // exact in binary, so this checks the column keeps the IEEE 754 double as sent.
    await agent.post("/api/vises", {
      ...vise,
      name: "Zeta 4 inch",
      jawWidthMm: 101.6,
      maxOpeningMm: 0.1 + 0.2,
    });
    await agent.post("/api/vises", { ...vise, name: "Alpha" });
    const list = viseListResponseSchema.parse((await agent.get("/api/vises")).body).vises;
    expect(list.map((v) => v.name)).toEqual(["Alpha", "Zeta 4 inch"]);
    expect(list[1]?.jawWidthMm).toBe(101.6);
    expect(list[1]?.maxOpeningMm).toBe(0.1 + 0.2);
  });
});

describe("validation", () => {
  it("gives one detail per bad vise field", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const res = await agent.post("/api/vises", {
      name: "x".repeat(81),
      jawWidthMm: -5,
      jawHeightMm: "32",
      jawThicknessMm: 0,
      maxOpeningMm: 5000,
    });
    expect(res.status).toBe(400);
    expect(errorOf(res).code).toBe("validation_error");
    expect(pathsOf(res)).toEqual(["jawHeightMm", "jawThicknessMm", "jawWidthMm", "maxOpeningMm", "name"]);
    const message = (p: string) => errorOf(res).details.find((d) => d.path === p)?.message;
    expect(message("name")).toBe("Name must be at most 80 characters.");
    expect(message("jawWidthMm")).toBe("Jaw width must be more than 0 mm.");
    expect(message("jawHeightMm")).toBe("Jaw height must be a number of millimetres.");
    expect(message("maxOpeningMm")).toBe("Maximum opening must be at most 2000 mm.");
  });

  it("refuses a missing field, an unknown field and an empty name", async () => {
    const { agent } = await signedInAs(t.app, t.db, "designer");
    const res = await agent.post("/api/vises", {
      name: "   ",
      jawWidthMm: 100,
      jawHeightMm: 30,
      jawThicknessMm: 10,
      jawWidht: 1,
    });
    expect(res.status).toBe(400);
    expect(pathsOf(res)).toEqual(["", "maxOpeningMm", "name"]);
    expect(errorOf(res).details.find((d) => d.path === "")?.message).toBe("Unknown field: jawWidht.");
  });

  it("refuses non-finite numbers (JSON cannot carry them; a huge literal becomes Infinity)", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const token = await agent.csrf();
    const res = await agent.http
      .post("/api/vises")
      .set("x-csrf-token", token)
      .set("content-type", "application/json")
      .send('{"name":"Big","jawWidthMm":1e999,"jawHeightMm":30,"jawThicknessMm":10,"maxOpeningMm":80}');
    expect(res.status).toBe(400);
    expect(pathsOf(res)).toEqual(["jawWidthMm"]);
  });

  it("gives one detail per bad machine field, and refuses a fractional spindle speed", async () => {
    const { agent } = await signedInAs(t.app, t.db, "reviewer");
    const res = await agent.post("/api/machines", { name: "", maxSpindleRpm: 1500.5, units: "cm" });
    expect(res.status).toBe(400);
    expect(pathsOf(res)).toEqual(["maxSpindleRpm", "name", "units"]);
    const tooFast = await agent.post("/api/machines", { ...machine, maxSpindleRpm: 1_000_000 });
    expect(pathsOf(tooFast)).toEqual(["maxSpindleRpm"]);
  });

  it("refuses an empty PATCH and a bad id, and leaves the row as it was", async () => {
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    const v = viseResponseSchema.parse((await agent.post("/api/vises", vise)).body).vise;
    const empty = await agent.patch(`/api/vises/${v.id}`, {});
    expect(empty.status).toBe(400);
    expect(errorOf(empty).details).toEqual([{ path: "", message: "Send at least one field to change." }]);
    const bad = await agent.patch(`/api/vises/${v.id}`, { jawWidthMm: 0, jawHeightMm: 40 });
    expect(pathsOf(bad)).toEqual(["jawWidthMm"]);
    const badId = await agent.patch("/api/vises/abc", { jawWidthMm: 10 });
    expect(badId.status).toBe(400);
    expect(pathsOf(badId)).toEqual(["params.id"]);
    const list = viseListResponseSchema.parse((await agent.get("/api/vises")).body).vises;
    expect(list[0]).toMatchObject(vise);
  });
});

describe("another user's profiles", () => {
  it("can be neither seen, changed nor deleted: 404, as if they did not exist", async () => {
    const owner = await signedInAs(t.app, t.db, "machinist");
    const v = viseResponseSchema.parse((await owner.agent.post("/api/vises", vise)).body).vise;
    const m = machineResponseSchema.parse((await owner.agent.post("/api/machines", machine)).body).machine;

    for (const role of roles) {
      const other = await signedInAs(t.app, t.db, role);
      expect(viseListResponseSchema.parse((await other.agent.get("/api/vises")).body).vises).toEqual([]);
      expect(machineListResponseSchema.parse((await other.agent.get("/api/machines")).body).machines).toEqual(
        [],
      );
      const patchV = await other.agent.patch(`/api/vises/${v.id}`, { name: "Mine now" });
      const patchM = await other.agent.patch(`/api/machines/${m.id}`, { name: "Mine now" });
      const delV = await other.agent.delete(`/api/vises/${v.id}`);
      const delM = await other.agent.delete(`/api/machines/${m.id}`);
      for (const res of [patchV, patchM, delV, delM]) {
        expect(res.status).toBe(404);
        expect(errorOf(res).code).toBe("not_found");
      }
      // The same answer as for an id nobody has.
      const missing = await other.agent.patch("/api/vises/4294967295", { name: "Mine now" });
      expect(missing.status).toBe(404);
      expect(errorOf(patchV).message).toBe(errorOf(missing).message.replace("4294967295", String(v.id)));
    }

    const mine = viseListResponseSchema.parse((await owner.agent.get("/api/vises")).body).vises;
    expect(mine).toEqual([v]);
    const myMachines = machineListResponseSchema.parse(
      (await owner.agent.get("/api/machines")).body,
    ).machines;
    expect(myMachines).toEqual([m]);
  });
});

describe("limits", () => {
  it(`keeps at most ${maxProfilesPerUser} vises per account (409 beyond)`, async () => {
    const { agent, user } = await signedInAs(t.app, t.db, "machinist");
    // Fill up to the limit directly (faster than 100 requests), then ask for one more through the API.
    await t.db.models.Vise.bulkCreate(
      Array.from({ length: maxProfilesPerUser }, (_, i) => ({
        ...vise,
        name: `Vise ${i}`,
        ownerId: user.id,
      })),
    );
    const res = await agent.post("/api/vises", vise);
    expect(res.status).toBe(409);
    expect(errorOf(res).code).toBe("conflict");
    // Another account is not affected.
    const other = await signedInAs(t.app, t.db, "machinist");
    expect((await other.agent.post("/api/vises", vise)).status).toBe(201);
  });
});
