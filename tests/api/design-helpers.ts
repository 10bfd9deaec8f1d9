/**
 * Helpers for the saved-designs and share-link API tests: a template catalogue whose versions the test
 * controls (to check version pinning), and a valid design body.
 */
import type { CreateDesignBody } from "@/shared/designs";
import type { CatalogueEntry, TemplateCatalogue } from "@server/modules/designs";

type CatalogueParameters = CatalogueEntry["parameters"];

/** A catalogue the test can publish new versions into and retire templates from. */
export class TestCatalogue implements TemplateCatalogue {
  private readonly entries = new Map<string, CatalogueEntry>();

  constructor(initial: CatalogueEntry[] = []) {
    for (const e of initial) this.entries.set(e.id, e);
  }

  async current(templateId: string): Promise<CatalogueEntry | null> {
    return this.entries.get(templateId) ?? null;
  }

  /** Publishes `version` of a template; with `parameters`, saved values are checked against them. */
  publish(
    id: string,
    version: string,
    name = this.entries.get(id)?.name ?? id,
    parameters?: CatalogueParameters,
  ): void {
    this.entries.set(id, { id, version, name, ...(parameters ? { parameters } : {}) });
  }

  retire(id: string): void {
    this.entries.delete(id);
  }
}

/** Template ids of our own, used only by these tests (not templates of the real catalogue). */
export const testTemplateId = "test-vise-stop";

/** A configuration of the test template; the numbers are invented test inputs, not reference values. */
export function designBody(overrides: Partial<CreateDesignBody> = {}): CreateDesignBody {
  return {
    templateId: testTemplateId,
    name: "Stop for the 100 mm vise",
    notes: "Left jaw, brass pad.",
    units: "mm",
    parameters: { jawWidth: 100, jawHeight: 32, padMaterial: "brass", withPad: true },
    ...overrides,
  };
}
