import { describe, expect, it } from "vitest";
import { compareSemver, isNewerVersion } from "./semver";

describe("compareSemver", () => {
  it("orders the precedence example of Semantic Versioning 2.0.0 §11", () => {
    // The chain printed in §11.4 of https://semver.org/spec/v2.0.0.html, lowest first.
    const chain = [
      "1.0.0-alpha",
      "1.0.0-alpha.1",
      "1.0.0-alpha.beta",
      "1.0.0-beta",
      "1.0.0-beta.2",
      "1.0.0-beta.11",
      "1.0.0-rc.1",
      "1.0.0",
    ];
    for (let i = 0; i + 1 < chain.length; i++) {
      expect(compareSemver(chain[i]!, chain[i + 1]!)).toBe(-1);
      expect(compareSemver(chain[i + 1]!, chain[i]!)).toBe(1);
    }
  });

  it("compares major, minor and patch as numbers (§11.2: 1.0.0 < 2.0.0 < 2.1.0 < 2.1.1)", () => {
    expect(compareSemver("1.0.0", "2.0.0")).toBe(-1);
    expect(compareSemver("2.0.0", "2.1.0")).toBe(-1);
    expect(compareSemver("2.1.0", "2.1.1")).toBe(-1);
    // Numeric, not text: 1.10.0 is after 1.9.0.
    expect(compareSemver("1.10.0", "1.9.0")).toBe(1);
  });

  it("ignores build metadata (§10) and treats equal versions as equal", () => {
    expect(compareSemver("1.2.3+build.7", "1.2.3")).toBe(0);
    expect(compareSemver("1.2.3", "1.2.3")).toBe(0);
  });

  it("refuses what is not a semantic version", () => {
    expect(compareSemver("1.2", "1.2.0")).toBeNull();
    expect(compareSemver("01.2.3", "1.2.3")).toBeNull();
    expect(isNewerVersion("banana", "1.0.0")).toBe(false);
  });

  it("says a catalogue version is newer only when it really is", () => {
    expect(isNewerVersion("1.1.0", "1.0.0")).toBe(true);
    expect(isNewerVersion("1.0.0", "1.0.0")).toBe(false);
    expect(isNewerVersion("0.9.0", "1.0.0")).toBe(false);
  });
});
