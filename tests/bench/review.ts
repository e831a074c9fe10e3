/**
 * Start review benchmark (issue 17): the review of a 150-wagon start (the dynamics benchmark's 7000 t train)
 * in process — plan, fit by re-simulation, re-judged verdict — from a GPX track of the same start made 15 %
 * heavier, 1 Hz with ±2 m noise, and from a CSV log with the notch (mass and effort fitted). Target ≤ 5 s.
 * Run alone: npx tsx tests/bench/review.ts
 */
import { planStart, planSequence, reviewStart, scaledCase } from "../../src/core/index.js";
import { readRecording } from "../../src/profiles/recording.js";
import { csvText, gpxText, simulatedStart } from "../tools/recordings.js";
import { longTrainCase } from "./dynamics.js";
import { heading, line, median, target, timeRuns } from "./util.js";

export function benchReview(): void {
  heading("Start review — 150 wagons + 2 locomotives, 7000 t planned, recorded 15 % heavier (median of 3 after warm-up)");
  const c = longTrainCase();
  const plan = planStart(c, { skipMassSearch: true, skipVerification: true });
  const seq = planSequence(plan).map((e) => ({ notch: e.notch, atS: Math.round(e.atS * 10) / 10 }));
  const power = seq.find((e) => e.notch > 0)!.atS;
  const heavy = simulatedStart(scaledCase(c, { massFactor: 1.15, effortFactor: 1 }), seq, { fromS: power - 30, extraS: 20 });
  const gpx = readRecording("start.gpx", gpxText(heavy, { noiseM: 2, seed: 7 }));
  const g = timeRuns(() => reviewStart(c, gpx.recording), 3, 1);
  line("GPX, speed from the track (mass factor)", `${median(g.times).toFixed(0)} ms`, `mass factor ${g.last.massFit.factors.massFactor.toFixed(3)}; ${g.last.runs} re-simulations; ${heavy.timeS.length} samples`);
  target({ target: "a review of a 150-wagon start ≤ 5 s (in process)", figure: `${(median(g.times) / 1000).toFixed(2)} s`, ratio: median(g.times) / 5000 });
  const csv = readRecording("start.csv", csvText(heavy, { notch: true, distance: true }));
  const k = timeRuns(() => reviewStart(c, csv.recording), 3, 1);
  line("CSV with notch (mass and effort factors)", `${median(k.times).toFixed(0)} ms`, `mass ${k.last.massFit.factors.massFactor.toFixed(3)}, effort ${k.last.effortFit!.factors.effortFactor.toFixed(3)}; ${k.last.runs} re-simulations`);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  benchReview();
}
