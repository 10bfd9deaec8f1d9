/**
 * Flow 1 of PRODUCT.md in the browser: the demo workshop's machinist records a vise, opens the cam-lock
 * vise stop from the catalogue, fills it from that vise in one step, sees the checks and the 3D preview,
 * saves the design and downloads the drawing PDF, whose text must carry the title block and the jaw size
 * entered. Then the same configuration is switched to inches and a known length must convert exactly.
 *
 * Demo data: the invented Quillbrook workshop (server/db/seeders), seeded once into the test database.
 * The vise sizes below are our own round numbers chosen so they convert to whole inches.
 */
import fs from "node:fs";
import type { Server } from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { projectRoot } from "@server/config";
import { seedDemo } from "@server/db/migrate";
import { demoAccounts } from "@server/db/seeders/demo-accounts";
import { createKernelPool, type KernelPool } from "@server/kernel";
import { createTestApp, type TestApp } from "../api/helpers/app";
import { launchBrowser, type E2eBrowser } from "./harness";

/**
 * The harness's app has no solid kernel; the preview and the drawing need one, so this test starts the
 * same test app (createTestApp, the harness's own base) with a one-worker kernel pool, serving the built
 * client as in production.
 */
interface KernelApp {
  baseUrl: string;
  app: TestApp;
  close(): Promise<void>;
}

async function startAppWithKernel(): Promise<KernelApp> {
  if (!fs.existsSync(path.join(projectRoot, "dist", "client", "index.html"))) {
    const { build } = await import("vite");
    await build({ root: projectRoot, logLevel: "warn" });
  }
  const kernel: KernelPool = createKernelPool({ poolSize: 1, warmupRounds: 1, taskTimeoutMs: 120_000 });
  const app = await createTestApp({ config: { env: "production", serveClient: true }, deps: { kernel } });
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.app.listen(0, "127.0.0.1", () => resolve(s));
    s.once("error", reject);
  });
  return {
    baseUrl: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    app,
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await app.close();
      await kernel.close();
    },
  };
}

let app: KernelApp;
let browser: E2eBrowser;
const machinist = demoAccounts.find((a) => a.role === "machinist")!;

// 127 mm = 5 in and 38.1 mm = 1.5 in exactly (1 in = 25.4 mm by definition: international yard and
// pound agreement, 1959; NIST SP 811 Appendix B).
const vise = {
  name: `Mill vise E2E ${Date.now().toString(36)}`,
  jawWidthMm: "127",
  jawHeightMm: "38.1",
  jawThicknessMm: "26.5",
  maxOpeningMm: "150",
};

beforeAll(async () => {
  app = await startAppWithKernel();
  await seedDemo(app.app.db);
  browser = await launchBrowser({ width: 1280, height: 900 });
});

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

const field = (page: Page, label: string) => page.getByRole("textbox", { name: new RegExp(`^${label} \\(`) });

async function textOfPdf(file: string): Promise<string> {
  const { getDocument } = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await getDocument({
    data: new Uint8Array(fs.readFileSync(file)),
    useSystemFonts: false,
    isEvalSupported: false,
  }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    pages.push(content.items.map((item) => ("str" in item ? item.str : "")).join(" "));
  }
  await doc.destroy();
  return pages.join("\n");
}

