import type { Models } from "@server/db/models";
import { designRepository, shareLinkRepository } from "./repository";
import { designService, type DesignService } from "./service";
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

export { designsRouter, sharedRouter } from "./router";
export type { TemplateCatalogue, CatalogueEntry } from "./template-catalogue";
export { fixedCatalogue } from "./template-catalogue";
export { storeCatalogue } from "./store-catalogue";
