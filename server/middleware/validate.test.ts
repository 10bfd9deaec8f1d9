import { describe, expect, it } from "vitest";
import { registerBodySchema } from "@/shared/auth";
import { zodDetails } from "./validate";

describe("zodDetails", () => {
  it("gives one entry per bad field, the first problem of each", () => {
    const r = registerBodySchema.safeParse({ email: 42, password: "", displayName: "" });
    expect(r.success).toBe(false);
    const details = zodDetails(r.error!);
    expect(details.map((d) => d.path)).toEqual(["email", "password", "displayName"]);
  });

  it("prefixes params and query paths", () => {
    const r = registerBodySchema.safeParse({});
    expect(zodDetails(r.error!, "params").map((d) => d.path)).toEqual([
      "params.email",
      "params.password",
      "params.displayName",
    ]);
  });
});
