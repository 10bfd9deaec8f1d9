/**
 * `GET /api/designs/:id/upgrade`: what changes for a saved design on the template's current version.
 * Runs on a template store holding our own test template in two versions (tests/fixtures/templates,
 * test-step-stop 1.0.0 and 2.0.0; the differences are listed at the top of the 2.0.0 file), plus the
 * built-in catalogue, which holds only the current version of each template. The expected values below
 * follow from those two files by reading them; lengths in inches use 1 in = 25.4 mm exactly (ISO 31-1 /
 * the 1959 international yard).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { evaluateTemplate } from "@/engine";
import { getMaterial } from "@/engine/materials";
import {
  inRangeCheckChanges,
  outOfRangeDecisions,
  padThicknessDropped,
  screwDepthAdded,
  stopHeightDefaultMoved,
} from "@/features/designs/test/upgrade-fixtures";
import { designUpgradeResponseSchema, type DesignUpgrade } from "@/shared/design-upgrade";
import { designResponseSchema, type Design, type DesignParameters } from "@/shared/designs";
import { apiErrorBodySchema } from "@/shared/errors";
import { builtInTemplates } from "@server/templates";
import { upgradeTemplateId, versionedStore } from "./design-upgrade-fixture";
import { createTestApp, signedInAs, TestAgent, type TestApp } from "./helpers";

const store = versionedStore();
let t: TestApp;
let owner: Awaited<ReturnType<typeof signedInAs>>;
/** Inside every limit of both versions; passes the height check on 1.0.0 only, the width warning on 2.0.0 only. */
let inRange: Design;
/** Wider than 2.0.0 allows, on a screw 2.0.0 no longer offers. */
let outOfRange: Design;

const inRangeValues: DesignParameters = {
  jawWidth: 130,
  stopHeight: 20,
  padThickness: 3,
  screw: "M6",
  metal: "brass",
  breakEdges: true,
};

async function save(
  agent: TestAgent,
  name: string,
  parameters: DesignParameters,
  templateId = upgradeTemplateId,
) {
  const res = await agent.post("/api/designs", { templateId, name, units: "mm", parameters });
  expect(res.status).toBe(201);
  return designResponseSchema.parse(res.body).design;
}

async function upgradeOf(agent: TestAgent, id: number, query = ""): Promise<DesignUpgrade> {
  const res = await agent.get(`/api/designs/${id}/upgrade${query}`);
  expect(res.status).toBe(200);
  return designUpgradeResponseSchema.parse(res.body).upgrade;
}

const errorOf = (res: { body: unknown }) => apiErrorBodySchema.parse(res.body).error;

beforeAll(async () => {
  t = await createTestApp({ deps: { templates: store } });
  owner = await signedInAs(t.app, t.db, "machinist");
  store.publish("1.0.0");
  inRange = await save(owner.agent, "Stop for the 130 mm vise", inRangeValues);
  outOfRange = await save(owner.agent, "Stop for the 160 mm vise", {
    ...inRangeValues,
    jawWidth: 160,
    screw: "M5",
  });
  store.publish("2.0.0");
});
afterAll(async () => {
  await t?.close();
});

describe("who may ask", () => {
  it("answers 401 to a guest and 404 for another user's design, as for a missing one", async () => {
    expect((await new TestAgent(t.app).get(`/api/designs/${inRange.id}/upgrade`)).status).toBe(401);
    const stranger = await signedInAs(t.app, t.db, "designer");
    const theirs = await stranger.agent.get(`/api/designs/${inRange.id}/upgrade`);
    expect(theirs.status).toBe(404);
    expect(errorOf(theirs).code).toBe("not_found");
    expect((await owner.agent.get("/api/designs/4294967295/upgrade")).status).toBe(404);
  });

  it("refuses a bad id, bad units and unknown options with one detail each", async () => {
    const id = await owner.agent.get("/api/designs/abc/upgrade");
    expect(id.status).toBe(400);
    expect(errorOf(id).details.map((d) => d.path)).toEqual(["params.id"]);
    const units = await owner.agent.get(`/api/designs/${inRange.id}/upgrade?units=cubits`);
    expect(units.status).toBe(400);
    expect(errorOf(units).details).toEqual([{ path: "query.units", message: "Choose mm or in." }]);
    const extra = await owner.agent.get(`/api/designs/${inRange.id}/upgrade?version=9.9.9`);
    expect(errorOf(extra).details).toEqual([{ path: "query", message: "Unknown field: version." }]);
  });
});

