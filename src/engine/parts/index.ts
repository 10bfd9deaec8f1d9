/** The part model: vocabulary, resolution, the degenerate-geometry guard and analytic sizes. */
export * from "./features";
export { partBoundingBox, partMassKg, partMassKgOrUndefined, partStockEnvelope, partVolumeMm3, baseVolumeMm3, removedVolumeMm3, holeLengthMm, internalThreadBore, isRadial, radialVolume, type BoundingBox, type StockEnvelope } from "./analytic";
export { baseGeometry, availableDepth, stepAt, type BaseGeometry, type TurnedStepSpan } from "./frame";
export { guardPart, MIN_SIZE_MM, MAX_PATTERN_COUNT } from "./guard";
export { featureName, featureRef, type GeometryIssue, type LengthFormatter } from "./issues";
export { expandPattern, patternCopy } from "./patterns";
export { resolveParts, validateResolvedPart, type ResolvedParts, type ResolvePartsOptions } from "./resolve";
export { metricThread, ISO_261_COARSE_PITCH_MM, TAP_RUN_OUT_PITCHES, type MetricThreadGeometry } from "./threads";
