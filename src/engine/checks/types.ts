import type { Severity } from "../template/schema";

/** One check's outcome, as the CLI, the API and the pages show it. */
export interface CheckResult {
  /** The template's check id, or `engine.<rule>.<part>[.<feature>]` for the engine's own checks. */
  id: string;
  severity: Severity;
  passed: boolean;
  /** Plain shop language with the numbers, in the user's units. */
  message: string;
  /** Parameters the check concerns (what to change to fix it). */
  parameters: string[];
}
