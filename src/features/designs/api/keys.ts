/**
 * Query keys of saved designs, general → specific: `designKeys.all` covers the list and every detail,
 * so any change to a design refreshes both. The public shared view has its own root (no sign-in).
 */
export const designKeys = {
  all: ["designs"] as const,
  list: () => ["designs", "list"] as const,
  detail: (id: number) => ["designs", "detail", id] as const,
  /** What changes on the current template version, with values shown in `units`. */
  upgrade: (id: number, units: string) => ["designs", "detail", id, "upgrade", units] as const,
  shared: (token: string) => ["shared-designs", token] as const,
};
