/**
 * The `jigwright` command line: `npm run -s cli -- <command> …`.
 *
 * Each command is a module in ./commands exporting a {@link CliCommand}; add it to the table below.
 * Commands write their result to stdout (JSON where the contract says so) and messages to stderr.
 * Exit codes: 0 ok, 1 the job ran but its result is "not ok" (e.g. an error check failed), 2 bad input.
 */
import { commands } from "./commands";
import { CliUsageError } from "./args";

async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === "help" || name === "--help" || name === "-h") {
    process.stdout.write(usage());
    return name ? 0 : 2;
  }
  const command = commands.find((c) => c.name === name);
  if (!command) {
    process.stderr.write(`Unknown command "${name}".\n${usage()}`);
    return 2;
  }
  try {
    return await command.run(rest);
  } catch (err) {
    if (err instanceof CliUsageError) {
      process.stderr.write(`${err.message}\n`);
      return 2;
    }
    process.stderr.write(`${err instanceof Error ? (err.stack ?? err.message) : String(err)}\n`);
    return 2;
  }
}

function usage(): string {
  const lines = commands.map((c) => `  ${c.usage}\n      ${c.summary}`);
  return `Usage: npm run -s cli -- <command> [options]\n\nCommands:\n${lines.join("\n")}\n`;
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    process.stderr.write(`${String(err)}\n`);
    process.exitCode = 2;
  },
);
