/** Client routes of the catalogue and the configurator (saved designs link to the configurator the same way). */
export const templatesPath = "/templates";
export const configuratorRoute = "/templates/:id";
export const configuratorPathOf = (templateId: string) => `/templates/${encodeURIComponent(templateId)}`;
