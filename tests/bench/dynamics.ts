/**
 * Dynamics benchmark (issue: longitudinal dynamics): a 150-wagon train over 180 s of simulated time —
 * vehicle-steps per second, wall time, peak memory — and the speed ratio against a general-purpose
 * integrator (odex, Gragg–Bulirsch–Stoer) on the same equations at matched accuracy.
 */
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { integratorSteps, modelFromCase } from "../../src/core/train/trainModel.js";
import { sequenceControls, simulate } from "../../src/core/dynamics/simulate.js";
import { couplingPeakError, engineModel, enginePeaks, odexPeaks, rollingChain } from "../core/helpers/compare.js";
import type { RefChain } from "../core/helpers/referenceChain.js";
import { heading, line, median, memoryMB, target, timeRuns } from "./util.js";


export function longTrainCase() {
  const r = parseStartCase(
    {
      schema: "taut/start-case@1",
      locomotives: [{ profile: "illustrative-6axle-3000", count: 2, position: "head" }],
      train: { trailingMass_t: 7000, wagons: 150, length_m: 2100, couplerSlack_mm: 50, bearing: "roller", couplerLimit_kN: 970, wagonType: "bogie-hopper-loaded", slackState: "bunched" },
      location: { gradient_permille: 2, curveRadius_m: 0, clearAhead_m: 3000 },
      conditions: { rail: "dry", sand: true, temperature_C: 10 },
      target: { speed_kmh: 30 },
    },
    builtinLibrary(),
  );
  if (!r.ok) throw new Error("bench case invalid");
  return r.value;
}

/** A 151-vehicle chain, as plain equations both integrators can take (rolling, slack bunched). */
function referenceChain(n = 151): RefChain {
  const masses = [138_000, ...Array.from({ length: n - 1 }, (_, i) => 45_000 + (i % 5) * 5_000)];
  return rollingChain(masses, { halfSlackM: 0.025, effortN: 460_000, powerW: 2.46e6 });
}

export function benchDynamics(opts: { compare: boolean }): void {
  heading("Dynamics — 150 wagons + 2 locomotives, 180 s simulated (full model: slack, hysteretic gear, stick, brakes, adhesion)");
  const c = longTrainCase();
  const model = modelFromCase(c);
  const seq = [
    { notch: 1, atS: 0 },
    { notch: 2, atS: 20 },
    { notch: 4, atS: 35 },
    { notch: 8, atS: 50 },
  ];
  const before = memoryMB();
  let peak = before;
  const { times, last } = timeRuns(
    () =>
      simulate(model, sequenceControls(seq, { trainBrakeReleaseS: -1e6, locoBrakeReleaseS: 3 }), {
        durationS: 180,
        onProgress: () => {
          peak = Math.max(peak, memoryMB());
        },
      }),
    5,
    2,
  );
  const wall = median(times);
  const vsteps = model.n * last.steps;
  line("vehicles × steps", `${(vsteps / 1e6).toFixed(2)} M`, `dt ${(last.dt * 1000).toFixed(1)} ms, ${last.steps} steps`);
  line("wall time (median of 5)", `${wall.toFixed(0)} ms`, `runs: ${times.map((t) => t.toFixed(0)).join(", ")}`);
  line("vehicle-steps per second", `${(vsteps / (wall / 1000) / 1e6).toFixed(1)} M/s`, "target ≥ 20 M/s on one core");
  line("memory held during the run (heap + buffers)", `${(peak - before).toFixed(1)} MB above idle`, `process total ${peak.toFixed(1)} MB; target < 50 MB`);

  if (!opts.compare) return;
  compareWithOdex();
}

/**
 * Target: an honest comparison with a general-purpose integrator (odex, Gragg–Bulirsch–Stoer) on the same
 * equations. Both read each coupling's peak force, what the planner checks. The reference is odex at 1e-10
 * read every millisecond of its dense output. Our derivative function allocates nothing. odex is swept over
 * its tolerance and over how its solution is read (at each of its own steps, or from its dense output every
 * engine step, 2 or 4 engine steps); the cheapest run at least as accurate as the engine is the match.
 */
function compareWithOdex(): void {
  const T = 60;
  heading(`Dynamics vs general-purpose integrator (odex) — same equations, 151 vehicles, ${T} s from a bunched start: each coupling's peak`);
  const ref = referenceChain();
  const dt = integratorSteps(engineModel(ref)).takeUpS;
  const t0 = performance.now();
  const truth = odexPeaks(ref, T, 1e-10, 0.001);
  line("reference: odex at 1e-10, read every 1 ms", `${(performance.now() - t0).toFixed(0)} ms`, `${truth.steps} steps`);
  const oursRuns = timeRuns(() => enginePeaks(ref, T, dt), 3, 1);
  const oursMs = median(oursRuns.times);
  const oursErr = couplingPeakError(oursRuns.last, truth);
  line(`Taut engine (step ${(dt * 1000).toFixed(2)} ms, as chosen for this train)`, `${oursMs.toFixed(0)} ms`, `peak error ${(oursErr * 100).toFixed(2)} % of the largest peak`);
  let best: { ms: number; what: string; err: number } | null = null;
  const reads: Array<[string, number | undefined]> = [
    ["its own steps", undefined],
    ["every engine step", dt],
    ["every 2 engine steps", 2 * dt],
    ["every 4 engine steps", 4 * dt],
  ];
  for (const tol of [1e-4, 1e-5, 1e-6, 1e-7, 1e-8]) {
    for (const [readName, every] of reads) {
      const ta = performance.now();
      const o = odexPeaks(ref, T, tol, every);
      const ms = performance.now() - ta;
      const err = couplingPeakError(o, truth);
      const what = `tolerance ${tol.toExponential(0)}, read at ${readName}`;
      line(`odex, ${what}`, `${ms.toFixed(0)} ms`, `peak error ${(err * 100).toFixed(2)} %; ${o.steps} steps, ${o.evaluations} derivative calls`);
      if (err <= oursErr && (best === null || ms < best.ms)) best = { ms, what, err };
    }
  }
  if (best) {
    line("speed ratio at equal peak accuracy (odex ÷ Taut)", `${(best.ms / oursMs).toFixed(1)}×`, `odex's cheapest match: ${best.what}; goal ≥ 10×`);
    target({ target: "odex ÷ Taut at equal peak accuracy ≥ 10×", figure: `${(best.ms / oursMs).toFixed(1)}×`, ratio: 10 / (best.ms / oursMs), note: best.what });
  } else {
    line("speed ratio at equal peak accuracy", "> measured", "no odex run tried reached the engine's peak accuracy");
    target({ target: "odex ÷ Taut at equal peak accuracy ≥ 10×", figure: "beyond odex", ratio: null, note: "no odex tolerance tried reached the engine's accuracy" });
  }
}
