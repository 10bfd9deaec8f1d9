/**
 * From resolved parts to the shop floor: the cut list (stock to buy, blanks to saw, weights) and the
 * operation sheet (ordered operations with tools and speeds). Pure: plain data in, plain data out.
 */
export { buildCutList, cutListCsv, csvField, KG_PER_LB, MM_PER_INCH, type CutList, type CutListOptions, type CutListRow } from "./cut-list";
export { buildOperationSheet, partOperations, PARTING_SPEED_FRACTION } from "./operations/build";
export type { MachiningOperation, Machine, OperationKind, OperationSheet, OperationSheetOptions, PartOperations } from "./operations/types";
export { OPERATION_KINDS } from "./operations/types";
export { chooseStock, DEFAULT_ALLOWANCES, type AppliedAllowances, type StockChoice } from "./stock";
export * from "./stock-sizes";
export { defaultHoleData, type HoleData, type ThreadData } from "./hole-data";
