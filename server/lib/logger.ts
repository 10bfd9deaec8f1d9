import { pino, type Logger, type LevelWithSilent } from "pino";

export type { Logger };

/**
 * The one logger of the server: JSON lines on stdout (pino). `silent` in tests.
 * Secrets never reach it: request logging redacts cookies and the CSRF header.
 */
export function createLogger(level: LevelWithSilent): Logger {
  return pino({
    level,
    base: { service: "jigwright" },
    redact: {
      paths: ["req.headers.cookie", 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]', "password"],
      censor: "[redacted]",
    },
  });
}
