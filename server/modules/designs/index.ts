import type { Models } from "@server/db/models";
import type { KernelPool } from "@server/kernel";
import { machineRepository } from "@server/modules/profiles/repository";
import type { TemplateStore } from "@server/templates";
import { designExportService, type DesignExportService } from "./export-service";
import { designRepository, shareLinkRepository } from "./repository";
import { designService, type DesignService } from "./service";
import { designUpgradeService, type DesignUpgradeService } from "./upgrade-service";
import type { TemplateCatalogue } from "./template-catalogue";

/** Wires the designs area over a database's models and a template catalogue. */
export function createDesignService(
  models: Models,
  catalogue: TemplateCatalogue,
  now?: () => Date,
): DesignService {
  return designService({
    designs: designRepository(models),
    shares: shareLinkRepository(models),
    catalogue,
    now,
  });
}

/** Wires the downloads of saved designs over the compiled templates and the kernel (absent: 503). */
export function createDesignExports(
  models: Models,
  templates: TemplateStore,
  kernel?: KernelPool,
): DesignExportService {
  return designExportService({
    designs: designRepository(models),
    machines: machineRepository(models),
    templates,
    kernel,
  });
}

/** Wires "what changes on the current template version" over the compiled templates. */
export function createDesignUpgrades(models: Models, templates: TemplateStore): DesignUpgradeService {
  return designUpgradeService({ designs: designRepository(models), templates });
}

export { designsRouter, sharedRouter } from "./router";
export type { TemplateCatalogue, CatalogueEntry } from "./template-catalogue";
export { fixedCatalogue } from "./template-catalogue";
export { storeCatalogue } from "./store-catalogue";
