import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { act, cleanup, configure, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { createMemoryRouter, RouterProvider } from "react-router";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { eccentricCamCalculator } from "@/engine/calculators/eccentric-cam";
import { CalculatorInputError } from "@/engine/calculators/types";
import { resetCsrfToken } from "@/lib/api-client";
import { CamCheckPage } from "./cam-check-page";

// The machine is shared and slow at times: allow waits (not assertions about time) up to 5 s.
configure({ asyncUtilTimeout: 5000 });

const reply = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

/**
 * Stands in for the server: the calculator route answers with the engine's own result (this test is
 * about what the page shows, not the engine's numbers, which its own tests check against sources).
 */
function calculatorServer() {
  const bodies: unknown[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string, init: RequestInit) => {
      if (url === "/api/auth/csrf") return reply(200, { csrfToken: "t" });
      const body = JSON.parse(String(init.body)) as unknown;
      bodies.push(body);
      try {
        return reply(200, eccentricCamCalculator.compute(eccentricCamCalculator.inputSchema.parse(body)));
      } catch (error) {
        if (!(error instanceof CalculatorInputError)) throw error;
        return reply(400, {
          error: {
            code: "validation_error",
            message: error.message,
            details: [{ path: error.field ?? "", message: error.message }],
          },
        });
      }
    }),
  );
  return bodies;
}

/** The page at `address` (its query holds the inputs); returns the router to read the address back. */
function renderPage(address = "/cam-check") {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const router = createMemoryRouter([{ path: "/cam-check", Component: CamCheckPage }], {
    initialEntries: [address],
  });
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return router;
}

const verdict = () => screen.findByTestId("lock-verdict");
const field = (name: string) => screen.getByRole("textbox", { name: new RegExp(`^${name}`) });

/** Replaces a field's text in one change event (as pasting would). */
function retype(name: string, text: string) {
  fireEvent.change(field(name), { target: { value: text } });
}

