import { describe, expect, it } from "vitest";
import { ConfigError, parseEnv } from "./env";

describe("parseEnv", () => {
  it("gives the documented defaults", () => {
    const e = parseEnv({});
    expect(e).toMatchObject({
      NODE_ENV: "development",
      HOST: "127.0.0.1",
      PORT: 3000,
      DB_PORT: 3406,
      DB_NAME: "jigwright",
    });
    expect(e.DB_MANAGED).toBe(true);
  });

  it("treats empty strings as unset", () => {
    expect(parseEnv({ PORT: "" }).PORT).toBe(3000);
  });

  it("names every bad variable", () => {
    try {
      parseEnv({ PORT: "eighty", DB_NAME: "drop table;", SESSION_SECRET: "short" });
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(ConfigError);
      const message = (err as Error).message;
      expect(message).toMatch(/PORT/);
      expect(message).toMatch(/DB_NAME/);
      expect(message).toMatch(/SESSION_SECRET/);
    }
  });

  it("reads booleans in the usual spellings", () => {
    expect(parseEnv({ DB_MANAGED: "false" }).DB_MANAGED).toBe(false);
    expect(parseEnv({ SEED_DEMO: "0" }).SEED_DEMO).toBe(false);
    expect(() => parseEnv({ SEED_DEMO: "maybe" })).toThrow(ConfigError);
  });
});
