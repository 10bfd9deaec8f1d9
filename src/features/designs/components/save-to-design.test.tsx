import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MemoryRouter } from "react-router";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { resetCsrfToken } from "@/lib/api-client";
import type { Design } from "@/shared/designs";
import { designOnOldVersion } from "../test/upgrade-fixtures";
import { SaveToDesign } from "./save-to-design";

/** A design on our own test template's 1.0.0 (round test numbers; tests/fixtures/templates). */
const design: Design = designOnOldVersion;
const shown = { jawWidth: 150, screw: "M6" };

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

function server() {
  let current = design;
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    if (url === "/api/auth/csrf") return json({ csrfToken: "t" });
    if (init?.method === "PATCH") {
      current = { ...current, parameters: shown, templateVersion: "2.0.0", newerVersion: null };
      return json({ design: current });
    }
    return json({ design: current });
  });
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

function renderIt(parameters: Record<string, number | string> | null = shown) {
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter>
        <SaveToDesign
          designId={5}
          templateId="test-step-stop"
          templateVersion="2.0.0"
          parameters={parameters}
          units="mm"
          designsHref="/designs"
        />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

beforeEach(() => resetCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("saving back onto the design the configurator was opened from", () => {
  it("leaves the design alone until asked, then saves the values shown onto the new version", async () => {
    const fetchMock = server();
    renderIt();
    const save = await screen.findByRole("button", {
      name: "Save “Stop for the 160 mm vise” on version 2.0.0",
    });
    expect(screen.getByText(/Saved on version 1\.0\.0; you are looking at version 2\.0\.0/)).toBeTruthy();
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === "PATCH")).toBe(false);

    await userEvent.click(save);
    expect(await screen.findByText("Saved “Stop for the 160 mm vise”")).toBeTruthy();
    const patch = fetchMock.mock.calls.find(([, init]) => init?.method === "PATCH")!;
    expect(patch[0]).toBe("/api/designs/5");
    expect(JSON.parse(String(patch[1]!.body))).toEqual({
      parameters: shown,
      units: "mm",
      useCurrentTemplateVersion: true,
    });
    expect(screen.getByText(/It is pinned to version 2\.0\.0 of the template/)).toBeTruthy();
  });

  it("cannot save while a field has a problem", async () => {
    server();
    renderIt(null);
    const save = await screen.findByRole("button", { name: /^Save “Stop for the 160 mm vise”/ });
    expect((save as HTMLButtonElement).disabled).toBe(true);
    expect(screen.getByText("Fix the marked fields to save.")).toBeTruthy();
  });
});
