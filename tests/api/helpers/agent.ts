/**
 * A browser-like client for API tests: keeps cookies (supertest agent), fetches the CSRF token once and
 * sends it on every state-changing request, and signs users of any role in.
 */
import { randomBytes } from "node:crypto";
import type express from "express";
import supertest from "supertest";
import type { PublicUser, Role } from "@/shared/auth";
import type { Database } from "@server/db";
import { userRepository } from "@server/modules/auth/repository";
import { authService } from "@server/modules/auth/service";

/** An e-mail no other test or earlier run has used (the shared test database outlives runs). */
export function uniqueEmail(tag = "user"): string {
  return `${tag}-${Date.now().toString(36)}-${randomBytes(4).toString("hex")}@api.test`;
}

export const testPassword = "correct horse battery";

export class TestAgent {
  readonly http: ReturnType<typeof supertest.agent>;
  private token: string | undefined;

  constructor(app: express.Express) {
    this.http = supertest.agent(app);
  }

  /** The session's CSRF token (fetched once; it survives sign-in and sign-out). */
  async csrf(): Promise<string> {
    if (!this.token) {
      const res = await this.http.get("/api/auth/csrf").expect(200);
      this.token = (res.body as { csrfToken: string }).csrfToken;
    }
    return this.token;
  }

  get(url: string) {
    return this.http.get(url);
  }
  // The token is fetched BEFORE the request is made: a supertest agent copies its cookies into a
  // request when it is created, so a request made first would go without the session cookie.
  async post(url: string, body?: object) {
    const token = await this.csrf();
    const req = this.http.post(url).set("x-csrf-token", token);
    return body === undefined ? req : req.send(body);
  }
  async patch(url: string, body?: object) {
    const token = await this.csrf();
    const req = this.http.patch(url).set("x-csrf-token", token);
    return body === undefined ? req : req.send(body);
  }
  async delete(url: string) {
    const token = await this.csrf();
    return this.http.delete(url).set("x-csrf-token", token);
  }

  /** Registers through the API (a machinist) and stays signed in. */
  async register(input: Partial<{ email: string; password: string; displayName: string }> = {}) {
    const body = {
      email: uniqueEmail("reg"),
      password: testPassword,
      displayName: "Test Machinist",
      ...input,
    };
    const res = await this.post("/api/auth/register", body);
    return { res, ...body };
  }

  async login(email: string, password: string) {
    return this.post("/api/auth/login", { email, password });
  }

  async me(): Promise<PublicUser | null> {
    const res = await this.get("/api/auth/me").expect(200);
    return (res.body as { user: PublicUser | null }).user;
  }
}

/** Makes an account of any role directly through the auth service (as the CLI does). */
export async function createUser(db: Database, role: Role, displayName = `Test ${role}`) {
  const email = uniqueEmail(role);
  const user = await authService(userRepository(db.models)).register(
    { email, password: testPassword, displayName },
    role,
  );
  return { ...user, password: testPassword };
}

/** A new agent signed in as a fresh user of `role`. */
export async function signedInAs(app: express.Express, db: Database, role: Role) {
  const user = await createUser(db, role);
  const agent = new TestAgent(app);
  const res = await agent.login(user.email, user.password);
  if (res.status !== 200)
    throw new Error(`login as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, user };
}
