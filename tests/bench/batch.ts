/**
 * Batch benchmark (issue: assistance, load tables, batch departures): 500 departures of the demo trains
 * through the real command line (`node src/cli/taut.mjs check`, worker pool of the available cores) — target
 * ≤ 60 s on a 2-core machine — and a load table. Figures, not assertions.
 *
 *  1. 500 CSV rows drawn (seeded) from the three demo cases under every rail condition, with and without sand:
 *     the CSV format varies only rail and sand, so at most 36 distinct departures; identical ones are worked
 *     out once.
 *  2. 500 JSON departures that are all different (tests/bench/departures.ts: masses, wagon families, units,
 *     grades, curves, every rail condition, sand, temperatures), nothing shared: target ≤ 60 s on 2 cores
 *     (issue 14); `--quick` runs the first 100 and scales the figure.
 *  3. `taut table` for a demo location (12 mass searches in the pool), and the same table on one thread.
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { RAIL_CONDITIONS } from "../../src/core/physics/types.js";
import { loadTable } from "../../src/core/dispatch/loadTable.js";
import { tableCase } from "../../src/cli/commands/table.js";
import { builtinCaseJson, builtinLibrary, builtinLocations } from "../../src/profiles/builtin.js";
import { allDifferentDepartures } from "./departures.js";
import { cpuMs, heading, line, target } from "./util.js";
import { allDifferentCases } from "../tools/departures.js";
import { runJob, type CheckOutcome } from "../../src/cli/batch/jobs.js";
import { judge, planStart, startableMasses } from "../../src/core/planner/index.js";
import type { StartCase } from "../../src/core/train/types.js";
import { vehicleStepsDone } from "../../src/core/dynamics/dynamics.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));

/** A small seeded generator (Park–Miller), so every run checks the same departures. */
function seeded(seed: number): () => number {
  let s = seed;
  return () => (s = (s * 48271) % 2147483647) / 2147483647;
}

interface Summary {
  departures: number;
  starts: number;
  marginal: number;
  needsAssistance: number;
  badRows: number;
  elapsed_s: number;
  workers: number;
  distinctChecks: number;
  distinctMassSearches: number;
  medianCheck_ms: number;
  medianMassSearch_ms: number;
  maxCheck_ms: number;
  maxMassSearch_ms: number;
  threadWork_s: number;
}

function runCheck(file: string): { wallS: number; summary: Summary } {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, ["src/cli/taut.mjs", "check", file, "--json", "--quiet"], { cwd: repo, encoding: "utf8", maxBuffer: 1 << 28 });
  const wallS = (performance.now() - t0) / 1000;
  if (r.status !== 0) throw new Error(`taut check failed (${r.status}): ${r.stderr}`);
  return { wallS, summary: (JSON.parse(r.stdout) as { summary: Summary }).summary };
}

