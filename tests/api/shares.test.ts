import supertest from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { roles } from "@/shared/auth";
import {
  designResponseSchema,
  sharedDesignResponseSchema,
  shareResponseSchema,
  type Design,
} from "@/shared/designs";
import { apiErrorBodySchema } from "@/shared/errors";
import { designBody, TestCatalogue, testTemplateId } from "./design-helpers";
import { createTestApp, signedInAs, TestAgent, type TestApp } from "./helpers";

const catalogue = new TestCatalogue([{ id: testTemplateId, version: "1.0.0", name: "Test vise stop" }]);
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ deps: { templateCatalogue: catalogue } });
});
afterAll(async () => {
  await t.close();
});

const errorOf = (res: { body: unknown }) => apiErrorBodySchema.parse(res.body).error;

/** A signed-in owner with one saved design. */
async function ownerWithDesign(role: (typeof roles)[number] = "machinist") {
  const owner = await signedInAs(t.app, t.db, role);
  const res = await owner.agent.post("/api/designs", designBody());
  expect(res.status).toBe(201);
  return { ...owner, design: designResponseSchema.parse(res.body).design };
}

/** Someone with no cookies at all: not signed in, no session. */
const stranger = () => supertest(t.app);

describe("making a share link", () => {
  it("gives a random url-safe token and the page address; asking again gives the same link", async () => {
    const { agent, design } = await ownerWithDesign();
    const first = await agent.post(`/api/designs/${design.id}/share`);
    expect(first.status).toBe(201);
    const link = shareResponseSchema.parse(first.body);
    // 24 random bytes in base64url (RFC 4648 §5): 32 characters from A–Z a–z 0–9 - _, no padding.
    expect(link.token).toMatch(/^[A-Za-z0-9_-]{32}$/);
    expect(link.url).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:\\d+/shared/${link.token}$`));

    const again = await agent.post(`/api/designs/${design.id}/share`);
    expect(again.status).toBe(200);
    // supertest serves each request on a fresh port, so compare the address without its origin.
    const samePage = (l: { token: string; url: string; createdAt: string }) => ({ ...l, url: new URL(l.url).pathname });
    expect(samePage(shareResponseSchema.parse(again.body))).toEqual(samePage(link));

    const opened = designResponseSchema.parse((await agent.get(`/api/designs/${design.id}`)).body).design;
    expect(opened.share && samePage(opened.share)).toEqual(samePage(link));
  });

  it("gives every design its own token", async () => {
    const tokens = new Set<string>();
    const { agent } = await signedInAs(t.app, t.db, "machinist");
    for (let i = 0; i < 5; i++) {
      const d = designResponseSchema.parse(
        (await agent.post("/api/designs", designBody({ name: `D${i}` }))).body,
      ).design;
      tokens.add(shareResponseSchema.parse((await agent.post(`/api/designs/${d.id}/share`)).body).token);
    }
    expect(tokens.size).toBe(5);
  });

  it.each(roles)("works for a %s, who can also revoke it", async (role) => {
    const { agent, design } = await ownerWithDesign(role);
    const made = await agent.post(`/api/designs/${design.id}/share`);
    expect(made.status).toBe(201);
    const { token } = shareResponseSchema.parse(made.body);
    expect((await stranger().get(`/api/shared/${token}`)).status).toBe(200);
    expect((await agent.delete(`/api/designs/${design.id}/share`)).status).toBe(204);
    expect((await stranger().get(`/api/shared/${token}`)).status).toBe(404);
  });
});

describe("the shared page", () => {
  it("opens signed out, read-only, and shows the design without anything about its owner", async () => {
    const { agent, design, user } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);

    const res = await stranger().get(`/api/shared/${link.token}`);
    expect(res.status).toBe(200);
    const shared = sharedDesignResponseSchema.parse(res.body).design;
    expect(shared).toMatchObject({
      name: design.name,
      notes: design.notes,
      templateId: testTemplateId,
      templateVersion: "1.0.0",
      templateName: "Test vise stop",
      parameters: design.parameters,
      units: "mm",
    });
    // Nothing that identifies the owner or the account's records, under any key.
    expect(Object.keys(shared).sort()).toEqual(
      [
        "name",
        "newerVersion",
        "notes",
        "parameters",
        "sharedAt",
        "templateId",
        "templateName",
        "templateVersion",
        "units",
        "updatedAt",
      ].sort(),
    );
    const text = JSON.stringify(res.body);
    expect(text).not.toContain(user.email);
    expect(text).not.toContain(user.displayName);
    expect(text).not.toMatch(/owner|email|"id"/i);
    expect(res.headers["cache-control"]).toBe("private, no-store");
  });

  it("is read-only: no write route exists under /api/shared", async () => {
    const { agent, design } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    const other = new TestAgent(t.app);
    for (const res of [
      await other.patch(`/api/shared/${link.token}`, { name: "Defaced" }),
      await other.delete(`/api/shared/${link.token}`),
    ]) {
      expect(res.status).toBe(404);
    }
    const still = designResponseSchema.parse((await agent.get(`/api/designs/${design.id}`)).body).design;
    expect(still.name).toBe(design.name);
  });

  it("shows the design as it is now (a live view, not a copy)", async () => {
    const { agent, design } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    await agent.patch(`/api/designs/${design.id}`, { name: "Renamed stop", parameters: { jawWidth: 125 } });
    const shared = sharedDesignResponseSchema.parse(
      (await stranger().get(`/api/shared/${link.token}`)).body,
    ).design;
    expect(shared).toMatchObject({ name: "Renamed stop", parameters: { jawWidth: 125 } });
  });

  it("says when a newer template version exists", async () => {
    const { agent, design } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    catalogue.publish(testTemplateId, "1.2.0");
    try {
      const shared = sharedDesignResponseSchema.parse(
        (await stranger().get(`/api/shared/${link.token}`)).body,
      ).design;
      expect(shared).toMatchObject({ templateVersion: "1.0.0", newerVersion: "1.2.0" });
    } finally {
      catalogue.publish(testTemplateId, "1.0.0");
    }
  });

  it("answers 404 for an unknown token, and for a token with its letters' case changed", async () => {
    const { agent, design } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    const unknown = await stranger().get(`/api/shared/${"A".repeat(32)}`);
    expect(unknown.status).toBe(404);
    expect(errorOf(unknown).code).toBe("not_found");
    // base64url is case-sensitive: the token column compares binary, so a case-folded token is another token.
    const swapped = [...link.token]
      .map((c) => (c === c.toLowerCase() ? c.toUpperCase() : c.toLowerCase()))
      .join("");
    if (swapped !== link.token) expect((await stranger().get(`/api/shared/${swapped}`)).status).toBe(404);
  });

  it("refuses what cannot be a token with 400", async () => {
    const res = await stranger().get("/api/shared/not%20a%20token");
    expect(res.status).toBe(400);
    expect(errorOf(res).details.map((d) => d.path)).toEqual(["params.token"]);
  });
});

describe("revoking", () => {
  it("stops the link working at once; sharing again makes a new link, the old one stays dead", async () => {
    const { agent, design } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    expect((await stranger().get(`/api/shared/${link.token}`)).status).toBe(200);

    expect((await agent.delete(`/api/designs/${design.id}/share`)).status).toBe(204);
    const gone = await stranger().get(`/api/shared/${link.token}`);
    expect(gone.status).toBe(404);
    expect(errorOf(gone).message).toBe("This share link does not exist or has been revoked by its owner.");
    const opened: Design = designResponseSchema.parse(
      (await agent.get(`/api/designs/${design.id}`)).body,
    ).design;
    expect(opened.share).toBeNull();
    // Revoking again is harmless.
    expect((await agent.delete(`/api/designs/${design.id}/share`)).status).toBe(204);

    const fresh = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    expect(fresh.token).not.toBe(link.token);
    expect((await stranger().get(`/api/shared/${fresh.token}`)).status).toBe(200);
    expect((await stranger().get(`/api/shared/${link.token}`)).status).toBe(404);
  });

  it("is for the owner only: another user of any role gets 404 and the link keeps working", async () => {
    const { agent, design } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    for (const role of roles) {
      const other = await signedInAs(t.app, t.db, role);
      expect((await other.agent.delete(`/api/designs/${design.id}/share`)).status).toBe(404);
      expect((await other.agent.post(`/api/designs/${design.id}/share`)).status).toBe(404);
      // Signed in or not, a share link opens the same read-only view.
      expect((await other.agent.get(`/api/shared/${link.token}`)).status).toBe(200);
    }
    expect((await stranger().get(`/api/shared/${link.token}`)).status).toBe(200);
  });

  it("needs the CSRF header like every state change", async () => {
    const { agent, design } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    const res = await agent.http.delete(`/api/designs/${design.id}/share`);
    expect(res.status).toBe(403);
    expect(errorOf(res).code).toBe("csrf_invalid");
    expect((await stranger().get(`/api/shared/${link.token}`)).status).toBe(200);
  });
});

describe("deleting a shared design", () => {
  it("closes its link while deleted, and an undo opens it again", async () => {
    const { agent, design } = await ownerWithDesign();
    const link = shareResponseSchema.parse((await agent.post(`/api/designs/${design.id}/share`)).body);
    expect((await agent.delete(`/api/designs/${design.id}`)).status).toBe(200);
    expect((await stranger().get(`/api/shared/${link.token}`)).status).toBe(404);
    expect((await agent.post(`/api/designs/${design.id}/restore`)).status).toBe(200);
    expect((await stranger().get(`/api/shared/${link.token}`)).status).toBe(200);
  });

  it("never carries the link over to a duplicate", async () => {
    const { agent, design } = await ownerWithDesign();
    await agent.post(`/api/designs/${design.id}/share`);
    const copy = designResponseSchema.parse(
      (await agent.post(`/api/designs/${design.id}/duplicate`)).body,
    ).design;
    expect(copy.share).toBeNull();
  });
});
