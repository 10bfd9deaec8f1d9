import type { FeatureKind } from "@/engine/parts/features";
import { blockBuilder } from "./block";
import { chamferBuilder } from "./chamfer";
import { eccentricBoreBuilder } from "./eccentric-bore";
import { holeBuilder } from "./hole";
import { circularPatternBuilder } from "./pattern-circular";
import { linearPatternBuilder } from "./pattern-linear";
import { pocketBuilder } from "./pocket";
import { slotBuilder } from "./slot";
import { stepBuilder } from "./step";
import { threadBuilder } from "./thread";
import { turnedBuilder } from "./turned";
import type { FeatureBuilder } from "./types";
import { vGrooveBuilder } from "./v-groove";

/**
 * One registered builder per feature kind of the engine's vocabulary. To add a kind: write
 * `builders/<kind>.ts` exporting a base, tool or modify builder, list it here, and add its pre-kernel
 * checks in `../validate.ts`.
 */
const list: FeatureBuilder[] = [
  blockBuilder,
  turnedBuilder,
  holeBuilder,
  threadBuilder,
  slotBuilder,
  pocketBuilder,
  stepBuilder,
  vGrooveBuilder,
  chamferBuilder,
  eccentricBoreBuilder,
  linearPatternBuilder,
  circularPatternBuilder,
] as FeatureBuilder[];

export const featureBuilders: ReadonlyMap<FeatureKind, FeatureBuilder> = new Map(list.map((b) => [b.kind, b]));

export type { BaseInfo, CosmeticThread, FeatureBuilder } from "./types";
