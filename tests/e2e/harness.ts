/**
 * The browser end-to-end harness: the real app (createApp with the TEST database, serving the built
 * client as in production) on an ephemeral loopback port, driven by Debian's Chromium through
 * playwright-core. Never downloads a browser.
 *
 * The app comes from the API tests' `createTestApp` (tests/api/helpers), so both suites get the same
 * app on the same TEST database (TEST_DB_*, which scripts/test.sh exports); run on its own it starts the
 * test instance if needed and migrates it. Here it also serves dist/client, as in production.
 */
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import type { AddressInfo } from "node:net";
import os from "node:os";
import path from "node:path";
import type { Server } from "node:http";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { projectRoot } from "@server/config";
import type { AppDeps } from "@server/app";
import type { Database } from "@server/db";
import { userRepository } from "@server/modules/auth/repository";
import { authService } from "@server/modules/auth/service";
import type { PublicUser, Role } from "@/shared/auth";
import { createTestApp } from "../api/helpers/app";

export const screenshotDir = path.join(projectRoot, ".tmp", "screenshots");
const clientIndex = path.join(projectRoot, "dist", "client", "index.html");

/** Chromium flags from the platform issue; the profile directory goes to launchPersistentContext. */
const chromiumArgs = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export interface E2eApp {
  baseUrl: string;
  db: Database;
  /** Makes an account through the app's own auth service (the same code as registration and the CLI). */
  createUser(input: {
    role: Role;
    displayName?: string;
    password?: string;
  }): Promise<PublicUser & { password: string }>;
  close(): Promise<void>;
}

/** An address no earlier run can have taken (the test database may outlive a run). */
export function uniqueEmail(tag: string): string {
  return `${tag}-${Date.now().toString(36)}-${randomBytes(3).toString("hex")}@e2e.test`;
}

/** Builds the client if there is no build yet (scripts/test.sh builds it before vitest). */
async function ensureClientBuilt(): Promise<void> {
  if (fs.existsSync(clientIndex)) return;
  const { build } = await import("vite");
  await build({ root: projectRoot, logLevel: "warn" });
}

/** `deps` replaces parts of the app's outside world (e.g. a template store of the test's own). */
export async function startApp(options: { deps?: Partial<AppDeps> } = {}): Promise<E2eApp> {
  await ensureClientBuilt();
  const { app, db, close } = await createTestApp({
    config: { env: "production", serveClient: true },
    ...(options.deps ? { deps: options.deps } : {}),
  });
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(0, "127.0.0.1", () => resolve(s));
    s.once("error", reject);
  });
  const { port } = server.address() as AddressInfo;
  const auth = authService(userRepository(db.models));

  return {
    baseUrl: `http://127.0.0.1:${port}`,
    db,
    async createUser({ role, displayName, password }) {
      const pw = password ?? `e2e ${randomBytes(6).toString("hex")} pass`;
      const email = uniqueEmail(role);
      const user = await auth.register(
        { email, password: pw, displayName: displayName ?? `E2E ${role}` },
        role,
      );
      return {
        id: user.id,
        email,
        displayName: user.displayName,
        role: user.role,
        createdAt: new Date().toISOString(),
        password: pw,
      };
    },
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await close();
    },
  };
}

export interface E2eBrowser {
  context: BrowserContext;
  page: Page;
  /** Saves a full-page PNG to .tmp/screenshots/<name>.png and returns its path. */
  screenshot(name: string, page?: Page): Promise<string>;
  close(): Promise<void>;
}

/** A fresh Chromium profile per call, so no cookie or cache leaks between tests. */
export async function launchBrowser(options: { width?: number; height?: number } = {}): Promise<E2eBrowser> {
  const profileDir = fs.mkdtempSync(path.join(os.tmpdir(), "jigwright-e2e-"));
  fs.mkdirSync(screenshotDir, { recursive: true });
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: "/usr/bin/chromium",
    headless: true,
    args: chromiumArgs,
    viewport: { width: options.width ?? 1280, height: options.height ?? 900 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  page.setDefaultTimeout(15_000);
  // A page error is a failure of the app under test: record it so tests can assert there were none.
  const pageErrors: string[] = [];
  page.on("pageerror", (error) => pageErrors.push(error.message));
  return {
    context,
    page,
    async screenshot(name, target = page) {
      const file = path.join(screenshotDir, `${name}.png`);
      await target.screenshot({ path: file, fullPage: true });
      return file;
    },
    async close() {
      await context.close();
      fs.rmSync(profileDir, { recursive: true, force: true });
      if (pageErrors.length > 0) throw new Error(`Uncaught errors in the page:\n${pageErrors.join("\n")}`);
    },
  };
}
