/**
 * The shipped demo recording (profiles/recordings, invented data made by tests/tools/demo-recording.ts):
 * the aggregate demo train run 12 % heavier than its papers through the plan's own steps. `taut review`
 * on it, as the README tells a trainer to try, must find that factor — the figure the file was made with,
 * not one read from the program — within the ±0.05 issue 17 asks of the fit.
 */
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { taut } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));

describe("the demo recording", () => {
  it("taut review finds the train 12 % heavier (±0.05), inside its own interval", async () => {
    const r = await taut("review", `${repo}profiles/cases/demo-aggregate-ashvale.json`, `${repo}profiles/recordings/demo-aggregate-ashvale-heavier.gpx`, "--json");
    expect(r.code).toBe(0);
    const m = (JSON.parse(r.stdout) as { massFactor: { value: number; low: number; high: number } }).massFactor;
    expect(Math.abs(m.value - 1.12)).toBeLessThanOrEqual(0.05);
    expect(m.low).toBeLessThanOrEqual(1.12);
    expect(m.high).toBeGreaterThanOrEqual(1.12);
  });
});