describe("a design inside the new limits", () => {
  it("lists each parameter difference with its values in the person's units", async () => {
    const up = await upgradeOf(owner.agent, inRange.id);
    expect(up).toMatchObject({
      templateId: upgradeTemplateId,
      templateName: "Test step stop",
      from: { version: "1.0.0", available: true },
      to: { version: "2.0.0" },
      units: "mm",
    });
    const mm = (n: number) => ({ value: n, text: `${n} mm` });
    expect(up.parameters).toEqual([
      {
        kind: "limits-changed",
        key: "jawWidth",
        label: "Jaw width",
        from: { min: mm(40), max: mm(200) },
        to: { min: mm(40), max: mm(150) },
      },
      stopHeightDefaultMoved,
      {
        kind: "limits-changed",
        key: "stopHeight",
        label: "Stop height",
        from: { min: mm(10), max: mm(40) },
        to: { min: mm(12), max: mm(40) },
      },
      { kind: "choices-changed", key: "screw", label: "Screw", added: [], removed: ["M5"] },
      {
        kind: "default-changed",
        key: "metal",
        label: "Material",
        from: { value: "mild-steel", text: getMaterial("mild-steel").name },
        to: { value: "brass", text: getMaterial("brass").name },
        affectsDesign: false,
      },
      {
        kind: "choices-changed",
        key: "metal",
        label: "Material",
        added: [getMaterial("aluminium-6082").name],
        removed: [],
      },
      screwDepthAdded,
      padThicknessDropped,
    ]);
    // Carried to the configurator: every saved value the new version still asks for, unchanged.
    expect(up.carried).toEqual({
      jawWidth: 130,
      stopHeight: 20,
      screw: "M6",
      metal: "brass",
      breakEdges: true,
    });
  });

  it("says which checks now fail and which now pass, with each version's own message", async () => {
    const { checks } = await upgradeOf(owner.agent, inRange.id);
    expect(checks).toMatchObject({ compared: true, evaluatedOnNew: true, note: null, failingErrorsOnNew: 1 });
    // 20 mm: at least 15 mm on 1.0.0 (passes), at least 22 mm on 2.0.0 (fails); 130 mm: over 120 mm on
    // 1.0.0 (warns), within 150 mm on 2.0.0. The new screw-depth note passes (10 ≤ 20 mm): not a change.
    expect(checks.changes).toEqual(inRangeCheckChanges);
  });

  it("shows values and messages in inches when asked (1 in = 25.4 mm)", async () => {
    const up = await upgradeOf(owner.agent, inRange.id, "?units=in");
    expect(up.units).toBe("in");
    // 150 mm / 25.4 = 5.9055 in; 40 mm = 1.5748 in; 10 mm = 0.3937 in (3 decimals, src/engine/units).
    expect(up.parameters[0]).toMatchObject({ to: { min: { text: "1.575 in" }, max: { text: "5.906 in" } } });
    expect(up.parameters.find((p) => p.kind === "added")).toMatchObject({
      default: { value: 10, text: "0.394 in" },
    });
    // 20 mm = 0.7874 in; 22 mm = 0.8661 in.
    expect(up.checks.changes[0]!.after!.message).toBe(
      "The stop stands only 0.787 in tall; make it at least 0.866 in.",
    );
    // The stored values stay in the template's own units.
    expect(up.carried.jawWidth).toBe(130);
  });
});

describe("a design outside the new limits", () => {
  it("flags the value beyond the limit and carries it unchanged, replaces a choice no longer offered", async () => {
    const up = await upgradeOf(owner.agent, outOfRange.id);
    expect(up.parameters.filter((p) => p.kind === "out-of-range" || p.kind === "not-offered")).toEqual(
      outOfRangeDecisions,
    );
    expect(up.carried).toMatchObject({ jawWidth: 160, screw: "M6" });
    // 160 mm is outside 2.0.0's limits, so 2.0.0 cannot be evaluated yet: no guessing at its checks.
    expect(up.checks).toMatchObject({
      compared: false,
      evaluatedOnNew: false,
      changes: [],
      failingErrorsOnNew: 0,
    });
    expect(up.checks.note).toBe(
      "Version 2.0.0 checks the design once every value is inside its limits: open it, change the marked values, and its checks follow.",
    );
  });
});

