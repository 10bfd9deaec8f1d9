/**
 * Recommended length of thread engagement in a tapped hole, as a multiple of the nominal diameter d, by the
 * material the hole is tapped in. Common practice (the workshop rule of thumb in machine-design handbooks,
 * from memory): steel ≈ 1.0·d, cast iron and copper alloys ≈ 1.25–1.5·d, aluminium ≈ 2·d, plastics ≈ 2–2.5·d.
 * The upper end of each range is used so a strength-grade 8.8 screw breaks before the tapped thread strips.
 */
import type { CuttingGroup } from "../../materials";

export const ENGAGEMENT_GROUPS = ["steel", "castIron", "bronze", "brass", "aluminium", "plastic"] as const;
export type EngagementGroup = (typeof ENGAGEMENT_GROUPS)[number];

export const ENGAGEMENT_FACTOR: Readonly<Record<EngagementGroup, { factor: number; range: string }>> = {
  steel: { factor: 1, range: "1.0·d" },
  castIron: { factor: 1.5, range: "1.25–1.5·d" },
  bronze: { factor: 1.5, range: "1.25–1.5·d" },
  brass: { factor: 1.5, range: "1.25–1.5·d" },
  aluminium: { factor: 2, range: "2·d" },
  plastic: { factor: 2.5, range: "2–2.5·d (threaded inserts preferred)" },
};

/** The engagement group of a catalogue material, by its cutting group. */
export function engagementGroupOf(group: CuttingGroup): EngagementGroup {
  switch (group) {
    case "steel-low-carbon":
    case "steel-free-cutting":
    case "tool-steel":
    case "stainless":
      return "steel";
    case "cast-iron":
      return "castIron";
    case "bronze":
      return "bronze";
    case "brass":
      return "brass";
    case "aluminium":
      return "aluminium";
    case "plastic":
      return "plastic";
  }
}
