import { Router } from "express";
import {
  createDesignBodySchema,
  designExportQuerySchema,
  duplicateDesignBodySchema,
  shareTokenParamsSchema,
  updateDesignBodySchema,
} from "@/shared/designs";
import { designUpgradeQuerySchema } from "@/shared/design-upgrade";
import { recordIdParamsSchema } from "@/shared/profiles";
import { requireUser } from "@server/middleware/auth";
import { validate } from "@server/middleware/validate";
import { designController } from "./controller";
import type { DesignExportService } from "./export-service";
import type { DesignService } from "./service";
import type { DesignUpgradeService } from "./upgrade-service";

const idParams = validate({ params: recordIdParamsSchema });

/**
 * `/api/designs`: the signed-in user's saved designs and their share links (every role; guests 401).
 * Another user's design answers 404, exactly like a missing one.
 */
export function designsRouter(
  designs: DesignService,
  exports: DesignExportService,
  upgrades: DesignUpgradeService,
): Router {
  const c = designController(designs, exports, upgrades);
  const r = Router();
  r.use(requireUser);
  r.get("/", c.list);
  r.post("/", validate({ body: createDesignBodySchema }), c.create);
  r.get("/:id", idParams, c.get);
  r.patch("/:id", validate({ params: recordIdParamsSchema, body: updateDesignBodySchema }), c.update);
  r.delete("/:id", idParams, c.remove);
  r.post(
    "/:id/duplicate",
    idParams,
    (req, _res, next) => {
      // The body is optional here: an empty POST duplicates with the default name.
      if (req.body === undefined) req.body = {};
      next();
    },
    validate({ body: duplicateDesignBodySchema }),
    c.duplicate,
  );
  r.post("/:id/restore", idParams, c.restore);
  r.post("/:id/share", idParams, c.share);
  r.delete("/:id/share", idParams, c.unshare);
  // What changes if the design moves to the current template version (reading it changes nothing).
  r.get("/:id/upgrade", validate({ params: recordIdParamsSchema, query: designUpgradeQuerySchema }), c.upgrade);
  r.get(
    "/:id/export",
    validate({ params: recordIdParamsSchema, query: designExportQuerySchema }),
    c.exportFile,
  );
  return r;
}

/** `/api/shared/:token`: the public, read-only view of a shared design. No sign-in needed. */
export function sharedRouter(designs: DesignService): Router {
  const c = designController(designs);
  const r = Router();
  r.get("/:token", validate({ params: shareTokenParamsSchema }), c.shared);
  return r;
}
