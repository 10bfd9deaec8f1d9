/**
 * The template and calculator routes on the real app (supertest on createApp). They need no database of
 * their own, but the app's session and CSRF layer do, so this runs in the api project.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiErrorBodySchema } from "@/shared/errors";
import { createTestApp, TestAgent, type TestApp } from "./helpers";

let t: TestApp;
let agent: TestAgent;
beforeAll(async () => {
  t = await createTestApp();
  agent = new TestAgent(t.app);
});
afterAll(async () => {
  await t.close();
});

const errorOf = (res: { body: unknown }) => apiErrorBodySchema.parse(res.body).error;
/** POSTs with the session's CSRF token and insists on the status. */
async function post(url: string, body: object, status: number) {
  const res = await agent.post(url, body);
  expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(status);
  return res;
}

describe("GET /api/templates", () => {
  it("lists the built-in templates", async () => {
    const res = await agent.get("/api/templates").expect(200);
    const stop = (res.body.templates as Array<Record<string, unknown>>).find((x) => x.id === "cam-vise-stop");
    expect(stop).toEqual({ id: "cam-vise-stop", version: "1.0.0", name: "Cam-lock vise stop", family: "stop", summary: expect.stringContaining("fixed jaw") });
  });
});

describe("GET /api/templates/:id", () => {
  it("gives everything a form needs", async () => {
    const { template } = (await agent.get("/api/templates/cam-vise-stop").expect(200)).body as { template: Record<string, unknown> };
    const parameters = template.parameters as Array<Record<string, unknown>>;
    expect(template).toMatchObject({ id: "cam-vise-stop", units: "mm", shownIn: "mm", family: "stop" });
    expect(parameters.find((p) => p.key === "jawThickness")).toEqual({
      key: "jawThickness",
      label: "Jaw thickness",
      kind: "length",
      group: "Your vise",
      help: expect.any(String),
      default: 20,
      min: 8,
      max: 40,
      step: 0.5,
      unit: "mm",
    });
    expect(parameters.find((p) => p.key === "bodyMaterial")!.materials).toContainEqual({ key: "mild-steel", name: expect.any(String) });
    expect(parameters.find((p) => p.key === "handForce")).toMatchObject({ kind: "force", unit: "N" });
    expect(template.groups).toEqual(["Your vise", "Stop rod", "Cam", "Body", "Materials"]);
    expect((template.analyses as Array<{ id: string; calculator: string }>).map((a) => [a.id, a.calculator])).toContainEqual(["cam", "eccentric-cam"]);
    expect((template.checks as Array<{ id: string }>).map((c) => c.id)).toContain("cam-self-locks");
    expect((template.defaults as Record<string, unknown>).camDiameter).toBe(20);
  });

  it("shows lengths in inches on request", async () => {
    const { template } = (await agent.get("/api/templates/cam-vise-stop?units=in").expect(200)).body as { template: { parameters: Array<Record<string, unknown>>; shownIn: string } };
    expect(template.shownIn).toBe("in");
    const jaw = template.parameters.find((p) => p.key === "jawThickness")!;
    expect(jaw.unit).toBe("in");
    expect(jaw.default as number).toBeCloseTo(20 / 25.4, 12);
    expect(jaw.max as number).toBeCloseTo(40 / 25.4, 12);
    expect(template.parameters.find((p) => p.key === "leverEndAngle")).toMatchObject({ default: 15, unit: "deg" });
  });

  it("answers 404 for an unknown id and 400 for bad units", async () => {
    const res = await agent.get("/api/templates/no-such-thing").expect(404);
    expect(errorOf(res)).toEqual({ code: "not_found", message: 'There is no template "no-such-thing".', details: [] });
    await agent.get("/api/templates/..%2Fetc").expect(404);
    const bad = await agent.get("/api/templates/cam-vise-stop?units=cm").expect(400);
    expect(errorOf(bad).details.map((d) => d.path)).toEqual(["query.units"]);
  });
});

