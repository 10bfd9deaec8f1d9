/**
 * The one place that imports every calculator module and registers it. Import this module (not the
 * registry alone) wherever calculators are looked up: template analyses, HTTP and the CLI.
 */
import { registerCalculator } from "./registry";
import type { Calculator } from "./types";
import { fitCalculator } from "./fit";
import { generalToleranceCalculator } from "./general-tolerance";
import { threadCalculator } from "./thread";
import { reamCalculator } from "./ream";
import { counterboreCalculator } from "./counterbore";
import { eccentricCamCalculator } from "./eccentric-cam";
import { beamCalculator } from "./beam";
import { cuttingSpeedCalculator } from "./cutting-speed";
import { tSlotCalculator } from "./t-slot";
import { holdingForceCalculator } from "./holding-force";
import { strapClampCalculator } from "./strap-clamp";
import { vBlockCalculator } from "./v-block";

const all: Calculator[] = [
  fitCalculator,
  generalToleranceCalculator,
  threadCalculator,
  reamCalculator,
  counterboreCalculator,
  eccentricCamCalculator,
  beamCalculator,
  cuttingSpeedCalculator,
  tSlotCalculator,
  holdingForceCalculator,
  strapClampCalculator,
  vBlockCalculator,
];

for (const calculator of all) registerCalculator(calculator);

export { getCalculator, listCalculators } from "./registry";
export { CalculatorInputError, SETUP_CAUTION, type Calculator, type CalculatorResultMeta, type Source } from "./types";
