import { roleSchema, roles, passwordSchema, emailSchema, displayNameSchema, type Role } from "@/shared/auth";
import { loadConfig } from "@server/config";
import { createDatabase, type Database } from "@server/db";
import { migrateUp } from "@server/db/migrate";
import { HttpError } from "@server/lib/errors";
import { userRepository } from "@server/modules/auth/repository";
import { authService } from "@server/modules/auth/service";
import { adminService } from "@server/modules/admin/service";
import { CliUsageError, parseArgs, rejectUnknown, single, type CliCommand } from "../args";
import { readSecret } from "@server/lib/secret-prompt";

const usage = `user create --email <e> --role <${roles.join("|")}> [--name <display name>] | user set-role --email <e> --role <role>`;

function required(value: string | undefined, option: string): string {
  if (value === undefined || value === "")
    throw new CliUsageError(`--${option} is required.\nUsage: npm run -s cli -- ${usage}`);
  return value;
}

function parseOr<T>(
  schema: {
    safeParse(
      v: unknown,
    ): { success: true; data: T } | { success: false; error: { issues: Array<{ message: string }> } };
  },
  value: unknown,
  option: string,
): T {
  const r = schema.safeParse(value);
  if (!r.success) throw new CliUsageError(`--${option}: ${r.error.issues[0]?.message ?? "not valid"}`);
  return r.data;
}

/** Password from JIGWRIGHT_PASSWORD, else asked twice on the terminal without echo. */
async function obtainPassword(): Promise<string> {
  const fromEnv = process.env.JIGWRIGHT_PASSWORD;
  if (fromEnv !== undefined && fromEnv !== "")
    return parseOr(passwordSchema, fromEnv, "password (JIGWRIGHT_PASSWORD)");
  if (!process.stdin.isTTY) {
    throw new CliUsageError("No terminal to ask for a password: set JIGWRIGHT_PASSWORD in the environment.");
  }
  const first = await readSecret("Password (at least 10 characters): ");
  parseOr(passwordSchema, first, "password");
  const second = await readSecret("Same password again: ");
  if (first !== second) throw new CliUsageError("The two passwords differ; nothing was changed.");
  return first;
}

async function withDatabase<T>(fn: (db: Database) => Promise<T>): Promise<T> {
  const config = loadConfig();
  const db = createDatabase(config.db);
  try {
    try {
      await db.sequelize.authenticate();
    } catch (err) {
      throw new Error(
        `Cannot reach the database ${config.db.database} at ${config.db.host}:${config.db.port} ` +
          `(${err instanceof Error ? err.message : String(err)}). ` +
          (config.dbManaged
            ? "Start it with `npm run db -- start` (or run `npm start`)."
            : "Check the DB_* settings."),
        { cause: err },
      );
    }
    // The same schema the server expects; a no-op when `npm start` has already run.
    await migrateUp(db);
    return await fn(db);
  } finally {
    await db.close();
  }
}

async function create(args: string[]): Promise<number> {
  const parsed = parseArgs(args);
  rejectUnknown(parsed, ["email", "role", "name"]);
  const email = parseOr(emailSchema, required(single(parsed, "email"), "email"), "email");
  const role: Role = parseOr(roleSchema, required(single(parsed, "role"), "role"), "role");
  const displayName = parseOr(
    displayNameSchema,
    single(parsed, "name") ?? email.split("@")[0] ?? email,
    "name",
  );
  const password = await obtainPassword();
  return withDatabase(async (db) => {
    try {
      const user = await authService(userRepository(db.models)).register(
        { email, password, displayName },
        role,
      );
      process.stderr.write(`Created ${user.role} ${user.email} (id ${user.id}).\n`);
      return 0;
    } catch (err) {
      if (err instanceof HttpError && err.code === "conflict") {
        process.stderr.write(`${err.message} Use \`user set-role\` to change its role.\n`);
        return 1;
      }
      throw err;
    }
  });
}

async function setRole(args: string[]): Promise<number> {
  const parsed = parseArgs(args);
  rejectUnknown(parsed, ["email", "role"]);
  const email = parseOr(emailSchema, required(single(parsed, "email"), "email"), "email");
  const role: Role = parseOr(roleSchema, required(single(parsed, "role"), "role"), "role");
  return withDatabase(async (db) => {
    const users = userRepository(db.models);
    const user = await users.findByEmail(email);
    if (!user) {
      process.stderr.write(`There is no account with the e-mail ${email}.\n`);
      return 1;
    }
    try {
      const updated = await adminService(users).setRole(user.id, role);
      process.stderr.write(`${updated.email} is now ${updated.role}.\n`);
      return 0;
    } catch (err) {
      if (err instanceof HttpError) {
        process.stderr.write(`${err.message}\n`);
        return 1;
      }
      throw err;
    }
  });
}

/** `user create` and `user set-role`: how an operator makes the first admin on a real install. */
export const userCommand: CliCommand = {
  name: "user",
  usage,
  summary:
    "Create an account with a role, or change an account's role. Password from JIGWRIGHT_PASSWORD, else asked. Uses the server's DB_* settings.",
  async run(args) {
    const [sub, ...rest] = args;
    if (sub === "create") return create(rest);
    if (sub === "set-role") return setRole(rest);
    throw new CliUsageError(`Unknown user subcommand "${sub ?? ""}".\nUsage: npm run -s cli -- ${usage}`);
  },
};
