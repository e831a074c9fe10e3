/** `taut review CASE.json RECORDING.gpx|.csv [--json]` — a recorded start held against its plan (Start review). */
import { reviewStart, RecordingRejected, type FactorEstimate, type StartReviewResult } from "../../core/dispatch/index.js";
import { readRecording, RecordingFileError, problemText, type ReadRecording } from "../../profiles/recording.js";
import { LIMIT_WORDS } from "../../core/planner/outcome.js";
import { InputError } from "../errors.js";
import { library, pathText, readStartCase, readText } from "../files.js";
import type { Command } from "../command.js";
import { num } from "../table.js";
import { wrap } from "../render/wrap.js";

export interface FactorJson {
  value: number;
  /** 95 % interval. */
  low: number;
  high: number;
}

export interface ReviewReport {
  schema: "taut/review@1";
  recording: { kind: "gpx" | "csv"; samples: number; duration_s: number; notchLogged: boolean; currentLogged: boolean; notices: string[] };
  planned: { verdict: string; timeToTarget_s: number | null; distanceToTarget_m: number | null; stretch_s: number | null };
  actual: { timeToTarget_s: number | null; distanceToTarget_m: number | null; stretch_s: number | null };
  tookLonger: boolean | null;
  stretchTookLonger: boolean | null;
  /** The train behaved as if this much heavier (the units' effort as specified). */
  massFactor: FactorJson;
  /** The units gave this share of their effort (the train's mass as on its papers); null without a logged notch. */
  effortFactor: FactorJson | null;
  /** Both together, when the recording tells them apart. */
  jointFit: { massFactor: FactorJson; effortFactor: FactorJson } | null;
  separable: boolean | null;
  correlation: number | null;
  fit: { rms_kmh: number; samples: number; runs: number };
  replanned: { massFactor: number; effortFactor: number; verdict: string; margin: number; binding: string; verdictChanged: boolean };
  slips: Array<{ start_s: number; end_s: number; notch: number; speed_kmh: number; currentBefore_A: number; currentLowest_A: number; adhesionDemand: number }>;
  summary: string[];
  series?: { time_s: number[]; recordedSpeed_kmh: number[]; plannedSpeed_kmh: number[]; fittedSpeed_kmh: number[]; recordedDistance_m: number[]; plannedDistance_m: number[] };
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const r3 = (x: number) => Math.round(x * 1000) / 1000;
const orNull = (x: number | null, f: (x: number) => number) => (x === null ? null : f(x));
const factor = (e: FactorEstimate): FactorJson => ({ value: r3(e.value), low: r3(e.low), high: r3(e.high) });
const pct = (f: number) => `${Math.abs(Math.round((f - 1) * 100))} %`;

/** Express a review with units in names. */
export function reviewReport(r: StartReviewResult, read: ReadRecording, series: boolean): ReviewReport {
  const s = read.recording.samples;
  const best = r.jointFit ?? r.massFit;
  const report: ReviewReport = {
    schema: "taut/review@1",
    recording: { kind: read.kind, samples: s.length, duration_s: r1(s[s.length - 1]!.timeS - s[0]!.timeS), notchLogged: read.recording.notchLogged, currentLogged: read.recording.currentLogged, notices: read.notices },
    planned: { verdict: r.plan.verdict, timeToTarget_s: orNull(r.planned.timeToTargetS, r1), distanceToTarget_m: orNull(r.planned.distanceToTargetM, r1), stretch_s: orNull(r.planned.stretchS, r1) },
    actual: { timeToTarget_s: orNull(r.actual.timeToTargetS, r1), distanceToTarget_m: orNull(r.actual.distanceToTargetM, r1), stretch_s: orNull(r.actual.stretchS, r1) },
    tookLonger: r.tookLonger,
    stretchTookLonger: r.stretchTookLonger,
    massFactor: factor(r.massFit.estimates.massFactor!),
    effortFactor: r.effortFit ? factor(r.effortFit.estimates.effortFactor!) : null,
    jointFit: r.jointFit ? { massFactor: factor(r.jointFit.estimates.massFactor!), effortFactor: factor(r.jointFit.estimates.effortFactor!) } : null,
    separable: r.separable,
    correlation: r.correlation === null ? null : r3(r.correlation),
    fit: { rms_kmh: r3(best.rmsMps * 3.6), samples: best.samples, runs: r.runs },
    replanned: { massFactor: r3(r.applied.massFactor), effortFactor: r3(r.applied.effortFactor), verdict: r.replanned.verdict, margin: r3(r.replanned.margin), binding: r.replanned.binding, verdictChanged: r.replanned.changed },
    slips: r.slips.map((e) => ({ start_s: r1(e.startS), end_s: r1(e.endS), notch: e.notch, speed_kmh: r1(e.speedMps * 3.6), currentBefore_A: Math.round(e.currentBeforeA), currentLowest_A: Math.round(e.currentLowestA), adhesionDemand: r3(e.adhesionDemand) })),
    summary: reviewSummary(r),
  };
  if (series) {
    const o = r.overlay;
    const kmh = (xs: number[]) => xs.map((v) => Math.round(v * 360) / 100);
    report.series = { time_s: o.timeS, recordedSpeed_kmh: kmh(o.recordedSpeedMps), plannedSpeed_kmh: kmh(o.plannedSpeedMps), fittedSpeed_kmh: kmh(o.fittedSpeedMps), recordedDistance_m: o.recordedDistanceM, plannedDistance_m: o.plannedDistanceM };
  }
  return report;
}

const VERDICT_WORDS: Record<string, string> = { starts: "starts", marginal: "marginal", "needs-assistance": "needs assistance" };

/** What the review says, one sentence each (the text output and the JSON `summary`). */
export function reviewSummary(r: StartReviewResult): string[] {
  const out: string[] = [];
  const m = r.massFit.estimates.massFactor!;
  const interval = (e: FactorEstimate) => `${num(e.low, 2)}–${num(e.high, 2)}`;
  out.push(`The train behaved as if ${pct(m.value)} ${m.value >= 1 ? "heavier" : "lighter"} than planned: mass factor ${num(m.value, 2)} (95 % interval ${interval(m)}), with the units' effort as specified.`);
  if (r.effortFit) {
    const e = r.effortFit.estimates.effortFactor!;
    out.push(`With the train's mass as planned, the units gave ${num(e.value * 100, 0)} % of their effort: effort factor ${num(e.value, 2)} (${interval(e)}).`);
    if (r.jointFit) {
      const jm = r.jointFit.estimates.massFactor!;
      const je = r.jointFit.estimates.effortFactor!;
      out.push(`The recording separates the two: together, mass factor ${num(jm.value, 2)} (${interval(jm)}) and effort factor ${num(je.value, 2)} (${interval(je)}).`);
    } else {
      out.push(`The recording cannot tell a heavier train from weaker units (they move the speed curve alike; correlation ${num(r.correlation ?? 1, 2)}): either explanation fits, and Taut does not choose between them.`);
    }
  } else {
    out.push("No notch was logged, so the driver is taken to have followed the plan's notches; the units' effort cannot be fitted.");
  }
  const p = r.planned;
  const a = r.actual;
  if (p.timeToTargetS !== null && a.timeToTargetS !== null) {
    out.push(`From the moment of start to the target: ${num(a.timeToTargetS, 0)} s and ${num(a.distanceToTargetM!, 0)} m recorded, ${num(p.timeToTargetS, 0)} s and ${num(p.distanceToTargetM!, 0)} m planned${r.tookLonger ? " — it took longer than planned" : ""}.`);
  } else if (a.timeToTargetS === null) out.push("The recording does not reach the case's target.");
  else out.push(`The recording reaches the target ${num(a.timeToTargetS, 0)} s after the moment of start; the plan does not reach it.`);
  if (p.stretchS !== null && a.stretchS !== null) {
    out.push(`The locomotive covered the plan's travel to the stretched train in ${num(a.stretchS, 0)} s (planned ${num(p.stretchS, 0)} s)${r.stretchTookLonger ? ": the stretch took longer than planned" : ""}.`);
  }
  for (const s of r.slips) {
    out.push(`Slip at ${num(s.startS, 0)}–${num(s.endS, 0)} s in notch ${s.notch} (${num(s.speedMps * 3.6, 1)} km/h): the current fell from ${Math.round(s.currentBeforeA)} A to ${Math.round(s.currentLowestA)} A while the notch held. The rail gave less than the adhesion the notch asked, ${num(s.adhesionDemand, 2)}.`);
  }
  const re = r.replanned;
  const used = r.jointFit ? "both fitted factors" : `the mass factor ${num(r.applied.massFactor, 2)}`;
  out.push(
    re.changed
      ? `Re-planned with ${used}, the verdict changes: ${VERDICT_WORDS[r.plan.verdict]} → ${VERDICT_WORDS[re.verdict]} (margin ${num(re.margin, 2)}, ${LIMIT_WORDS[re.binding]}).`
      : `Re-planned with ${used}, the verdict stays ${VERDICT_WORDS[re.verdict]} (margin ${num(re.margin, 2)}, ${LIMIT_WORDS[re.binding]}).`,
  );
  return out;
}

export function renderReview(rep: ReviewReport): string {
  return [
    `Recording: ${rep.recording.kind.toUpperCase()}, ${rep.recording.samples} samples over ${num(rep.recording.duration_s, 0)} s${rep.recording.notchLogged ? ", notch logged" : ""}${rep.recording.currentLogged ? ", current logged" : ""}`,
    ...rep.recording.notices.map((n) => `  ${n}`),
    `Planned verdict: ${VERDICT_WORDS[rep.planned.verdict]}`,
    "",
    ...rep.summary.flatMap((s) => wrap(s, 100, "  ")),
    "",
    `Fit: ${rep.fit.samples} samples compared, speed difference ${num(rep.fit.rms_kmh, 2)} km/h (root mean square), ${rep.fit.runs} re-simulations on the median rail.`,
    "Observed factors are evidence from one start; use them as observed, beside the model, never in its place.",
    "Advisory only: operating rules, local instructions and the locomotive's own instructions prevail.",
  ].join("\n");
}

export const reviewCommand: Command = {
  name: "review",
  summary: "hold a recorded start (GPX or CSV) against the plan and fit the observed factors",
  usage: "taut review CASE.json RECORDING.gpx|.csv [--json] [--series]",
  help: [
    "Lays a recorded start over the case's plan at the moment of start (the speed first stays above 2 km/h",
    "for 5 s) and fits, by re-running the dynamics model, the factor on the trailing mass that reproduces it",
    "(\"behaved as if 12 % heavier\"), with a 95 % interval. With the notch logged it also fits the units'",
    "effort, and says when the recording cannot tell the two apart; with notch and current, it finds slips",
    "(the current falls while the notch holds). It then re-plans with the fitted values: would the verdict change?",
    "",
    "RECORDING: a GPX 1.1 track (time and position; speed from the positions, or the speed logged with the",
    "points) or a CSV log with the header time_s,speed_kmh[,notch][,current_A][,distance_m].",
    "",
    "Options:",
    "  --json     JSON output (the fitted factors are massFactor and effortFactor, each with low and high)",
    "  --series   with --json, include the plan, the recording and the fitted run at 1 s",
  ].join("\n"),
  options: { json: { type: "boolean" }, series: { type: "boolean" } },
  run({ values, positionals }, io) {
    const [casePath, recPath] = positionals;
    if (!casePath || !recPath) throw new InputError("a start case and a recording are needed\n  usage: taut review CASE.json RECORDING.gpx|.csv [--json]");
    const { c } = readStartCase(casePath, library());
    let read: ReadRecording;
    try {
      read = readRecording(recPath, readText(recPath));
    } catch (e) {
      if (e instanceof RecordingFileError) throw new InputError(`${pathText(recPath)}: ${e.message}`);
      throw e;
    }
    let r: StartReviewResult;
    try {
      r = reviewStart(c, read.recording);
    } catch (e) {
      if (e instanceof RecordingRejected) throw new InputError(`${pathText(recPath)}: ${e.problems.map(problemText).join("\n")}`);
      throw e;
    }
    const report = reviewReport(r, read, values.series === true);
    io.out(values.json ? JSON.stringify(report, null, 2) : renderReview(report));
    return 0;
  },
};
