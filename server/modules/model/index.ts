export { modelRouter } from "./router";
export { modelService, type ModelService, type PreparedModel } from "./service";
export { guardPartsForKernel, kernelErrorToHttp } from "./kernel-http";
export { parametersFromQuery } from "./query";
