/**
 * Template expressions: a locked-down mathjs parser and a whitelist compiler (see compile.ts for the full list
 * of what is allowed and refused).
 */
export { compileExpression, Unavailable, type CompiledExpression, type CompileOptions, type ExprValue, type Scope, type StaticKind } from "./compile";
export { ExpressionError, ExpressionEvaluationError, UnavailableValueError, shorten } from "./errors";
export { CONSTANTS, FUNCTIONS, RESERVED_NAMES, cosDeg, isFunctionName, roundTo, sinDeg, tanDeg, type UnitFactors } from "./functions";
export { MAX_EXPRESSION_LENGTH, MAX_NESTING, parseExpression } from "./parse";
export { evaluateBoolean, evaluateNumber, evaluateText } from "./typed";
