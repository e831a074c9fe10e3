/**
 * `taut check` hands a day's distinct departures to its threads costliest first (the most vehicles first),
 * so that a long departure does not come last and leave a core idle; the rows still come out in the file's
 * order, with the same figures, byte for byte, as when the departures are worked out in the file's order.
 * Departures: the demo day's covered goods trains (illustrative), and shorter and longer copies of one of
 * them, made here, so that the estimate differs between departures.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { checkDepartures, estimatedCost, publicRow, type CheckOrder } from "../../src/cli/batch/checkDepartures.js";
import type { Job } from "../../src/cli/batch/jobs.js";
import { JobPool } from "../../src/cli/batch/pool.js";
import { checkCsv } from "../../src/cli/render/check.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { departuresFromJson } from "../../src/profiles/departures.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));

function departures() {
  const day = JSON.parse(readFileSync(`${repo}profiles/departures/demo-day.json`, "utf8")) as Array<Record<string, unknown>>;
  const goods = day.filter((d) => String(d.id).startsWith("goods-"));
  const base = goods[0]!;
  const train = base.train as Record<string, number | string>;
  // Shorter and longer copies of one train (same wagons, same load per wagon), placed among the others.
  const sized = (id: string, wagons: number) => ({
    ...base,
    id,
    train: { ...train, wagons, trailingMass_t: Math.round((Number(train.trailingMass_t) * wagons) / Number(train.wagons)), length_m: Math.round((Number(train.length_m) * wagons) / Number(train.wagons)) },
  });
  const rows = [sized("short-12", 12), ...goods.slice(0, 2), sized("long-40", 40), goods[0], sized("short-20", 20), ...goods.slice(2)];
  const read = departuresFromJson(JSON.stringify(rows), builtinLibrary());
  if (!read.ok) throw new Error("the test's departures do not read");
  return read.departures;
}

async function check(order: CheckOrder) {
  const deps = departures();
  const pool = new JobPool(1);
  const costs: number[] = [];
  const ids: string[] = [];
  const recording = {
    run: (job: Job) => {
      if (job.kind === "check") {
        costs.push(estimatedCost(job.case));
        ids.push(deps.find((d) => d.case && JSON.stringify(d.case) === JSON.stringify(job.case))!.id);
      }
      return pool.run(job);
    },
  };
  try {
    const { rows, stats } = await checkDepartures(deps, recording, { order });
    return { deps, rows, stats, costs, ids };
  } finally {
    await pool.close();
  }
}

describe("taut check's order of work", () => {
  it("works out the costliest departures first and gives the rows in the file's order, identical to the file's order of work", async () => {
    const first = await check("costliest-first");
    const input = await check("input");
    // Each distinct departure once (the repeated goods train is shared), the most vehicles first.
    expect(first.costs.length).toBe(first.stats.checks);
    expect(first.costs.length).toBe(new Set(first.deps.map((d) => JSON.stringify(d.case))).size);
    expect(first.costs).toEqual([...first.costs].sort((a, b) => b - a));
    expect(first.ids[0]).toBe("long-40");
    expect(first.ids.at(-1)).toBe("short-12");
    // The file's order on request: the order in which each departure first appears.
    const seen = new Set<string>();
    const firstSeen = input.deps.filter((d) => !seen.has(JSON.stringify(d.case)) && seen.add(JSON.stringify(d.case))).map((d) => d.id);
    expect(input.ids).toEqual(firstSeen);
    expect(input.ids).not.toEqual(first.ids);
    // Rows in the file's order, byte for byte the same JSON and CSV.
    expect(first.rows.map((r) => r.id)).toEqual(first.deps.map((d) => d.id));
    expect(JSON.stringify(first.rows.map(publicRow))).toBe(JSON.stringify(input.rows.map(publicRow)));
    expect(checkCsv(first.rows)).toBe(checkCsv(input.rows));
    expect(first.rows.every((r) => r.verdict !== undefined)).toBe(true);
  }, 120_000);
});
