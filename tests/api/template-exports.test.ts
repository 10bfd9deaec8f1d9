/**
 * `GET` and `POST /api/templates/:id/export`: the download pack of a configured template, on a real kernel
 * worker. Checks the route's own contract (signed-in only, options validated one detail per field, files
 * named after template, version and part, sent as attachments) and reads the files back with
 * general-purpose libraries (pdfjs-dist, dxf-parser, jszip).
 * The failing setting: a cam with D/e = 20/2.5 = 8 is far under the handbook rule of thumb for a
 * self-locking circular cam (D/e about 14–20, PRODUCT.md), so its drawings must carry the stamp.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Response, Test } from "supertest";
import DxfParser from "dxf-parser";
import JSZip from "jszip";
import { apiErrorBodySchema } from "@/shared/errors";
import { createKernelPool, type KernelPool } from "@server/kernel";
import { builtInTemplates } from "@server/templates";
import { createTestApp, signedInAs, TestAgent, type TestApp } from "./helpers";

let t: TestApp;
let noKernel: TestApp;
let kernel: KernelPool;
let agent: TestAgent;

beforeAll(async () => {
  kernel = createKernelPool({ poolSize: 1, warmupRounds: 0, taskTimeoutMs: 180_000 });
  t = await createTestApp({ deps: { kernel } });
  noKernel = await createTestApp();
  agent = (await signedInAs(t.app, t.db, "machinist")).agent;
  await kernel.ready();
}, 180_000);
afterAll(async () => {
  await t?.close();
  await noKernel?.close();
  await kernel?.close();
});

const version = () => builtInTemplates().get("cam-vise-stop")!.template.version;
const errorOf = (res: { body: unknown }) => apiErrorBodySchema.parse(res.body).error;

/** Collects the answer as bytes whatever its type (supertest only buffers text and JSON by itself). */
function bytes(req: Test): Promise<Response> {
  return req.buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on("data", (c: Buffer) => chunks.push(c));
    res.on("end", () => cb(null, Buffer.concat(chunks)));
  });
}
const download = (a: TestAgent, url: string): Promise<Response> => bytes(a.get(url));

async function pdfText(body: Buffer): Promise<string[]> {
  const { getDocument } = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await getDocument({ data: new Uint8Array(body), disableFontFace: true, verbosity: 0 }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    pages.push(content.items.map((item) => ("str" in item ? item.str : "")).join(" "));
  }
  await doc.destroy();
  return pages;
}

describe("who may download", () => {
  it("guests are asked to sign in (401); an unknown template is 404", async () => {
    const guest = await new TestAgent(t.app).get("/api/templates/cam-vise-stop/export?format=csv");
    expect(guest.status).toBe(401);
    expect(errorOf(guest).code).toBe("unauthenticated");
    const missing = await agent.get("/api/templates/no-such-thing/export?format=csv");
    expect(missing.status).toBe(404);
    expect(errorOf(missing).code).toBe("not_found");
  });
});

describe("bad input gets a clear 400", () => {
  it("a format we do not write, a projection that does not exist and a parameter out of range, one detail each", async () => {
    const res = await agent.get("/api/templates/cam-vise-stop/export?format=docx&projection=second");
    expect(res.status).toBe(400);
    expect(errorOf(res).details.map((d) => d.path).sort()).toEqual(["query.format", "query.projection"]);
    const range = await agent.get("/api/templates/cam-vise-stop/export?format=csv&jawThickness=500");
    expect(range.status).toBe(400);
    expect(errorOf(range).details.map((d) => d.path)).toEqual(["parameters.jawThickness"]);
    const nan = await agent.get("/api/templates/cam-vise-stop/export?format=csv&jawThickness=thick");
    expect(nan.status).toBe(400);
  });
  it("a part the template does not have, or a one-part format without a part, names the parts", async () => {
    const part = await agent.get("/api/templates/cam-vise-stop/export?format=dxf&part=no-such-part");
    expect(part.status).toBe(400);
    expect(errorOf(part).details.map((d) => d.path)).toEqual(["part"]);
    expect(errorOf(part).message).toMatch(/parts: body, stop-rod/);
    const none = await agent.get("/api/templates/cam-vise-stop/export?format=dxf");
    expect(none.status).toBe(400);
    expect(errorOf(none).message).toMatch(/choose one of body/);
  });
  it("without a solid modeller the drawing formats answer 503, the cut list still works", async () => {
    const a = (await signedInAs(noKernel.app, noKernel.db, "machinist")).agent;
    const pdf = await a.get("/api/templates/cam-vise-stop/export?format=pdf");
    expect(pdf.status).toBe(503);
    expect(errorOf(pdf).code).toBe("service_unavailable");
    expect((await download(a, "/api/templates/cam-vise-stop/export?format=csv")).status).toBe(200);
  });
});

describe("files", () => {
  it("the cut list CSV, as an attachment named after template and version", async () => {
    const res = await download(agent, "/api/templates/cam-vise-stop/export?format=csv&units=in");
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("text/csv; charset=utf-8");
    expect(res.headers["content-disposition"]).toBe(`attachment; filename="cam-vise-stop-v${version()}-cut-list.csv"`);
    const [header] = (res.body as Buffer).toString("utf8").split(/\r\n/);
    // Inch users get inches in the column names.
    expect(header).toMatch(/\(in\)/);
  });

  it("a PDF of one part with failing checks carries the stamp, the user's name and the ISO 2768 note", async () => {
    const res = await download(agent, "/api/templates/cam-vise-stop/export?format=pdf&part=cam&camEccentricity=2.5");
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    expect(res.headers["content-disposition"]).toBe(`attachment; filename="cam-vise-stop-v${version()}-cam.pdf"`);
    const [sheet] = await pdfText(res.body as Buffer);
    expect(sheet).toContain("NOT CHECKED — ERRORS");
    expect(sheet).toContain("General tolerances ISO 2768-m");
    expect(sheet).toContain("Ø8 H7");
    expect(sheet).toMatch(/Drawn by\s+Test/i);
  }, 180_000);

  it("a DXF of the body in inches (POST with a JSON body)", async () => {
    const req = agent.http
      .post("/api/templates/cam-vise-stop/export")
      .set("x-csrf-token", await agent.csrf())
      .send({ format: "dxf", part: "body", units: "in", parameters: { jawThickness: 0.75 } });
    const res = await bytes(req);
    expect(res.status).toBe(200);
    expect(res.headers["content-disposition"]).toBe(`attachment; filename="cam-vise-stop-v${version()}-body.dxf"`);
    const dxf = new DxfParser().parseSync((res.body as Buffer).toString("utf8"))!;
    expect(dxf.header.$INSUNITS).toBe(1);
    expect(Object.keys(dxf.tables.layer.layers)).toEqual(expect.arrayContaining(["VISIBLE", "HIDDEN", "CENTER", "DIMENSIONS", "TEXT"]));
  }, 180_000);

  it("the ZIP of one part holds its PDF, SVG, DXF, STEP, STL and cut list", async () => {
    const res = await download(agent, "/api/templates/cam-vise-stop/export?format=zip&part=washer&projection=third");
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/zip");
    const names = Object.keys((await JSZip.loadAsync(res.body as Buffer)).files);
    const p = `cam-vise-stop-v${version()}-`;
    for (const n of [`${p}washer.pdf`, `dxf/${p}washer.dxf`, `step/${p}washer.step`, `stl/${p}washer.stl`, `${p}cut-list.csv`]) expect(names).toContain(n);
    expect(names.some((n) => n.startsWith("svg/") && n.endsWith("-washer.svg"))).toBe(true);
  }, 180_000);
});
