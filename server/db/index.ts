import { Sequelize } from "sequelize";
import type { DbConfig } from "@server/config";
import type { Logger } from "@server/lib/logger";
import { defineModels, type Models } from "./models";

/** An open database: the Sequelize instance and the models defined on it. */
export interface Database {
  sequelize: Sequelize;
  models: Models;
  config: DbConfig;
  close(): Promise<void>;
}

/**
 * Opens a connection pool (dialect mariadb, connector `mariadb` 3.0.2 — see STACK.md on why not newer).
 * Nothing is created or synced here: the schema comes from migrations only (`migrate()`).
 * Connections fail fast (1 s) so a missing database shows as 503 instead of hanging requests.
 */
export function createDatabase(config: DbConfig, logger?: Logger): Database {
  const sequelize = new Sequelize(config.database, config.user, config.password, {
    dialect: "mariadb",
    host: config.host,
    port: config.port,
    logging: logger ? (sql: string) => logger.trace({ sql }, "sql") : false,
    timezone: "+00:00",
    define: { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
    dialectOptions: { connectTimeout: 1000 },
    pool: { max: config.poolMax, min: 0, acquire: 3000, idle: 10_000, evict: 5000 },
    retry: { max: 1 },
  });
  const models = defineModels(sequelize);
  return {
    sequelize,
    models,
    config,
    close: () => sequelize.close(),
  };
}
