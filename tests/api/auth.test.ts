import { afterAll, beforeAll, describe, expect, it } from "vitest";
import supertest from "supertest";
import { apiErrorBodySchema } from "@/shared/errors";
import { publicUserSchema } from "@/shared/auth";
import { createTestApp, TestAgent, testPassword, uniqueEmail, type TestApp } from "./helpers";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

function sessionCookie(res: { headers: Record<string, unknown> }): string | undefined {
  const raw = res.headers["set-cookie"];
  const list = Array.isArray(raw) ? (raw as string[]) : typeof raw === "string" ? [raw] : [];
  return list.find((c) => c.startsWith("jigwright.sid="));
}

describe("POST /api/auth/register", () => {
  it("refuses a bad e-mail, a short password and a missing name, one detail per field", async () => {
    const agent = new TestAgent(t.app);
    const res = await agent.post("/api/auth/register", {
      email: "not-an-address",
      password: "short",
      displayName: "  ",
    });
    expect(res.status).toBe(400);
    const body = apiErrorBodySchema.parse(res.body);
    expect(body.error.code).toBe("validation_error");
    expect(body.error.details.map((d) => d.path).sort()).toEqual(["displayName", "email", "password"]);
    expect(body.error.details.find((d) => d.path === "password")?.message).toMatch(/at least 10/);
  });

  it("accepts exactly 10 characters and refuses 9 (our rule: passwords of at least 10)", async () => {
    const agent = new TestAgent(t.app);
    const nine = await agent.post("/api/auth/register", {
      email: uniqueEmail(),
      password: "123456789",
      displayName: "N",
    });
    expect(nine.status).toBe(400);
    const ten = await agent.post("/api/auth/register", {
      email: uniqueEmail(),
      password: "1234567890",
      displayName: "N",
    });
    expect(ten.status).toBe(201);
  });

  it("creates a machinist, signs them in, and normalises the e-mail", async () => {
    const agent = new TestAgent(t.app);
    const email = uniqueEmail("Mixed");
    const { res } = await agent.register({
      email: `  ${email.toUpperCase()} `,
      displayName: "  Lathe Hand  ",
    });
    expect(res.status).toBe(201);
    const user = publicUserSchema.parse((res.body as { user: unknown }).user);
    expect(user).toMatchObject({ email: email.toLowerCase(), displayName: "Lathe Hand", role: "machinist" });
    expect(JSON.stringify(res.body)).not.toMatch(/password/i);
    expect(await agent.me()).toMatchObject({ id: user.id, role: "machinist" });
  });

  it("ignores a role in the body: self-registered accounts are machinists", async () => {
    const agent = new TestAgent(t.app);
    const res = await agent.post("/api/auth/register", {
      email: uniqueEmail(),
      password: testPassword,
      displayName: "Sneaky",
      role: "admin",
    });
    expect(res.status).toBe(201);
    expect((res.body as { user: { role: string } }).user.role).toBe("machinist");
  });

  it("refuses a duplicate e-mail with 409 on the email field, whatever its case", async () => {
    const email = uniqueEmail("dup");
    expect((await new TestAgent(t.app).register({ email })).res.status).toBe(201);
    const again = await new TestAgent(t.app).register({ email: email.toUpperCase() });
    expect(again.res.status).toBe(409);
    const body = apiErrorBodySchema.parse(again.res.body);
    expect(body.error.code).toBe("conflict");
    expect(body.error.details[0]?.path).toBe("email");
  });
});

