/** `taut simulate CASE.json --sequence "1@0,2@20,4@35,8@50"` — run a given notch sequence through the dynamics model. */
import { simulate, type SimResult } from "../../core/dynamics/simulate.js";
import { ACCELERATE_MAX_S } from "../../core/planner/search.js";
import { sequenceRun } from "../../core/planner/index.js";
import type { StartCase } from "../../core/train/types.js";
import { InputError } from "../errors.js";
import { quoted } from "../../profiles/text.js";
import { library, readStartCase } from "../files.js";
import type { Command } from "../command.js";
import { asGiven, num, textTable } from "../table.js";
import { cli } from "../../i18n/en/cli.js";
import { usageLine } from "../errors.js";
import { wrap } from "../render/wrap.js";
import { cliSimulate } from "../../i18n/en/cliSimulate.js";
import { createTranslator, type Translator } from "../../i18n/translator.js";
import { cliTr } from "../lang.js";

/** The words of `taut simulate` in this run's language. */
const words = () => cliTr().ns(cliSimulate);

/** Longest run when the target is not reached: the plan's own time cap, s. */
const MAX_DURATION_S = ACCELERATE_MAX_S;
/** A train that has moved and then stands this long has stalled, s. */
const STALL_S = 20;
/** Wheels held slipping by the protection at a standstill this long: stop (rail burns), s. */
const SPIN_S = 10;

/** Why a run ended. */
export type StopReason = "target" | "duration" | "cap" | "stall" | "slips";

export interface SequenceEntry {
  notch: number;
  atS: number;
}

/** Parse "1@0,2@20,4@35" into notch/time pairs; throws InputError naming the bad entry. */
export function parseSequence(text: string, maxNotch: number): SequenceEntry[] {
  const entries = text
    .split(",")
    .map((p) => p.trim())
    .filter((p) => p.length > 0);
  if (entries.length === 0) throw new InputError(words()("sequenceEmpty"));
  const out = entries.map((p, k) => {
    const m = /^(\d+)\s*@\s*(\d+(?:\.\d+)?)$/.exec(p);
    if (!m) throw new InputError(words()("sequenceEntry_", { entry: k + 1, text: quoted(p) }));
    const notch = Number(m[1]);
    const atS = Number(m[2]);
    if (notch > maxNotch) throw new InputError(words()("sequenceNotch", { entry: k + 1, notch, max: maxNotch }));
    return { notch, atS };
  });
  for (let k = 1; k < out.length; k++) {
    if (out[k]!.atS < out[k - 1]!.atS) throw new InputError(words()("sequenceEarlier", { entry: k + 1, text: entries[k]! }));
  }
  return out;
}