describe("POST /api/templates/:id/evaluate", () => {
  it("evaluates the defaults", async () => {
    const res = await post("/api/templates/cam-vise-stop/evaluate", {}, 200);
    expect(res.body).toMatchObject({ template: { id: "cam-vise-stop", version: "1.0.0" }, units: "mm", ok: true, buildable: true });
    expect(res.body.analyses.cam.clampForceN).toBeCloseTo(750, 6);
    expect(res.body.partSummaries).toHaveLength(8);
    expect(res.body.parts).toBeUndefined(); // the kernel's input stays on the server
    expect(res.body.cautions[0]).toMatch(/not guarantees/);
  });

  it("takes parameters in inches and reports a failing check with ok: false", async () => {
    const res = await post("/api/templates/cam-vise-stop/evaluate", { units: "in", parameters: { jawThickness: 1.5 } }, 200);
    expect(res.body.ok).toBe(false);
    const slot = (res.body.checks as Array<{ id: string; passed: boolean; message: string }>).find((c) => c.id === "slot-covers-jaw")!;
    expect(slot.passed).toBe(false);
    expect(slot.message).toMatch(/your jaw is 1.5 in/);
  });

  it("gives one detail per bad parameter, in the user's units", async () => {
    const res = await post("/api/templates/cam-vise-stop/evaluate", { units: "in", parameters: { jawThickness: 3, camMaterial: "gold", leverLenght: 60, rodRows: 2.5 } }, 400);
    const error = errorOf(res);
    expect(error.code).toBe("validation_error");
    expect(error.details.map((d) => d.path).sort()).toEqual(["parameters.camMaterial", "parameters.jawThickness", "parameters.leverLenght", "parameters.rodRows"]);
    expect(error.details.find((d) => d.path === "parameters.jawThickness")!.message).toBe("jawThickness (Jaw thickness) must be between 0.315–1.5748 in; got 3 in.");
    expect(error.details.find((d) => d.path === "parameters.leverLenght")!.message).toMatch(/did you mean leverLength/);
  });

  it("refuses a malformed body with a detail per field", async () => {
    const res = await post("/api/templates/cam-vise-stop/evaluate", { parameters: { jawThickness: [1] }, units: "cm", extra: 1 }, 400);
    expect(errorOf(res).details.map((d) => d.path).sort()).toEqual(["", "parameters.jawThickness", "units"]);
  });

  it("answers 404 for an unknown template before looking at the body", async () => {
    await post("/api/templates/nothing-here/evaluate", { units: "cm" }, 404);
  });
});

describe("calculators", () => {
  it("lists them with their inputs", async () => {
    const res = await agent.get("/api/calculators").expect(200);
    const cam = (res.body.calculators as Array<{ kind: string; inputs: string[] }>).find((c) => c.kind === "eccentric-cam")!;
    expect(cam.inputs).toEqual(expect.arrayContaining(["diameter", "eccentricity", "pivotDiameter", "leverLength", "handForce", "muContact", "muPivot", "gap"]));
  });

  // ISO 286-2 (from memory): Ø8 H7 = +0.015/0, g6 = −0.005/−0.014 → clearance 0.005 to 0.029 mm.
  it("runs one", async () => {
    const res = await post("/api/calculators/fit", { size: 8, hole: "H7", shaft: "g6" }, 200);
    expect(res.body).toMatchObject({ hole: { upper: 0.015, lower: 0 }, kind: "clearance" });
    expect(res.body.clearanceMin).toBeCloseTo(0.005, 9);
    expect(res.body.clearanceMax).toBeCloseTo(0.029, 9);
    expect(res.body.sources.length).toBeGreaterThan(0);
  });

  it("gives one detail per bad field, names the field of an impossible input, and 404s an unknown kind", async () => {
    const bad = await post("/api/calculators/eccentric-cam", { diameter: -1, eccentricity: "a lot", gap: 1 }, 400);
    expect(errorOf(bad).details.map((d) => d.path).sort()).toEqual(["diameter", "eccentricity", "handForce", "leverLength", "pivotDiameter"]);
    const impossible = await post("/api/calculators/eccentric-cam", { diameter: 20, eccentricity: 12, pivotDiameter: 8, leverLength: 60, handForce: 30, gap: 1 }, 400);
    expect(errorOf(impossible).details[0]!.path).toBe("eccentricity");
    await post("/api/calculators/flux-capacitor", {}, 404);
    await agent.get("/api/calculators/flux-capacitor").expect(404);
  });
});
