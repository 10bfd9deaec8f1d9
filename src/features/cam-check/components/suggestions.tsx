import { Button } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import type { CamSuggestion } from "../api/cam-result-schema";
import type { CamFieldKey } from "../model/fields";
import { formatQuantity, type UnitSystem } from "../model/units";

const titles: Record<CamSuggestion["parameter"], string> = {
  eccentricity: "Smaller eccentricity",
  diameter: "Bigger cam",
  leverLength: "Longer lever",
  pivotDiameter: "Thicker pivot pin",
  muContact: "If the face is oily",
};

/** The calculator's message opens with "label from → to:", which the card already shows. */
function effectText(message: string): string {
  const cut = message.indexOf(": ");
  if (cut < 0 || !message.slice(0, cut).includes("→")) return message;
  const rest = message.slice(cut + 2);
  return rest.charAt(0).toUpperCase() + rest.slice(1);
}

const quantityOf = (p: CamSuggestion["parameter"]) => (p === "muContact" ? "coefficient" : "length");

/** Each change the calculator worked through, with its effect, and a button that makes it. */
export function Suggestions({
  suggestions,
  system,
  onTry,
}: {
  suggestions: CamSuggestion[];
  system: UnitSystem;
  onTry: (key: CamFieldKey, baseValue: number) => void;
}) {
  return (
    <section aria-labelledby="changes-heading" className="space-y-3">
      <h2 id="changes-heading" className="text-xl">
        What to change, and what each change does
      </h2>
      <ul className="grid gap-3 md:grid-cols-2">
        {suggestions.map((s) => {
          const locks = s.selfLockMargin !== null && s.selfLockMargin >= 0;
          const locksEverywhere = locks && s.selfLockMarginOverZone !== null && s.selfLockMarginOverZone >= 0;
          const tag =
            s.selfLockMargin === null
              ? "not possible"
              : locksEverywhere
                ? "locks"
                : locks
                  ? "locks at this setting"
                  : "does not lock";
          const q = quantityOf(s.parameter);
          return (
            <li
              key={s.parameter}
              className="flex flex-col gap-2 rounded-lg border border-steel-200 bg-white p-4"
            >
              <div className="flex flex-wrap items-center justify-between gap-2">
                <h3 className="text-lg">{titles[s.parameter]}</h3>
                <span
                  className={cn(
                    "rounded px-2 py-0.5 text-xs font-semibold uppercase tracking-wide",
                    locksEverywhere
                      ? "bg-holds-50 text-holds-700"
                      : locks
                        ? "bg-caution-50 text-caution-700"
                        : "bg-fault-50 text-fault-700",
                  )}
                >
                  {tag}
                </span>
              </div>
              <p className="figure text-steel-900">
                {formatQuantity(system, q, s.from)} → {formatQuantity(system, q, s.to)}
              </p>
              <p className="text-sm text-steel-700">{effectText(s.message)}</p>
              {s.selfLockMargin !== null && s.parameter !== "muContact" ? (
                <Button
                  variant="secondary"
                  className="mt-auto self-start"
                  onClick={() => onTry(s.parameter, s.to)}
                >
                  Try this change
                </Button>
              ) : null}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
