import { useId, useState } from "react";
import { Link } from "react-router";
import type { Vise } from "@/shared/profiles";
import { useMyVises } from "../api/vises";

/** Which vise measurement fills which template parameter. */
export const viseParameterMap: ReadonlyArray<{
  from: keyof Pick<Vise, "jawWidthMm" | "jawHeightMm" | "jawThicknessMm">;
  to: string;
}> = [
  { from: "jawWidthMm", to: "jawWidth" },
  { from: "jawHeightMm", to: "jawHeight" },
  { from: "jawThicknessMm", to: "jawThickness" },
];

/**
 * "Fill from my vise": picking one of the signed-in user's vises writes its jaw width, height and
 * thickness into the form in one step (exactly, whatever units the form shows).
 */
export function ViseFill({
  parameterKeys,
  labelOf,
  onFill,
  visesHref,
}: {
  parameterKeys: ReadonlySet<string>;
  labelOf: (key: string) => string | undefined;
  onFill: (lengthsMm: Record<string, number>) => string[];
  visesHref: string;
}) {
  const id = useId();
  const vises = useMyVises(true);
  const [chosen, setChosen] = useState("");
  const [message, setMessage] = useState<string | null>(null);
  const usable = viseParameterMap.filter((m) => parameterKeys.has(m.to));
  if (usable.length === 0) return null;

  function fill(viseId: string) {
    setChosen(viseId);
    const vise = vises.data?.find((v) => String(v.id) === viseId);
    if (!vise) return;
    const lengths: Record<string, number> = {};
    for (const m of usable) lengths[m.to] = vise[m.from];
    const filled = onFill(lengths);
    setMessage(`Filled ${filled.map((k) => labelOf(k)?.toLowerCase() ?? k).join(", ")} from “${vise.name}”.`);
  }

  return (
    <div className="rounded-lg border border-spark-300 bg-spark-50 p-3">
      <label htmlFor={id} className="font-semibold text-steel-900">
        Fill from my vise
      </label>
      {vises.isPending ? (
        <p className="text-sm text-steel-700">Loading your vises…</p>
      ) : vises.isError ? (
        <p className="text-sm text-fault-700">Could not load your vises: {vises.error.message}</p>
      ) : vises.data.length === 0 ? (
        <p className="text-sm text-steel-700">
          You have no vises recorded yet.{" "}
          <Link to={visesHref} className="font-semibold text-spark-700 underline">
            Add your vise
          </Link>{" "}
          once and fill any template from it.
        </p>
      ) : (
        <select
          id={id}
          value={chosen}
          onChange={(e) => fill(e.target.value)}
          className="mt-1 block min-h-11 w-full rounded-md border border-steel-300 bg-white px-3"
        >
          <option value="">Choose a vise…</option>
          {vises.data.map((v) => (
            <option key={v.id} value={String(v.id)}>
              {v.name} — jaws {v.jawWidthMm} × {v.jawHeightMm} mm, {v.jawThicknessMm} mm thick
            </option>
          ))}
        </select>
      )}
      <p aria-live="polite" className="text-sm text-steel-800">
        {message}
      </p>
    </div>
  );
}
