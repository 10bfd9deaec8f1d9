import { Router } from "express";
import { z } from "zod";
import { setRoleBodySchema } from "@/shared/auth";
import { requireRole } from "@server/middleware/auth";
import { validate } from "@server/middleware/validate";
import { adminController } from "./controller";
import type { AdminService } from "./service";

const userIdParams = z.object({
  id: z.coerce
    .number({ error: "User id must be a number." })
    .int()
    .positive({ error: "User id must be a positive whole number." }),
});

/** `/api/admin`: admins only (401 for guests, 403 for every other role). */
export function adminRouter(admin: AdminService): Router {
  const c = adminController(admin);
  const r = Router();
  r.use(requireRole("admin"));
  r.get("/users", c.listUsers);
  r.patch("/users/:id/role", validate({ params: userIdParams, body: setRoleBodySchema }), c.setRole);
  return r;
}
