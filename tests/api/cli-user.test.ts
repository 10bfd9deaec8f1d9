import { spawnSync } from "node:child_process";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { projectRoot } from "@server/config";
import { userCommand } from "@server/cli/commands/user";
import { CliUsageError } from "@server/cli/args";
import { createTestApp, TestAgent, uniqueEmail, type TestApp } from "./helpers";

/** Runs `npm run -s cli -- …` the way an operator would, pointed at the test database by DB_* variables. */
function cli(t: TestApp, args: string[], env: Record<string, string> = {}) {
  const { host, port, database, user, password } = t.config.db;
  const r = spawnSync(
    path.join(projectRoot, "node_modules", ".bin", "tsx"),
    ["server/cli/index.ts", ...args],
    {
      cwd: projectRoot,
      encoding: "utf8",
      stdio: ["ignore", "pipe", "pipe"],
      env: {
        ...process.env,
        NODE_ENV: "test",
        DB_HOST: host,
        DB_PORT: String(port),
        DB_NAME: database,
        DB_USER: user,
        DB_PASSWORD: password,
        JIGWRIGHT_PASSWORD: "",
        ...env,
      },
    },
  );
  return { code: r.status, stderr: r.stderr };
}

/**
 * The same command in this process (a spawn of tsx costs seconds on a busy machine): the database
 * settings go through process.env exactly as for the real CLI. Returns the exit code the dispatcher
 * would give (usage errors are 2) and what was written to stderr.
 */
async function cliInProcess(args: string[], password = "") {
  const written: string[] = [];
  const spy = vi.spyOn(process.stderr, "write").mockImplementation((chunk: string | Uint8Array) => {
    written.push(String(chunk));
    return true;
  });
  process.env.JIGWRIGHT_PASSWORD = password;
  try {
    return { code: await userCommand.run(args), stderr: written.join("") };
  } catch (err) {
    if (err instanceof CliUsageError) return { code: 2, stderr: written.join("") + err.message };
    throw err;
  } finally {
    spy.mockRestore();
  }
}

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  const { host, port, database, user, password } = t.config.db;
  Object.assign(process.env, {
    DB_HOST: host,
    DB_PORT: String(port),
    DB_NAME: database,
    DB_USER: user,
    DB_PASSWORD: password,
  });
});
afterAll(async () => {
  await t.close();
});

describe("npm run -s cli -- user", () => {
  it("creates an admin who can then sign in and reach the admin routes", async () => {
    const email = uniqueEmail("operator");
    const made = cli(t, ["user", "create", "--email", email, "--role", "admin", "--name", "Shop Operator"], {
      JIGWRIGHT_PASSWORD: "first admin password",
    });
    expect(made.stderr).toContain(`Created admin ${email}`);
    expect(made.code).toBe(0);
    const agent = new TestAgent(t.app);
    expect((await agent.login(email, "first admin password")).status).toBe(200);
    expect((await agent.me())?.displayName).toBe("Shop Operator");
    expect((await agent.get("/api/admin/users")).status).toBe(200);

    const again = await cliInProcess(["create", "--email", email, "--role", "admin"], "another password");
    expect(again.code).toBe(1);
    expect(again.stderr).toMatch(/already exists/);
  });

  it("changes a role with set-role", async () => {
    const { email } = await new TestAgent(t.app).register();
    const r = await cliInProcess(["set-role", "--email", email, "--role", "designer"]);
    expect(r.stderr).toContain(`${email} is now designer`);
    expect(r.code).toBe(0);
    expect((await t.db.models.User.findOne({ where: { email } }))!.role).toBe("designer");
  });

  it("says so when the account does not exist", async () => {
    const r = await cliInProcess(["set-role", "--email", uniqueEmail("ghost"), "--role", "designer"]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/no account/);
  });

  it("refuses bad input with exit code 2 and a clear message", async () => {
    const badRole = await cliInProcess(["set-role", "--email", "x@api.test", "--role", "boss"]);
    expect(badRole.code).toBe(2);
    expect(badRole.stderr).toContain("Role must be one of");
    const shortPassword = await cliInProcess(
      ["create", "--email", uniqueEmail(), "--role", "machinist"],
      "short",
    );
    expect(shortPassword.code).toBe(2);
    expect(shortPassword.stderr).toContain("at least 10");
    // No JIGWRIGHT_PASSWORD and no terminal to ask on.
    const wasTTY = process.stdin.isTTY;
    Object.defineProperty(process.stdin, "isTTY", { value: false, configurable: true });
    const noTerminal = await cliInProcess([
      "create",
      "--email",
      uniqueEmail(),
      "--role",
      "machinist",
    ]).finally(() => Object.defineProperty(process.stdin, "isTTY", { value: wasTTY, configurable: true }));
    expect(noTerminal.code).toBe(2);
    expect(noTerminal.stderr).toContain("JIGWRIGHT_PASSWORD");
  });
});
