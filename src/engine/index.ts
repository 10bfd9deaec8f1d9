/**
 * The pure engine's public surface: load and compile templates, evaluate them, and the part model.
 * No React, Express, database, file system, network, clock or randomness below this folder.
 */
export { evaluateTemplate, evaluationContract, compiledOf, type Evaluation, type EvaluateInput, type AnalysisOutcome, type PartSummary, type FixtureBox } from "./evaluate";
export * from "./template";
export { ParameterResolutionError, resolveParameters, choiceValues, allowedRange, type ParameterIssue, type ParameterValue } from "./parameters";
export type { CheckResult } from "./checks";
export { ExpressionError, ExpressionEvaluationError, compileExpression } from "./expressions";
export { partBoundingBox, partVolumeMm3, partMassKg, partStockEnvelope, expandPattern, resolveParts, type GeometryIssue } from "./parts";
