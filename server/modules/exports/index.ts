export { exportRouter } from "./router";
export { exportService, type ExportService, type TemplateExportRequest } from "./service";
