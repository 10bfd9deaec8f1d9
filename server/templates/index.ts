export { builtInTemplates, loadTemplateStore, defaultTemplatesDir, CatalogueLoadError, type TemplateStore } from "./catalogue";
