import type { TemplateSummary } from "../api/get-templates";

/** Family keys of the template format, in words a machinist uses. */
export const familyLabels: Record<string, string> = {
  stop: "Stops",
  clamp: "Clamps",
  parallels: "Parallels",
  "soft-jaws": "Soft jaws",
  block: "Blocks",
  fixture: "Fixtures",
  gauge: "Gauges",
  other: "Other",
};

export const familyLabel = (family: string) => familyLabels[family] ?? family.replace(/-/g, " ");

/** Lower case, accents folded, so "Vise" finds "vise" and "étau" finds "etau". */
function fold(text: string): string {
  return text
    .normalize("NFD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase();
}

/** The words of a search: split on anything that is not a letter or digit. */
export function searchWords(query: string): string[] {
  return fold(query)
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean);
}

/**
 * Templates matching a family (null = all) and every word of the search, each word found at the start of
 * a word in the name, summary, family or id ("cam" finds "cam-lock", "stop" finds "stops").
 */
export function filterTemplates(
  templates: readonly TemplateSummary[],
  family: string | null,
  query: string,
): TemplateSummary[] {
  const words = searchWords(query);
  return templates.filter((t) => {
    if (family && t.family !== family) return false;
    if (words.length === 0) return true;
    const haystack = searchWords(`${t.name} ${t.summary} ${t.family} ${familyLabel(t.family)} ${t.id}`);
    return words.every((w) => haystack.some((h) => h.startsWith(w)));
  });
}

/** The families present, in the format's order, with how many templates each holds. */
export function familiesOf(templates: readonly TemplateSummary[]): Array<{ family: string; count: number }> {
  const order = Object.keys(familyLabels);
  const counts = new Map<string, number>();
  for (const t of templates) counts.set(t.family, (counts.get(t.family) ?? 0) + 1);
  return [...counts.entries()]
    .map(([family, count]) => ({ family, count }))
    .sort(
      (a, b) =>
        (order.indexOf(a.family) + 1 || 99) - (order.indexOf(b.family) + 1 || 99) ||
        a.family.localeCompare(b.family),
    );
}
