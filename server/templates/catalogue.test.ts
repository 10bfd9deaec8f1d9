import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { CatalogueLoadError, loadTemplateStore } from "./catalogue";

const dirs: string[] = [];
function tempDir(files: Record<string, string>): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "jw-templates-"));
  dirs.push(dir);
  for (const [name, text] of Object.entries(files)) {
    fs.mkdirSync(path.dirname(path.join(dir, name)), { recursive: true });
    fs.writeFileSync(path.join(dir, name), text);
  }
  return dir;
}
afterEach(() => {
  for (const d of dirs.splice(0)) fs.rmSync(d, { recursive: true, force: true });
});

describe("the built-in catalogue", () => {
  it("loads and compiles every template in templates/", () => {
    const store = loadTemplateStore();
    const stop = store.get("cam-vise-stop");
    expect(stop?.template.name).toBe("Cam-lock vise stop");
    expect(store.sourceOf("cam-vise-stop")).toBe(path.join("stops", "cam-vise-stop.yaml"));
    expect(store.list().length).toBeGreaterThanOrEqual(1);
  });

  it("fails loudly, naming the file and every reason, when a template is broken", () => {
    const good = fs.readFileSync(path.resolve(__dirname, "../../templates/stops/cam-vise-stop.yaml"), "utf8");
    const dir = tempDir({
      "stops/good.yaml": good,
      "stops/bad.yaml": good.replace("id: cam-vise-stop", "id: other-stop").replace("rodRadius: stopRodDiameter / 2", "rodRadius: import('fs')"),
      "clamps/twin.yaml": good,
    });
    try {
      loadTemplateStore(dir);
      throw new Error("expected a failure");
    } catch (err) {
      expect(err).toBeInstanceOf(CatalogueLoadError);
      const message = (err as Error).message;
      expect(message).toMatch(/stops\/bad\.yaml: .*derived\.rodRadius.*the function "import" is not allowed/s);
      expect(message).toMatch(/the id "cam-vise-stop" is also used by/);
    }
  });
});
