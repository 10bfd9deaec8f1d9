export {
  CUTTING_GROUPS,
  MATERIAL_KEYS,
  isMaterialKey,
  materialKeySchema,
  materials,
  type CuttingGroup,
  type FrictionFamily,
  type Material,
  type MaterialFigure,
  type MaterialKey,
} from "./catalogue";
export { getMaterial } from "./lookup";
export { FRICTION_PAIRS, frictionCoefficient, frictionPair, type FrictionPair } from "./friction";
