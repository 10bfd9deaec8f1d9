/**
 * `GET /api/designs/:id/export`: a saved design drawn by the pack service on a real kernel worker, with
 * the owner-only, pinning and option checks of the designs area.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Response } from "supertest";
import { designResponseSchema, type Design } from "@/shared/designs";
import { apiErrorBodySchema } from "@/shared/errors";
import { machineResponseSchema } from "@/shared/profiles";
import { createKernelPool, type KernelPool } from "@server/kernel";
import { builtInTemplates } from "@server/templates";
import { createTestApp, signedInAs, TestAgent, type TestApp } from "./helpers";

let t: TestApp;
let noKernel: TestApp;
let kernel: KernelPool;

beforeAll(async () => {
  kernel = createKernelPool({ poolSize: 1, warmupRounds: 0, taskTimeoutMs: 120_000 });
  t = await createTestApp({ deps: { kernel } });
  noKernel = await createTestApp();
  await kernel.ready();
}, 180_000);
afterAll(async () => {
  await t?.close();
  await noKernel?.close();
  await kernel?.close();
});

const template = () => builtInTemplates().get("cam-vise-stop")!.template;
const errorOf = (res: { body: unknown }) => apiErrorBodySchema.parse(res.body).error;

/** Reads the answer as bytes whatever its type (supertest only buffers text and JSON by itself). */
function download(agent: TestAgent, url: string): Promise<Response> {
  return agent
    .get(url)
    .buffer(true)
    .parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => cb(null, Buffer.concat(chunks)));
    });
}

async function pdfText(body: Buffer): Promise<string> {
  const { getDocument } = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await getDocument({ data: new Uint8Array(body), useSystemFonts: false, isEvalSupported: false })
    .promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    pages.push(content.items.map((item) => ("str" in item ? item.str : "")).join(" "));
  }
  await doc.destroy();
  return pages.join("\n");
}

async function ownerWithDesign(units: "mm" | "in" = "mm") {
  const owner = await signedInAs(t.app, t.db, "machinist");
  const res = await owner.agent.post("/api/designs", {
    templateId: "cam-vise-stop",
    name: "Stop for the 100 mm vise",
    units,
    parameters: { jawWidth: 100, jawThickness: 20 },
  });
  expect(res.status).toBe(201);
  return { ...owner, design: designResponseSchema.parse(res.body).design };
}

describe("who may download", () => {
  it("refuses guests (401) and another user's design (404)", async () => {
    const { design } = await ownerWithDesign();
    expect((await new TestAgent(t.app).get(`/api/designs/${design.id}/export?format=csv`)).status).toBe(401);
    const other = await signedInAs(t.app, t.db, "admin");
    const res = await other.agent.get(`/api/designs/${design.id}/export?format=csv`);
    expect(res.status).toBe(404);
    expect(errorOf(res).code).toBe("not_found");
  });
});

describe("options", () => {
  it("gives one detail per bad option", async () => {
    const { agent, design } = await ownerWithDesign();
    const res = await agent.get(`/api/designs/${design.id}/export?format=docx&projection=second&machine=abc`);
    expect(res.status).toBe(400);
    expect(
      errorOf(res)
        .details.map((d) => d.path)
        .sort(),
    ).toEqual(["query.format", "query.machine", "query.projection"]);
    const unknown = await agent.get(`/api/designs/${design.id}/export?format=csv&colour=red`);
    expect(errorOf(unknown).details).toEqual([{ path: "query", message: "Unknown field: colour." }]);
  });

  it("refuses a machine that is not one of yours, and a part the template does not have", async () => {
    const { agent, design } = await ownerWithDesign();
    const stranger = await signedInAs(t.app, t.db, "machinist");
    const theirs = machineResponseSchema.parse(
      (await stranger.agent.post("/api/machines", { name: "Their mill", maxSpindleRpm: 2000, units: "mm" }))
        .body,
    ).machine;
    const res = await agent.get(`/api/designs/${design.id}/export?format=pdf&machine=${theirs.id}`);
    expect(res.status).toBe(400);
    expect(errorOf(res).details).toEqual([
      { path: "query.machine", message: `You have no machine with id ${theirs.id}.` },
    ]);
    const part = await agent.get(`/api/designs/${design.id}/export?format=dxf&part=no-such-part`);
    expect(part.status).toBe(400);
    expect(errorOf(part).details.map((d) => d.path)).toEqual(["query.part"]);
  }, 120_000);
});

