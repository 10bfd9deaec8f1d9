import { cleanup, render, screen } from "@testing-library/react";
import { createMemoryRouter, RouterProvider } from "react-router";
import { afterEach, describe, expect, it, vi } from "vitest";
import { RouteError } from "./route-error";

function Broken(): never {
  throw new Error("Cannot read the template's parameters");
}

afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

describe("route error page", () => {
  it("says the page stopped working, shows the reason and offers a way on", async () => {
    vi.spyOn(console, "error").mockImplementation(() => {}); // React logs the caught error
    const router = createMemoryRouter([{ path: "/", Component: Broken, ErrorBoundary: RouteError }]);
    render(<RouterProvider router={router} />);
    expect(await screen.findByRole("heading", { name: "This page stopped working" })).toBeTruthy();
    expect(screen.getByText("Cannot read the template's parameters")).toBeTruthy();
    expect(screen.getByRole("link", { name: "Go to the home page" }).getAttribute("href")).toBe("/");
  });

  it("turns a 404 thrown by a loader into the not-found page", async () => {
    const router = createMemoryRouter(
      [
        {
          path: "/templates/:id",
          loader: () => {
            throw new Response("", { status: 404 });
          },
          Component: () => null,
          ErrorBoundary: RouteError,
        },
      ],
      { initialEntries: ["/templates/no-such-stop"] },
    );
    render(<RouterProvider router={router} />);
    expect(await screen.findByRole("heading", { name: "Nothing at this address" })).toBeTruthy();
    expect(screen.getByText("/templates/no-such-stop")).toBeTruthy();
  });
});
