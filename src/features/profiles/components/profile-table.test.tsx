import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ApiError } from "@/lib/api-error";
import { machineFieldsSchema, viseFieldsSchema, type Machine, type Vise } from "@/shared/profiles";
import { machineFields, viseFields } from "../model/fields";
import { ProfileTable } from "./profile-table";

afterEach(() => cleanup());

// Invented demo sizes, not reference values.
const vises: Vise[] = [
  {
    id: 1,
    name: "Bench vise 100",
    jawWidthMm: 100,
    jawHeightMm: 32,
    jawThicknessMm: 12,
    maxOpeningMm: 100,
    createdAt: "2026-01-01T00:00:00.000Z",
    updatedAt: "2026-01-01T00:00:00.000Z",
  },
  {
    id: 2,
    name: "Angle vise",
    jawWidthMm: 75,
    jawHeightMm: 25,
    jawThicknessMm: 10,
    maxOpeningMm: 60,
    createdAt: "2026-01-01T00:00:00.000Z",
    updatedAt: "2026-01-01T00:00:00.000Z",
  },
];

function renderVises(overrides: Partial<Parameters<typeof ProfileTable>[0]> = {}) {
  const onCreate = vi.fn(async () => undefined);
  const onUpdate = vi.fn(async () => undefined);
  const onDelete = vi.fn(async () => undefined);
  render(
    <ProfileTable
      caption="Your vises"
      noun="vise"
      rows={vises}
      fields={viseFields}
      schema={viseFieldsSchema}
      onCreate={onCreate}
      onUpdate={onUpdate}
      onDelete={onDelete}
      empty={<p>No vises yet.</p>}
      {...overrides}
    />,
  );
  return { onCreate, onUpdate, onDelete };
}

const input = (label: RegExp) => screen.getByRole("textbox", { name: label });
const errorFor = (el: HTMLElement) => {
  const id = el.getAttribute("aria-describedby");
  return id ? document.getElementById(id)?.textContent : null;
};

