import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { act, cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useEffect, useState } from "react";
import { createMemoryRouter, Link, RouterProvider, useSearchParams } from "react-router";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { Page } from "@/components/layouts/page";
import { RootLayout } from "./root-layout";

/** A page whose heading arrives after its data, as the configurator's does. */
function LatePage() {
  const [ready, setReady] = useState(false);
  useEffect(() => {
    window.addEventListener("data-arrived", () => setReady(true), { once: true });
  }, []);
  useEffect(() => {
    if (ready) document.title = "Late page · Jigwright";
  }, [ready]);
  return ready ? <h1>Late page</h1> : <p>Loading the template</p>;
}

function FirstPage() {
  const [, setParams] = useSearchParams();
  return (
    <Page title="First page">
      <Link to="/second">Go to the second page</Link>
      <Link to="/late">Go to the late page</Link>
      <button type="button" onClick={() => setParams({ diameter: "24" })}>
        Change the query
      </button>
    </Page>
  );
}

function renderApp() {
  const router = createMemoryRouter(
    [
      {
        Component: RootLayout,
        children: [
          { path: "/", Component: FirstPage },
          { path: "/second", Component: () => <Page title="Second page">Body of the second page.</Page> },
          { path: "/late", Component: LatePage },
        ],
      },
    ],
    { initialEntries: ["/"] },
  );
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return router;
}

beforeEach(() => {
  // The shell asks who is signed in: a guest.
  vi.stubGlobal(
    "fetch",
    vi.fn(
      async () =>
        new Response(JSON.stringify({ user: null }), { headers: { "content-type": "application/json" } }),
    ),
  );
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("focus on navigation", () => {
  it("leaves the first page alone, then moves focus to the new page's heading and announces its title", async () => {
    renderApp();
    await screen.findByRole("heading", { name: "First page", level: 1 });
    // On arrival the browser keeps the focus (nothing is announced yet).
    expect(document.activeElement).toBe(document.body);
    expect(screen.getByTestId("route-announcer").textContent).toBe("");

    await userEvent.click(screen.getByRole("link", { name: "Go to the second page" }));
    const heading = await screen.findByRole("heading", { name: "Second page", level: 1 });
    await waitFor(() => expect(document.activeElement).toBe(heading));
    // Focusable by script only: no new tab stop.
    expect(heading.getAttribute("tabindex")).toBe("-1");
    expect(document.title).toBe("Second page · Jigwright");
    expect(screen.getByRole("status").textContent).toBe("Second page · Jigwright");
  });

  it("does not take the focus away when only the query changes (typing in a form)", async () => {
    const router = renderApp();
    const button = await screen.findByRole("button", { name: "Change the query" });
    await userEvent.click(button);
    await waitFor(() => expect(router.state.location.search).toBe("?diameter=24"));
    expect(document.activeElement).toBe(button);
  });

  it("focuses the main landmark until a late heading arrives, then the heading, and announces the late title", async () => {
    renderApp();
    await userEvent.click(await screen.findByRole("link", { name: "Go to the late page" }));
    await screen.findByText("Loading the template");
    const main = screen.getByRole("main");
    await waitFor(() => expect(document.activeElement).toBe(main));

    act(() => {
      window.dispatchEvent(new Event("data-arrived"));
    });
    const heading = await screen.findByRole("heading", { name: "Late page", level: 1 });
    await waitFor(() => expect(document.activeElement).toBe(heading));
    await waitFor(() => expect(screen.getByRole("status").textContent).toBe("Late page · Jigwright"));
  });
});
