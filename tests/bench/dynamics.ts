/**
 * Dynamics benchmark (issue: longitudinal dynamics): a 150-wagon train over 180 s of simulated time —
 * vehicle-steps per second, wall time, peak memory — and the speed ratio against a general-purpose
 * integrator (odex, Gragg–Bulirsch–Stoer) on the same equations at matched accuracy.
 */
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { modelFromCase } from "../../src/core/train/trainModel.js";
import { sequenceControls, simulate } from "../../src/core/dynamics/simulate.js";
import { engineHistory, maxDeviationOverPeak, odexHistory, peakForceError, rollingChain } from "../core/helpers/compare.js";
import type { RefChain } from "../core/helpers/referenceChain.js";
import { heading, line, median, memoryMB, timeRuns } from "./util.js";


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
  heading("Dynamics vs general-purpose integrator (odex) — same equations, 151 vehicles, 180 s, coupler forces every 0.1 s");
  const ref = referenceChain();
  const T = 180;
  const every = 0.1;
  const t0 = performance.now();
  const truth = odexHistory(ref, T, every, 1e-9);
  line("reference: odex at tolerance 1e-9", `${(performance.now() - t0).toFixed(0)} ms`);
  const oursRuns = timeRuns(() => engineHistory(ref, T, every), 3, 1);
  const ours = oursRuns.last;
  const oursMs = median(oursRuns.times);
  const oursErr = maxDeviationOverPeak(ours, truth);
  const oursRel = oursErr.dev / oursErr.peak;
  const oursPeak = peakForceError(ours, truth);
  line("Taut engine (default step)", `${oursMs.toFixed(0)} ms`, `history deviation ${(oursRel * 100).toFixed(2)} %, peak-force error ${(oursPeak * 100).toFixed(2)} % of the ${(oursErr.peak / 1000).toFixed(0)} kN peak`);
  // Accuracy matched two ways: the whole force history (sensitive to the timing of every slack impact over
  // 180 s) and each coupling's peak force (what the planner checks against the coupling allowance).
  let byHistory: { tol: number; ms: number } | null = null;
  let byPeak: { tol: number; ms: number } | null = null;
  for (const tol of [1e-3, 1e-4, 1e-5, 1e-6, 1e-7]) {
    const ta = performance.now();
    const h = odexHistory(ref, T, every, tol);
    const ms = performance.now() - ta;
    const e = maxDeviationOverPeak(h, truth);
    const rel = e.dev / e.peak;
    const pk = peakForceError(h, truth);
    line(`odex at tolerance ${tol.toExponential(0)}`, `${ms.toFixed(0)} ms`, `history deviation ${(rel * 100).toFixed(2)} %, peak-force error ${(pk * 100).toFixed(2)} %`);
    if (!byHistory && rel <= oursRel) byHistory = { tol, ms };
    if (!byPeak && pk <= oursPeak) byPeak = { tol, ms };
    if (byHistory && byPeak) break;
  }
  const ratio = (m: { tol: number; ms: number } | null, what: string) =>
    m
      ? line(`speed ratio, ${what} matched (odex ÷ Taut)`, `${(m.ms / oursMs).toFixed(1)}×`, `odex needs tolerance ${m.tol.toExponential(0)}; target ≥ 10×`)
      : line(`speed ratio, ${what} matched`, "> measured", "odex did not reach the engine's accuracy in the tolerances tried");
  ratio(byPeak, "peak coupler forces");
  ratio(byHistory, "force histories");
}
