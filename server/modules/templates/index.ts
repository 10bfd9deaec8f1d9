export { templatesRouter } from "./router";
export { templatesService, type TemplatesService, type EvaluationDto, type TemplateSummaryDto } from "./service";
