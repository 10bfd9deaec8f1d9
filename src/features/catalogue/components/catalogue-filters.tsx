import { cn } from "@/components/ui/cn";
import { familyLabel } from "../model/filter";

/** Search by words and a row of family buttons (radio buttons, so arrow keys move between them). */
export function CatalogueFilters({
  query,
  onQuery,
  family,
  onFamily,
  families,
  total,
}: {
  query: string;
  onQuery: (q: string) => void;
  family: string | null;
  onFamily: (f: string | null) => void;
  families: Array<{ family: string; count: number }>;
  total: number;
}) {
  const chip = (active: boolean) =>
    cn(
      "inline-flex min-h-10 cursor-pointer items-center gap-1.5 rounded-full border px-4 font-semibold has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-spark-500",
      active
        ? "border-steel-900 bg-steel-900 text-white"
        : "border-steel-300 bg-white text-steel-800 hover:bg-steel-100",
    );
  const options: Array<{ value: string | null; label: string; count: number }> = [
    { value: null, label: "All", count: total },
    ...families.map((f) => ({ value: f.family, label: familyLabel(f.family), count: f.count })),
  ];
  return (
    <div className="flex flex-col gap-4 md:flex-row md:items-end md:justify-between">
      <fieldset>
        <legend className="mb-1 font-semibold text-steel-900">Family</legend>
        <div className="flex flex-wrap gap-2">
          {options.map((o) => (
            <label key={o.value ?? "all"} className={chip(family === o.value)}>
              <input
                type="radio"
                name="family"
                className="sr-only"
                checked={family === o.value}
                onChange={() => onFamily(o.value)}
              />
              {o.label}
              <span className="figure text-sm opacity-80">{o.count}</span>
            </label>
          ))}
        </div>
      </fieldset>
      <div className="flex flex-col gap-1 md:w-80">
        <label htmlFor="catalogue-search" className="font-semibold text-steel-900">
          Search templates
        </label>
        <input
          id="catalogue-search"
          type="search"
          value={query}
          onChange={(e) => onQuery(e.target.value)}
          placeholder="e.g. cam, vise, stop"
          className="min-h-11 rounded-md border border-steel-300 bg-white px-3 text-base text-steel-950 shadow-inner placeholder:text-steel-500 hover:border-steel-400"
        />
      </div>
    </div>
  );
}
