/**
 * `taut simulate` (INTERFACE.md "Other commands"): a run whose wheels slip says so first, not after a
 * "target reached". Whether a notch must slip is checked outside the simulator: tractive effort at
 * standstill is the starting effort × the notch's fraction (the locomotive file's formula) against the
 * median dry adhesion × the weight on the driving wheels (μ from profiles/conditions, PHYSICS.md §2).
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { GRAVITY_MPS2 } from "../../src/core/index.js";
import { taut } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const demo = `${repo}profiles/cases/demo-aggregate-ashvale.json`;
const HELP_EXAMPLE = "1@0,2@20,4@35,8@50";
const json = (p: string) => JSON.parse(readFileSync(`${repo}${p}`, "utf8")) as Record<string, unknown>;

describe("taut simulate: wheel slip first", () => {
  it("the help's own example asks notch 8 at a standstill for more than a dry rail's median adhesion gives", () => {
    const loco = json("profiles/locomotives/illustrative-6axle-3000.json") as { startingTractiveEffort_kN: number; notchStartingEffort: number[]; adhesiveMass_t: number };
    const conditions = json("profiles/conditions/rail-conditions.json") as { conditions: Record<string, { median: number }> };
    const demand = loco.startingTractiveEffort_kN * loco.notchStartingEffort[7]!;
    const median = conditions.conditions.dry!.median * loco.adhesiveMass_t * GRAVITY_MPS2;
    expect(demand).toBeGreaterThan(median);
  });

  it("a run that slips opens with a WARNING, and the end line does not let 'target reached' stand alone", async () => {
    expect((await taut("simulate", "--help")).stdout).toContain(HELP_EXAMPLE);
    const r = await taut("simulate", demo, "--sequence", HELP_EXAMPLE);
    expect(r.code).toBe(0);
    const j = JSON.parse((await taut("simulate", demo, "--sequence", HELP_EXAMPLE, "--json")).stdout) as {
      slipEvents: Array<{ start_s: number; end_s: number }>;
      slipTime_s: number;
      warnings: string[];
      targetReached: boolean;
    };
    expect(j.slipEvents.length).toBeGreaterThan(0);
    expect(j.slipTime_s).toBeCloseTo(j.slipEvents.reduce((t, e) => t + e.end_s - e.start_s, 0), 0);
    expect(j.warnings[0]).toMatch(/^The wheels slipped for [\d.]+ s in all/);
    expect(r.stdout.split("\n")[0]).toMatch(/^WARNING: The wheels slipped for/);
    if (j.targetReached) expect(r.stdout).toMatch(/target reached, with the wheels slipping/);
    expect(r.stdout).not.toMatch(/\(target reached\)$/m);
  });

  it("a gentle sequence that does not slip has no warning", async () => {
    const r = await taut("simulate", demo, "--sequence", "1@0,2@20,3@35,4@50,5@70", "--json");
    const j = JSON.parse(r.stdout) as { slipEvents: unknown[]; warnings: string[]; slipTime_s: number };
    expect(j.slipEvents).toEqual([]);
    expect(j.warnings).toEqual([]);
    expect(j.slipTime_s).toBe(0);
  });
});
