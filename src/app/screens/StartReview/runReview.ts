/**
 * One review from a recording's text, as plain data for the page: the report (words and figures) and what
 * a kept review records. Runs in the review worker (review.worker.ts), or on the page where workers are not
 * available (tests in jsdom).
 */
import { reviewStart, RecordingRejected, type StartReviewResult } from "../../../core/dispatch/index.js";
import type { StartCase } from "../../../core/train/types.js";
import type { StartReviewFile } from "../../../profiles/notes.js";
import { problemText, readRecording, RecordingFileError } from "../../../profiles/recording.js";
import { reviewReport, type ReviewReport } from "../../../profiles/reviewReport.js";

/** The fields of a kept review that come from the review itself. */
export type ReviewFindings = Pick<StartReviewFile, "massFactor" | "effortFactor" | "separable" | "plannedVerdict" | "replannedVerdict" | "thumbnail">;

export type ReviewOutcome = { ok: true; report: ReviewReport; findings: ReviewFindings } | { ok: false; message: string };

/** About forty points of the recorded speed from the moment of start, for the note's thumbnail. */
export function thumbnail(r: StartReviewResult): StartReviewFile["thumbnail"] {
  const o = r.overlay;
  const step = Math.max(1, Math.ceil(o.timeS.length / 40));
  const keep = o.timeS.map((_, i) => i).filter((i) => i % step === 0 || i === o.timeS.length - 1);
  return { time_s: keep.map((i) => o.timeS[i]!), speed_kmh: keep.map((i) => Math.round(o.recordedSpeedMps[i]! * 360) / 100) };
}

export function runReview(c: StartCase, fileName: string, text: string): ReviewOutcome {
  try {
    const read = readRecording(fileName, text);
    const r = reviewStart(c, read.recording);
    return {
      ok: true,
      report: reviewReport(r, read, true),
      findings: {
        massFactor: r.massFit.estimates.massFactor!,
        ...(r.effortFit ? { effortFactor: r.effortFit.estimates.effortFactor! } : {}),
        ...(r.separable !== null ? { separable: r.separable } : {}),
        plannedVerdict: r.plan.verdict,
        replannedVerdict: r.replanned.verdict,
        thumbnail: thumbnail(r),
      },
    };
  } catch (e) {
    if (e instanceof RecordingFileError) return { ok: false, message: `${fileName}: ${e.message}` };
    if (e instanceof RecordingRejected) return { ok: false, message: `${fileName}: ${e.problems.map(problemText).join("\n")}` };
    return { ok: false, message: `${fileName}: the review failed (${(e as Error).message || String(e)}).` };
  }
}
