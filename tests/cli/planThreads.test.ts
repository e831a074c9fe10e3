/**
 * `taut plan` judges its mass search's first masses on worker threads while it plans (src/cli/batch/speculate.ts).
 * The answer must be the one the search gives alone: the built command line (which speculates when it has two
 * cores) prints exactly what the same command prints in-process from the sources (which does not).
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { availableParallelism, tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { taut } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));

/** A 60-wagon loaded train on a rising grade (invented, illustrative): both mass searches end at a probe. */
const CASE = {
  schema: "taut/start-case@1",
  label: "Speculation check (illustrative)",
  illustrative: true,
  locomotives: [{ profile: "illustrative-6axle-3000", count: 1, position: "head" }],
  train: { trailingMass_t: 3600, wagons: 60, length_m: 840, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970, wagonType: "bogie-hopper-loaded" },
  location: { gradient_permille: 6, curveRadius_m: 0, clearAhead_m: 2000 },
  conditions: { rail: "wet", sand: true, temperature_C: 5 },
  target: { speed_kmh: 20 },
};

describe("taut plan with the mass search's probes on worker threads", () => {
  it.skipIf(availableParallelism() < 2)("prints the same plan, masses and assistance as without them", async () => {
    const dir = mkdtempSync(join(tmpdir(), "taut-spec-"));
    try {
      const file = join(dir, "case.json");
      writeFileSync(file, JSON.stringify(CASE));
      const r = spawnSync(process.execPath, ["src/cli/taut.mjs", "plan", file, "--json"], { cwd: repo, encoding: "utf8", timeout: 120_000 });
      expect(r.stderr).toBe("");
      expect(r.status).toBe(0);
      const alone = await taut("plan", file, "--json");
      expect(alone.code).toBe(0);
      const threaded = JSON.parse(r.stdout) as { maxStartableMass_t: number; largestMarginalMass_t: number };
      expect(threaded.maxStartableMass_t).toBeGreaterThan(0);
      expect(threaded).toEqual(JSON.parse(alone.stdout));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
