import { memo } from "react";
import { cn } from "@/components/ui/cn";
import type { EccentricCamInput } from "@/engine/calculators/eccentric-cam/schema";
import type { CamResult } from "../api/cam-result-schema";
import type { CamFieldKey } from "../model/fields";
import { unitOf, type Quantity, type UnitSystem } from "../model/units";
import { CamCurveChart, type ShownUnit } from "@/components/charts/cam-curve-chart";
import { CamFigures } from "./cam-figures";
import { Cautions } from "./cautions";
import { Explanation } from "./explanation";
import { MomentBalance } from "./moment-balance";
import { Sources } from "./sources";
import { Suggestions } from "./suggestions";
import { Verdict } from "./verdict";

/** A unit of the cam check in the shape the shared chart takes; forces to whole newtons or 0.1 lbf. */
function shownUnit(system: UnitSystem, quantity: Quantity): ShownUnit {
  const info = unitOf(system, quantity);
  const decimals = quantity === "force" ? (system === "inch" ? 1 : 0) : info.decimals;
  return { symbol: info.symbol, perBase: info.fromBase, decimals };
}

/**
 * Everything computed for one cam. Memoised: typing changes the inputs on every key, but this (and its
 * chart) only renders again when a new result arrives, the units change, or it goes stale.
 */
export const CamResults = memo(function CamResults({
  shown,
  system,
  stale,
  updating,
  onTry,
}: {
  shown: { input: EccentricCamInput; result: CamResult };
  system: UnitSystem;
  /** The inputs have a problem: these figures are for the last good cam. */
  stale: boolean;
  updating: boolean;
  onTry: (key: CamFieldKey, baseValue: number) => void;
}) {
  const { result } = shown;
  return (
    <div
      className={cn("space-y-6 transition-opacity", stale ? "opacity-70" : undefined)}
      aria-busy={updating}
    >
      <div aria-live="polite">
        <Verdict result={result} system={system} />
      </div>
      <div className="grid gap-6 xl:grid-cols-[1fr_20rem]">
        <CamFigures result={result} system={system} />
        <Cautions cautions={result.cautions} />
      </div>
      <Explanation result={result}>
        <MomentBalance result={result} system={system} />
      </Explanation>
      <CamCurveChart
        curve={result.curve}
        engageAngleDeg={result.engageAngleDeg}
        throwMm={result.throwMm}
        workingZone={result.workingZone}
        length={shownUnit(system, "length")}
        force={shownUnit(system, "force")}
        showEarlierForce
      />
      <Suggestions suggestions={result.suggestions} system={system} onTry={onTry} />
      <Sources sources={result.sources} zoneBasis={result.workingZone.basis} />
    </div>
  );
});
