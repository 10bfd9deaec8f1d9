import { cleanup, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { resetCsrfToken } from "@/lib/api-client";
import type { EvaluationView } from "../api/evaluate";
import { fakeServer, renderAt, reply, type RecordedCall } from "../test/render";
import { fixtureEvaluation, fixtureTemplate } from "../test/fixture-template";
import { ConfiguratorPage } from "./configurator-page";

beforeEach(() => resetCsrfToken());
afterEach(() => cleanup());

const links = { catalogue: "/templates", signIn: "/sign-in", vises: "/workshop" };

function page(signedIn = false) {
  return (
    <ConfiguratorPage
      templateId="test-stop"
      signedIn={signedIn}
      renderViewer={() => <p>preview here</p>}
      links={links}
    />
  );
}

/** The server: the fixture template, and an evaluation built by `evaluate` from the request. */
function serve(
  evaluate: (body: { parameters: Record<string, unknown>; units: string }) => EvaluationView,
  extra?: (call: RecordedCall) => Response | null,
) {
  return fakeServer((call) => {
    const more = extra?.(call);
    if (more) return more;
    if (call.url === "/api/templates/test-stop") return reply(200, { template: fixtureTemplate });
    if (call.url === "/api/templates/test-stop/evaluate")
      return reply(200, evaluate(call.body as { parameters: Record<string, unknown>; units: string }));
    return reply(404, { error: { code: "not_found", message: `no ${call.url}`, details: [] } });
  });
}

const evaluations = (calls: RecordedCall[]) =>
  calls
    .filter((c) => c.url.endsWith("/evaluate"))
    .map((c) => c.body as { parameters: Record<string, unknown>; units: string });

describe("configurator: mm/inch switch", () => {
  it("converts lengths in place exactly, sends exact values, and comes back to the same millimetres", async () => {
    const calls = serve((body) => fixtureEvaluation({ units: body.units as "mm" | "in" }));
    renderAt(page());
    const width = (await screen.findByLabelText(/Jaw width/)) as HTMLInputElement;
    const thickness = screen.getByLabelText(/Jaw thickness/) as HTMLInputElement;
    expect(width.value).toBe("100");
    await waitFor(() => expect(evaluations(calls)).toHaveLength(1));
    expect(evaluations(calls)[0]).toMatchObject({
      units: "mm",
      parameters: { jawWidth: 100, jawThickness: 25.4 },
    });

    await userEvent.click(screen.getByRole("radio", { name: /inch/ }));
    // 1 in = 25.4 mm exactly (international yard and pound agreement, 1959; NIST SP 811 App. B).
    expect(thickness.value).toBe("1");
    expect(width.value).toBe("3.93701");
    expect(screen.getByLabelText(/Jaw width/).parentElement!.textContent).toBe("in");
    await waitFor(() => expect(evaluations(calls)).toHaveLength(2));
    const inch = evaluations(calls)[1]!;
    expect(inch.units).toBe("in");
    // 100 / 25.4 = 3.937007874015748…, not the 5 decimals on screen.
    expect(inch.parameters.jawWidth).not.toBe(3.93701);
    expect(Math.abs((inch.parameters.jawWidth as number) - 100 / 25.4)).toBeLessThan(1e-11);
    expect(inch.parameters.jawThickness).toBe(1);
    expect(inch.parameters.handForce).toBe(100);

    await userEvent.click(screen.getByRole("radio", { name: /mm/ }));
    expect(width.value).toBe("100");
    expect(thickness.value).toBe("25.4");
  });

  it("re-checks limits in the new units: 10 in is over the 250 mm limit and says so in inches", async () => {
    serve((body) => fixtureEvaluation({ units: body.units as "mm" | "in" }));
    renderAt(page());
    await userEvent.click(await screen.findByRole("radio", { name: /inch/ }));
    const width = screen.getByLabelText(/Jaw width/);
    await userEvent.clear(width);
    await userEvent.type(width, "10");
    expect(
      await screen.findByText("Jaw width must be at most 9.8425 in (allowed 0.7874–9.8425 in)."),
    ).toBeTruthy();
    expect(screen.getByTestId("evaluation-status").dataset.status).toBe("input-problem");
  });

  it("starts from the units and values in the address", async () => {
    const calls = serve((body) => fixtureEvaluation({ units: body.units as "mm" | "in" }));
    renderAt(page(), "/templates/test-stop?units=in&jawWidth=127");
    expect(((await screen.findByLabelText(/Jaw width/)) as HTMLInputElement).value).toBe("5");
    await waitFor(() =>
      expect(evaluations(calls)[0]).toMatchObject({ units: "in", parameters: { jawWidth: 5 } }),
    );
  });
});

describe("configurator: the address holds the configuration", () => {
  it("writes changed values in the template's units, so a bookmark reopens the same configuration", async () => {
    serve((body) => fixtureEvaluation({ units: body.units as "mm" | "in" }));
    const { router } = renderAt(page());
    await userEvent.click(await screen.findByRole("radio", { name: /inch/ }));
    const width = screen.getByLabelText(/Jaw width/);
    await userEvent.clear(width);
    await userEvent.type(width, "4");
    // 4 in = 101.6 mm exactly; the address keeps millimetres whatever the screen shows.
    await waitFor(() => expect(router.state.location.search).toBe("?units=in&jawWidth=101.6"));
  });
});

describe("configurator: check results", () => {
  const checks: EvaluationView["checks"] = [
    {
      id: "rod-wall",
      severity: "warning",
      passed: false,
      message: "Only 1.2 mm of wall around the rod hole.",
      parameters: ["jawThickness"],
    },
    {
      id: "slot-range",
      severity: "error",
      passed: true,
      message: "The slot covers the jaw.",
      parameters: ["jawThickness"],
    },
    {
      id: "self-lock",
      severity: "error",
      passed: false,
      message: "The cam does not lock.",
      parameters: ["handForce", "friction", "notInTheForm"],
    },
    {
      id: "lever-note",
      severity: "note",
      passed: false,
      message: "The lever points down when locked.",
      parameters: [],
    },
  ];

  it("lists failing errors first, then warnings and notes, with what passes folded below", async () => {
    serve(() => fixtureEvaluation({ checks, ok: false }));
    renderAt(page());
    const failing = await screen.findByRole("list", { name: "Checks that fail" });
    const items = within(failing).getAllByRole("listitem");
    expect(items.map((li) => li.dataset.severity)).toEqual(["error", "warning", "note"]);
    expect(items[0]!.textContent).toContain("The cam does not lock.");
    expect(screen.getByTestId("checks-summary").textContent).toBe(
      "1 error, 1 warning, 1 note to look at; 1 pass.",
    );
    expect(
      within(screen.getByRole("list", { name: "Checks that pass" })).getByText("The slot covers the jaw."),
    ).toBeTruthy();
  });

  it("links each check to the fields it concerns: the button focuses the field", async () => {
    serve(() => fixtureEvaluation({ checks, ok: false }));
    renderAt(page());
    const failing = await screen.findByRole("list", { name: "Checks that fail" });
    const camCheck = within(failing).getAllByRole("listitem")[0]!;
    // Only parameters the form has are linked.
    expect(
      within(camCheck)
        .getAllByRole("button")
        .map((b) => b.textContent),
    ).toEqual(["Hand force", "Friction coefficient"]);
    await userEvent.click(within(camCheck).getByRole("button", { name: "Friction coefficient" }));
    expect(document.activeElement).toBe(screen.getByLabelText(/Friction coefficient/));
    const wallCheck = within(failing).getAllByRole("listitem")[1]!;
    await userEvent.click(within(wallCheck).getByRole("button", { name: "Jaw thickness" }));
    expect(document.activeElement).toBe(screen.getByLabelText(/Jaw thickness/));
  });

  it("keeps the last result on screen while the next one is worked out", async () => {
    let release: (() => void) | null = null;
    let count = 0;
    fakeServer(async (call) => {
      if (call.url === "/api/templates/test-stop") return reply(200, { template: fixtureTemplate });
      count += 1;
      if (count === 1) return reply(200, fixtureEvaluation({ checks: [checks[2]!] }));
      await new Promise<void>((resolve) => (release = resolve));
      return reply(
        200,
        fixtureEvaluation({ checks: [{ ...checks[2]!, passed: true, message: "The cam locks." }] }),
      );
    });
    renderAt(page());
    expect(await screen.findByText("The cam does not lock.")).toBeTruthy();
    const width = screen.getByLabelText(/Jaw width/);
    await userEvent.clear(width);
    await userEvent.type(width, "120");
    await waitFor(() => expect(screen.getByTestId("evaluation-status").dataset.status).toBe("updating"));
    // While the request is out, the previous checks stay: no empty panel.
    expect(screen.getByText("The cam does not lock.")).toBeTruthy();
    await waitFor(() => expect(release).not.toBeNull());
    release!();
    expect(await screen.findByText("The cam locks.")).toBeTruthy();
  });

  it("puts a server refusal that names a parameter on that field", async () => {
    fakeServer((call) => {
      if (call.url === "/api/templates/test-stop") return reply(200, { template: fixtureTemplate });
      return reply(400, {
        error: {
          code: "validation_error",
          message: "1 parameter is not acceptable",
          details: [{ path: "parameters.leverAngle", message: "leverAngle is out of its range." }],
        },
      });
    });
    renderAt(page());
    expect(await screen.findByText("leverAngle is out of its range.")).toBeTruthy();
    expect(screen.getByLabelText(/Lever angle/).getAttribute("aria-invalid")).toBe("true");
  });
});

describe("configurator: fill from my vise", () => {
  it("fills jaw width and thickness from the chosen vise in one step, exactly, in inches too", async () => {
    const calls = serve(
      (body) => fixtureEvaluation({ units: body.units as "mm" | "in" }),
      (call) =>
        call.url === "/api/vises"
          ? reply(200, {
              vises: [
                // Invented demo sizes.
                {
                  id: 7,
                  name: "Club mill vise",
                  jawWidthMm: 125,
                  jawHeightMm: 40,
                  jawThicknessMm: 22,
                  maxOpeningMm: 150,
                  createdAt: "2026-01-01T00:00:00Z",
                  updatedAt: "2026-01-01T00:00:00Z",
                },
              ],
            })
          : null,
    );
    renderAt(page(true));
    await userEvent.click(await screen.findByRole("radio", { name: /inch/ }));
    const select = await screen.findByLabelText("Fill from my vise");
    await userEvent.selectOptions(select, "7");
    expect((screen.getByLabelText(/Jaw width/) as HTMLInputElement).value).toBe("4.92126");
    expect((screen.getByLabelText(/Jaw thickness/) as HTMLInputElement).value).toBe("0.86614");
    expect(screen.getByText("Filled jaw width, jaw thickness from “Club mill vise”.")).toBeTruthy();
    // 125 mm / 25.4 = 4.921259842519685… in, exactly as the profile's millimetres, not the rounded text.
    await waitFor(() =>
      expect(Math.abs((evaluations(calls).at(-1)!.parameters.jawWidth as number) - 125 / 25.4)).toBeLessThan(
        1e-11,
      ),
    );
  });
});
