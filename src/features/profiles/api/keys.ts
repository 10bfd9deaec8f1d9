/**
 * Query keys of the vise and machine profiles, general → specific, so a mutation invalidates exactly
 * the list it changed (`profileKeys.all` drops both).
 */
export const profileKeys = {
  all: ["profiles"] as const,
  vises: () => ["profiles", "vises"] as const,
  machines: () => ["profiles", "machines"] as const,
};
