/**
 * Flow: a machinist records a vise and a machine in "My vises and machines" (inline edit, with the
 * validation message shown before anything is saved), then manages a saved design: rename, duplicate,
 * share the read-only link, open it signed out (nothing about the owner shown), revoke it, delete with
 * undo. Screenshots go to .tmp/screenshots/ for a look at every state.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { launchBrowser, startApp, type E2eApp, type E2eBrowser } from "./harness";

let app: E2eApp;
const browsers: E2eBrowser[] = [];

async function open(size?: { width: number; height: number }): Promise<E2eBrowser> {
  const b = await launchBrowser(size);
  browsers.push(b);
  return b;
}

async function signIn(page: Page, email: string, password: string, path: string) {
  await page.goto(`${app.baseUrl}${path}`);
  // Guests are sent to sign in and brought back afterwards.
  await page.waitForURL("**/sign-in?next=*");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`**${path}`);
}

/** Saves a design through the API as the signed-in browser (the configurator's own save is its page's job). */
async function saveDesignAs(page: Page, body: object): Promise<number> {
  return page.evaluate(async (design) => {
    const { csrfToken } = (await (await fetch("/api/auth/csrf")).json()) as { csrfToken: string };
    const res = await fetch("/api/designs", {
      method: "POST",
      headers: { "content-type": "application/json", "x-csrf-token": csrfToken },
      body: JSON.stringify(design),
    });
    if (res.status !== 201) throw new Error(`save failed: ${res.status} ${await res.text()}`);
    return ((await res.json()) as { design: { id: number } }).design.id;
  }, body);
}

beforeAll(async () => {
  app = await startApp();
});

afterAll(async () => {
  for (const b of browsers.splice(0)) await b.close();
  await app?.close();
});

describe("my vises and machines in the browser", () => {
  it("adds a vise with inline checks, edits it in place, and adds a machine", async () => {
    const user = await app.createUser({ role: "machinist", displayName: "Ada Workshop" });
    const { page, screenshot } = await open();
    await signIn(page, user.email, user.password, "/workshop");
    await page.getByText("No vises yet.").waitFor();
    await screenshot("workshop-empty");

    await page.getByRole("button", { name: "Add a vise" }).click();
    await page.getByLabel(/^Name of new vise/).fill("Milling vise 100");
    await page.getByLabel(/^Jaw width \(mm\) of new vise/).fill("0");
    await page.getByLabel(/^Jaw height \(mm\) of new vise/).fill("32");
    await page.getByLabel(/^Jaw thickness \(mm\) of new vise/).fill("12,5");
    await page.getByLabel(/^Maximum opening \(mm\) of new vise/).fill("100");
    await page.getByRole("button", { name: "Add", exact: true }).click();
    await page.getByText("Jaw width must be more than 0 mm.").waitFor();
    await screenshot("workshop-vise-error");

    await page.getByLabel(/^Jaw width \(mm\) of new vise/).fill("100");
    await page.getByLabel(/^Jaw width \(mm\) of new vise/).press("Enter");
    await page.getByText("Added “Milling vise 100”.").waitFor();
    const row = page.locator("tr", { hasText: "Milling vise 100" });
    expect(await row.locator("td").nth(3).textContent()).toBe("12.5");

    await page.getByRole("button", { name: "Edit Milling vise 100" }).click();
    await page.getByLabel(/^Maximum opening \(mm\) of/).fill("110");
    await page.getByRole("button", { name: "Save" }).click();
    await page.getByText("Saved “Milling vise 100”.").waitFor();
    expect(await row.locator("td").nth(4).textContent()).toBe("110");

    await page.getByRole("button", { name: "Add a machine" }).click();
    await page.getByLabel(/^Name of new machine/).fill("Bench mill");
    await page.getByLabel(/^Maximum spindle speed \(rpm\) of new machine/).fill("3000");
    await page.getByRole("button", { name: "Add", exact: true }).click();
    await page.getByText("Added “Bench mill”.").waitFor();
    await screenshot("workshop-filled");

    // The table is what the server holds: a reload shows the same rows.
    await page.reload();
    await page.locator("tr", { hasText: "Milling vise 100" }).waitFor();
    await page.locator("tr", { hasText: "Bench mill" }).waitFor();
  });
});

