import type { CliCommand } from "../args";
import { exportCommand } from "./export";
import { userCommand } from "./user";
import { listCommand } from "./list";
import { evaluateCommand } from "./evaluate";
import { calcCommand } from "./calc";
import { validateCommand } from "./validate";
import { modelCommand } from "./model";

/**
 * The command table. Each command lives in its own file in this folder; list it here.
 * Engine commands (list, evaluate, calc, validate) must not open the database.
 */
export const commands: CliCommand[] = [userCommand, exportCommand, listCommand, evaluateCommand, calcCommand, validateCommand, modelCommand];
