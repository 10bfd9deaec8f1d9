/**
 * Query key factories: array keys holding every variable the fetch uses, general → specific, so a
 * mutation can invalidate exactly what it changed (`queryKeys.admin.all` drops every admin query).
 */
export const queryKeys = {
  auth: {
    all: ["auth"] as const,
    me: () => ["auth", "me"] as const,
  },
  admin: {
    all: ["admin"] as const,
    users: () => ["admin", "users"] as const,
  },
  calculators: {
    all: ["calculators"] as const,
    result: (kind: string, input: unknown) => ["calculators", kind, input] as const,
  },
};