describe("profile table inline edit", () => {
  it("refuses a bad size with the shared schema's message under that field, and sends nothing", async () => {
    const user = userEvent.setup();
    const { onUpdate } = renderVises();
    await user.click(screen.getByRole("button", { name: "Edit Bench vise 100" }));
    const width = input(/^Jaw width \(mm\) of Bench vise 100/);
    await user.clear(width);
    await user.type(width, "-3");
    const height = input(/^Jaw height \(mm\) of Bench vise 100/);
    await user.clear(height);
    await user.type(height, "tall");
    await user.click(screen.getByRole("button", { name: "Save" }));

    expect(width.getAttribute("aria-invalid")).toBe("true");
    // Messages from src/shared/profiles.ts, the same the server sends.
    expect(errorFor(width)).toContain("Jaw width must be more than 0 mm.");
    expect(errorFor(height)).toContain("Jaw height must be a number of millimetres.");
    expect(input(/^Jaw thickness/).getAttribute("aria-invalid")).toBeNull();
    expect(onUpdate).not.toHaveBeenCalled();
  });

  it("refuses a size above the limit and an empty name", async () => {
    const user = userEvent.setup();
    const { onUpdate } = renderVises();
    await user.click(screen.getByRole("button", { name: "Edit Angle vise" }));
    const name = input(/^Name of Angle vise/);
    await user.clear(name);
    const opening = input(/^Maximum opening/);
    await user.clear(opening);
    await user.type(opening, "2500");
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect(errorFor(name)).toContain("Name is required.");
    expect(errorFor(opening)).toContain("Maximum opening must be at most 2000 mm.");
    expect(onUpdate).not.toHaveBeenCalled();
  });

  it("sends only the changed fields once they are good, reading a decimal comma", async () => {
    const user = userEvent.setup();
    const { onUpdate } = renderVises();
    await user.click(screen.getByRole("button", { name: "Edit Bench vise 100" }));
    const thickness = input(/^Jaw thickness/);
    await user.clear(thickness);
    await user.type(thickness, "12,5{Enter}");
    expect(onUpdate).toHaveBeenCalledExactlyOnceWith(1, { jawThicknessMm: 12.5 });
    expect(await screen.findByText("Saved “Bench vise 100”.")).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Save" })).toBeNull();
  });

  it("puts the server's per-field refusal under the field and keeps the row open", async () => {
    const user = userEvent.setup();
    const onUpdate = vi.fn(async () => {
      throw new ApiError(400, "validation_error", "Some fields are not valid.", [
        { path: "jawWidthMm", message: "Jaw width must be at most 1000 mm." },
      ]);
    });
    renderVises({ onUpdate });
    await user.click(screen.getByRole("button", { name: "Edit Bench vise 100" }));
    const width = input(/^Jaw width/);
    await user.clear(width);
    await user.type(width, "999");
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect(await screen.findByText("Jaw width must be at most 1000 mm.")).toBeTruthy();
    expect(width.getAttribute("aria-invalid")).toBe("true");
    expect((width as HTMLInputElement).value).toBe("999");
  });

  it("says so when the row was deleted elsewhere (404)", async () => {
    const user = userEvent.setup();
    const onUpdate = vi.fn(async () => {
      throw new ApiError(404, "not_found", "You have no vise with id 1.");
    });
    renderVises({ onUpdate });
    await user.click(screen.getByRole("button", { name: "Edit Bench vise 100" }));
    await user.type(input(/^Name of/), " old");
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect((await screen.findByRole("alert")).textContent).toContain("This vise no longer exists");
  });

  it("Escape throws the edit away and shows the stored values again", async () => {
    const user = userEvent.setup();
    const { onUpdate } = renderVises();
    await user.click(screen.getByRole("button", { name: "Edit Bench vise 100" }));
    const width = input(/^Jaw width/);
    await user.clear(width);
    await user.type(width, "0{Escape}");
    expect(onUpdate).not.toHaveBeenCalled();
    const row = screen.getByText("Bench vise 100").closest("tr")!;
    expect(within(row).getAllByRole("cell")[1]?.textContent).toBe("100");
  });

  it("checks every field of a new row and adds it when all are good", async () => {
    const user = userEvent.setup();
    const { onCreate } = renderVises();
    await user.click(screen.getByRole("button", { name: "Add a vise" }));
    await user.click(screen.getByRole("button", { name: "Add" }));
    expect(screen.getAllByText(/must be a number of millimetres\./)).toHaveLength(4);
    expect(errorFor(input(/^Name of new vise/))).toContain("Name is required.");
    expect(onCreate).not.toHaveBeenCalled();

    await user.type(input(/^Name of new vise/), "Toolmaker's vise");
    await user.type(input(/^Jaw width \(mm\) of new vise/), "50");
    await user.type(input(/^Jaw height \(mm\) of new vise/), "20");
    await user.type(input(/^Jaw thickness \(mm\) of new vise/), "8");
    await user.type(input(/^Maximum opening \(mm\) of new vise/), "45");
    await user.click(screen.getByRole("button", { name: "Add" }));
    expect(onCreate).toHaveBeenCalledExactlyOnceWith({
      name: "Toolmaker's vise",
      jawWidthMm: 50,
      jawHeightMm: 20,
      jawThicknessMm: 8,
      maxOpeningMm: 45,
    });
  });

  it("refuses a fractional spindle speed on a machine row", async () => {
    const user = userEvent.setup();
    const machines: Machine[] = [
      {
        id: 7,
        name: "Bench mill",
        maxSpindleRpm: 3000,
        units: "mm",
        createdAt: "2026-01-01T00:00:00.000Z",
        updatedAt: "2026-01-01T00:00:00.000Z",
      },
    ];
    const onUpdate = vi.fn(async () => undefined);
    render(
      <ProfileTable
        caption="Your machines"
        noun="machine"
        rows={machines}
        fields={machineFields}
        schema={machineFieldsSchema}
        onCreate={vi.fn()}
        onUpdate={onUpdate}
        onDelete={vi.fn()}
        empty={null}
      />,
    );
    await user.click(screen.getByRole("button", { name: "Edit Bench mill" }));
    const speed = input(/^Maximum spindle speed \(rpm\)/);
    await user.clear(speed);
    await user.type(speed, "2500.5");
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect(errorFor(speed)).toContain("Maximum spindle speed must be a whole number of rpm.");
    await user.selectOptions(screen.getByRole("combobox", { name: /^Works in of Bench mill/ }), "in");
    await user.clear(speed);
    await user.type(speed, "2500");
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect(onUpdate).toHaveBeenCalledExactlyOnceWith(7, { maxSpindleRpm: 2500, units: "in" });
  });
});

describe("profile table", () => {
  it("sorts by name, then by a number column when its header is pressed", async () => {
    const user = userEvent.setup();
    renderVises();
    const names = () =>
      screen
        .getAllByRole("row")
        .slice(1)
        .map((r) => within(r).getAllByRole("cell")[0]?.textContent);
    expect(names()).toEqual(["Angle vise", "Bench vise 100"]);
    await user.click(screen.getByRole("button", { name: /Jaw width \(mm\)/ }));
    expect(names()).toEqual(["Angle vise", "Bench vise 100"]);
    await user.click(screen.getByRole("button", { name: /Jaw width \(mm\)/ }));
    expect(names()).toEqual(["Bench vise 100", "Angle vise"]);
    expect(screen.getByRole("columnheader", { name: /Jaw width/ }).getAttribute("aria-sort")).toBe(
      "descending",
    );
  });

  it("deletes only after confirming, and Keep leaves the row alone", async () => {
    const user = userEvent.setup();
    const { onDelete } = renderVises();
    await user.click(screen.getByRole("button", { name: "Delete Angle vise" }));
    await user.click(screen.getByRole("button", { name: "Keep" }));
    expect(onDelete).not.toHaveBeenCalled();
    await user.click(screen.getByRole("button", { name: "Delete Angle vise" }));
    const confirm = screen.getByRole("group", { name: "Confirm deleting Angle vise" });
    await user.click(within(confirm).getByRole("button", { name: "Delete" }));
    expect(onDelete).toHaveBeenCalledExactlyOnceWith(2);
    expect(await screen.findByText("Deleted “Angle vise”.")).toBeTruthy();
  });

  it("shows the empty state when there are no rows", () => {
    renderVises({ rows: [] });
    expect(screen.getByText("No vises yet.")).toBeTruthy();
    expect(screen.queryByRole("table")).toBeNull();
  });
});
