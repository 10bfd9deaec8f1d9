import type { CliCommand } from "../args";
import { userCommand } from "./user";

/**
 * The command table. Each command lives in its own file in this folder; list it here.
 * Engine commands (list, evaluate, calc, validate) must not open the database.
 */
export const commands: CliCommand[] = [userCommand];
