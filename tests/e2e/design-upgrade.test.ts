/**
 * A saved design on an older template version, in the browser: the designs page shows what changes on
 * the new version, opens the configurator on it with the saved values carried over (the one outside the
 * new limits marked in its field), and the design moves only when its owner saves it there. Uses our own
 * two-version test template (tests/fixtures/templates/test-step-stop-*.yaml; round test numbers).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { noTemplates, versionedStore } from "../api/design-upgrade-fixture";
import { launchBrowser, startApp, type E2eApp, type E2eBrowser } from "./harness";

// Only the test template: this flow does not depend on the built-in catalogue.
const store = versionedStore(noTemplates);
let app: E2eApp;
let browser: E2eBrowser;

beforeAll(async () => {
  app = await startApp({ deps: { templates: store } });
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
});

describe("a saved design on an older template version", () => {
  it("shows the differences, opens on the new version, and moves only when saved there", async () => {
    const { page, screenshot } = browser;
    const user = await app.createUser({ role: "machinist", displayName: "Ines Upgrader" });
    await page.goto(`${app.baseUrl}/sign-in?next=/designs`);
    await page.getByLabel("E-mail").fill(user.email);
    await page.getByLabel("Password", { exact: true }).fill(user.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/designs");
    // Let the page settle first: its own requests after sign-in write the same session.
    await page.getByText("No saved designs yet.").waitFor();

    // Saved while 1.0.0 was current: a 160 mm jaw (2.0.0 allows up to 150 mm) on an M5 screw (dropped in 2.0.0).
    store.publish("1.0.0");
    const id = await page.evaluate(async () => {
      const { csrfToken } = (await (await fetch("/api/auth/csrf")).json()) as { csrfToken: string };
      const res = await fetch("/api/designs", {
        method: "POST",
        headers: { "content-type": "application/json", "x-csrf-token": csrfToken },
        body: JSON.stringify({
          templateId: "test-step-stop",
          name: "Stop for the 160 mm vise",
          units: "mm",
          parameters: {
            jawWidth: 160,
            stopHeight: 24,
            padThickness: 3,
            screw: "M5",
            metal: "brass",
            breakEdges: true,
          },
        }),
      });
      if (res.status !== 201) throw new Error(`save failed: ${res.status} ${await res.text()}`);
      return ((await res.json()) as { design: { id: number } }).design.id;
    });
    store.publish("2.0.0");

    await page.reload();
    const card = page.locator("article", { hasText: "Stop for the 160 mm vise" });
    await card.getByText("Version 2.0.0 of this template is out").waitFor();
    // No direct "open": a design on an older version opens on the new one through the comparison.
    expect(await card.getByRole("link", { name: "Open in the configurator" }).count()).toBe(0);
    await card.getByRole("button", { name: "What changes in version 2.0.0?" }).click();
    const panel = card.getByRole("region", { name: "What changes on version 2.0.0" });
    await panel.getByTestId("upgrade-summary").waitFor();
    expect(await panel.getByTestId("upgrade-summary").textContent()).toContain(
      "2 saved values need your decision on version 2.0.0.",
    );
    expect(await panel.locator('[data-key="jawWidth"]').textContent()).toContain(
      "Your jaw width of 160 mm is outside version 2.0.0's limits (40 mm to 150 mm).",
    );
    expect(await panel.locator('[data-key="screw"]').textContent()).toContain("M5 is no longer offered");
    expect(await panel.locator('[data-key="padThickness"]').textContent()).toContain("Dropped");
    await screenshot("design-upgrade-differences");

    await panel.getByRole("link", { name: "Open on version 2.0.0" }).click();
    await page.waitForURL("**/templates/test-step-stop?*");
    await page.getByRole("heading", { name: "Test step stop", level: 1 }).waitFor();
    // The out-of-range width is carried over as saved and marked; the dropped screw starts on M6.
    const width = page.getByLabel(/^Jaw width/);
    expect(await width.inputValue()).toBe("160");
    await expect.poll(() => width.getAttribute("aria-invalid")).toBe("true");
    expect(await page.getByLabel(/^Screw$/).inputValue()).toBe("M6");
    const saveBack = page.getByRole("region", { name: "Opened from “Stop for the 160 mm vise”" });
    const saveButton = saveBack.getByRole("button", {
      name: "Save “Stop for the 160 mm vise” on version 2.0.0",
    });
    expect(await saveButton.isDisabled()).toBe(true);
    await screenshot("design-upgrade-configurator");

    // Until saved, the design stays on 1.0.0 with its own values.
    const before = await page.evaluate(
      async (designId) => (await (await fetch(`/api/designs/${designId}`)).json()) as unknown,
      id,
    );
    expect(before).toMatchObject({
      design: { templateVersion: "1.0.0", parameters: { jawWidth: 160, screw: "M5" } },
    });

    await width.fill("150");
    await expect.poll(() => saveButton.isDisabled()).toBe(false);
    // The address keeps naming the design while the values change in it.
    await page.waitForURL((url) => url.searchParams.get("jawWidth") === "150");
    expect(new URL(page.url()).searchParams.get("saved-design")).toBe(String(id));
    await saveButton.click();
    await saveBack.getByText("Saved “Stop for the 160 mm vise”").waitFor();
    const after = await page.evaluate(
      async (designId) => (await (await fetch(`/api/designs/${designId}`)).json()) as unknown,
      id,
    );
    expect(after).toMatchObject({
      design: {
        templateVersion: "2.0.0",
        newerVersion: null,
        parameters: {
          jawWidth: 150,
          stopHeight: 24,
          screw: "M6",
          metal: "brass",
          breakEdges: true,
          screwDepth: 10,
        },
      },
    });
    expect((after as { design: { parameters: object } }).design.parameters).not.toHaveProperty(
      "padThickness",
    );
  });
});
