import { QueryTypes, type Sequelize } from "sequelize";

/**
 * True when the database answers `SELECT 1` within `timeoutMs`. A raw query on purpose: it is also the
 * canary for the connector bug in STACK.md (raw queries failing under mariadb ≥ 3.1). Never throws.
 */
export async function pingDatabase(sequelize: Sequelize, timeoutMs = 1000): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<false>((resolve) => {
    timer = setTimeout(() => resolve(false), timeoutMs);
  });
  const ping = sequelize
    .query<{ ok: number }>("SELECT 1 AS ok", { type: QueryTypes.SELECT })
    .then((rows) => rows[0]?.ok === 1)
    .catch(() => false);
  try {
    return await Promise.race([ping, timeout]);
  } finally {
    clearTimeout(timer);
  }
}
