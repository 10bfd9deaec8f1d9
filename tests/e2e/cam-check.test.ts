/**
 * Flow 3 of PRODUCT.md: a learner, not signed in, checks a cam clamp before cutting metal, sees why a
 * cam that does not lock fails, and changes the eccentricity until it locks. Runs against the real
 * calculator route (POST /api/calculators/eccentric-cam) of the real app.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { launchBrowser, startApp, type E2eApp, type E2eBrowser } from "./harness";

let app: E2eApp;
let browser: E2eBrowser;

beforeAll(async () => {
  app = await startApp();
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await app?.close();
});

const results = (page: Page) => page.getByTestId("cam-results");
const verdict = (page: Page) => page.getByTestId("lock-verdict");

/** Types an eccentricity and waits for the result of exactly that cam (its throw is 2e). */
async function setEccentricity(page: Page, mm: number, expectedThrow: string) {
  await page.getByLabel("Eccentricity").fill(String(mm));
  await page.locator('[data-testid="cam-results"][data-status="current"]').waitFor();
  await page.getByTestId("figure-throw").getByText(expectedThrow, { exact: true }).waitFor();
}

describe("cam check in the browser, as a guest", () => {
  it("explains why a cam does not lock, and locks once the eccentricity is small enough", async () => {
    const { page, screenshot } = browser;
    await page.goto(app.baseUrl);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Cam check" }).click();
    await page.waitForURL("**/cam-check");
    await verdict(page).waitFor();
    // No sign-in: the header still offers it.
    expect(await page.getByRole("link", { name: "Sign in" }).count()).toBe(1);

    // Ø24 mm with 3 mm eccentricity: D/e = 8, far below the 14–20 that jig & fixture handbooks give for
    // a self-locking circular cam (from memory), so at μ = 0.1 it must not lock.
    await setEccentricity(page, 3, "6 mm");
    expect(await verdict(page).getAttribute("data-tone")).toBe("fault");
    expect(await verdict(page).textContent()).toContain("Does not lock");
    await page.getByRole("heading", { name: "Why it does not lock" }).waitFor();
    expect(await page.getByTestId("cam-explanation").textContent()).toMatch(/short of what is needed/);
    // The safety cautions sit with the figures and name the failure.
    expect(await page.getByRole("complementary", { name: "Before you rely on it" }).textContent()).toContain(
      "does not self-lock",
    );
    await screenshot("cam-check-does-not-lock");

    // Bring the eccentricity down a quarter millimetre at a time until the cam locks everywhere.
    let e = 3;
    const tones: string[] = [];
    while (e > 0.5) {
      e = Math.round((e - 0.25) * 100) / 100;
      await setEccentricity(page, e, `${Math.round(2 * e * 1000) / 1000} mm`);
      const tone = (await verdict(page).getAttribute("data-tone")) ?? "";
      tones.push(tone);
      if (tone === "holds") break;
    }
    expect(await verdict(page).textContent()).toContain("Locks by itself");
    // On the way it passes "locks at this setting only" before it holds over the whole working zone.
    expect(tones).toContain("caution");
    // It locks at D/e = 24/1.5 = 16: inside the handbook's 14–20 band (from memory).
    expect(e).toBe(1.5);
    expect(24 / e).toBeGreaterThanOrEqual(14);
    expect(24 / e).toBeLessThanOrEqual(20);
    await page.getByRole("heading", { name: "Why it locks" }).waitFor();
    await screenshot("cam-check-locks");
  });

  it("keeps the last good result on screen and marks the field when the cam cannot be built", async () => {
    const { page, screenshot } = browser;
    await page.goto(`${app.baseUrl}/cam-check`);
    await page.locator('[data-testid="cam-results"][data-status="current"]').waitFor();
    // An eccentricity larger than the radius (12 mm) cannot exist: the server refuses it with a reason.
    await page.getByLabel("Eccentricity").fill("13");
    await page.locator('[data-testid="cam-results"][data-status="input-problem"]').waitFor();
    expect(await page.getByLabel("Eccentricity").getAttribute("aria-invalid")).toBe("true");
    await verdict(page).waitFor();
    expect(await results(page).getByText("Fix the marked input").count()).toBe(1);
    await screenshot("cam-check-bad-input");
  });

  it("switches to inches and back, converting exactly (1 in = 25.4 mm)", async () => {
    const { page, screenshot } = browser;
    await page.goto(`${app.baseUrl}/cam-check`);
    await page.locator('[data-testid="cam-results"][data-status="current"]').waitFor();
    await page.getByLabel("Cam diameter").fill("25.4");
    await page.getByLabel("Eccentricity").fill("1.27");
    await page.locator('[data-testid="cam-results"][data-status="current"]').waitFor();
    await page.locator('label:has(input[name="unit-system"][value="inch"])').click();
    expect(await page.getByLabel("Cam diameter").inputValue()).toBe("1");
    expect(await page.getByLabel("Eccentricity").inputValue()).toBe("0.05");
    // Throw 2 × 1.27 mm = 2.54 mm = 0.1 in exactly.
    await page.getByTestId("figure-throw").getByText("0.1 in", { exact: true }).waitFor();
    await screenshot("cam-check-inch");
    await page.locator('label:has(input[name="unit-system"][value="mm"])').click();
    expect(await page.getByLabel("Cam diameter").inputValue()).toBe("25.4");
  });

  it("keeps the cam in the address: a reload and Back bring the same inputs and units", async () => {
    const { page, screenshot } = browser;
    await page.goto(`${app.baseUrl}/cam-check`);
    await page.locator('[data-testid="cam-results"][data-status="current"]').waitFor();
    await page.getByLabel("Cam diameter").fill("25.4");
    await setEccentricity(page, 1.27, "2.54 mm");
    await page.locator('label:has(input[name="unit-system"][value="inch"])').click();
    // The address follows a moment after the last change: units and every input, as shown.
    await page.waitForURL(
      (url) => url.searchParams.get("units") === "in" && url.searchParams.get("eccentricity") === "0.05",
    );
    const address = new URL(page.url());
    expect(address.searchParams.get("diameter")).toBe("1");

    await page.reload();
    await page.locator('[data-testid="cam-results"][data-status="current"]').waitFor();
    expect(await page.getByLabel("Cam diameter").inputValue()).toBe("1");
    expect(await page.getByLabel("Eccentricity").inputValue()).toBe("0.05");
    expect(await page.locator('input[name="unit-system"][value="inch"]').isChecked()).toBe(true);
    // Throw 2e = 0.1 in exactly (1 in = 25.4 mm), so the same cam was computed again.
    await page.getByTestId("figure-throw").getByText("0.1 in", { exact: true }).waitFor();
    await screenshot("cam-check-reloaded");

    // Away to another page and Back: the same cam again.
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Templates" }).click();
    await page.waitForURL("**/templates");
    await page.goBack();
    await page.waitForURL((url) => url.pathname === "/cam-check");
    await page.locator('[data-testid="cam-results"][data-status="current"]').waitFor();
    expect(await page.getByLabel("Eccentricity").inputValue()).toBe("0.05");
    expect(new URL(page.url()).search).toBe(address.search);
  });

  it("opens a link with a bad value on the starting value, saying which and why", async () => {
    const { page } = browser;
    await page.goto(`${app.baseUrl}/cam-check?units=mm&diameter=24&eccentricity=-1&muContact=lots`);
    await page.locator('[data-testid="cam-results"][data-status="current"]').waitFor();
    const note = page.getByRole("status").filter({ hasText: "Some values in the link could not be used" });
    expect(await note.textContent()).toContain(
      "Eccentricity: -1 from the link cannot be used (it must be more than 0 mm)",
    );
    expect(await note.textContent()).toContain(
      "Friction at the work face: “lots” in the link is not a number",
    );
    // The starting cam's values (src/features/cam-check/model/fields.ts) stand in for them.
    expect(await page.getByLabel("Eccentricity").inputValue()).toBe("1.2");
    expect(await page.getByLabel("Friction at the work face").inputValue()).toBe("0.1");
  });
});
