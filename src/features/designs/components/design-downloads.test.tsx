import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { Design } from "@/shared/designs";
import { DesignDownloads } from "./design-downloads";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const design: Design = {
  id: 5,
  name: "Stop for the 100 mm vise",
  notes: "",
  templateId: "cam-vise-stop",
  templateVersion: "1.0.0",
  templateName: "Cam-lock vise stop",
  newerVersion: null,
  parameters: { jawWidth: 100 },
  units: "mm",
  share: null,
  createdAt: "2026-01-01T00:00:00.000Z",
  updatedAt: "2026-01-01T00:00:00.000Z",
};
const machines = [{ id: 7, name: "Bench mill", maxSpindleRpm: 3000 }];

describe("design downloads", () => {
  it("asks for the file with the chosen machine and hands it to the browser", async () => {
    const user = userEvent.setup();
    const fetchMock = vi.fn(
      async () =>
        new Response("Part,Name\n", {
          status: 200,
          headers: {
            "content-type": "text/csv",
            "content-disposition": 'attachment; filename="cam-vise-stop-v1.0.0-cut-list.csv"',
          },
        }),
    );
    vi.stubGlobal("fetch", fetchMock);
    URL.createObjectURL = vi.fn(() => "blob:x");
    URL.revokeObjectURL = vi.fn();
    render(<DesignDownloads design={design} machines={machines} />);
    await user.selectOptions(screen.getByLabelText("Operation sheet for"), "7");
    await user.click(screen.getByRole("button", { name: "Cut list (CSV)" }));
    expect(await screen.findByText("Downloaded cam-vise-stop-v1.0.0-cut-list.csv.")).toBeTruthy();
    expect(fetchMock).toHaveBeenCalledWith(
      "/api/designs/5/export?format=csv&machine=7",
      expect.objectContaining({ credentials: "same-origin" }),
    );
  });

  it("shows the server's refusal in its own words", async () => {
    const user = userEvent.setup();
    vi.stubGlobal(
      "fetch",
      vi.fn(
        async () =>
          new Response(
            JSON.stringify({
              error: {
                code: "service_unavailable",
                message: "The solid modeller is not running on this server.",
                details: [],
              },
            }),
            {
              status: 503,
              headers: { "content-type": "application/json" },
            },
          ),
      ),
    );
    render(<DesignDownloads design={design} machines={[]} />);
    expect(screen.queryByLabelText("Operation sheet for")).toBeNull();
    await user.click(screen.getByRole("button", { name: "Drawing pack (PDF)" }));
    expect((await screen.findByRole("alert")).textContent).toContain(
      "The solid modeller is not running on this server.",
    );
  });

  it("offers no files for a design pinned to an older version, and says what to do", () => {
    render(<DesignDownloads design={{ ...design, newerVersion: "1.1.0" }} machines={machines} />);
    expect(screen.queryByRole("button")).toBeNull();
    expect(screen.getByText(/see what changes in version 1\.1\.0/)).toBeTruthy();
  });
});
