import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import { MemoryRouter } from "react-router";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { DesignUpgrade } from "@/shared/design-upgrade";
import {
  designOnOldVersion,
  inRangeCheckChanges,
  outOfRangeDecisions,
  padThicknessDropped,
  screwDepthAdded,
  stopHeightDefaultMoved,
} from "../test/upgrade-fixtures";
import { UpgradePanel } from "./upgrade-panel";

/** The server's answers for our test template (checked against the server in tests/api/design-upgrade.test.ts). */
const report: DesignUpgrade = {
  designId: 5,
  templateId: "test-step-stop",
  templateName: "Test step stop",
  from: { version: "1.0.0", available: true },
  to: { version: "2.0.0" },
  units: "mm",
  parameters: [
    outOfRangeDecisions[0]!,
    stopHeightDefaultMoved,
    outOfRangeDecisions[1]!,
    screwDepthAdded,
    padThicknessDropped,
  ],
  checks: {
    compared: true,
    evaluatedOnNew: true,
    note: null,
    failingErrorsOnNew: 1,
    changes: inRangeCheckChanges,
  },
  carried: { jawWidth: 160, stopHeight: 20, screw: "M6", metal: "brass", breakEdges: true },
};
const design = designOnOldVersion;

function serve(body: DesignUpgrade) {
  const fetchMock = vi.fn(
    async (_url: string, _init?: RequestInit) =>
      new Response(JSON.stringify({ upgrade: body }), { headers: { "content-type": "application/json" } }),
  );
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

function renderPanel() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter>
        <UpgradePanel design={design} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("what changes on the new version", () => {
  it("lists the values that need a decision apart from the other differences, in words with units", async () => {
    const fetchMock = serve(report);
    renderPanel();
    const summary = await screen.findByTestId("upgrade-summary");
    expect(summary.textContent).toBe(
      "2 saved values need your decision on version 2.0.0. 1 error check fails on version 2.0.0.",
    );
    const decide = screen.getByRole("heading", { name: "Needs your decision" }).parentElement!;
    expect(
      within(decide)
        .getAllByRole("listitem")
        .map((li) => li.textContent),
    ).toEqual([
      "Your jaw width of 160 mm is outside version 2.0.0's limits (40 mm to 150 mm). It is carried over unchanged and marked in the configurator: change it there, or keep the design on version 1.0.0.",
      "Screw: M5 is no longer offered (version 2.0.0 offers M6 and M8). The configurator starts on M6; pick the one you want.",
    ]);
    const others = screen.getByRole("heading", { name: "Other changes" }).parentElement!;
    expect(
      within(others)
        .getAllByRole("listitem")
        .map((li) => li.textContent),
    ).toEqual([
      "Stop height: the default moved from 20 mm to 24 mm; your design keeps its own value.",
      "New in version 2.0.0: Screw depth. It starts at its default, 10 mm.",
      "Dropped: version 2.0.0 no longer asks for Pad thickness, so your 3 mm is left out.",
    ]);
    // Asking is a GET: nothing is sent that would change the design.
    expect(fetchMock.mock.calls.map(([url, init]) => [url, init?.method ?? "GET"])).toEqual([
      ["/api/designs/5/upgrade?units=mm", "GET"],
    ]);
  });

  it("says which checks now fail and which now pass, with the new version's message", async () => {
    serve(report);
    renderPanel();
    const fails = (await screen.findByText("Error: passed on your version, fails on 2.0.0")).closest("li")!;
    expect(fails.getAttribute("data-shift")).toBe("now-fails");
    expect(fails.textContent).toContain("The stop stands only 20 mm tall; make it at least 22 mm.");
    const passes = screen.getByText("Warning: failed on your version, passes on 2.0.0").closest("li")!;
    expect(passes.textContent).toContain("A 130 mm jaw suits this stop.");
  });

  it("opens the configurator on the new version with the carried values and the design to save back to", async () => {
    serve(report);
    renderPanel();
    const open = await screen.findByRole("link", { name: "Open on version 2.0.0" });
    const href = new URL(open.getAttribute("href")!, "http://x");
    expect(href.pathname).toBe("/templates/test-step-stop");
    expect(Object.fromEntries(href.searchParams)).toEqual({
      units: "mm",
      jawWidth: "160",
      stopHeight: "20",
      screw: "M6",
      metal: "brass",
      breakEdges: "true",
      "saved-design": "5",
    });
    expect(
      screen.getByText(/Your saved design stays on version 1\.0\.0, unchanged, until you save it there/),
    ).toBeTruthy();
  });

  it("says plainly when the pinned version is no longer held and the checks could not be compared", async () => {
    const note =
      "Version 1.0.0 is no longer held on this server, so its limits, defaults and check results cannot be set beside version 2.0.0's.";
    serve({
      ...report,
      from: { version: "1.0.0", available: false },
      parameters: [screwDepthAdded],
      checks: {
        compared: false,
        evaluatedOnNew: true,
        note,
        failingErrorsOnNew: 1,
        changes: [{ ...report.checks.changes[0]!, before: null }],
      },
    });
    renderPanel();
    expect(await screen.findByText(note)).toBeTruthy();
    expect(screen.getByText("Error: fails on 2.0.0")).toBeTruthy();
    expect(
      screen.getByText(
        "Screw depth is not among your saved values: it starts at version 2.0.0's default, 10 mm.",
      ),
    ).toBeTruthy();
  });
});
