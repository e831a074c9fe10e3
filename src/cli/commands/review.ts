/** `taut review CASE.json RECORDING.gpx|.csv [--json]` — a recorded start held against its plan (Start review). */
import { reviewStart, RecordingRejected, type StartReviewResult } from "../../core/dispatch/index.js";
import { readRecording, RecordingFileError, problemText, type ReadRecording } from "../../profiles/recording.js";
import { reviewLines, reviewReport, type ReviewReport } from "../../profiles/reviewReport.js";
import { reviewText, type ReviewText } from "../../i18n/reviewText.js";
import { cli } from "../../i18n/en/cli.js";
import { cliTr, cliWords } from "../lang.js";
import type { Verdict } from "../../core/planner/outcome.js";
import { errorWords, InputError, usageLine } from "../errors.js";
import { library, pathText, readStartCase, readText } from "../files.js";
import type { Command } from "../command.js";
import { num } from "../table.js";
import { wrap } from "../render/wrap.js";

/** The review as text in this run's language: the report's figures, the review's sentences and the recording's notices as data. */
export function renderReview(rep: ReviewReport, lines: readonly ReviewText[], notices: readonly ReviewText[]): string {
  const tr = cliTr();
  const t = tr.ns(cli);
  const r = rep.recording;
  return [
    t("reviewRecording", { kind: r.kind.toUpperCase(), samples: r.samples, duration: num(r.duration_s, 0) }) + (r.notchLogged ? t("reviewNotchLogged") : "") + (r.currentLogged ? t("reviewCurrentLogged") : ""),
    ...notices.map((n) => `  ${reviewText(tr, n)}`),
    t("reviewPlanned", { verdict: cliWords().verdictInline(rep.planned.verdict as Verdict) }),
    "",
    ...lines.flatMap((l) => wrap(reviewText(tr, l), 100, "  ")),
    "",
    t("reviewFit", { samples: rep.fit.samples, rms: num(rep.fit.rms_kmh, 2), runs: rep.fit.runs }),
    t("reviewEvidence"),
    t("reviewAdvisory"),
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
    if (!casePath || !recPath) throw new InputError(`${errorWords()("reviewNeeded")}\n  ${usageLine("taut review CASE.json RECORDING.gpx|.csv [--json]")}`);
    const { c } = readStartCase(casePath, library());
    let read: ReadRecording;
    try {
      read = readRecording(recPath, readText(recPath));
    } catch (e) {
      if (e instanceof RecordingFileError) throw new InputError(`${pathText(recPath)}: ${e.texts.map((x) => reviewText(cliTr(), x)).join("\n")}`);
      throw e;
    }
    let r: StartReviewResult;
    try {
      r = reviewStart(c, read.recording);
    } catch (e) {
      if (e instanceof RecordingRejected) throw new InputError(`${pathText(recPath)}: ${e.problems.map((p) => problemText(p, cliTr())).join("\n")}`);
      throw e;
    }
    const report = reviewReport(r, read, values.series === true);
    io.out(values.json ? JSON.stringify(report, null, 2) : renderReview(report, reviewLines(r), read.noticeTexts));
    return 0;
  },
};
