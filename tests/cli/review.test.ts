/**
 * `taut review` at the command line (INTERFACE.md "Additions"): a broken recording is bad input (exit 2,
 * the line named, nothing on standard output); a CSV log with notch and traction current whose current
 * falls by 30 % for three seconds while the notch holds reports one slip, and the adhesion it implies is
 * the notch's effort at that speed over the usable adhesive weight: F = min(F_start × share, P × share / v)
 * (W. J. White, How Diesel-Electric Locomotives Operate, 1997, p. 3-10), μ = F / (u · m_adh · g).
 */
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { GRAVITY_MPS2, planSequence, planStart } from "../../src/core/index.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { taut } from "../tools/cli.js";
import { csvText, simulatedStart } from "../tools/recordings.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const demo = `${repo}profiles/cases/demo-aggregate-ashvale.json`;

describe("taut review", () => {
  it("refuses a broken recording as bad input, naming the line, and prints no result", async () => {
    const dir = mkdtempSync(join(tmpdir(), "taut-review-cli-"));
    writeFileSync(join(dir, "bad.csv"), "time_s,speed_kmh\n0,0\n1,0\n2,x\n");
    const r = await taut("review", demo, join(dir, "bad.csv"), "--json");
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr).toMatch(/bad\.csv.*line 4: speed_kmh must be a number/s);
    const none = await taut("review", demo);
    expect(none.code).toBe(2);
    expect((await taut("--help")).stdout).toMatch(/review/);
  });

  it("finds the slip in a log whose current falls while the notch holds, with the adhesion the notch asked", async () => {
    const parsed = parseStartCase(builtinCaseJson.find((j) => (j as { id: string }).id === "demo-aggregate-ashvale"), builtinLibrary());
    if (!parsed.ok) throw new Error("demo case invalid");
    const c = parsed.value;
    const run = simulatedStart(c, planSequence(planStart(c, { skipMassSearch: true, skipVerification: true })), { extraS: 10 });
    // A steady current for each notch, with a 30 % dip for three seconds 20 s after the last notch change.
    const lastChange = run.timeS.find((_, i) => i > 0 && run.notch[i] !== run.notch[i - 1] && run.notch.slice(i).every((n) => n === run.notch[i]))!;
    const dipAt = lastChange + 20;
    const current = run.timeS.map((t, i) => 150 * run.notch[i]! * (t >= dipAt && t < dipAt + 3 ? 0.7 : 1));
    const dir = mkdtempSync(join(tmpdir(), "taut-review-cli-"));
    writeFileSync(join(dir, "log.csv"), csvText(run, { notch: true, current }));
    const r = await taut("review", demo, join(dir, "log.csv"), "--json");
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout) as { slips: Array<{ start_s: number; notch: number; speed_kmh: number; adhesionDemand: number }>; effortFactor: unknown; separable: boolean | null };
    expect(j.slips).toHaveLength(1);
    const s = j.slips[0]!;
    expect(s.start_s).toBeCloseTo(dipAt - 1 - run.timeS[0]!, 6);
    expect(j.effortFactor).not.toBeNull();
    expect(typeof j.separable).toBe("boolean");
    const loco = JSON.parse(readFileSync(`${repo}profiles/locomotives/illustrative-6axle-3000.json`, "utf8")) as { startingTractiveEffort_kN: number; notchStartingEffort: number[]; railPower_kW: number; notchPower: number[]; adhesiveMass_t: number };
    const v = s.speed_kmh / 3.6;
    const effortN = Math.min(loco.startingTractiveEffort_kN * 1000 * loco.notchStartingEffort[s.notch - 1]!, (loco.railPower_kW * 1000 * loco.notchPower[s.notch - 1]!) / v);
    const u = c.locomotives[0]!.spec.adhesionUtilisation;
    // The speed in the JSON is rounded to 0.1 km/h: a small tolerance on μ.
    expect(s.adhesionDemand).toBeCloseTo(effortN / (u * loco.adhesiveMass_t * 1000 * GRAVITY_MPS2), 2);
  });
});
