/** Small, strict argument parsing shared by the CLI commands. */

/** Bad input on the command line: printed to stderr, exit code 2. */
export class CliUsageError extends Error {}

export interface CliCommand {
  /** The word after `cli --`. */
  name: string;
  /** One line of usage, e.g. `evaluate <template-id> [--set key=value]… [--units mm|in]`. */
  usage: string;
  summary: string;
  /** Returns the process exit code. */
  run(args: string[]): Promise<number>;
}

export interface ParsedArgs {
  positional: string[];
  /** Every `--name value` (or `--name=value`); repeated options keep every value in order. */
  options: Map<string, string[]>;
}

/**
 * Parses `--key value`, `--key=value` and positionals. Flags listed in `booleanFlags` take no value.
 */
export function parseArgs(args: string[], booleanFlags: readonly string[] = []): ParsedArgs {
  const positional: string[] = [];
  const options = new Map<string, string[]>();
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (!arg.startsWith("--")) {
      positional.push(arg);
      continue;
    }
    const eq = arg.indexOf("=");
    let key: string;
    let value: string;
    if (eq > 2) {
      key = arg.slice(2, eq);
      value = arg.slice(eq + 1);
    } else {
      key = arg.slice(2);
      if (booleanFlags.includes(key)) {
        value = "true";
      } else {
        const next = args[i + 1];
        if (next === undefined || (next.startsWith("--") && !/^--?\d/.test(next))) {
          throw new CliUsageError(`Option --${key} needs a value.`);
        }
        value = next;
        i++;
      }
    }
    const list = options.get(key) ?? [];
    list.push(value);
    options.set(key, list);
  }
  return { positional, options };
}

/** The single value of an option, or undefined; more than one is an error. */
export function single(parsed: ParsedArgs, key: string): string | undefined {
  const values = parsed.options.get(key);
  if (!values) return undefined;
  if (values.length > 1) throw new CliUsageError(`Option --${key} was given more than once.`);
  return values[0];
}

/** Refuses options the command does not know, naming them. */
export function rejectUnknown(parsed: ParsedArgs, known: readonly string[]): void {
  const unknown = [...parsed.options.keys()].filter((k) => !known.includes(k));
  if (unknown.length > 0) {
    throw new CliUsageError(`Unknown option${unknown.length > 1 ? "s" : ""}: ${unknown.map((k) => `--${k}`).join(", ")}.`);
  }
}
