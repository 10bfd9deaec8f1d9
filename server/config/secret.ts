import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

/**
 * The session-signing secret for an install that did not set SESSION_SECRET: made once from
 * 32 random bytes and kept in `<dataDir>/session-secret` (mode 0600, git-ignored), so sign-ins survive
 * restarts. Side effect: creates the file on first call. Production behind a load balancer must set
 * SESSION_SECRET so every server process signs alike.
 */
export function loadOrCreateSessionSecret(dataDir: string): string {
  const file = path.join(dataDir, "session-secret");
  try {
    const existing = fs.readFileSync(file, "utf8").trim();
    if (existing.length >= 32) return existing;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== "ENOENT") throw err;
  }
  fs.mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString("base64url");
  try {
    // "wx": if another process won the race, keep its secret.
    fs.writeFileSync(file, `${secret}\n`, { mode: 0o600, flag: "wx" });
    return secret;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "EEXIST") return fs.readFileSync(file, "utf8").trim();
    throw err;
  }
}
