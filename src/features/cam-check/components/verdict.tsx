import { cn } from "@/components/ui/cn";
import type { CamResult } from "../api/cam-result-schema";
import { formatQuantity, type UnitSystem } from "../model/units";

const percent = (fraction: number) => `${fraction >= 0 ? "+" : "−"}${Math.abs(Math.round(fraction * 100))} %`;

type Tone = "holds" | "caution" | "fault";

/** Three outcomes a learner must tell apart at a glance: locks, locks only where set, does not lock. */
export function lockVerdict(result: CamResult): { tone: Tone; title: string; text: string } {
  if (!result.selfLocking) {
    return {
      tone: "fault",
      title: "Does not lock",
      text: "Let go of the lever and this cam turns back: the load on it is stronger than the friction holding it.",
    };
  }
  if (!result.selfLockingOverZone) {
    return {
      tone: "caution",
      title: "Locks at this setting only",
      text: "It holds where it meets the work now, but not everywhere in its working zone: a thinner workpiece or wear can make it slip.",
    };
  }
  return {
    tone: "holds",
    title: "Locks by itself",
    text: "Friction holds more than the load can turn back, at this setting and anywhere in its working zone.",
  };
}

const toneClasses: Record<Tone, string> = {
  holds: "border-holds-600 bg-holds-50 text-holds-700",
  caution: "border-caution-700 bg-caution-50 text-caution-700",
  fault: "border-fault-700 bg-fault-50 text-fault-700",
};

const icons: Record<Tone, string> = { holds: "✔", caution: "!", fault: "✖" };

export function Verdict({ result, system }: { result: CamResult; system: UnitSystem }) {
  const v = lockVerdict(result);
  return (
    <div
      className={cn("rounded-lg border-2 p-4", toneClasses[v.tone])}
      data-testid="lock-verdict"
      data-tone={v.tone}
    >
      <div className="flex items-start gap-3">
        <span
          aria-hidden="true"
          className="figure flex size-9 shrink-0 items-center justify-center rounded-full bg-current text-lg"
        >
          <span className="text-white">{icons[v.tone]}</span>
        </span>
        <div>
          <p className="text-2xl font-bold">{v.title}</p>
          <p className="mt-1 text-steel-800">{v.text}</p>
          <p className="figure mt-2 text-sm text-steel-800">
            Self-locking margin: {percent(result.selfLockMargin)} where it engages,{" "}
            {percent(result.selfLockMarginOverZone)} at the weakest point of the working zone
          </p>
          {v.tone === "holds" ? null : (
            <p className="mt-2 font-semibold text-steel-900">
              With everything else as entered, it locks over the whole working zone with an eccentricity of at
              most{" "}
              <span className="figure">
                {formatQuantity(system, "length", result.maxSelfLockingEccentricityMm)}
              </span>
              .
            </p>
          )}
        </div>
      </div>
    </div>
  );
}
