/**
 * One review from a recording's text, as plain data for the page: the report (words and figures) and what
 * a kept review records. Runs in the review worker (review.worker.ts), or on the page where workers are not
 * available (tests in jsdom).
 */
import { reviewStart, RecordingRejected, type StartReviewResult } from "../../../core/dispatch/index.js";
import type { StartCase } from "../../../core/train/types.js";
import type { StartReviewFile } from "../../../profiles/notes.js";
import { problemLine, readRecording, RecordingFileError } from "../../../profiles/recording.js";
import { reviewLines, reviewReport, type ReviewReport } from "../../../profiles/reviewReport.js";
import type { ReviewText } from "../../../i18n/reviewText.js";

/** The fields of a kept review that come from the review itself. */
export type ReviewFindings = Pick<StartReviewFile, "massFactor" | "effortFactor" | "separable" | "plannedVerdict" | "replannedVerdict" | "thumbnail">;

/**
 * The review (its report, and what it says and what the reader noticed as data, for the page to render in
 * the language on screen), or why the recording was refused (as data, after the file's name).
 */
export type ReviewOutcome = { ok: true; report: ReviewReport; lines: ReviewText[]; notices: ReviewText[]; findings: ReviewFindings } | { ok: false; fileName: string; texts: ReviewText[] };

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
      lines: reviewLines(r),
      notices: read.noticeTexts,
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
    if (e instanceof RecordingFileError) return { ok: false, fileName, texts: [...e.texts] };
    if (e instanceof RecordingRejected) return { ok: false, fileName, texts: e.problems.map(problemLine) };
    return { ok: false, fileName, texts: [{ key: "failed", params: { error: (e as Error).message || String(e) } }] };
  }
}
