/** One problem with one parameter, phrased for the person who typed it (their units). */
export interface ParameterIssue {
  /** The parameter key as the user sent it (or "units"). */
  key: string;
  /** Dotted path for API error details: `parameters.jawThickness`. */
  path: string;
  /** Names the parameter, the value received and what is allowed. */
  message: string;
  received: unknown;
  /** The allowed range or list, in the user's units, e.g. "6–30 mm" or "mild-steel, brass". */
  allowed?: string;
}

/** Thrown when any parameter is unknown, of the wrong type, out of range or not in its list. */
export class ParameterResolutionError extends Error {
  constructor(readonly issues: ParameterIssue[]) {
    super(issues.length === 1 ? issues[0]!.message : `${issues.length} parameters are not acceptable: ${issues.map((i) => i.message).join(" ")}`);
    this.name = "ParameterResolutionError";
  }
}
