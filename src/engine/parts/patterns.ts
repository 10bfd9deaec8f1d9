/**
 * Pattern expansion: the copies a linear or circular pattern stands for, as plain features. The solid
 * builders, the drawings (n× callouts) and the analytic volume all expand patterns the same way.
 */
import type { CircularPatternFeature, LinearPatternFeature, PatternableFeature } from "./features";
import { add, rotateAbout } from "./frame";

/** Copy i of a pattern (copy 0 is the feature itself). Circular copies turn `at` about the pattern axis. */
export function patternCopy(pattern: LinearPatternFeature | CircularPatternFeature, i: number): PatternableFeature {
  const f = pattern.feature;
  if (pattern.kind === "pattern-linear") return { ...f, at: add(f.at, pattern.spacing, i) } as PatternableFeature;
  const step = pattern.angleDeg ?? 360 / pattern.count;
  return { ...f, at: rotateAbout(f.at, pattern.centre, pattern.axis, step * i) } as PatternableFeature;
}

/** Every copy of a pattern, in order. `count` is rounded down and clamped to 0 (the guard refuses bad counts). */
export function expandPattern(pattern: LinearPatternFeature | CircularPatternFeature): PatternableFeature[] {
  const n = Math.max(0, Math.floor(pattern.count));
  return Array.from({ length: n }, (_, i) => patternCopy(pattern, i));
}
