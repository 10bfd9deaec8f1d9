import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { createMemoryRouter, RouterProvider } from "react-router";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CataloguePage } from "./catalogue-page";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const reply = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

function renderCatalogue(answer: () => Response | Promise<Response>, url = "/templates") {
  vi.stubGlobal(
    "fetch",
    vi.fn(async () => answer()),
  );
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const element = (
    <CataloguePage
      renderPicture={(t) => <div data-testid={`picture-${t.id}`} />}
      templateHref={(id) => `/templates/${id}`}
      camCheckHref="/cam-check"
    />
  );
  const router = createMemoryRouter([{ path: "/templates", element }], { initialEntries: [url] });
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return router;
}

// Invented entries.
const templates = [
  {
    id: "cam-vise-stop",
    version: "1.0.0",
    name: "Cam-lock vise stop",
    family: "stop",
    summary: "Hooks over the fixed jaw.",
  },
  { id: "toe-clamp", version: "1.0.0", name: "Toe clamp", family: "clamp", summary: "For the T-slots." },
];

describe("catalogue page", () => {
  it("shows each template as a card with its picture, family, summary and a link to its configurator", async () => {
    renderCatalogue(() => reply(200, { templates }));
    const cards = await screen.findByRole("list", { name: "Templates" });
    const first = within(cards).getAllByRole("listitem")[0]!;
    expect(within(first).getByRole("link", { name: "Cam-lock vise stop" }).getAttribute("href")).toBe(
      "/templates/cam-vise-stop",
    );
    expect(within(first).getByText("Stops")).toBeTruthy();
    expect(within(first).getByText("Hooks over the fixed jaw.")).toBeTruthy();
    expect(within(first).getByTestId("picture-cam-vise-stop")).toBeTruthy();
  });

  it("filters by family and by words, keeps both in the address, and says when nothing matches", async () => {
    const router = renderCatalogue(() => reply(200, { templates }));
    await screen.findByRole("list", { name: "Templates" });
    await userEvent.click(screen.getByRole("radio", { name: /Clamps/ }));
    expect(within(screen.getByRole("list", { name: "Templates" })).getAllByRole("listitem")).toHaveLength(1);
    expect(router.state.location.search).toBe("?family=clamp");
    await userEvent.type(screen.getByLabelText("Search templates"), "vise");
    expect(await screen.findByRole("heading", { name: "Nothing matches" })).toBeTruthy();
    await userEvent.click(screen.getByRole("button", { name: "Show all templates" }));
    expect(within(screen.getByRole("list", { name: "Templates" })).getAllByRole("listitem")).toHaveLength(2);
  });

  it("says so when no template is published yet", async () => {
    renderCatalogue(() => reply(200, { templates: [] }));
    expect(await screen.findByRole("heading", { name: "No templates are published yet" })).toBeTruthy();
  });

  it("shows the server's message and a retry when the list cannot be loaded", async () => {
    renderCatalogue(() =>
      reply(503, {
        error: { code: "service_unavailable", message: "The database is not answering.", details: [] },
      }),
    );
    expect(await screen.findByText("The database is not answering.")).toBeTruthy();
    expect(screen.getByRole("button", { name: "Try again" })).toBeTruthy();
  });
});