describe("pinning", () => {
  it("refuses (409) to draw a design pinned to a version the catalogue no longer has", async () => {
    const { agent, design } = await ownerWithDesign();
    await t.db.models.Design.update({ templateVersion: "0.9.0" }, { where: { id: design.id } });
    const res = await agent.get(`/api/designs/${design.id}/export?format=pdf`);
    expect(res.status).toBe(409);
    expect(errorOf(res).details).toEqual([
      { path: "templateVersion", message: `Pinned to 0.9.0; the catalogue has ${template().version}.` },
    ]);
    // Moving the pin (after checking the design in the configurator) makes it downloadable.
    const moved = await agent.patch(`/api/designs/${design.id}`, { useCurrentTemplateVersion: true });
    expect(designResponseSchema.parse(moved.body).design.templateVersion).toBe(template().version);
    expect((await download(agent, `/api/designs/${design.id}/export?format=csv`)).status).toBe(200);
  });
});

describe("files", () => {
  let owner: Awaited<ReturnType<typeof ownerWithDesign>>;
  let design: Design;
  beforeAll(async () => {
    owner = await ownerWithDesign();
    design = owner.design;
  });

  it("answers 503 with a clear message when the solid modeller is not running", async () => {
    // The same design seen through an app without a kernel (same database).
    const agent = new TestAgent(noKernel.app);
    await agent.login(owner.user.email, owner.user.password);
    const res = await agent.get(`/api/designs/${design.id}/export?format=pdf`);
    expect(res.status).toBe(503);
    expect(errorOf(res).message).toBe("The solid modeller is not running on this server.");
  });

  it("gives the cut list as CSV, named after the template and its pinned version", async () => {
    const res = await download(owner.agent, `/api/designs/${design.id}/export?format=csv`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("text/csv; charset=utf-8");
    expect(res.headers["content-disposition"]).toBe(
      `attachment; filename="cam-vise-stop-v${template().version}-cut-list.csv"`,
    );
    expect(res.headers["cache-control"]).toBe("private, no-store");
    const [header, ...rows] = (res.body as Buffer).toString("utf8").trim().split(/\r?\n/);
    expect(header).toMatch(/^Part,Name,Quantity,Material/);
    expect(rows.length).toBeGreaterThan(0);
  });

  it("draws the PDF pack in the design's units, signed by the user, with the chosen machine's top speed", async () => {
    const machine = machineResponseSchema.parse(
      (await owner.agent.post("/api/machines", { name: "Bench mill", maxSpindleRpm: 2750, units: "mm" }))
        .body,
    ).machine;
    const res = await download(
      owner.agent,
      `/api/designs/${design.id}/export?format=pdf&machine=${machine.id}`,
    );
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    const body = res.body as Buffer;
    // Every PDF file starts with its header line "%PDF-" and a version (ISO 32000-1:2008, 7.5.2).
    expect(body.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const text = await pdfText(body);
    expect(text).toContain(`${template().name} v${template().version}`);
    expect(text).toContain(owner.user.displayName);
    expect(text).toMatch(/Units\s+mm/);
    // Our default for millimetre drawings: first-angle projection (ISO 5456-2 method 1).
    expect(text).toContain("Projection: first angle");
    expect(text).toMatch(/2\s?750/);
  }, 180_000);

  // Inch drawings default to third-angle projection (common practice in North America; ISO 5456-2 allows both).
  it("draws in inches, third angle, when asked", async () => {
    const res = await download(owner.agent, `/api/designs/${design.id}/export?format=pdf&units=in`);
    expect(res.status).toBe(200);
    const text = await pdfText(res.body as Buffer);
    expect(text).toMatch(/Units\s+inch/);
    expect(text).toContain("Projection: third angle");
  }, 180_000);
});
