/**
 * A Start review in the output shape (units in field names; the fitted factors named with `Factor`, each
 * with a 95 % interval) and in words: the words of the review, shared by `taut review` and the app's Start
 * review place, live here.
 */
import type { FactorEstimate, StartReviewResult } from "../core/dispatch/index.js";
import { fig, reviewText, type ReviewText } from "../i18n/reviewText.js";
import { createTranslator } from "../i18n/translator.js";
import type { ReadRecording } from "./recording.js";

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

const ENGLISH = createTranslator("en", null);

/** What the review says, one sentence each, in English (the JSON `summary`). */
export function reviewSummary(r: StartReviewResult): string[] {
  return reviewLines(r).map((l) => reviewText(ENGLISH, l));
}

/** What the review says, one sentence each, as data (rendered in any language by `reviewText`). */
export function reviewLines(r: StartReviewResult): ReviewText[] {
  const out: ReviewText[] = [];
  const m = r.massFit.estimates.massFactor!;
  const pct = (f: number) => Math.abs(Math.round((f - 1) * 100));
  out.push({ key: m.value >= 1 ? "heavier" : "lighter", params: { pct: pct(m.value), value: fig(m.value, 2), low: fig(m.low, 2), high: fig(m.high, 2) } });
  if (r.effortFit) {
    const e = r.effortFit.estimates.effortFactor!;
    out.push({ key: "effort", params: { pct: fig(e.value * 100, 0), value: fig(e.value, 2), low: fig(e.low, 2), high: fig(e.high, 2) } });
    if (r.jointFit) {
      const jm = r.jointFit.estimates.massFactor!;
      const je = r.jointFit.estimates.effortFactor!;
      out.push({ key: "joint", params: { mass: fig(jm.value, 2), massLow: fig(jm.low, 2), massHigh: fig(jm.high, 2), effort: fig(je.value, 2), effortLow: fig(je.low, 2), effortHigh: fig(je.high, 2) } });
    } else {
      out.push({ key: "notSeparable", params: { correlation: fig(r.correlation ?? 1, 2) } });
    }
  } else {
    out.push({ key: "noNotch" });
  }
  const p = r.planned;
  const a = r.actual;
  if (p.timeToTargetS !== null && a.timeToTargetS !== null) {
    out.push({
      key: r.tookLonger ? "toTargetLonger" : "toTarget",
      params: { actualS: fig(a.timeToTargetS, 0), actualM: fig(a.distanceToTargetM!, 0), plannedS: fig(p.timeToTargetS, 0), plannedM: fig(p.distanceToTargetM!, 0) },
    });
  } else if (a.timeToTargetS === null) out.push({ key: "noTarget" });
  else out.push({ key: "planNoTarget", params: { s: fig(a.timeToTargetS, 0) } });
  if (p.stretchS !== null && a.stretchS !== null && p.stretchS < 0.5 && a.stretchS < 0.5) {
    out.push({ key: "slackOut" });
  } else if (p.stretchS !== null && a.stretchS !== null) {
    out.push({ key: r.stretchTookLonger ? "stretchLonger" : "stretch", params: { actual: fig(a.stretchS, 0), planned: fig(p.stretchS, 0) } });
  }
  for (const s of r.slips) {
    out.push({
      key: "slip",
      params: {
        start: fig(s.startS, 0),
        end: fig(s.endS, 0),
        notch: s.notch,
        speed: fig(s.speedMps * 3.6, 1),
        before: Math.round(s.currentBeforeA),
        lowest: Math.round(s.currentLowestA),
        demand: fig(s.adhesionDemand, 2),
      },
    });
  }
  const re = r.replanned;
  const used: ReviewText = r.jointFit ? { key: "usedBoth" } : { key: "usedMass", params: { value: fig(r.applied.massFactor, 2) } };
  out.push(
    re.changed
      ? { key: "changes", params: { used: { text: used }, from: { verdict: r.plan.verdict }, to: { verdict: re.verdict }, margin: fig(re.margin, 2), limit: { limit: re.binding } } }
      : { key: "stays", params: { used: { text: used }, verdict: { verdict: re.verdict }, margin: fig(re.margin, 2), limit: { limit: re.binding } } },
  );
  return out;
}
