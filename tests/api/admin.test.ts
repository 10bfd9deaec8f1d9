import { afterAll, beforeAll, describe, expect, it } from "vitest";
import supertest from "supertest";
import { roles, userListResponseSchema, userResponseSchema, type Role } from "@/shared/auth";
import { apiErrorBodySchema } from "@/shared/errors";
import { createTestApp, createUser, signedInAs, TestAgent, type TestApp } from "./helpers";

// Its own database: the last-admin rule counts every admin, so no other suite may add any.
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ isolatedDatabase: "jigwright_test_admin" });
});
afterAll(async () => {
  await t.close();
});

type Caller = Role | "guest";
const callers: Caller[] = ["guest", ...roles];

async function agentFor(caller: Caller): Promise<TestAgent> {
  if (caller === "guest") return new TestAgent(t.app);
  return (await signedInAs(t.app, t.db, caller)).agent;
}

const expected = (caller: Caller) => (caller === "guest" ? 401 : caller === "admin" ? 200 : 403);

describe("every role against every admin route", () => {
  it.each(callers)("GET /api/admin/users as %s", async (caller) => {
    const agent = await agentFor(caller);
    const res = await agent.get("/api/admin/users");
    expect(res.status).toBe(expected(caller));
    if (res.status === 200) {
      const list = userListResponseSchema.parse(res.body);
      expect(list.users.length).toBeGreaterThan(0);
      expect(JSON.stringify(res.body)).not.toMatch(/password/i);
    } else {
      expect(apiErrorBodySchema.parse(res.body).error.code).toBe(
        caller === "guest" ? "unauthenticated" : "forbidden",
      );
    }
  });

  it.each(callers)("PATCH /api/admin/users/:id/role as %s", async (caller) => {
    const target = await createUser(t.db, "machinist");
    const agent = await agentFor(caller);
    const res = await agent.patch(`/api/admin/users/${target.id}/role`, { role: "designer" });
    expect(res.status).toBe(expected(caller));
    const after = (await t.db.models.User.findByPk(target.id))!;
    expect(after.role).toBe(caller === "admin" ? "designer" : "machinist");
  });
});

describe("PATCH /api/admin/users/:id/role", () => {
  it("changes the role, and the user's own open session sees it on the next request", async () => {
    const { agent: admin } = await signedInAs(t.app, t.db, "admin");
    const { agent: member, user } = await signedInAs(t.app, t.db, "machinist");
    const res = await admin.patch(`/api/admin/users/${user.id}/role`, { role: "reviewer" });
    expect(res.status).toBe(200);
    expect(userResponseSchema.parse(res.body).user).toMatchObject({ id: user.id, role: "reviewer" });
    expect((await member.me())?.role).toBe("reviewer");
  });

  it("validates the role and the id, and 404s an unknown user", async () => {
    const { agent: admin } = await signedInAs(t.app, t.db, "admin");
    const badRole = await admin.patch(`/api/admin/users/1/role`, { role: "overlord" });
    expect(badRole.status).toBe(400);
    expect(apiErrorBodySchema.parse(badRole.body).error.details).toEqual([
      { path: "role", message: "Role must be one of: machinist, designer, reviewer, admin." },
    ]);
    const badId = await admin.patch(`/api/admin/users/abc/role`, { role: "designer" });
    expect(badId.status).toBe(400);
    expect(apiErrorBodySchema.parse(badId.body).error.details[0]?.path).toBe("params.id");
    const missing = await admin.patch(`/api/admin/users/999999999/role`, { role: "designer" });
    expect(missing.status).toBe(404);
    expect(apiErrorBodySchema.parse(missing.body).error.code).toBe("not_found");
  });

  it("never demotes the last admin, but lets one of two admins step down", async () => {
    // Leave exactly one admin in this database.
    const { agent: admin, user: me } = await signedInAs(t.app, t.db, "admin");
    await t.db.models.User.update({ role: "machinist" }, { where: { role: "admin" } });
    await t.db.models.User.update({ role: "admin" }, { where: { id: me.id } });

    const refused = await admin.patch(`/api/admin/users/${me.id}/role`, { role: "machinist" });
    expect(refused.status).toBe(409);
    expect(apiErrorBodySchema.parse(refused.body).error.code).toBe("conflict");
    expect((await t.db.models.User.findByPk(me.id))!.role).toBe("admin");

    const second = await createUser(t.db, "machinist");
    expect((await admin.patch(`/api/admin/users/${second.id}/role`, { role: "admin" })).status).toBe(200);
    const stepDown = await admin.patch(`/api/admin/users/${me.id}/role`, { role: "designer" });
    expect(stepDown.status).toBe(200);
    // Now a designer, the former admin is refused the admin routes.
    expect((await admin.get("/api/admin/users")).status).toBe(403);
  });

  it("refuses a guest before looking at the body", async () => {
    const res = await supertest(t.app).get("/api/admin/users");
    expect(res.status).toBe(401);
  });
});