export function run(): void {
  const dir = mkdtempSync(join(tmpdir(), "taut-bench-"));
  try {
    const rnd = seeded(20261012);
    // Built-in cases by id (a case file outside the departures file's folder is refused).
    const cases = builtinCaseJson.map((j) => (j as { id: string }).id);
    const rows = ["id,case,rail,sand"];
    for (let k = 1; k <= 500; k++) {
      const c = cases[Math.floor(rnd() * cases.length)]!;
      const rail = RAIL_CONDITIONS[Math.floor(rnd() * RAIL_CONDITIONS.length)]!;
      rows.push(`dep-${String(k).padStart(3, "0")},${c},${rail},${rnd() < 0.5 ? "yes" : "no"}`);
    }
    const csvPath = join(dir, "day-500.csv");
    writeFileSync(csvPath, `${rows.join("\n")}\n`);

    heading("Batch — taut check, 500 departures of the demo trains (CSV; real process, worker pool)");
    const a = runCheck(csvPath);
    const s = a.summary;
    line("wall time, 500 departures", `${a.wallS.toFixed(1)} s`, `target ≤ 60 s; ${s.workers} workers`);
    line("per departure (wall ÷ 500)", `${((1000 * a.wallS) / 500).toFixed(0)} ms`);
    line("distinct checks / mass searches", `${s.distinctChecks} / ${s.distinctMassSearches}`, "identical departures are worked out once");
    line("median per distinct check (plan + assistance)", `${s.medianCheck_ms} ms`);
    line("median per mass search", `${s.medianMassSearch_ms} ms`);
    line("verdicts", `${s.starts}/${s.marginal}/${s.needsAssistance}`, "starts / marginal / needs assistance");

    // Departures that are all different: nothing is shared between them.
    const count = process.argv.includes("--quick") ? 100 : 500;
    const jsonPath = join(dir, `all-different-${count}.json`);
    writeFileSync(jsonPath, JSON.stringify(allDifferentDepartures(count)));
    heading(`Batch — ${count} departures, all different (JSON; seeded: masses, wagon families, 1–3 units, grades, curves, rail, sand, −20…30 °C)`);
    const b = runCheck(jsonPath);
    const bs = b.summary;
    const scale = 500 / count;
    line(`wall time, ${count} departures`, `${b.wallS.toFixed(1)} s`, `${bs.workers} workers; ${bs.distinctChecks} distinct checks, ${bs.distinctMassSearches} mass searches`);
    if (count !== 500) line("wall time, 500 such (scaled)", `${(b.wallS * scale).toFixed(0)} s`, "target ≤ 60 s on 2 cores");
    target({
      target: "500 all-different departures ≤ 60 s on 2 cores",
      figure: `${(b.wallS * scale).toFixed(0)} s`,
      ratio: (b.wallS * scale) / 60,
      note: `${count === 500 ? "" : `scaled from ${count}; `}load ${loadavg()[0]!.toFixed(1)} at the end`,
    });
    line("thread time (Σ checks + mass searches)", `${bs.threadWork_s.toFixed(0)} s`, `${((1000 * bs.threadWork_s) / count).toFixed(0)} ms per departure`);
    line("median / worst check (plan + assistance)", `${bs.medianCheck_ms} / ${bs.maxCheck_ms} ms`);
    line("median / worst mass search", `${bs.medianMassSearch_ms} / ${bs.maxMassSearch_ms} ms`);
    line("verdicts", `${bs.starts}/${bs.marginal}/${bs.needsAssistance}`, "starts / marginal / needs assistance");

    departureAgainstPlan(count === 500 ? 40 : 16);

    heading("Load table — taut table ashvale-loop-up --loco illustrative-6axle-3000 (40 loaded hoppers; 12 mass searches)");
    const t0 = performance.now();
    const t = spawnSync(process.execPath, ["src/cli/taut.mjs", "table", "ashvale-loop-up", "--loco", "illustrative-6axle-3000", "--json", "--quiet"], { cwd: repo, encoding: "utf8" });
    if (t.status !== 0) throw new Error(`taut table failed: ${t.stderr}`);
    line("wall time, command line (worker pool)", `${((performance.now() - t0) / 1000).toFixed(1)} s`);
    const note = builtinLocations.find((n) => n.id === "ashvale-loop-up")!;
    const c = tableCase(note, { loco: "illustrative-6axle-3000" }, builtinLibrary()).c;
    loadTable(c); // warm-up
    const t1 = performance.now();
    loadTable(c);
    line("one thread, in process (warm)", `${((performance.now() - t1) / 1000).toFixed(1)} s`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * A departure's thread time (the check with its assistance and both mass searches, as `taut check` runs it)
 * against one plan of the same train (its verdict and verified plan, no mass search), on the first `n`
 * all-different departures, in this process, one after the other: Σ departures ÷ Σ plans.
 */
export function departureAgainstPlan(n: number): void {
  const cases = allDifferentCases(n);
  planStart(cases[0]!, { skipMassSearch: true }); // warm-up
  let planMs = 0;
  let departureMs = 0;
  let worst = 0;
  let searches = 0;
  // The mass searches' own share (both searches of each departure): thread time and masses judged.
  const massMs: number[] = [];
  const judged: number[] = [];
  for (const c of cases) {
    const t0 = performance.now();
    planStart(c, { skipMassSearch: true });
    const p = performance.now() - t0;
    const t1 = performance.now();
    const o = runJob({ kind: "check", case: c, masses: true }) as CheckOutcome;
    const d = performance.now() - t1;
    planMs += p;
    departureMs += d;
    searches += o.masses ? 1 : 0;
    if (o.masses) {
      massMs.push(o.masses.elapsedMs);
      judged.push(o.masses.judgements);
    }
    worst = Math.max(worst, d / p);
  }
  const sorted = (xs: number[]) => [...xs].sort((a, b) => a - b);
  const median = (xs: number[]) => sorted(xs)[Math.floor(xs.length / 2)] ?? 0;
  const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
  heading(`A departure against one plan of the same train (first ${n} all-different departures, in process, one thread)`);
  line("one plan (verdict and verified plan)", `${(planMs / n).toFixed(0)} ms`, "mean");
  line("one departure (check, assistance, both masses)", `${(departureMs / n).toFixed(0)} ms`, `mean; ${searches} mass searches`);
  line("mass searches (both) per departure", `${median(massMs).toFixed(0)} / ${Math.max(0, ...massMs).toFixed(0)} ms`, `median / worst; Σ ${(sum(massMs) / planMs).toFixed(2)}× Σ plans, ${((100 * sum(massMs)) / departureMs).toFixed(0)} % of the departures' time`);
  line("masses judged per departure (both searches)", `${(sum(judged) / Math.max(1, judged.length)).toFixed(1)} mean, ${Math.max(0, ...judged)} worst`, "each most often one plan, at the mass where the quasi-static limits stop allowing the verdict");
  massSearchesBeforeAfter(cases);
  guidedMassSearches();
  target({ target: "a departure's CPU ≤ 1.5 × one plan of the same train", figure: `${(departureMs / planMs).toFixed(2)}×`, ratio: departureMs / planMs / 1.5, note: `Σ departures ÷ Σ plans; worst single departure ${worst.toFixed(1)}×` });
}

/**
 * The two mass searches of each departure (given its own verdict, as the check runs them), CPU time of this
 * thread: with every judgement planned to its end (before verdict-only plans) against plans that stop once a
 * limit has failed, alternating which goes first; and whether the figures agree to the kilogram.
 */
function massSearchesBeforeAfter(cases: readonly StartCase[]): void {
  let before = 0;
  let after = 0;
  let stepsBefore = 0;
  let stepsAfter = 0;
  let differ = 0;
  // The lumped wagons' guide (startableMass.ts) against the full model alone, both verdict-only.
  let unguidedMs = 0;
  let unguidedSteps = 0;
  let unguidedPlans = 0;
  let guidedPlans = 0;
  let otherFigures = 0;
  let worstOff = 0;
  for (const [k, c] of cases.entries()) {
    const own = judge(c, { depth: "marginal" }).verdict;
    const search = (fullPlans: boolean, lumpedGuide = true) => {
      const t0 = cpuMs();
      const s0 = vehicleStepsDone();
      let judged = 0;
      const m = startableMasses(c, { own, fullPlans, lumpedGuide, onJudgement: () => judged++ });
      return { m, ms: cpuMs() - t0, steps: vehicleStepsDone() - s0, judged };
    };
    const [a, b] = k % 2 === 0 ? [search(true), search(false)] : [search(false), search(true)];
    const [full, verdictOnly] = k % 2 === 0 ? [a, b] : [b, a];
    const unguided = search(false, false);
    unguidedMs += unguided.ms;
    unguidedSteps += unguided.steps;
    unguidedPlans += unguided.judged;
    guidedPlans += verdictOnly.judged;
    if (unguided.m.startsKg !== verdictOnly.m.startsKg || unguided.m.marginalKg !== verdictOnly.m.marginalKg) {
      otherFigures++;
      const off = (x: number, y: number) => (y === 0 ? (x === 0 ? 0 : Infinity) : Math.abs(x - y) / y);
      worstOff = Math.max(worstOff, off(verdictOnly.m.startsKg, unguided.m.startsKg), off(verdictOnly.m.marginalKg, unguided.m.marginalKg));
    }
    before += full.ms;
    after += verdictOnly.ms;
    stepsBefore += full.steps;
    stepsAfter += verdictOnly.steps;
    if (full.m.startsKg !== verdictOnly.m.startsKg || full.m.marginalKg !== verdictOnly.m.marginalKg) differ++;
  }
  line(
    "mass searches, plans to the end → verdict-only",
    `${(before / cases.length).toFixed(0)} → ${(after / cases.length).toFixed(0)} ms`,
    `CPU per departure, same run; ${(after / before).toFixed(2)}×; ${differ} of ${cases.length} departures with other figures`,
  );
  line(
    "mass searches' work, plans to the end → verdict-only",
    `${(stepsBefore / cases.length / 1e6).toFixed(2)} → ${(stepsAfter / cases.length / 1e6).toFixed(2)} M`,
    `vehicle-steps per departure; ${(stepsAfter / Math.max(1, stepsBefore)).toFixed(2)}×`,
  );
  line(
    "mass searches, full model only → guided by lumped wagons",
    `${(unguidedMs / cases.length).toFixed(0)} → ${(after / cases.length).toFixed(0)} ms`,
    `CPU per departure; ${(unguidedSteps / cases.length / 1e6).toFixed(2)} → ${(stepsAfter / cases.length / 1e6).toFixed(2)} M vehicle-steps; full-model plans ${unguidedPlans} → ${guidedPlans}; ${otherFigures} of ${cases.length} departures with other figures${otherFigures ? ` (worst ${(100 * worstOff).toFixed(2)} %)` : ""}`,
  );
}

/**
 * The mass searches the quasi-static probe does not settle — among the first 100 seeded departures, 25, 64, 65,
 * 68, 85 and 94 (85 alone takes about a minute, so it is left out here) — with the full model only against
 * guided by lumped wagons (startableMass.ts): the full-model plans, the work and the figures.
 */
export function guidedMassSearches(): void {
  const picked = [24, 63, 64, 67, 93];
  const all = allDifferentCases(100);
  const tot = { full: { ms: 0, steps: 0, plans: 0 }, guided: { ms: 0, steps: 0, plans: 0 } };
  const notes: string[] = [];
  for (const k of picked) {
    const c = all[k]!;
    const own = judge(c, { depth: "marginal" }).verdict;
    const search = (lumpedGuide: boolean) => {
      const t0 = cpuMs();
      const s0 = vehicleStepsDone();
      let plans = 0;
      const m = startableMasses(c, { own, lumpedGuide, onJudgement: () => plans++ });
      const t = tot[lumpedGuide ? "guided" : "full"];
      t.ms += cpuMs() - t0;
      t.steps += vehicleStepsDone() - s0;
      t.plans += plans;
      return m;
    };
    const f = search(false);
    const g = search(true);
    const pct = (x: number, y: number) => (x === y ? "same" : `${((100 * (x - y)) / y).toFixed(2)} %`);
    notes.push(`${k + 1}: ${pct(g.startsKg, f.startsKg)} / ${pct(g.marginalKg, f.marginalKg)}`);
  }
  heading(`Mass searches the quasi-static probe does not settle (seeded departures ${picked.map((k) => k + 1).join(", ")}; in process, one thread)`);
  line("full model only → guided by lumped wagons, CPU", `${(tot.full.ms / 1000).toFixed(1)} → ${(tot.guided.ms / 1000).toFixed(1)} s`, `${(tot.guided.ms / tot.full.ms).toFixed(2)}×`);
  line("vehicle-steps", `${(tot.full.steps / 1e6).toFixed(0)} → ${(tot.guided.steps / 1e6).toFixed(0)} M`, `${(tot.guided.steps / tot.full.steps).toFixed(2)}×; full-model plans ${tot.full.plans} → ${tot.guided.plans}`);
  line("figures, guided against full only (starts / marginal)", notes.join("; "), "departure 94: its verdict holds at 739 t, fails at 740.6 t, holds again at 748.6–758.2 t");
}