export interface SimulateReport {
  schema: "taut/simulation@1";
  sequence: SequenceEntry[];
  locoBrakeRelease_s: number;
  adhesionQuantile: number;
  lastVehicleMoves_s: number | null;
  locoTravelToStretch_m: number | null;
  peakCouplerForce_kN: number;
  peakCompression_kN: number;
  peakAt: { coupling: number; time_s: number };
  peakCompressionAt: { coupling: number; time_s: number };
  couplerPeaks_kN: number[];
  maxRunOut_kmh: number;
  maxRunIn_kmh: number;
  slipEvents: Array<{ unit: number; start_s: number; end_s: number; cuts: number; speed_kmh: number }>;
  final: { time_s: number; speed_kmh: number; distance_m: number };
  targetReached: boolean;
  /** Seconds the wheels slipped in all (every unit's episodes added). */
  slipTime_s: number;
  /** What the reader must not miss (wheel slip above all), one line each. */
  warnings: string[];
  /** Why the run ended: the target, the asked duration, the time cap, a stall, or wheels spinning at a standstill. */
  stoppedBy: StopReason;
  /** When the train-brake release began, s; null when it was already released. */
  trainBrakeRelease_s: number | null;
  /** The train brake was eased in stages (a falling grade the locomotive brake cannot hold), as the plan does. */
  graduatedRelease: boolean;
  series?: { time_s: number[]; speed_kmh: number[]; notch: number[]; distance_m: number[]; maxTension_kN: number[] };
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const r2 = (x: number) => Math.round(x * 100) / 100;

/** Run the sequence on the case and express the result with units in names. */
export function simulateCase(
  c: StartCase,
  seq: SequenceEntry[],
  opts: { durationS?: number; releaseAtS?: number; adhesionQuantile?: number; series?: boolean; brakeReleased?: boolean },
): SimulateReport {
  const q = opts.adhesionQuantile ?? 0.5;
  // The brakes come off as the plan takes them off, unless told the train brake is already released.
  const { model, controls, locoBrakeReleaseS: release, trainBrakeReleaseS: trainRelease, graduatedRelease: graduated } = sequenceRun(c, seq, {
    adhesionQuantile: q,
    ...(opts.brakeReleased ? { brakeReleased: true } : {}),
    ...(opts.releaseAtS !== undefined ? { releaseAtS: opts.releaseAtS } : {}),
  });
  const target = c.target;
  const reached = (o: { leadSpeedMps: number; tailTravelM: number }) =>
    target.kind === "speed" ? o.leadSpeedMps >= target.speedMps : o.tailTravelM >= target.distanceM;
  const stop: { why: StopReason } = { why: opts.durationS === undefined ? "cap" : "duration" };
  let moved = false;
  let standingSince = -1;
  let spinningSince = -1;
  const lastEntryS = seq[seq.length - 1]!.atS;
  const res: SimResult = simulate(model, controls, {
    durationS: opts.durationS ?? MAX_DURATION_S,
    ...(opts.durationS === undefined
      ? {
          stopWhen: (o) => {
            if (reached(o)) {
              stop.why = "target";
              return true;
            }
            if (o.leadSpeedMps > 0.05) moved = true;
            const standing = o.leadSpeedMps <= 0.01;
            standingSince = standing ? (standingSince < 0 ? o.timeS : standingSince) : -1;
            if (moved && standing && o.timeS - standingSince > STALL_S && o.timeS > lastEntryS) {
              stop.why = "stall";
              return true;
            }
            spinningSince = standing && o.slipped ? (spinningSince < 0 ? o.timeS : spinningSince) : -1;
            if (spinningSince >= 0 && o.timeS - spinningSince > SPIN_S) {
              stop.why = "slips";
              return true;
            }
            return false;
          },
        }
      : {}),
  });
  const hit = reached({ leadSpeedMps: res.final.leadSpeedMps, tailTravelM: res.final.tailTravelM }) || stop.why === "target";
  const report: SimulateReport = {
    schema: "taut/simulation@1",
    sequence: seq,
    locoBrakeRelease_s: release,
    adhesionQuantile: q,
    lastVehicleMoves_s: res.lastVehicleMovesS === null ? null : r1(res.lastVehicleMovesS),
    locoTravelToStretch_m: res.locoTravelToStretchM === null ? null : r2(res.locoTravelToStretchM),
    peakCouplerForce_kN: r1(res.peakTensionN / 1000),
    peakCompression_kN: r1(res.peakCompressionN / 1000),
    peakAt: { coupling: res.peakTensionAt.coupling, time_s: r1(res.peakTensionAt.timeS) },
    peakCompressionAt: { coupling: res.peakCompressionAt.coupling, time_s: r1(res.peakCompressionAt.timeS) },
    couplerPeaks_kN: Array.from(res.couplerPeakTensionN, (f) => r1(f / 1000)),
    maxRunOut_kmh: r2(res.maxRunOutMps * 3.6),
    maxRunIn_kmh: r2(res.maxRunInMps * 3.6),
    slipEvents: res.slipEpisodes.map((e) => ({ unit: e.unit, start_s: r1(e.startS), end_s: r1(e.endS), cuts: e.cuts, speed_kmh: r1(e.speedMps * 3.6) })),
    final: { time_s: r1(res.final.timeS), speed_kmh: r1(res.final.leadSpeedMps * 3.6), distance_m: r1(res.final.leadTravelM) },
    targetReached: hit,
    slipTime_s: r1(res.slipEpisodes.reduce((t, e) => t + (e.endS - e.startS), 0)),
    warnings: [],
    stoppedBy: stop.why,
    trainBrakeRelease_s: opts.brakeReleased ? null : trainRelease,
    graduatedRelease: graduated,
  };
  // The JSON's warnings are in English whatever the language (JSON is language-neutral); the printout renders its own.
  report.warnings = simulationWarnings(report, ENGLISH);
  if (opts.series) {
    const s = res.series;
    report.series = {
      time_s: Array.from(s.timeS, r1),
      speed_kmh: Array.from(s.leadSpeedMps, (v) => r2(v * 3.6)),
      notch: Array.from(s.notch),
      distance_m: Array.from(s.leadTravelM, r2),
      maxTension_kN: Array.from(s.maxTensionN, (f) => r1(f / 1000)),
    };
  }
  return report;
}

const ENGLISH = createTranslator("en", null);

/**
 * Wheel slip is the first thing to say about a run: a sequence that reaches its target only while the
 * protection cuts power again and again is not one to drive (spinning burns the rail; PRACTICE.md).
 */
export function simulationWarnings(
  r: Pick<SimulateReport, "slipEvents" | "slipTime_s" | "targetReached" | "lastVehicleMoves_s" | "locoBrakeRelease_s" | "final">,
  tr: Translator = cliTr(),
): string[] {
  const t = tr.ns(cliSimulate);
  const n = (x: number, d: number) => (Number.isFinite(x) ? tr.num(x, d) : "—");
  const out: string[] = [];
  if (r.slipEvents.length > 0) {
    const cuts = r.slipEvents.reduce((k, e) => k + e.cuts, 0);
    const first = Math.min(...r.slipEvents.map((e) => e.start_s));
    out.push(
      t("slipped", {
        time: n(r.slipTime_s, 1),
        episodes: t("episodes", { count: r.slipEvents.length }),
        first: n(first, 1),
        cuts: t("powerCuts", { count: cuts }),
        reached: r.targetReached ? t("reachedWhileCut") : "",
      }),
    );
  }
  if (r.lastVehicleMoves_s === null) out.push(t("didNotStart"));
  // A run that ends before the locomotive brake comes off was held by it throughout: say so, beside the slips.
  if (r.final.time_s < r.locoBrakeRelease_s) out.push(t("brakeStillOn", { end: n(r.final.time_s, 1), release: releaseText(r.locoBrakeRelease_s, tr) }));
  return out;
}

/**
 * When the locomotive brake comes off: a time the user gave (--release-at) as given, the plan's own moment
 * (worked out, 45.06666666666667 s) to 0.1 s as the other times of the run.
 */
function releaseText(s: number, tr: Translator = cliTr()): string {
  return (String(s).split(".")[1] ?? "").length > 3 ? tr.num(s, 1) : String(s).replace(".", tr.num(0.5, 1).charAt(1));
}

export function renderSimulation(r: SimulateReport): string {
  const tr = cliTr();
  const t = tr.ns(cliSimulate);
  const warnings = simulationWarnings(r, tr);
  const prefix = t("warning", { text: "" });
  const stopWords: Record<StopReason, string> = {
    target: t("stopTarget"),
    duration: t("stopDuration"),
    cap: t("stopCap", { cap: asGiven(MAX_DURATION_S) }),
    stall: t("stopStall", { stall: asGiven(STALL_S) }),
    slips: t("stopSlips", { spin: asGiven(SPIN_S) }),
  };
  const lines = [
    ...warnings.flatMap((w) => wrap(`${prefix}${w}`, 100, " ".repeat(prefix.length))),
    ...(warnings.length > 0 ? [""] : []),
    t("sequence", { list: r.sequence.map((e) => t("sequenceEntry", { notch: String(e.notch), time: asGiven(e.atS) })).join(", "), time: releaseText(r.locoBrakeRelease_s) }),
    t("adhesion", { what: r.adhesionQuantile === 0.5 ? t("median") : t("quantile", { percent: String(Math.round(r.adhesionQuantile * 100)) }) }),
    t("lastMoves", { what: r.lastVehicleMoves_s === null ? t("neverMoved") : t("movedAfter", { time: num(r.lastVehicleMoves_s, 1), travel: num(r.locoTravelToStretch_m, 2) }) }),
    t("peak", { force: num(r.peakCouplerForce_kN), coupling: String(r.peakAt.coupling + 1), time: num(r.peakAt.time_s, 1), compression: num(r.peakCompression_kN) }),
    t("takeUp", { runOut: num(r.maxRunOut_kmh, 2), runIn: num(r.maxRunIn_kmh, 2) }),
    t("slip", {
      what:
        r.slipEvents.length === 0
          ? t("slipNone")
          : t("slipAll", {
              time: num(r.slipTime_s, 1),
              list: r.slipEvents.map((e) => t("slipEpisode", { unit: String(e.unit + 1), from: num(e.start_s, 1), to: num(e.end_s, 1), count: e.cuts })).join("; "),
            }),
    }),
    t("trainBrake", { what: r.trainBrakeRelease_s === null ? t("alreadyReleased") : `${t("releasedFrom", { time: num(r.trainBrakeRelease_s, 0) })}${r.graduatedRelease ? t("inStages") : ""}` }),
    t("end", {
      time: num(r.final.time_s, 1),
      speed: num(r.final.speed_kmh, 1),
      distance: num(r.final.distance_m, 1),
      why: stopWords[r.stoppedBy],
      note: r.targetReached ? (r.slipEvents.length > 0 ? t("reachedSlipping") : r.stoppedBy !== "target" ? t("reached") : "") : "",
    }),
    "",
    t("peaksTitle"),
    textTable(
      [t("colCoupling"), t("colPeak")],
      r.couplerPeaks_kN.map((f, j) => [String(j + 1), num(f)]).filter((_, j) => j % 10 === 0 || j === r.couplerPeaks_kN.length - 1),
    ),
    "",
    tr.ns(cli)("reviewAdvisory"),
  ];
  return lines.join("\n");
}

export const simulateCommand: Command = {
  name: "simulate",
  summary: "run a given notch sequence through the train dynamics model",
  usage: 'taut simulate CASE.json --sequence "1@0,2@20,4@35,8@50" [--duration S] [--release-at S] [--brake-released] [--adhesion-quantile Q] [--json] [--series]',
  help: [
    "Runs the notches you give (notch@seconds) and reports when the last vehicle moves, coupler forces",
    "along the train, take-up speeds, wheel slips and the final speed and distance. A run in which the",
    "wheels slip opens with a WARNING (and `warnings` in the JSON): try lower notches or later steps.",
    "The brakes come off as the plan takes them off: the train brake's release starts at 0 s and runs to the",
    "rear (on a falling grade the locomotive brake cannot hold, it is eased in stages); the locomotive brake",
    "holds until --release-at (default: the plan's moment, and at least 3 s after the first notch).",
    "Without --duration the run goes on until the case's target is reached, and says why it stopped first:",
    `the time cap (${MAX_DURATION_S} s), a stall, or wheels held slipping at a standstill.`,
    "",
    "Options:",
    "  --sequence S          notch@seconds, comma separated (required)",
    "  --duration S          simulate exactly S seconds",
    "  --release-at S        when the locomotive brake is eased off, s",
    "  --brake-released      the train brake is already released at 0 s (the locomotive brake then holds",
    "                        until 3 s after the first notch unless --release-at says otherwise)",
    "  --adhesion-quantile Q adhesion the run assumes: 0.5 median (default), 0.1 the 10 % worst",
    "  --json                JSON output",
    "  --series              with --json, include the decimated time series",
  ].join("\n"),
  options: {
    sequence: { type: "string" },
    duration: { type: "string" },
    "release-at": { type: "string" },
    "brake-released": { type: "boolean" },
    "adhesion-quantile": { type: "string" },
    json: { type: "boolean" },
    series: { type: "boolean" },
  },
  run({ values, positionals }, io) {
    const path = positionals[0];
    if (!path) throw new InputError(`${words()("caseNeeded")}\n  ${usageLine(`taut simulate CASE.json --sequence "1@0,4@20"`)}`);
    if (typeof values.sequence !== "string") throw new InputError(words()("sequenceRequired"));
    const { c } = readStartCase(path, library());
    const maxNotch = Math.min(...c.locomotives.map((g) => g.spec.notchPower.length));
    const seq = parseSequence(values.sequence, maxNotch);
    const opts: Parameters<typeof simulateCase>[2] = { series: values.series === true, brakeReleased: values["brake-released"] === true };
    if (values.duration !== undefined) opts.durationS = positiveNumber("--duration", values.duration, 3600);
    if (values["release-at"] !== undefined) opts.releaseAtS = positiveNumber("--release-at", values["release-at"], 3600, true);
    if (values["adhesion-quantile"] !== undefined) {
      const q = Number(values["adhesion-quantile"]);
      if (!(q > 0 && q < 1)) throw new InputError(words()("quantileRange", { value: quoted(String(values["adhesion-quantile"])) }));
      opts.adhesionQuantile = q;
    }
    const report = simulateCase(c, seq, opts);
    io.out(values.json ? JSON.stringify(report, null, 2) : renderSimulation(report));
    return 0;
  },
};

function positiveNumber(name: string, raw: unknown, max: number, allowZero = false): number {
  const x = Number(raw);
  if (!Number.isFinite(x) || x < 0 || (!allowZero && x === 0) || x > max) {
    throw new InputError(words()(allowZero ? "secondsFromZero" : "secondsAboveZero", { option: name, max: String(max), value: quoted(String(raw)) }));
  }
  return x;
}
