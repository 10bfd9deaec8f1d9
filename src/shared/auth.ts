import { z } from "zod";

/**
 * The sign-in and roles contract shared by client and server.
 * See PRODUCT.md "People and roles": a guest is simply someone not signed in (no role value).
 */
export const roles = ["machinist", "designer", "reviewer", "admin"] as const;
export const roleSchema = z.enum(roles, { error: `Role must be one of: ${roles.join(", ")}.` });
export type Role = z.infer<typeof roleSchema>;

/** What each role is for, in one line (used in the admin screen and the CLI help). */
export const roleSummaries: Record<Role, string> = {
  machinist: "Signed-in user: saves vise and machine profiles and designs, downloads drawing packs.",
  designer: "Trusted author: writes, validates, submits and versions templates.",
  reviewer: "Senior practitioner: approves or sends back submitted templates.",
  admin: "Operator: manages users and roles, retires templates.",
};

/** Passwords: at least 10 characters (length beats complexity rules; NIST SP 800-63B asks for ≥ 8). */
export const passwordMinLength = 10;
/** Upper bound so a huge body cannot make the slow hash a denial of service. */
export const passwordMaxLength = 200;
export const displayNameMaxLength = 80;
/** RFC 5321 limits a forward path to 256 octets including the angle brackets: 254 for the address. */
export const emailMaxLength = 254;

export const emailSchema = z
  .string({ error: "E-mail is required." })
  .trim()
  .toLowerCase()
  .max(emailMaxLength, { error: `E-mail must be at most ${emailMaxLength} characters.` })
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.org." }));

export const passwordSchema = z
  .string({ error: "Password is required." })
  .min(passwordMinLength, { error: `Password must be at least ${passwordMinLength} characters.` })
  .max(passwordMaxLength, { error: `Password must be at most ${passwordMaxLength} characters.` });

export const displayNameSchema = z
  .string({ error: "Name is required." })
  .trim()
  .min(1, { error: "Name is required." })
  .max(displayNameMaxLength, { error: `Name must be at most ${displayNameMaxLength} characters.` });

/** `POST /api/auth/register`. New accounts are always machinists. */
export const registerBodySchema = z.object({
  email: emailSchema,
  password: passwordSchema,
  displayName: displayNameSchema,
});
export type RegisterBody = z.infer<typeof registerBodySchema>;

/** `POST /api/auth/login`. The password is not length-checked here: old accounts may predate the rule. */
export const loginBodySchema = z.object({
  email: emailSchema,
  password: z
    .string({ error: "Password is required." })
    .min(1, { error: "Password is required." })
    .max(passwordMaxLength),
});
export type LoginBody = z.infer<typeof loginBodySchema>;

/** The user as the API shows it: never the password hash. `createdAt` is an ISO 8601 string. */
export const publicUserSchema = z.object({
  id: z.number().int().positive(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  createdAt: z.string(),
});
export type PublicUser = z.infer<typeof publicUserSchema>;

/**
 * `GET /api/auth/me` → 200 `{ user }`, with `user: null` for a guest (not a 401: being a guest is a
 * normal state, not an error). `POST /api/auth/register` and `/login` → 200/201 `{ user }` (non-null).
 */
export const meResponseSchema = z.object({ user: publicUserSchema.nullable() });
export type MeResponse = z.infer<typeof meResponseSchema>;
export const userResponseSchema = z.object({ user: publicUserSchema });
export type UserResponse = z.infer<typeof userResponseSchema>;

/** `GET /api/auth/csrf` → `{ csrfToken }`; send it back in the `x-csrf-token` header. */
export const csrfResponseSchema = z.object({ csrfToken: z.string() });
export type CsrfResponse = z.infer<typeof csrfResponseSchema>;

/** `GET /api/admin/users` → `{ users }`, ordered by id. */
export const userListResponseSchema = z.object({ users: z.array(publicUserSchema) });
export type UserListResponse = z.infer<typeof userListResponseSchema>;

/** `PATCH /api/admin/users/:id/role` body; answers `{ user }`. */
export const setRoleBodySchema = z.object({ role: roleSchema });
export type SetRoleBody = z.infer<typeof setRoleBodySchema>;
