/** `list`: the built-in templates as a JSON array of `{ id, version, name, family }`. No database. */
import { builtInTemplates } from "@server/templates";
import { CliUsageError, parseArgs, rejectUnknown, type CliCommand } from "../args";

export const listCommand: CliCommand = {
  name: "list",
  usage: "list",
  summary: "Print the built-in templates as JSON: [{ id, version, name, family }].",
  async run(args) {
    const parsed = parseArgs(args);
    rejectUnknown(parsed, []);
    if (parsed.positional.length > 0) throw new CliUsageError(`list takes no arguments (got ${parsed.positional.join(" ")}).`);
    const rows = builtInTemplates()
      .list()
      .map(({ template: t }) => ({ id: t.id, version: t.version, name: t.name, family: t.family }));
    process.stdout.write(`${JSON.stringify(rows, null, 2)}\n`);
    return 0;
  },
};
