import fs from "node:fs";
import path from "node:path";
import express from "express";
import helmet from "helmet";
import { pinoHttp } from "pino-http";
import type { AppConfig } from "@server/config";
import type { Database } from "@server/db";
import { createLogger, type Logger } from "@server/lib/logger";
import "@server/lib/express-user";
import { csrfProtection } from "@server/middleware/csrf";
import { errorHandler } from "@server/middleware/error-handler";
import { notFoundHandler } from "@server/middleware/not-found";
import { healthRouter } from "@server/modules/health/router";
import { userRepository } from "@server/modules/auth/repository";
import { authService } from "@server/modules/auth/service";
import { createSessionLayer } from "@server/modules/auth/session";
import { authRouter } from "@server/modules/auth/router";
import { adminService } from "@server/modules/admin/service";
import { adminRouter } from "@server/modules/admin/router";
import { machinesRouter, visesRouter } from "@server/modules/profiles/router";
import {
  createDesignExports,
  createDesignService,
  createDesignUpgrades,
  designsRouter,
  sharedRouter,
  storeCatalogue,
  type TemplateCatalogue,
} from "@server/modules/designs";
import { templatesRouter, templatesService } from "@server/modules/templates";
import { calculatorsRouter, calculatorsService } from "@server/modules/calculators";
import { modelRouter, modelService } from "@server/modules/model";
import { exportRouter, exportService } from "@server/modules/exports";
import type { KernelPool } from "@server/kernel";
import { builtInTemplates, type TemplateStore } from "@server/templates";

/**
 * Everything the app needs from outside, passed in (tests pass a test database and a silent logger).
 * Areas that need more add an optional field here (e.g. `kernel?: …`) and read it when mounting.
 */
export interface AppDeps {
  config: AppConfig;
  db: Database;
  /** Defaults to a logger at `config.logLevel`. */
  logger?: Logger;
  /** How long `/api/health` waits for the database before answering 503. */
  healthTimeoutMs?: number;
  /** Which templates exist and their current versions, for saved designs (tests pass their own). */
  templateCatalogue?: TemplateCatalogue;
  /** The compiled template catalogue (defaults to the built-in templates, loaded once; a broken one fails start-up). */
  templates?: TemplateStore;
  /** The solid kernel's worker pool (server/kernel); without it the 3D model routes answer 503. */
  kernel?: KernelPool;
  /** Size of the encoded 3D-model cache, MB. */
  modelCacheMb?: number;
}

/** JSON bodies above this are refused with 413. Routes taking uploads set their own limit. */
export const jsonBodyLimit = "1mb";

/**
 * Builds the Express app without listening (server/index.ts listens; tests use supertest on it).
 * Order: security headers → request log → health (no session) → body parsing → session + passport →
 * CSRF → routers → /api 404 → built client (production) → 404 → central error handler.
 */
export function createApp(deps: AppDeps): express.Express {
  const { config, db } = deps;
  const logger = deps.logger ?? createLogger(config.logLevel);
  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", config.trustProxy);
  app.set("query parser", "simple");

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          "img-src": ["'self'", "data:", "blob:"],
          "worker-src": ["'self'", "blob:"],
          "connect-src": ["'self'"],
          // The app is served over plain http on loopback by default; upgrading would break it there.
          "upgrade-insecure-requests": null,
        },
      },
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === "/api/health" },
      // One short line per request: no headers (they hold cookies and tokens).
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? "error" : res.statusCode >= 400 ? "warn" : "info"),
    }),
  );

  app.use("/api/health", healthRouter(db.sequelize, deps.healthTimeoutMs ?? 1000));

  app.use("/api", express.json({ limit: jsonBodyLimit }));
  const users = userRepository(db.models);
  const auth = authService(users);
  const sessionLayer = createSessionLayer(config, db, auth);
  app.locals.sessionLayer = sessionLayer;
  app.use("/api", ...sessionLayer.handlers);
  app.use("/api", csrfProtection);

  app.use("/api/auth", authRouter(auth, sessionLayer, config.rateLimit));
  app.use("/api/admin", adminRouter(adminService(users)));

  // --- feature routers ---
  // Mount each area's router here, one line each: app.use("/api/<area>", <area>Router(deps));
  app.use("/api/vises", visesRouter(db.models));
  app.use("/api/machines", machinesRouter(db.models));
  const templateStore = deps.templates ?? builtInTemplates();
  const designs = createDesignService(db.models, deps.templateCatalogue ?? storeCatalogue(templateStore));
  app.use(
    "/api/designs",
    designsRouter(
      designs,
      createDesignExports(db.models, templateStore, deps.kernel),
      createDesignUpgrades(db.models, templateStore),
    ),
  );
  app.use("/api/shared", sharedRouter(designs));
  app.use("/api/templates", templatesRouter(templatesService(templateStore)));
  app.use("/api/calculators", calculatorsRouter(calculatorsService()));
  app.use("/api/templates", modelRouter(modelService({ templates: templateStore, kernel: deps.kernel, cacheMb: deps.modelCacheMb })));
  app.use("/api/templates", exportRouter(exportService({ templates: deps.templates ?? builtInTemplates(), kernel: deps.kernel })));
  // --- end feature routers ---

  app.use("/api", notFoundHandler);

  if (config.serveClient) mountClient(app, config.clientDir, logger);

  app.use(notFoundHandler);
  app.use(errorHandler(logger));
  return app;
}

/**
 * Serves the built client and answers every other GET with index.html (history fallback, so a reload
 * of /admin works). /api paths never reach here: they were answered or 404'd above.
 */
function mountClient(app: express.Express, clientDir: string, logger: Logger): void {
  const indexHtml = path.join(clientDir, "index.html");
  if (!fs.existsSync(indexHtml)) {
    logger.warn({ clientDir }, "no built client found; run `npx vite build` (npm start does it for you)");
  }
  // Vite puts content-hashed files in assets/: cache those for a year, never index.html.
  app.use(
    "/assets",
    express.static(path.join(clientDir, "assets"), { immutable: true, maxAge: "365d", fallthrough: true }),
  );
  app.use(express.static(clientDir, { index: false, maxAge: 0 }));
  app.get("/{*splat}", (req, res, next) => {
    // /api is answered above; a path with a file extension is a missing file, not a client route.
    if (req.path.startsWith("/api/") || req.path === "/api" || /\.[A-Za-z0-9]+$/.test(req.path)) return next();
    res.setHeader("Cache-Control", "no-cache");
    res.sendFile(indexHtml, (err) => {
      if (err) next(err);
    });
  });
}
