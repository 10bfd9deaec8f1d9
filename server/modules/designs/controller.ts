import type { Request, Response } from "express";
import type { DesignUpgradeQuery } from "@/shared/design-upgrade";
import type {
  CreateDesignBody,
  DesignExportQuery,
  DuplicateDesignBody,
  UpdateDesignBody,
} from "@/shared/designs";
import { abortOnClose, sendDownload, today } from "@server/lib/downloads";
import type { DesignExportService } from "./export-service";
import type { DesignService } from "./service";
import type { DesignUpgradeService } from "./upgrade-service";

function ownerOf(req: Request): number {
  if (!req.user) throw new Error("designs route mounted without requireUser");
  return req.user.id;
}

/** The site address the request came to (honours "trust proxy" for the scheme), for share URLs. */
export function originOf(req: Request): string {
  return `${req.protocol}://${req.get("host") ?? "localhost"}`;
}

const idOf = (req: Request) => Number(req.params.id);

/** The only designs code touching req/res. */
export function designController(
  designs: DesignService,
  exports?: DesignExportService,
  upgrades?: DesignUpgradeService,
) {
  return {
    async upgrade(req: Request, res: Response) {
      if (!upgrades) throw new Error("upgrade route mounted without an upgrade service");
      const query = res.locals.query as DesignUpgradeQuery;
      res.json({ upgrade: await upgrades.report(ownerOf(req), idOf(req), query) });
    },
    async exportFile(req: Request, res: Response) {
      if (!exports) throw new Error("export route mounted without an export service");
      const query = res.locals.query as DesignExportQuery;
      const file = await exports.export(ownerOf(req), idOf(req), {
        ...query,
        drawnBy: req.user?.displayName ?? "Jigwright user",
        date: today(),
        signal: abortOnClose(res),
      });
      sendDownload(res, file);
    },
    async list(req: Request, res: Response) {
      res.json({ designs: await designs.list(ownerOf(req), originOf(req)) });
    },
    async create(req: Request, res: Response) {
      res.status(201).json({ design: await designs.create(ownerOf(req), req.body as CreateDesignBody) });
    },
    async get(req: Request, res: Response) {
      res.json({ design: await designs.get(ownerOf(req), idOf(req), originOf(req)) });
    },
    async update(req: Request, res: Response) {
      res.json({
        design: await designs.update(ownerOf(req), idOf(req), req.body as UpdateDesignBody, originOf(req)),
      });
    },
    async duplicate(req: Request, res: Response) {
      const body = (req.body ?? {}) as DuplicateDesignBody;
      res
        .status(201)
        .json({ design: await designs.duplicate(ownerOf(req), idOf(req), body.name, originOf(req)) });
    },
    async remove(req: Request, res: Response) {
      res.json(await designs.remove(ownerOf(req), idOf(req)));
    },
    async restore(req: Request, res: Response) {
      res.json({ design: await designs.restore(ownerOf(req), idOf(req), originOf(req)) });
    },
    async share(req: Request, res: Response) {
      const { link, created } = await designs.share(ownerOf(req), idOf(req), originOf(req));
      res.status(created ? 201 : 200).json(link);
    },
    async unshare(req: Request, res: Response) {
      await designs.unshare(ownerOf(req), idOf(req));
      res.status(204).end();
    },
    async shared(req: Request, res: Response) {
      // A share page may be opened by anyone; keep shared copies out of caches that serve other people.
      res.setHeader("Cache-Control", "private, no-store");
      res.json({ design: await designs.shared(String(req.params.token)) });
    },
  };
}
