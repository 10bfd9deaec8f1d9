import session from "express-session";
import connectSessionSequelize from "connect-session-sequelize";
import passportModule from "passport";
import { Strategy as LocalStrategy } from "passport-local";
import type { RequestHandler } from "express";
import type { AppConfig } from "@server/config";
import type { Database } from "@server/db";
import type { AuthService } from "./service";

const SequelizeStore = connectSessionSequelize(session.Store);

/** How long a sign-in lasts without a new sign-in. */
export const sessionMaxAgeMs = 7 * 24 * 60 * 60 * 1000;
export const sessionCookieName = "jigwright.sid";

/**
 * Sessions in MariaDB (connect-session-sequelize on the `sessions` table made by migration 0002) and a
 * passport instance of this app's own (not the global singleton, so several apps can share a process).
 *
 * Cookie: HttpOnly, SameSite=Lax, Secure whenever the request arrived over HTTPS (`secure: "auto"`;
 * behind a proxy set TRUST_PROXY so Express believes X-Forwarded-Proto). A session is only stored once
 * something is put in it (a CSRF token or a sign-in).
 */
export function createSessionLayer(config: AppConfig, db: Database, auth: AuthService) {
  const store = new SequelizeStore({
    db: db.sequelize,
    table: "Session",
    expiration: sessionMaxAgeMs,
    checkExpirationInterval: 15 * 60 * 1000,
  });

  const sessionMiddleware: RequestHandler = session({
    name: sessionCookieName,
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: false,
    proxy: undefined, // follow Express's "trust proxy"
    cookie: { httpOnly: true, sameSite: "lax", secure: "auto", maxAge: sessionMaxAgeMs, path: "/" },
  });

  const passport = new passportModule.Passport();
  passport.use(
    new LocalStrategy(
      { usernameField: "email", passwordField: "password", session: true },
      (email, password, done) => {
        auth.verifyCredentials(email, password).then(
          (user) => done(null, user ?? false),
          (err: unknown) => done(err),
        );
      },
    ),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: number, done) => {
    // A deleted account simply signs out (false), a database failure becomes a 503.
    auth.findSessionUser(id).then(
      (user) => done(null, user ?? false),
      (err: unknown) => done(err),
    );
  });

  return {
    store,
    passport,
    handlers: [sessionMiddleware, passport.initialize(), passport.session()] as RequestHandler[],
    /** Stops the store's expiry timer (it is unref'd, so this is only tidiness for tests). */
    close: () => store.stopExpiringSessions(),
  };
}

export type SessionLayer = ReturnType<typeof createSessionLayer>;
