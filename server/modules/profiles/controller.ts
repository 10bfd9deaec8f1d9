import type { Request, Response } from "express";
import type { ProfileService } from "./service";

/** Signed-in user of a request behind `requireUser`. */
function ownerOf(req: Request): number {
  if (!req.user) throw new Error("profile route mounted without requireUser");
  return req.user.id;
}

/**
 * The only profile code touching req/res. `listKey`/`itemKey` name the JSON envelope:
 * `{ vises: [...] }` and `{ vise: {...} }`.
 */
export function profileController<F, A>(service: ProfileService<F, A>, listKey: string, itemKey: string) {
  return {
    async list(req: Request, res: Response) {
      res.json({ [listKey]: await service.list(ownerOf(req)) });
    },
    async create(req: Request, res: Response) {
      res.status(201).json({ [itemKey]: await service.create(ownerOf(req), req.body as F) });
    },
    async update(req: Request, res: Response) {
      res.json({
        [itemKey]: await service.update(ownerOf(req), Number(req.params.id), req.body as Partial<F>),
      });
    },
    async remove(req: Request, res: Response) {
      await service.remove(ownerOf(req), Number(req.params.id));
      res.status(204).end();
    },
  };
}
