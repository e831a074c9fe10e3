// Runs the workplace's term check when it is present beside the repository (it is not part of the project).
import { existsSync } from "node:fs";
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { join } from "node:path";

const repo = fileURLToPath(new URL("../..", import.meta.url));
const tool = join(repo, "..", "shared", "tools", "term-check.mjs");
if (!existsSync(tool)) {
  console.log("term-check: tool not present here; skipped");
  process.exit(0);
}
const r = spawnSync(process.execPath, [tool, repo], { stdio: "inherit" });
process.exit(r.status ?? 1);
