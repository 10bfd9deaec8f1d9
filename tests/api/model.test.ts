/**
 * The 3D model route on the real app, with a real kernel worker: contract shape (src/shared/model.ts),
 * kernel volumes against the engine's analytic volumes (within 0.5 %), units normalised to mm for the cache
 * key (1 in = 25.4 mm exactly, the international inch), caching and revalidation, and clear errors.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import supertest from "supertest";
import { evaluateTemplate } from "@/engine";
import { partVolumeMm3 } from "@/engine/parts/analytic";
import { apiErrorBodySchema } from "@/shared/errors";
import { decodeFloat32, decodeUint32, modelResponseSchema, type ModelResponse } from "@/shared/model";
import { createKernelPool, type KernelPool } from "@server/kernel";
import { builtInTemplates } from "@server/templates";
import { createTestApp, TestAgent, type TestApp } from "./helpers";

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

const ID = "cam-vise-stop";

describe("GET /api/templates/:id/model", () => {
  let body: ModelResponse;
  let etag: string;

  it("answers the default configuration with every part meshed, placed and coloured", async () => {
    const res = await supertest(t.app).get(`/api/templates/${ID}/model`).expect(200);
    expect(res.headers["content-type"]).toMatch(/application\/json/);
    body = modelResponseSchema.parse(res.body);
    etag = res.headers.etag as string;
    const evaluation = evaluateTemplate(builtInTemplates().get(ID)!, {});
    expect(body.parts.map((p) => p.id)).toEqual(evaluation.parts.map((p) => p.id));
    expect(body.units).toBe("mm");
    for (const p of body.parts) {
      const positions = decodeFloat32(p.mesh.positions);
      const indices = decodeUint32(p.mesh.indices);
      expect(positions.length).toBe(p.mesh.vertexCount * 3);
      expect(indices.length).toBe(p.mesh.triangleCount * 3);
      expect(decodeFloat32(p.mesh.normals).length).toBe(positions.length);
      expect(Math.max(...indices)).toBeLessThan(p.mesh.vertexCount);
      expect(p.assembly).toHaveLength(16);
      expect(p.colour).toMatch(/^#[0-9a-f]{6}$/);
      // Kernel volume against the analytic one (src/engine/parts/analytic.ts).
      const analytic = partVolumeMm3(evaluation.parts.find((q) => q.id === p.id)!);
      expect(Math.abs(p.volumeMm3 - analytic) / analytic).toBeLessThan(0.005);
    }
    // The ghost jaws the template declares.
    expect(body.fixtures.map((f) => f.id)).toContain("fixed-jaw");
  });

  it("gives the same key and bytes for the same parameters, and 304 when the client has them", async () => {
    const again = await supertest(t.app).get(`/api/templates/${ID}/model`).expect(200);
    expect(again.body.cacheKey).toBe(body.cacheKey);
    expect(again.body.parts[0].mesh.positions).toBe(body.parts[0]!.mesh.positions);
    await supertest(t.app).get(`/api/templates/${ID}/model`).set("If-None-Match", etag).expect(304);
  });

  it("reads parameters from the query; inches normalise to the same cache key as millimetres", async () => {
    const mm = await supertest(t.app).get(`/api/templates/${ID}/model?units=mm&jawWidth=101.6`).expect(200);
    const inch = await supertest(t.app).get(`/api/templates/${ID}/model?units=in&jawWidth=4`).expect(200);
    expect(inch.body.units).toBe("in");
    expect(inch.body.cacheKey).toBe(mm.body.cacheKey);
    expect(mm.body.cacheKey).not.toBe(body.cacheKey);
  });

  it("refuses a bad parameter with 400 naming it", async () => {
    const res = await supertest(t.app).get(`/api/templates/${ID}/model?jawWidth=wide`).expect(400);
    const err = apiErrorBodySchema.parse(res.body).error;
    expect(err.code).toBe("validation_error");
    expect(err.details[0]?.path).toBe("query.jawWidth");
    const out = await supertest(t.app).get(`/api/templates/${ID}/model?jawWidth=5000`).expect(400);
    expect(apiErrorBodySchema.parse(out.body).error.details.length).toBeGreaterThan(0);
  });

  it("answers 404 for an unknown template", async () => {
    const res = await supertest(t.app).get("/api/templates/no-such-template/model").expect(404);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe("not_found");
  });

  it("answers 503 when the server runs without the kernel", async () => {
    const res = await supertest(noKernel.app).get(`/api/templates/${ID}/model`).expect(503);
    expect(apiErrorBodySchema.parse(res.body).error.message).toMatch(/solid modeller/);
  });
});

describe("POST /api/templates/:id/model", () => {
  it("takes { parameters, units } like /evaluate", async () => {
    const agent = new TestAgent(t.app);
    const res = await agent.post(`/api/templates/${ID}/model`, { parameters: { jawThickness: 0.75 }, units: "in" });
    expect(res.status).toBe(200);
    const body = modelResponseSchema.parse(res.body);
    expect(body.units).toBe("in");
    const mm = await supertest(t.app).get(`/api/templates/${ID}/model?jawThickness=19.05`).expect(200);
    expect(mm.body.cacheKey).toBe(body.cacheKey);
  });

  it("refuses an unknown body field with 400", async () => {
    const res = await new TestAgent(t.app).post(`/api/templates/${ID}/model`, { parameters: {}, colour: "red" });
    expect(res.status).toBe(400);
  });
});
