import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiErrorBodySchema } from "@/shared/errors";
import { createTestApp, TestAgent, testPassword, uniqueEmail, type TestApp } from "./helpers";

describe("sign-in rate limit per account", () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ rateLimit: { loginPerAccount: 3, loginPerIp: 1000 } });
  });
  afterAll(async () => {
    await t.close();
  });

  it("blocks an account after 3 failed sign-ins, even with the right password, and not other accounts", async () => {
    const victim = uniqueEmail("victim");
    const bystander = uniqueEmail("bystander");
    await new TestAgent(t.app).register({ email: victim });
    await new TestAgent(t.app).register({ email: bystander });
    const attacker = new TestAgent(t.app);
    for (let i = 0; i < 3; i++) expect((await attacker.login(victim, `guess number ${i}`)).status).toBe(401);

    // The counter is per account, so a fresh browser (fresh session) is blocked as well.
    const blocked = await new TestAgent(t.app).login(victim.toUpperCase(), testPassword);
    expect(blocked.status).toBe(429);
    expect(apiErrorBodySchema.parse(blocked.body).error.code).toBe("rate_limited");
    expect(Number(blocked.headers["retry-after"])).toBeGreaterThan(0);

    expect((await new TestAgent(t.app).login(bystander, testPassword)).status).toBe(200);
  });

  it("does not count successful sign-ins", async () => {
    const email = uniqueEmail("regular");
    await new TestAgent(t.app).register({ email });
    for (let i = 0; i < 5; i++)
      expect((await new TestAgent(t.app).login(email, testPassword)).status).toBe(200);
  });
});

describe("sign-in rate limit per address", () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ rateLimit: { loginPerAccount: 1000, loginPerIp: 4 } });
  });
  afterAll(async () => {
    await t.close();
  });

  it("blocks an address after 4 sign-in or register requests, whichever accounts they name", async () => {
    const agent = new TestAgent(t.app);
    for (let i = 0; i < 4; i++)
      expect((await agent.login(uniqueEmail(`spray${i}`), "whatever password")).status).toBe(401);
    const res = await agent.register();
    expect(res.res.status).toBe(429);
    expect(apiErrorBodySchema.parse(res.res.body).error.code).toBe("rate_limited");
    // Other routes are not limited.
    expect((await agent.get("/api/auth/me")).status).toBe(200);
  });
});
