import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { repoRoot } from "./instances";

/** Newest modification time under `p` (a file or a folder, recursively), 0 if missing. */
function newestMtime(p: string): number {
  let stat: fs.Stats;
  try {
    stat = fs.statSync(p);
  } catch {
    return 0;
  }
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = 0;
  for (const entry of fs.readdirSync(p)) newest = Math.max(newest, newestMtime(path.join(p, entry)));
  return newest;
}

/** The inputs of the client build: if any is newer than dist/client/index.html, it is rebuilt. */
const clientSources = ["src", "public", "index.html", "vite.config.ts", "package-lock.json", "tsconfig.json"];

export function clientBuildIsStale(root = repoRoot): boolean {
  const built = newestMtime(path.join(root, "dist", "client", "index.html"));
  if (built === 0) return true;
  return clientSources.some((s) => newestMtime(path.join(root, s)) > built);
}

/** Runs `vite build` when the built client is missing or older than its sources. Returns whether it built. */
export function buildClientIfNeeded(log: (line: string) => void, root = repoRoot): boolean {
  if (!clientBuildIsStale(root)) return false;
  log("Building the client (vite build)…");
  const vite = path.join(root, "node_modules", ".bin", "vite");
  const r = spawnSync(vite, ["build", "--logLevel", "warn"], { cwd: root, stdio: "inherit" });
  if (r.status !== 0) throw new Error("vite build failed (see above).");
  return true;
}
