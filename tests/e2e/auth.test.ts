/**
 * Flow: a new machinist registers, signs out, signs back in and sees their name and role in the header;
 * an admin changes another user's role and the change shows, in the table and in that user's header.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { launchBrowser, startApp, uniqueEmail, type E2eApp, type E2eBrowser } from "./harness";

let app: E2eApp;
const browsers: E2eBrowser[] = [];

async function open(): Promise<E2eBrowser> {
  const b = await launchBrowser();
  browsers.push(b);
  return b;
}

async function signIn(page: Page, baseUrl: string, email: string, password: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

const header = (page: Page) => page.getByTestId("signed-in-as");

beforeAll(async () => {
  app = await startApp();
});

afterAll(async () => {
  for (const b of browsers.splice(0)) await b.close();
  await app?.close();
});

describe("sign-in flow in the browser", () => {
  it("register, sign out, sign in, and see your name in the header", async () => {
    const { page, screenshot } = await open();
    const email = uniqueEmail("turner");
    const password = "a lathe with a taper attachment";

    await page.goto(app.baseUrl);
    await expect
      .poll(() => page.getByRole("heading", { level: 1 }).textContent())
      .toContain("before you cut metal");
    await screenshot("home-guest");

    await page.getByRole("link", { name: "Create account" }).first().click();
    await page.waitForURL("**/register");
    // The form checks with the shared schema before anything is sent.
    await page.getByRole("button", { name: "Create account" }).click();
    await page.getByText("Name is required.").waitFor();
    await page.getByText(/Password must be at least 10 characters/).waitFor();
    await screenshot("register-errors");

    await page.getByLabel("Your name").fill("Morwenna Tregear");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password", { exact: true }).fill(password);
    await page.getByRole("button", { name: "Create account" }).click();
    await header(page).getByText("Morwenna Tregear").waitFor();
    expect(await header(page).textContent()).toContain("machinist");
    expect(new URL(page.url()).pathname).toBe("/");
    await screenshot("home-signed-in");

    await page.getByRole("button", { name: "Sign out" }).click();
    await page.getByRole("link", { name: "Sign in" }).waitFor();
    expect(await header(page).count()).toBe(0);

    // A wrong password is refused without saying which part was wrong.
    await signIn(page, app.baseUrl, email, "not the right password");
    await page.getByRole("alert").getByText("That e-mail and password do not match an account.").waitFor();
    await screenshot("sign-in-refused");

    await page.getByLabel("Password", { exact: true }).fill(password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await header(page).getByText("Morwenna Tregear").waitFor();

    // The session survives a reload (it lives in MariaDB, not in the page).
    await page.reload();
    await header(page).getByText("Morwenna Tregear").waitFor();
  });

  it("an admin changes a user's role and the change shows", async () => {
    const admin = await app.createUser({ role: "admin", displayName: "Ines Admin" });
    const target = await app.createUser({ role: "machinist", displayName: "Tobias Fettle" });

    const { page, screenshot } = await open();
    await signIn(page, app.baseUrl, admin.email, admin.password);
    await header(page).getByText("Ines Admin").waitFor();
    await page.getByRole("link", { name: "Accounts" }).click();
    await page.waitForURL("**/admin");

    const roleOf = (email: string) => page.getByLabel(`Role of Tobias Fettle (${email})`);
    const roleSelect = roleOf(target.email);
    await roleSelect.waitFor();
    expect(await roleSelect.inputValue()).toBe("machinist");
    await roleSelect.selectOption("designer");
    await page.getByText("Tobias Fettle is now designer.").waitFor();
    await screenshot("admin-role-changed");

    // It is stored: a reload reads it back from the server.
    await page.reload();
    await roleOf(target.email).waitFor();
    expect(await roleOf(target.email).inputValue()).toBe("designer");

    // And the user sees it in their own header.
    const other = await open();
    await signIn(other.page, app.baseUrl, target.email, target.password);
    await header(other.page).getByText("Tobias Fettle").waitFor();
    expect(await header(other.page).textContent()).toContain("designer");
    // A designer is not an admin: the accounts page says so instead of showing the table.
    await other.page.goto(`${app.baseUrl}/admin`);
    await other.page.getByText("For administrators only").waitFor();
    expect(await other.page.getByRole("table").count()).toBe(0);
  });

  it("a guest sent to the admin page is asked to sign in; an unknown address gets the 404 page", async () => {
    const { page, screenshot } = await open();
    await page.goto(`${app.baseUrl}/admin`);
    await page.waitForURL("**/sign-in?next=%2Fadmin");
    await page.getByRole("heading", { name: "Sign in" }).waitFor();
    await screenshot("sign-in");

    await page.goto(`${app.baseUrl}/no/such/page`);
    await page.getByRole("heading", { name: "Nothing at this address" }).waitFor();
    expect(await page.getByText("/no/such/page").count()).toBeGreaterThan(0);
    await screenshot("not-found");
  });

  it("signs in with the keyboard alone: skip link first, Tab between fields, Enter to send", async () => {
    const user = await app.createUser({ role: "reviewer", displayName: "Keyboard Kit" });
    const { page } = await open();
    await page.goto(`${app.baseUrl}/sign-in`);
    await page.getByRole("heading", { name: "Sign in" }).waitFor();
    await page.keyboard.press("Tab");
    const focused = () => page.evaluate(() => document.activeElement?.textContent ?? "");
    expect(await focused()).toBe("Skip to content");
    await page.getByLabel("E-mail").focus();
    await page.keyboard.type(user.email);
    await page.keyboard.press("Tab");
    expect(await page.evaluate(() => (document.activeElement as HTMLInputElement | null)?.type)).toBe(
      "password",
    );
    await page.keyboard.type(user.password);
    await page.keyboard.press("Enter");
    await header(page).getByText("Keyboard Kit").waitFor();
    expect(await header(page).textContent()).toContain("reviewer");
  });
});
