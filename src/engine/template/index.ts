export * from "./schema";
export { compileTemplate, type CompileDeps, type CompiledTemplate, type CompiledAnalysis, type CompiledCheck, type CompiledDerived, type CompiledPart } from "./compile";
export { loadAndCompileTemplate, loadTemplate, parseTemplateYaml, validateTemplateData, validateTemplateText, MAX_ALIAS_COUNT, MAX_TEMPLATE_BYTES, MAX_YAML_DEPTH, type ValidationOutcome } from "./load";
export { migrateTemplateDocument, migrations, MigrationError, type Migration } from "./migrations";
export { TemplateValidationError, type TemplateIssue } from "./issues";
export { compileMessage, renderMessage, formatValue, MessageTemplateError, type CompiledMessage } from "./message";
