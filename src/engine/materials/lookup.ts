import { CalculatorInputError } from "../calculators/types";
import { isMaterialKey, MATERIAL_KEYS, materials, type Material } from "./catalogue";

/** The catalogue entry for a key; throws CalculatorInputError naming the valid keys for anything else. */
export function getMaterial(key: string): Material {
  if (!isMaterialKey(key)) {
    throw new CalculatorInputError(`Unknown material "${key}". Known materials: ${MATERIAL_KEYS.join(", ")}.`, "material");
  }
  return materials[key];
}
