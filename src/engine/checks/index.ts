export type { CheckResult } from "./types";
export { runTemplateChecks } from "./template-checks";
export { fitPurposeChecks } from "./fits";
export { issuesToChecks } from "./from-issues";
export { generalPartIssues, DEFAULT_MIN_WALL_MM, THREAD_ENGAGEMENT_FACTOR, type GeneralCheckOptions } from "./general";
