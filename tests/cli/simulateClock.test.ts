/**
 * `taut simulate --duration S` runs exactly S seconds: the control interval is exactly 0.1 s whatever the
 * integrator's step (a 0.1 s interval of 33 steps of 3 ms used to last 0.099 s, and 400 s ended at 396 s).
 */
import { describe, expect, it } from "vitest";
import { taut } from "../tools/cli.js";

const demo = "profiles/cases/demo-aggregate-ashvale.json";

describe("taut simulate --duration", () => {
  it.each([400, 12.3])("ends at %s s", async (duration) => {
    const r = await taut("simulate", demo, "--sequence", "1@0,2@20,4@35", "--duration", String(duration), "--json");
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const report = JSON.parse(r.stdout) as { final: { time_s: number } };
    expect(report.final.time_s).toBe(duration);
  });
});