describe("asking changes nothing; saving on the new version moves the pin", () => {
  it("keeps the design on 1.0.0 until its owner saves the carried values with useCurrentTemplateVersion", async () => {
    // New designs pin the current version (2.0.0 here), which has no pad thickness: the same values are refused.
    const fresh = await owner.agent.post("/api/designs", {
      templateId: upgradeTemplateId,
      name: "Stop to move",
      units: "mm",
      parameters: inRangeValues,
    });
    expect(fresh.status).toBe(400);
    expect(errorOf(fresh).details.map((d) => d.path)).toEqual(["parameters.padThickness"]);
    const before = designResponseSchema.parse(
      (await owner.agent.get(`/api/designs/${inRange.id}`)).body,
    ).design;
    expect(before).toMatchObject({
      templateVersion: "1.0.0",
      newerVersion: "2.0.0",
      parameters: inRangeValues,
    });
    const up = await upgradeOf(owner.agent, inRange.id);
    const moved = await owner.agent.patch(`/api/designs/${inRange.id}`, {
      parameters: { ...up.carried, stopHeight: 24 },
      useCurrentTemplateVersion: true,
    });
    expect(moved.status).toBe(200);
    expect(designResponseSchema.parse(moved.body).design).toMatchObject({
      templateVersion: "2.0.0",
      newerVersion: null,
      parameters: { ...up.carried, stopHeight: 24 },
    });
    // On the current version there is nothing to move to.
    const now = await upgradeOf(owner.agent, inRange.id);
    expect(now).toMatchObject({ from: { version: "2.0.0", available: true }, to: null, parameters: [] });
  });
});

describe("a design pinned to a version the server no longer holds", () => {
  it("compares the saved values with the current version only and says why", async () => {
    const current = builtInTemplates().get("cam-vise-stop")!;
    // e = 3 mm on a Ø20 cam (D/e ≈ 6.7) cannot lock (common practice: D/e of about 14–20 locks).
    const values = { jawWidth: 100, jawThickness: 20, camEccentricity: 3 };
    const d = await save(owner.agent, "Old stop", values, "cam-vise-stop");
    // Pinned to an earlier built-in version: the built-in catalogue keeps only the YAML it ships.
    await t.db.models.Design.update({ templateVersion: "0.9.0" }, { where: { id: d.id } });
    const up = await upgradeOf(owner.agent, d.id);
    expect(up.from).toEqual({ version: "0.9.0", available: false });
    expect(up.to).toEqual({ version: current.template.version });
    expect(up.checks.compared).toBe(false);
    expect(up.checks.evaluatedOnNew).toBe(true);
    expect(up.checks.note).toContain("Version 0.9.0 is no longer held on this server");
    // Every check listed is one that fails on the current version; none claims a "before".
    const failing = evaluateTemplate(current, { parameters: values }).checks.filter((c) => !c.passed);
    expect(up.checks.changes.map((c) => c.id).sort()).toEqual(failing.map((c) => c.id).sort());
    expect(up.checks.changes.map((c) => c.id)).toContain("cam-self-locks");
    expect(up.checks.changes.every((c) => c.before === null && c.after?.passed === false)).toBe(true);
    // Parameters the design never held are listed as starting at their defaults; none is dropped.
    expect(up.parameters.every((p) => p.kind === "added")).toBe(true);
    expect(up.parameters.map((p) => p.key)).not.toContain("jawWidth");
    expect(up.carried).toEqual(values);
    // The design itself is untouched.
    const after = designResponseSchema.parse((await owner.agent.get(`/api/designs/${d.id}`)).body).design;
    expect(after.templateVersion).toBe("0.9.0");
  });

  it("answers 409 when the catalogue no longer lists the template at all", async () => {
    const d = await save(owner.agent, "Retired", { jawWidth: 100 }, "cam-vise-stop");
    await t.db.models.Design.update({ templateId: "retired-stop" }, { where: { id: d.id } });
    const res = await owner.agent.get(`/api/designs/${d.id}/upgrade`);
    expect(res.status).toBe(409);
    expect(errorOf(res).details).toEqual([{ path: "templateId", message: "Not in the catalogue." }]);
  });
});
