/** A reason a template is refused: where (a dotted path such as `parts[2].features[0].size.x`) and why. */
export interface TemplateIssue {
  path: string;
  message: string;
}

/** Thrown when a template fails to load, validate or compile; lists every reason found. */
export class TemplateValidationError extends Error {
  constructor(
    readonly issues: TemplateIssue[],
    readonly source?: string,
  ) {
    const head = source ? `Template ${source} is not valid` : "The template is not valid";
    const shown = issues.slice(0, 8).map((i) => `  - ${i.path || "(document)"}: ${i.message}`);
    const more = issues.length > 8 ? [`  … and ${issues.length - 8} more`] : [];
    super(`${head} (${issues.length} problem${issues.length === 1 ? "" : "s"}):\n${[...shown, ...more].join("\n")}`);
    this.name = "TemplateValidationError";
  }
}
