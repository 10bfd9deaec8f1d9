export { calculatorsRouter } from "./router";
export { calculatorsService, type CalculatorsService, type CalculatorDto } from "./service";
