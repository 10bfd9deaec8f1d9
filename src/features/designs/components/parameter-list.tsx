import type { DesignParameters } from "@/shared/designs";
import { formatValue, humaniseKey } from "../model/present";

/** A design's values as a definition list, in the order they were saved. Values are in the template's own units. */
export function ParameterList({
  parameters,
  className,
}: {
  parameters: DesignParameters;
  className?: string;
}) {
  const entries = Object.entries(parameters);
  if (entries.length === 0) return <p className="text-steel-600">All values at the template's defaults.</p>;
  return (
    <dl className={className ?? "grid grid-cols-[auto_1fr] gap-x-4 gap-y-1"}>
      {entries.map(([key, value]) => (
        <div key={key} className="contents">
          <dt className="text-steel-700">
            {humaniseKey(key)} <span className="figure text-xs text-steel-500">({key})</span>
          </dt>
          <dd className="figure text-steel-950">{formatValue(value)}</dd>
        </div>
      ))}
    </dl>
  );
}
