/**
 * A template store for the saved-design upgrade tests: the built-in catalogue plus our own test template
 * `test-step-stop` in two versions (tests/fixtures/templates), of which the test chooses the current one.
 * Like a store that keeps published versions, it still answers for the version a design is pinned to.
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import "@/engine/calculators";
import { getCalculator } from "@/engine/calculators/registry";
import { loadAndCompileTemplate, type CompiledTemplate } from "@/engine";
import { builtInTemplates, type TemplateStore } from "@server/templates";

export const upgradeTemplateId = "test-step-stop";

const fixturesDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../fixtures/templates");

function compileFixture(version: string): CompiledTemplate {
  const file = path.join(fixturesDir, `${upgradeTemplateId}-${version}.yaml`);
  return loadAndCompileTemplate(fs.readFileSync(file, "utf8"), { getCalculator }, path.basename(file));
}

export interface VersionedStore extends TemplateStore {
  /** Makes `version` the current one (what the catalogue lists and new designs pin). */
  publish(version: "1.0.0" | "2.0.0"): void;
}

/** No templates at all: for a test that needs only the test template. */
export const noTemplates: TemplateStore = { list: () => [], get: () => undefined, sourceOf: () => undefined };

export function versionedStore(base: TemplateStore = builtInTemplates()): VersionedStore {
  const versions = new Map(["1.0.0", "2.0.0"].map((v) => [v, compileFixture(v)]));
  let current = versions.get("1.0.0")!;
  return {
    list: () => [...base.list(), current],
    get: (id) => (id === upgradeTemplateId ? current : base.get(id)),
    sourceOf: (id) => (id === upgradeTemplateId ? `tests/fixtures/templates` : base.sourceOf(id)),
    getVersion: (id, version) =>
      id === upgradeTemplateId ? versions.get(version) : base.getVersion?.(id, version),
    publish(version) {
      current = versions.get(version)!;
    },
  };
}
