import { Router } from "express";
import type { ZodType } from "zod";
import type { Models } from "@server/db/models";
import { requireUser } from "@server/middleware/auth";
import { validate } from "@server/middleware/validate";
import {
  createMachineBodySchema,
  createViseBodySchema,
  recordIdParamsSchema,
  updateMachineBodySchema,
  updateViseBodySchema,
} from "@/shared/profiles";
import { profileController } from "./controller";
import { machineRepository, viseRepository } from "./repository";
import { toApiMachine, toApiVise } from "./serialize";
import { profileService, type ProfileService } from "./service";

function profileRouter<F, A>(
  service: ProfileService<F, A>,
  schemas: { create: ZodType; update: ZodType },
  keys: { list: string; item: string },
): Router {
  const c = profileController(service, keys.list, keys.item);
  const r = Router();
  // Every signed-in role may keep profiles; guests get 401. CSRF was checked before this router.
  r.use(requireUser);
  r.get("/", c.list);
  r.post("/", validate({ body: schemas.create }), c.create);
  r.patch("/:id", validate({ params: recordIdParamsSchema, body: schemas.update }), c.update);
  r.delete("/:id", validate({ params: recordIdParamsSchema }), c.remove);
  return r;
}

/** `/api/vises`: the signed-in user's vise profiles. */
export function visesRouter(models: Models): Router {
  const service = profileService(viseRepository(models), toApiVise, { one: "vise", many: "vises" });
  return profileRouter(
    service,
    { create: createViseBodySchema, update: updateViseBodySchema },
    { list: "vises", item: "vise" },
  );
}

/** `/api/machines`: the signed-in user's machine profiles. */
export function machinesRouter(models: Models): Router {
  const service = profileService(machineRepository(models), toApiMachine, {
    one: "machine",
    many: "machines",
  });
  return profileRouter(
    service,
    { create: createMachineBodySchema, update: updateMachineBodySchema },
    { list: "machines", item: "machine" },
  );
}
