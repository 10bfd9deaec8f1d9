export { ParameterResolutionError, type ParameterIssue } from "./errors";
export { allowedRange, choiceValues, resolveParameters, type ParameterValue, type ResolvedParameters, type ResolveOptions } from "./resolve";
