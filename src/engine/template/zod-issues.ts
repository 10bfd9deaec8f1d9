/**
 * Turns zod issues into `{ path, message }` a designer can act on. For unions (the feature list is one) zod
 * reports every branch; we keep the branch that got furthest — the one whose `kind` matched — so the reason
 * is "parts[0].features[2].depth: expected number" rather than "invalid input".
 */
import type { z } from "zod";
import type { TemplateIssue } from "./issues";

type Issue = z.core.$ZodIssue;

export function formatPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const seg of path) {
    if (typeof seg === "number") out += `[${seg}]`;
    else out += out ? `.${String(seg)}` : String(seg);
  }
  return out;
}

function depth(issues: readonly Issue[]): number {
  return Math.max(0, ...issues.map((i) => i.path.length));
}

function flatten(issue: Issue, prefix: readonly PropertyKey[]): TemplateIssue[] {
  const path = [...prefix, ...issue.path];
  if (issue.code === "invalid_union" && issue.errors.length > 0) {
    // Prefer the branch whose discriminator matched (no issue on `kind`/`form`), then the deepest.
    const branches = issue.errors.filter((b) => b.length > 0);
    const matched = branches.filter((b) => !b.some((i) => i.path.length === 1 && (i.path[0] === "kind" || i.path[0] === "form")));
    const pool = matched.length > 0 ? matched : branches;
    const best = [...pool].sort((a, b) => depth(b) - depth(a) || a.length - b.length)[0];
    if (best && (matched.length > 0 || depth(best) > 1)) return best.flatMap((i) => flatten(i, path));
    const kinds = branches
      .flatMap((b) => b.filter((i) => i.code === "invalid_value" && (i.path[0] === "kind" || i.path[0] === "form")))
      .flatMap((i) => (i.code === "invalid_value" ? i.values.map(String) : []));
    if (kinds.length > 0) return [{ path: formatPath([...path, "kind"]), message: `unknown kind; expected one of ${[...new Set(kinds)].join(", ")}` }];
  }
  if (issue.code === "unrecognized_keys") {
    return issue.keys.map((k) => ({ path: formatPath([...path, k]), message: `unknown field "${k}"` }));
  }
  return [{ path: formatPath(path), message: issue.message }];
}

export function zodIssuesToTemplateIssues(error: z.ZodError): TemplateIssue[] {
  const seen = new Set<string>();
  const out: TemplateIssue[] = [];
  for (const issue of error.issues) {
    for (const t of flatten(issue, [])) {
      const key = `${t.path}|${t.message}`;
      if (!seen.has(key)) {
        seen.add(key);
        out.push(t);
      }
    }
  }
  return out;
}
