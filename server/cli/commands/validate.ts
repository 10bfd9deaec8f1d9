/**
 * `validate <file.yaml>`: checks a template file exactly as an upload would be checked (size, YAML
 * safety, format migration, schema, names, limits, calculators, expressions). Prints "ok" (exit 0) or one
 * reason per line, "path: reason" (exit 1). A missing or unreadable file is bad input (exit 2). No database.
 */
import fs from "node:fs";
import "@/engine/calculators";
import { getCalculator } from "@/engine/calculators/registry";
import { MAX_TEMPLATE_BYTES, validateTemplateText } from "@/engine";
import { CliUsageError, parseArgs, rejectUnknown, type CliCommand } from "../args";

export const validateCommand: CliCommand = {
  name: "validate",
  usage: "validate <file.yaml>",
  summary: 'Check a template file; print "ok" or the reasons it fails (exit 1).',
  async run(args) {
    const parsed = parseArgs(args);
    rejectUnknown(parsed, []);
    const [file, ...extra] = parsed.positional;
    if (!file) throw new CliUsageError("Name a template file: validate <file.yaml>.");
    if (extra.length > 0) throw new CliUsageError(`Unexpected argument${extra.length > 1 ? "s" : ""}: ${extra.join(" ")}.`);
    let stat: fs.Stats;
    try {
      stat = fs.statSync(file);
    } catch {
      throw new CliUsageError(`Cannot read "${file}": no such file.`);
    }
    if (!stat.isFile()) throw new CliUsageError(`"${file}" is not a file.`);
    if (stat.size > MAX_TEMPLATE_BYTES) {
      process.stdout.write(`(document): the file is ${Math.ceil(stat.size / 1024)} KB; the limit is ${MAX_TEMPLATE_BYTES / 1024} KB\n`);
      return 1;
    }
    const outcome = validateTemplateText(fs.readFileSync(file, "utf8"), { getCalculator });
    if (outcome.ok) {
      process.stdout.write("ok\n");
      return 0;
    }
    for (const issue of outcome.issues) process.stdout.write(`${issue.path || "(document)"}: ${issue.message}\n`);
    return 1;
  },
};
