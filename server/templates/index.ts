export { builtInTemplates, loadTemplateStore, defaultTemplatesDir, CatalogueLoadError, type TemplateStore } from "./catalogue";
export { evaluateCached, evaluateForRequest, evaluationKey, requireBuildable, type RefusalMessages } from "./evaluation";
