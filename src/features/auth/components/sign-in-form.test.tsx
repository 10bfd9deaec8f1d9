import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MemoryRouter } from "react-router";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { resetCsrfToken } from "@/lib/api-client";
import { SignInForm } from "./sign-in-form";

function renderForm(onSignedIn = vi.fn()) {
  // A fresh client per test, no retries (TanStack Query testing guide).
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter>
        <SignInForm onSignedIn={onSignedIn} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return onSignedIn;
}

const reply = (status: number, body: unknown, headers: Record<string, string> = {}) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json", ...headers } });

/** Answers the CSRF request, then `login` for the sign-in POST. */
function serverAnswers(login: () => Response) {
  const fetchMock = vi.fn(async (url: string) =>
    url === "/api/auth/csrf" ? reply(200, { csrfToken: "t" }) : login(),
  );
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

beforeEach(() => resetCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("sign-in form", () => {
  it("shows a message under each empty field and sends nothing", async () => {
    const fetchMock = serverAnswers(() => reply(500, {}));
    renderForm();
    await userEvent.click(screen.getByRole("button", { name: "Sign in" }));
    // Messages come from the shared schema in src/shared/auth.ts.
    expect(await screen.findByText("Enter a valid e-mail address, like name@example.org.")).toBeTruthy();
    expect(screen.getByText("Password is required.")).toBeTruthy();
    expect(screen.getByLabelText("E-mail").getAttribute("aria-invalid")).toBe("true");
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("rejects a malformed e-mail address but accepts the password", async () => {
    serverAnswers(() => reply(500, {}));
    renderForm();
    await userEvent.type(screen.getByLabelText("E-mail"), "turner.at.workshop");
    await userEvent.type(screen.getByLabelText("Password"), "long enough secret");
    await userEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByText("Enter a valid e-mail address, like name@example.org.")).toBeTruthy();
    expect(screen.queryByText("Password is required.")).toBeNull();
  });

  it("says plainly when the e-mail and password do not match, without naming which", async () => {
    serverAnswers(() =>
      reply(401, {
        error: {
          code: "invalid_credentials",
          message: "That e-mail and password do not match an account.",
          details: [{ path: "", message: "Check the e-mail (a@b.org) and the password, then try again." }],
        },
      }),
    );
    const onSignedIn = renderForm();
    await userEvent.type(screen.getByLabelText("E-mail"), "a@b.org");
    await userEvent.type(screen.getByLabelText("Password"), "wrong password");
    await userEvent.click(screen.getByRole("button", { name: "Sign in" }));
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toContain("That e-mail and password do not match an account.");
    expect(alert.textContent).toContain("Check the e-mail (a@b.org) and the password");
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it("explains rate limiting with the wait from Retry-After", async () => {
    serverAnswers(() =>
      reply(
        429,
        { error: { code: "rate_limited", message: "Too many attempts.", details: [] } },
        { "retry-after": "600" },
      ),
    );
    renderForm();
    await userEvent.type(screen.getByLabelText("E-mail"), "a@b.org");
    await userEvent.type(screen.getByLabelText("Password"), "whatever it is");
    await userEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect((await screen.findByRole("alert")).textContent).toContain("try again in about 10 minutes");
  });

  it("puts the server's field errors on the fields", async () => {
    serverAnswers(() =>
      reply(400, {
        error: {
          code: "validation_error",
          message: "Check the fields.",
          details: [{ path: "email", message: "This address is not accepted here." }],
        },
      }),
    );
    renderForm();
    await userEvent.type(screen.getByLabelText("E-mail"), "a@b.org");
    await userEvent.type(screen.getByLabelText("Password"), "some password");
    await userEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByText("This address is not accepted here.")).toBeTruthy();
    expect(screen.getByLabelText("E-mail").getAttribute("aria-invalid")).toBe("true");
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("hands the signed-in user on, after sending the CSRF header", async () => {
    const user = {
      id: 7,
      email: "a@b.org",
      displayName: "Ada",
      role: "machinist",
      createdAt: "2026-01-01T00:00:00.000Z",
    };
    const fetchMock = serverAnswers(() => reply(200, { user }));
    const onSignedIn = renderForm();
    await userEvent.type(screen.getByLabelText("E-mail"), "  A@B.org ");
    await userEvent.type(screen.getByLabelText("Password"), "right password");
    await userEvent.click(screen.getByRole("button", { name: "Sign in" }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(user));
    const loginCall = fetchMock.mock.calls.find(([url]) => url === "/api/auth/login") as unknown as [
      string,
      RequestInit,
    ];
    expect((loginCall[1].headers as Record<string, string>)["x-csrf-token"]).toBe("t");
    // The shared schema trims and lower-cases the address before it is sent.
    expect(JSON.parse(loginCall[1].body as string)).toEqual({ email: "a@b.org", password: "right password" });
  });
});
