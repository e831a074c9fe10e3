/** `taut review CASE.json RECORDING.gpx|.csv [--json]` — a recorded start held against its plan (Start review). */
import { reviewStart, RecordingRejected, type StartReviewResult } from "../../core/dispatch/index.js";
import { readRecording, RecordingFileError, problemText, type ReadRecording } from "../../profiles/recording.js";
import { reviewReport, VERDICT_WORDS, type ReviewReport } from "../../profiles/reviewReport.js";
import { InputError } from "../errors.js";
import { library, pathText, readStartCase, readText } from "../files.js";
import type { Command } from "../command.js";
import { num } from "../table.js";
import { wrap } from "../render/wrap.js";

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
