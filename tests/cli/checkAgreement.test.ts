/**
 * The app's Departures screen and `taut check` give one answer per departure: the same order when asked for
 * risk first (needs assistance, marginal, starts, each by margin), the same figures with the same rounding
 * (margin to two decimals from the three the JSON gives, the largest startable mass rounded down to whole
 * tonnes) and the same CSV. The app's side runs its worker job (src/worker/jobs.ts) and formats with its own
 * functions; the command line's side runs its batch and renders its table. Four quick departures of the demo
 * day (the covered goods trains, 30 vans each) keep this to seconds.
 */
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { margin, showAtMost } from "../../src/app/format.js";
import { byRisk, departuresCsv, type DepartureRow as AppRow } from "../../src/app/screens/Departures/rows.js";
import { limitWord } from "../../src/app/screens/shared/words.js";
import { checkDepartures } from "../../src/cli/batch/checkDepartures.js";
import { readDepartures } from "../../src/cli/batch/departures.js";
import { JobPool } from "../../src/cli/batch/pool.js";
import { checkCsv, renderCheck } from "../../src/cli/render/check.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { sortByRisk } from "../../src/profiles/riskOrder.js";
import { runCheck } from "../../src/worker/jobs.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));

describe("Departures in the app and taut check", () => {
  it("agree on the order by risk and on every figure of every row", async () => {
    const all = readDepartures(`${repo}profiles/departures/demo-day.json`, builtinLibrary());
    const deps = all.filter((d) => d.id.startsWith("goods-"));
    expect(deps.length).toBeGreaterThanOrEqual(4);
    // The command line: its batch on this thread, then `--sort risk`'s order.
    const pool = new JobPool(1);
    let cli;
    try {
      cli = (await checkDepartures(deps, pool)).rows;
    } finally {
      await pool.close();
    }
    const cliByRisk = sortByRisk(cli, (x, order) => ({ verdict: x.verdict, margin: x.margin, order, failed: x.error !== undefined }));
    // The app: its worker's job for each departure, its rows and its order.
    const app: AppRow[] = deps.map((d, order) => ({
      id: d.id,
      where: d.where,
      order,
      ...(d.index !== undefined ? { index: d.index } : {}),
      rail: d.case!.conditions.rail,
      sand: d.case!.conditions.sand,
      trailingMassKg: d.case!.train.trailingMassKg,
      answer: runCheck(d.case!),
    }));
    expect(byRisk(app).map((x) => x.id)).toEqual(cliByRisk.map((x) => x.id));
    // Every row's figures read the same on the screen and in `taut check`'s table.
    const table = renderCheck(cliByRisk, []);
    for (const x of app) {
      const a = x.answer!;
      const line = table.split("\n").find((l) => l.startsWith(`${x.id} `))!;
      const cells = line.split(/\s{2,}/);
      expect(cells[5], x.id).toBe(a.verdict.replace("-", " "));
      // The margin with the limit it is of, as the screen gives it.
      expect(cells[7], x.id).toBe(`${margin(a.margin).replace("× ", "")} (${limitWord(a.binding)})`);
      const mass = a.maxStartableMassKg >= 1000 ? showAtMost("mass", a.maxStartableMassKg, "metric").replace(/ t$/, "").replace(/,/g, "") : "none";
      expect(cells[8]!.split(" / ")[0], x.id).toBe(mass);
    }
    // And the app's CSV export is the command line's CSV, row for row.
    expect(departuresCsv(app)).toBe(checkCsv(cli));
  }, 120_000);
});