describe("saved designs in the browser", () => {
  it("renames, duplicates, shares, revokes and deletes with undo", async () => {
    const user = await app.createUser({ role: "designer", displayName: "Bram Sharer" });
    const { page, screenshot } = await open();
    await signIn(page, user.email, user.password, "/designs");
    await page.getByText("No saved designs yet.").waitFor();
    await screenshot("designs-empty");

    await saveDesignAs(page, {
      templateId: "cam-vise-stop",
      name: "Stop for the 100 mm vise",
      notes: "Left-hand jaw.",
      units: "mm",
      parameters: { jawWidth: 100, jawThickness: 20 },
    });
    await page.reload();
    const card = page.locator("article", { hasText: "Stop for the 100 mm vise" });
    await card.waitFor();
    // Pinned to the catalogue's version, and opened in the configurator with its values in the address.
    expect(await card.textContent()).toContain("v1.0.0");
    const href = await card.getByRole("link", { name: "Open in the configurator" }).getAttribute("href");
    // …and the design's id, so the configurator can offer to save changes back onto it.
    expect(href).toMatch(/^\/templates\/cam-vise-stop\?units=mm&jawWidth=100&jawThickness=20&saved-design=\d+$/);

    await card.getByRole("button", { name: /^Rename/ }).click();
    await page.getByLabel("Design name").fill("");
    await page.getByRole("button", { name: "Save" }).click();
    await page.getByText("Name is required.").waitFor();
    await page.getByLabel("Design name").fill("Cam stop, 100 mm vise");
    await page.getByLabel("Design name").press("Enter");
    const renamed = page.locator("article", { hasText: "Cam stop, 100 mm vise" });
    await renamed.getByRole("heading", { name: "Cam stop, 100 mm vise" }).waitFor();

    await renamed.getByRole("button", { name: /^Duplicate/ }).click();
    await page.getByText("Saved a copy: “Copy of Cam stop, 100 mm vise”.").waitFor();
    await expect.poll(() => page.locator("article").count()).toBe(2);

    const original = page.locator("article", {
      has: page.getByRole("heading", { name: "Cam stop, 100 mm vise", exact: true }),
    });
    await original.getByRole("button", { name: /^Share/ }).click();
    await original.getByRole("button", { name: "Make a share link" }).click();
    const linkField = original.getByLabel(/^Share link/);
    await linkField.waitFor();
    const url = await linkField.inputValue();
    expect(url).toMatch(new RegExp(`^${app.baseUrl}/shared/[A-Za-z0-9_-]{32}$`));
    await screenshot("designs-shared");

    // Signed out, on a phone-sized screen: the design, and nothing about its owner.
    const guest = await open({ width: 390, height: 844 });
    await guest.page.goto(url);
    await guest.page.getByRole("heading", { level: 1, name: "Cam stop, 100 mm vise" }).waitFor();
    const text = (await guest.page.locator("main").textContent()) ?? "";
    expect(text).toContain("Left-hand jaw.");
    expect(text).toContain("Cam-lock vise stop");
    expect(text).not.toContain(user.email);
    expect(text).not.toContain("Bram Sharer");
    await guest.screenshot("shared-design-guest");

    await original.getByRole("button", { name: "Revoke link…" }).click();
    await original.getByRole("button", { name: "Revoke link", exact: true }).click();
    await original.getByRole("button", { name: "Make a share link" }).waitFor();
    await guest.page.reload();
    await guest.page.getByText("This link does not open a design").waitFor();
    await guest.screenshot("shared-design-revoked");

    await original.getByRole("button", { name: /^Delete/ }).click();
    await page.getByText("Deleted “Cam stop, 100 mm vise”.").waitFor();
    await expect.poll(() => page.locator("article").count()).toBe(1);
    await screenshot("designs-deleted-undo");
    await page.getByRole("button", { name: "Undo" }).click();
    await page.getByText("“Cam stop, 100 mm vise” is back.").waitFor();
    await expect.poll(() => page.locator("article").count()).toBe(2);
  });
});