beforeEach(() => resetCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// The page renders a chart per result: on a loaded 2-core machine a test can take several seconds.
describe("cam check page", { timeout: 20_000 }, () => {
  it("shows the starting cam's verdict, figures with units, the explanation and the cautions", async () => {
    calculatorServer();
    renderPage();
    expect((await verdict()).textContent).toContain("Locks by itself");
    // Ø24, e 1.2: throw 2e = 2.4 mm.
    expect(screen.getByTestId("figure-throw").textContent).toBe("2.4 mm");
    expect(screen.getByTestId("cam-explanation").textContent).toContain("more than needed");
    const cautions = screen.getByRole("complementary", { name: "Before you rely on it" });
    expect(within(cautions).getByText(/Check the workholding on the machine before cutting/)).toBeTruthy();
  });

  it("says a cam with D/e = 8 does not lock, and why", async () => {
    calculatorServer();
    renderPage();
    await verdict();
    retype("Eccentricity", "3");
    await waitFor(() => expect(screen.getByTestId("lock-verdict").textContent).toContain("Does not lock"));
    expect(screen.getByRole("heading", { name: "Why it does not lock" })).toBeTruthy();
    expect(screen.getByTestId("cam-explanation").textContent).toContain("short of what is needed");
  });

  it("keeps the last good result while an input is missing, and sends nothing for it", async () => {
    const bodies = calculatorServer();
    renderPage();
    await verdict();
    const sent = bodies.length;
    retype("Cam diameter", "");
    expect(await screen.findByText("Enter the cam diameter.")).toBeTruthy();
    expect(screen.getByText("Fix the marked input")).toBeTruthy();
    expect(screen.getByTestId("lock-verdict").textContent).toContain("Locks by itself");
    await new Promise((r) => setTimeout(r, 400)); // past the debounce
    expect(bodies.length).toBe(sent);
  });

  it("puts the server's refusal on the field it concerns", async () => {
    calculatorServer();
    renderPage();
    await verdict();
    retype("Eccentricity", "13");
    expect(await screen.findByText(/must be smaller than the cam radius 12 mm/)).toBeTruthy();
    expect(field("Eccentricity").getAttribute("aria-invalid")).toBe("true");
    expect(screen.getByTestId("lock-verdict")).toBeTruthy();
  });

  it("switches to inches in place and back to exactly what was typed", async () => {
    const bodies = calculatorServer();
    renderPage();
    await verdict();
    await userEvent.click(screen.getByRole("radio", { name: /inch/ }));
    // 24 mm / 25.4 = 0.94488… in, shown to 0.0001 in.
    expect((field("Cam diameter") as HTMLInputElement).value).toBe("0.9449");
    await waitFor(() => expect(screen.getByTestId("figure-throw").textContent).toBe("0.0945 in"));
    await userEvent.click(screen.getByRole("radio", { name: /mm/ }));
    expect((field("Cam diameter") as HTMLInputElement).value).toBe("24");
    expect((field("Eccentricity") as HTMLInputElement).value).toBe("1.2");
    // Whatever the shown unit, the calculator always gets millimetres.
    const last = bodies.at(-1) as { diameter: number };
    expect(last.diameter).toBeCloseTo(24, 3);
  });

  it("opens with the inputs and units the address holds", async () => {
    calculatorServer();
    renderPage("/cam-check?units=in&diameter=1&eccentricity=0.05");
    await verdict();
    expect((field("Cam diameter") as HTMLInputElement).value).toBe("1");
    expect((field("Eccentricity") as HTMLInputElement).value).toBe("0.05");
    expect((screen.getByRole("radio", { name: /inch/ }) as HTMLInputElement).checked).toBe(true);
    // Throw 2e = 2 × 0.05 in = 0.1 in (1 in = 25.4 mm exactly).
    await waitFor(() => expect(screen.getByTestId("figure-throw").textContent).toBe("0.1 in"));
    expect(screen.queryByText("Some values in the link could not be used")).toBeNull();
  });

  it("falls back to the starting value, with a note, for what in the address cannot be used", async () => {
    calculatorServer();
    renderPage("/cam-check?units=cubits&diameter=abc&muContact=1.5&eccentricity=2");
    await verdict();
    const note = screen.getByText("Some values in the link could not be used").parentElement!;
    expect(note.textContent).toContain("The link's units “cubits” are not mm or in; the check uses mm.");
    expect(note.textContent).toContain(
      "Cam diameter: “abc” in the link is not a number; the starting value 24 mm is used.",
    );
    expect(note.textContent).toContain("Friction at the work face: 1.5 from the link cannot be used");
    expect((field("Cam diameter") as HTMLInputElement).value).toBe("24");
    expect((field("Friction at the work face") as HTMLInputElement).value).toBe("0.1");
    // What did fit is used.
    expect((field("Eccentricity") as HTMLInputElement).value).toBe("2");
    await userEvent.click(within(note).getByRole("button", { name: "Dismiss" }));
    expect(screen.queryByText("Some values in the link could not be used")).toBeNull();
  });

  it("writes a whole cam to the address, and reads back a link to another cam", async () => {
    calculatorServer();
    const router = renderPage();
    await verdict();
    retype("Eccentricity", "3");
    await waitFor(() =>
      expect(new URLSearchParams(router.state.location.search).get("eccentricity")).toBe("3"),
    );
    const written = new URLSearchParams(router.state.location.search);
    expect(written.get("units")).toBe("mm");
    expect(written.get("diameter")).toBe("24");
    // A half-typed value does not reach the address: it keeps the last whole cam.
    retype("Cam diameter", "");
    await new Promise((r) => setTimeout(r, 400)); // past the address's pause
    expect(new URLSearchParams(router.state.location.search).get("diameter")).toBe("24");

    await act(() => router.navigate("/cam-check?units=mm&diameter=30&eccentricity=1.5"));
    await waitFor(() => expect((field("Cam diameter") as HTMLInputElement).value).toBe("30"));
    expect((field("Eccentricity") as HTMLInputElement).value).toBe("1.5");
  });
});