describe("configurator in the browser, signed in as the demo machinist", () => {
  it("fills the vise stop from a recorded vise, checks it, previews it, saves it and downloads the drawing", async () => {
    const { page, screenshot } = browser;
    await page.goto(`${app.baseUrl}/sign-in`);
    await page.getByLabel("E-mail").fill(machinist.email);
    await page.getByLabel("Password", { exact: true }).fill(machinist.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByTestId("signed-in-as").getByText(machinist.displayName).waitFor();

    // Record the vise on the workshop page.
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "My workshop" }).click();
    await page.getByRole("button", { name: "Add a vise" }).click();
    await page.getByLabel("Name of new vise").fill(vise.name);
    await page.getByLabel("Jaw width (mm) of new vise").fill(vise.jawWidthMm);
    await page.getByLabel("Jaw height (mm) of new vise").fill(vise.jawHeightMm);
    await page.getByLabel("Jaw thickness (mm) of new vise").fill(vise.jawThicknessMm);
    await page.getByLabel("Maximum opening (mm) of new vise").fill(vise.maxOpeningMm);
    await page.getByLabel("Maximum opening (mm) of new vise").press("Enter");
    await page.getByText(`Added “${vise.name}”.`).waitFor();

    // The catalogue: a card per template; search by words narrows it to the vise stop, whose picture is
    // drawn from its own model.
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Templates" }).click();
    await page.waitForURL("**/templates");
    await page.getByRole("list", { name: "Templates" }).waitFor();
    expect(await page.getByRole("list", { name: "Templates" }).getByRole("listitem").count()).toBeGreaterThan(
      1,
    );
    await page.getByLabel("Search templates").fill("vise stop");
    await page.waitForURL(/q=vise/);
    const card = page
      .getByRole("listitem")
      .filter({ has: page.getByRole("link", { name: "Cam-lock vise stop" }) });
    await card.getByRole("img", { name: /drawn from its model/ }).waitFor({ timeout: 150_000 });
    await screenshot("catalogue-search");
    await card.getByRole("link", { name: "Cam-lock vise stop" }).click();
    await page.waitForURL("**/templates/cam-vise-stop**");
    await page.getByRole("heading", { level: 1, name: "Cam-lock vise stop" }).waitFor();

    // Fill from the vise in one step.
    const option = await page
      .getByLabel("Fill from my vise")
      .locator("option", { hasText: vise.name })
      .getAttribute("value");
    await page.getByLabel("Fill from my vise").selectOption(option!);
    await page.getByText(`from “${vise.name}”`).waitFor();
    expect(await field(page, "Jaw width").inputValue()).toBe("127");
    expect(await field(page, "Jaw height").inputValue()).toBe("38.1");
    expect(await field(page, "Jaw thickness").inputValue()).toBe("26.5");
    // The address follows, so the configuration can be bookmarked.
    await page.waitForURL(/jawWidth=127/);
    await page.waitForURL(/jawThickness=26.5/);

    // Checks for exactly these values, and the 3D preview.
    await page
      .locator('[data-testid="evaluation-status"][data-status="current"]')
      .waitFor({ timeout: 30_000 });
    expect(await page.getByTestId("checks-summary").textContent()).toMatch(/checks pass|to look at/);
    await page.getByRole("heading", { name: "Engineering figures" }).waitFor();
    expect(await page.getByRole("heading", { name: "Parts", exact: true }).count()).toBe(1);
    await page.getByTestId("model-canvas").locator("canvas").waitFor({ timeout: 150_000 });
    await page.getByRole("button", { name: "Exploded" }).click();
    expect(await page.getByRole("button", { name: "Exploded" }).getAttribute("aria-pressed")).toBe("true");
    await page.getByRole("button", { name: "Exploded" }).click();
    await page.waitForTimeout(500);
    await screenshot("configurator-filled");

    // Save the design.
    await page.getByLabel("Design name").fill(`Stop for ${vise.name}`);
    await page.getByLabel(/Notes/).fill("Rod in the middle row for short work.");
    await page.getByRole("button", { name: "Save design" }).click();
    await page.getByText(`Saved as “Stop for ${vise.name}”`).waitFor();

    // Download the drawing PDF.
    const [download] = await Promise.all([
      page.waitForEvent("download", { timeout: 90_000 }),
      page.getByRole("button", { name: /Drawing \(PDF\)/ }).click(),
    ]);
    const file = await download.path();
    const bytes = fs.readFileSync(file);
    // ISO 32000-1 §7.5.2: a PDF file begins with the header "%PDF-".
    expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const text = await textOfPdf(file);
    // The title block (ISO 7200 fields: title, drawing number, revision, scale, sheet, drawn by, date) and
    // the general tolerance (ISO 2768-1) on the template's own drawing, drawn by the signed-in machinist.
    expect(text).toContain("Cam-lock vise stop");
    for (const fieldName of ["Title", "Drawing number", "Revision", "Scale", "Sheet", "Drawn by", "Date"]) {
      expect(text, `title block field "${fieldName}"`).toContain(fieldName);
    }
    expect(text).toContain(machinist.displayName);
    expect(text).toMatch(/ISO 2768-m/);
    await page.getByText(/downloaded/).waitFor();
    await screenshot("configurator-downloaded");
    // The jaw size entered must be on the drawing, so the print says which vise it was made for. 26.5 mm
    // was chosen because no dimension, mass or speed of the default drawing reads 26.5.
    expect(text, "the drawing should state the jaw thickness (26.5 mm) it was sized for").toMatch(
      /(?<![\d.])26\.5(?!\d)/,
    );
  }, 420_000);

  it("switches to inches and converts a known length exactly, in place", async () => {
    const { page, screenshot } = browser;
    await page.goto(`${app.baseUrl}/templates/cam-vise-stop?units=mm&jawWidth=127&jawHeight=38.1`);
    await field(page, "Jaw width").waitFor();
    expect(await field(page, "Jaw width").inputValue()).toBe("127");
    await page.locator("label").filter({ hasText: /^inch/ }).click();
    // 127 mm = 5 in and 38.1 mm = 1.5 in exactly.
    expect(await field(page, "Jaw width").inputValue()).toBe("5");
    expect(await field(page, "Jaw height").inputValue()).toBe("1.5");
    await page.getByRole("textbox", { name: "Jaw width (inches)" }).waitFor();
    await page.waitForURL(/units=in/);
    // The address keeps millimetres, so nothing drifts when the units change.
    expect(new URL(page.url()).searchParams.get("jawWidth")).toBe("127");
    await page
      .locator('[data-testid="evaluation-status"][data-status="current"]')
      .waitFor({ timeout: 30_000 });
    await screenshot("configurator-inches");
    await page.locator("label").filter({ hasText: /^mm/ }).click();
    expect(await field(page, "Jaw width").inputValue()).toBe("127");
  });
});
