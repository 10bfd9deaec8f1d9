import type { Request, Response } from "express";
import type { SetRoleBody } from "@/shared/auth";
import { toPublicUser } from "@server/modules/auth/public-user";
import type { AdminService } from "./service";

export function adminController(admin: AdminService) {
  return {
    async listUsers(_req: Request, res: Response) {
      const users = await admin.listUsers();
      res.json({ users: users.map(toPublicUser) });
    },
    async setRole(req: Request, res: Response) {
      const { role } = req.body as SetRoleBody;
      const user = await admin.setRole(Number(req.params.id), role);
      res.json({ user: toPublicUser(user) });
    },
  };
}