describe("sessions", () => {
  it("sets an HttpOnly, SameSite=Lax cookie, not Secure over plain http", async () => {
    const res = await supertest(t.app).get("/api/auth/csrf").expect(200);
    const cookie = sessionCookie(res);
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
  });

  it("marks the cookie Secure when a trusted proxy says the request came over HTTPS", async () => {
    const behindProxy = await createTestApp({ config: { trustProxy: "loopback" } });
    try {
      const res = await supertest(behindProxy.app)
        .get("/api/auth/csrf")
        .set("X-Forwarded-Proto", "https")
        .expect(200);
      expect(sessionCookie(res)).toMatch(/;\s*Secure/i);
    } finally {
      await behindProxy.close();
    }
  });

  it("keeps the user signed in across requests and issues a new session id at sign-in", async () => {
    const email = uniqueEmail("persist");
    await new TestAgent(t.app).register({ email });
    const agent = new TestAgent(t.app);
    const before = sessionCookie(await agent.http.get("/api/auth/csrf"));
    const login = await agent.login(email, testPassword);
    expect(login.status).toBe(200);
    const after = sessionCookie(login);
    expect(before).toBeDefined();
    expect(after).toBeDefined();
    expect(after!.split(";")[0]).not.toBe(before!.split(";")[0]);
    for (let i = 0; i < 3; i++) expect((await agent.me())?.email).toBe(email);
  });

  it("answers `{ user: null }` to a guest", async () => {
    const res = await supertest(t.app).get("/api/auth/me").expect(200);
    expect(res.body).toEqual({ user: null });
  });

  it("logs out: the user is gone and the old session id no longer signs anyone in", async () => {
    const agent = new TestAgent(t.app);
    const reg = await agent.register();
    const oldCookie = sessionCookie(reg.res)!.split(";")[0]!;
    const out = await agent.post("/api/auth/logout");
    expect(out.status).toBe(204);
    expect(await agent.me()).toBeNull();
    const replay = await supertest(t.app).get("/api/auth/me").set("Cookie", oldCookie).expect(200);
    expect(replay.body).toEqual({ user: null });
  });
});

describe("POST /api/auth/login", () => {
  it("signs in with the right password", async () => {
    const email = uniqueEmail("login");
    await new TestAgent(t.app).register({ email });
    const agent = new TestAgent(t.app);
    const res = await agent.login(email.toUpperCase(), testPassword);
    expect(res.status).toBe(200);
    expect(publicUserSchema.parse((res.body as { user: unknown }).user).email).toBe(email);
  });

  it("answers a wrong password and an unknown e-mail alike: 401, not saying which part was wrong", async () => {
    const email = uniqueEmail("login");
    await new TestAgent(t.app).register({ email });
    const wrongPassword = await new TestAgent(t.app).login(email, "not the password");
    const unknownEmail = await new TestAgent(t.app).login(uniqueEmail("nobody"), "not the password");
    for (const res of [wrongPassword, unknownEmail]) {
      expect(res.status).toBe(401);
      const body = apiErrorBodySchema.parse(res.body);
      expect(body.error.code).toBe("invalid_credentials");
      expect(body.error.message).toBe("That e-mail and password do not match an account.");
      expect(body.error.message).not.toMatch(/unknown|no account|wrong password|incorrect password/i);
    }
    const agent = new TestAgent(t.app);
    await agent.login(email, "not the password");
    expect(await agent.me()).toBeNull();
  });

  it("validates the body", async () => {
    const res = await new TestAgent(t.app).post("/api/auth/login", { email: "x" });
    expect(res.status).toBe(400);
    expect(
      apiErrorBodySchema
        .parse(res.body)
        .error.details.map((d) => d.path)
        .sort(),
    ).toEqual(["email", "password"]);
  });
});

describe("CSRF", () => {
  it("refuses a state-changing request without the x-csrf-token header (403)", async () => {
    const agent = new TestAgent(t.app);
    await agent.csrf(); // a session with a token exists, but the header is not sent
    const res = await agent.http
      .post("/api/auth/register")
      .send({ email: uniqueEmail(), password: testPassword, displayName: "No Token" });
    expect(res.status).toBe(403);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe("csrf_invalid");
  });

  it("refuses a wrong token, and a token from another session", async () => {
    const a = new TestAgent(t.app);
    const b = new TestAgent(t.app);
    await a.csrf();
    const wrong = await a.http.post("/api/auth/logout").set("x-csrf-token", "x".repeat(43));
    expect(wrong.status).toBe(403);
    const tokenOfB = await b.csrf();
    const foreign = await a.http.post("/api/auth/logout").set("x-csrf-token", tokenOfB);
    expect(foreign.status).toBe(403);
  });

  it("refuses PATCH and DELETE too, even for unknown routes, before routing", async () => {
    const agent = new TestAgent(t.app);
    await agent.csrf();
    expect((await agent.http.patch("/api/admin/users/1/role").send({ role: "admin" })).status).toBe(403);
    expect((await agent.http.delete("/api/anything")).status).toBe(403);
  });

  it("keeps the token valid across sign-in and sign-out of the same browser", async () => {
    const agent = new TestAgent(t.app);
    const token = await agent.csrf();
    const { res } = await agent.register();
    expect(res.status).toBe(201);
    expect((await agent.post("/api/auth/logout")).status).toBe(204);
    const again = await agent.http.get("/api/auth/csrf").expect(200);
    expect((again.body as { csrfToken: string }).csrfToken).toBe(token);
  });
});
