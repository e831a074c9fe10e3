/**
 * Recorded starts from files, for the Start review: GPX 1.1 tracks and the plain CSV log
 * (`time_s,speed_kmh[,notch][,current_A][,distance_m]`, header required). The readers turn a file into the
 * core's Recording (src/core/dispatch/recording.ts) or refuse it with a RecordingFileError whose message
 * names the line or point; nothing is changed by a refused file. What the readers say is here, as data, in
 * RECORDING_WORDS and `problemLine`; the words themselves are the `review` namespace of src/i18n (en/review.ts).
 *
 * GPX is read with saxes (already the railML reader's parser: strict, non-validating, never fetches or
 * expands entities). Read: every `trk` / `trkseg` / `trkpt` in order (several segments are one recording;
 * a gap between them is checked like any other); `lat`, `lon`, `time` (xsd:dateTime, any time zone; a time
 * without a zone is taken as UTC); a `speed` element in the point (GPX 1.0's, m/s) or in its `extensions`
 * (any namespace, m/s) is used instead of the track-derived speed when every point carries one. `ele`,
 * `name` and other elements are ignored. A point without a time is left out with a notice.
 */
import { SaxesParser } from "saxes";
import {
  integratedDistanceM,
  MAX_GAP_S,
  recordingProblems,
  REVERSE_M,
  trackSpeeds,
  type Recording,
  type RecordingProblem,
  type RecordingSample,
} from "../core/dispatch/recording.js";
import { fig, reviewText, type ReviewText } from "../i18n/reviewText.js";
import { createTranslator, type Translator } from "../i18n/translator.js";
import { CsvQuoteError, parseCsv } from "./csv.js";
import { xmlProblemCode } from "./xmlProblem.js";

/** A recording file that cannot be read or cannot be a start; the message (English) and its sentences as data (`texts`) are for the user. */
export class RecordingFileError extends Error {
  override name = "RecordingFileError";
  readonly texts: readonly ReviewText[];
  constructor(texts: ReviewText | readonly ReviewText[]) {
    const list = Array.isArray(texts) ? (texts as readonly ReviewText[]) : [texts as ReviewText];
    super(list.map((t) => reviewText(ENGLISH, t)).join("\n"));
    this.texts = list;
  }
}

export interface ReadRecording {
  recording: Recording;
  /** What was read and what was left out, one line each (English, as the JSON carries them). */
  notices: string[];
  /** The same as data, for a printout in another language. */
  noticeTexts: ReviewText[];
  kind: "gpx" | "csv";
}

/** Largest recording read: a start logged at 10 Hz for an hour is well inside. */
export const MAX_RECORDING_CHARS = 64 * 1024 * 1024;
const MAX_SAMPLES = 200_000;

const NUMBER = /^\s*[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?\s*$/;
/** xsd:dateTime: date, time, optional fraction, optional zone (Z or ±hh:mm). */
const DATE_TIME = /^\s*(-?\d{4,})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})(\.\d+)?(Z|[+-]\d{2}:\d{2})?\s*$/;

const ENGLISH = createTranslator("en", null);
const clip = (raw: string) => raw.slice(0, 40);

/** What the readers say, as data (rendered in the language chosen by `reviewText`; the `review` namespace of src/i18n). */
export const RECORDING_WORDS = {
  csvHeader: { key: "csvHeader" },
  csvUnknownColumn: (line: number, name: string): ReviewText => ({ key: "csvUnknownColumn", params: { line, name } }),
  csvMissing: (line: number, name: string): ReviewText => ({ key: "csvMissing", params: { line, name } }),
  csvNotNumber: (line: number, name: string, raw: string): ReviewText => ({ key: "csvNotNumber", params: { line, name, raw: clip(raw) } }),
  csvNotch: (line: number, raw: string): ReviewText => ({ key: "csvNotch", params: { line, raw: clip(raw) } }),
  csvPartial: (name: string): ReviewText => ({ key: "csvPartial", params: { name } }),
  csvQuote: (detail: string): ReviewText => ({ key: "csvQuote", params: { detail } }),
  csvUnclosed: (line: number): ReviewText => ({ key: "csvUnclosed", params: { line } }),
  gpxNotXml: (line: number, column: number, message: string): ReviewText => {
    // What is wrong as a code of ours (xmlProblem.ts), not the parser's English.
    const p = xmlProblemCode(message);
    return { key: "gpxNotXml", params: { line, column, detail: { text: p.tag === undefined ? { key: p.code } : { key: p.code, params: { tag: p.tag } } } } };
  },
  gpxRoot: (name: string): ReviewText => ({ key: "gpxRoot", params: { name } }),
  gpxEntities: { key: "gpxEntities" },
  gpxNoPoints: { key: "gpxNoPoints" },
  gpxLatLon: (point: number, line: number): ReviewText => ({ key: "gpxLatLon", params: { point, line } }),
  gpxTime: (point: number, line: number, raw: string): ReviewText => ({ key: "gpxTime", params: { point, line, raw: clip(raw) } }),
  gpxNoTime: (point: number, line: number): ReviewText => ({ key: "gpxNoTime", params: { point, line } }),
  gpxSpeed: (point: number, line: number, raw: string): ReviewText => ({ key: "gpxSpeed", params: { point, line, raw: clip(raw) } }),
  gpxSpeedUsed: { key: "gpxSpeedUsed" },
  gpxSpeedDerived: { key: "gpxSpeedDerived" },
  tooBig: { key: "tooBig" },
  tooMany: { key: "tooMany", params: { max: String(MAX_SAMPLES) } },
  empty: { key: "empty" },
  unknownKind: { key: "unknownKind" },
} as const satisfies Record<string, ReviewText | ((...args: never[]) => ReviewText)>;

/** A problem that makes the samples unusable as a start, as data. */
export function problemLine(p: RecordingProblem): ReviewText {
  switch (p.kind) {
    case "too-few":
      return { key: "tooFew", params: { count: p.count } };
    case "out-of-order":
      return { key: "outOfOrder", params: { at: p.at, previousAt: p.previousAt } };
    case "gap":
      return { key: "gap", params: { at: p.at, gap: fig(p.gapS, 1), previousAt: p.previousAt, max: MAX_GAP_S } };
    case "no-movement":
      return { key: "noMovement", params: { speed: fig(p.maxSpeedMps * 3.6, 1) } };
    case "reversing":
      return { key: "reversing", params: { at: p.at, back: fig(p.backM, 0), max: REVERSE_M } };
    case "negative-speed":
      return { key: "negativeSpeed", params: { at: p.at } };
  }
}

/** A problem that makes the samples unusable as a start, for the user (English unless a translator is given). */
export function problemText(p: RecordingProblem, tr: Translator = ENGLISH): string {
  return reviewText(tr, problemLine(p));
}

/** Notices in English (the JSON's) and as data. */
const noticesOf = (texts: ReviewText[]) => ({ notices: texts.map((t) => reviewText(ENGLISH, t)), noticeTexts: texts });

/** Read a recording by its file name's ending (.gpx or .csv), checked as a start. */
export function readRecording(name: string, text: string): ReadRecording {
  if (text.length > MAX_RECORDING_CHARS) throw new RecordingFileError(RECORDING_WORDS.tooBig);
  if (text.replace(/^\ufeff/, "").trim() === "") throw new RecordingFileError(RECORDING_WORDS.empty);
  const lower = name.toLowerCase();
  const r = lower.endsWith(".gpx") ? readGpx(text) : lower.endsWith(".csv") ? readCsvLog(text) : null;
  if (!r) throw new RecordingFileError(RECORDING_WORDS.unknownKind);
  const problems = recordingProblems(r.recording);
  if (problems.length > 0) throw new RecordingFileError(problems.map(problemLine));
  return r;
}

const CSV_COLUMNS = ["time_s", "speed_kmh", "notch", "current_A", "distance_m"] as const;
type CsvColumn = (typeof CSV_COLUMNS)[number];

/** Read the CSV log (not yet checked as a start: `readRecording` does that). */
export function readCsvLog(text: string): ReadRecording {
  let records;
  try {
    records = parseCsv(text);
  } catch (e) {
    throw new RecordingFileError(e instanceof CsvQuoteError ? RECORDING_WORDS.csvUnclosed(e.line) : RECORDING_WORDS.csvQuote((e as Error).message));
  }
  if (records.length > MAX_SAMPLES + 1) throw new RecordingFileError(RECORDING_WORDS.tooMany);
  const head = records[0];
  if (!head) throw new RecordingFileError(RECORDING_WORDS.empty);
  const names = head.fields.map((f) => f.trim());
  const col = new Map<CsvColumn, number>();
  names.forEach((n, k) => {
    if (!(CSV_COLUMNS as readonly string[]).includes(n)) {
      if (NUMBER.test(n) || !names.includes("time_s")) throw new RecordingFileError(RECORDING_WORDS.csvHeader);
      throw new RecordingFileError(RECORDING_WORDS.csvUnknownColumn(head.line, n));
    }
    col.set(n as CsvColumn, k);
  });
  if (!col.has("time_s") || !col.has("speed_kmh")) throw new RecordingFileError(RECORDING_WORDS.csvHeader);
  const value = (rec: { line: number; fields: string[] }, name: CsvColumn, optional: boolean): number | undefined => {
    const k = col.get(name);
    if (k === undefined) return undefined;
    const raw = (rec.fields[k] ?? "").trim();
    if (raw === "") {
      if (optional) return undefined;
      throw new RecordingFileError(RECORDING_WORDS.csvMissing(rec.line, name));
    }
    if (!NUMBER.test(raw)) throw new RecordingFileError(RECORDING_WORDS.csvNotNumber(rec.line, name, raw));
    const x = Number(raw);
    if (name === "notch" && !(Number.isInteger(x) && x >= 0)) throw new RecordingFileError(RECORDING_WORDS.csvNotch(rec.line, raw));
    return x;
  };
  const samples: RecordingSample[] = records.slice(1).map((rec) => {
    const s: RecordingSample = { timeS: value(rec, "time_s", false)!, speedMps: value(rec, "speed_kmh", false)! / 3.6, at: `line ${rec.line}` };
    const notch = value(rec, "notch", true);
    const current = value(rec, "current_A", true);
    const distance = value(rec, "distance_m", true);
    if (notch !== undefined) s.notch = notch;
    if (current !== undefined) s.currentA = current;
    if (distance !== undefined) s.distanceM = distance;
    return s;
  });
  for (const [name, key] of [
    ["notch", "notch"],
    ["current_A", "currentA"],
    ["distance_m", "distanceM"],
  ] as const) {
    const filled = samples.filter((s) => s[key] !== undefined).length;
    if (filled > 0 && filled < samples.length) throw new RecordingFileError(RECORDING_WORDS.csvPartial(name));
  }
  // Distances are measured from the first sample.
  if (samples.length > 0 && samples[0]!.distanceM !== undefined) {
    const d0 = samples[0]!.distanceM;
    for (const s of samples) s.distanceM = s.distanceM! - d0;
  } else if (samples.length > 1 && samples.every((s) => Number.isFinite(s.timeS)) && isAscending(samples)) {
    const d = integratedDistanceM(
      samples.map((s) => s.timeS),
      samples.map((s) => s.speedMps),
    );
    samples.forEach((s, i) => (s.distanceM = d[i]!));
  }
  const t0 = samples[0]?.timeS ?? 0;
  for (const s of samples) s.timeS -= t0;
  return {
    kind: "csv",
    recording: { samples, notchLogged: samples.length > 0 && samples.every((s) => s.notch !== undefined), currentLogged: samples.length > 0 && samples.every((s) => s.currentA !== undefined) },
    notices: [],
    noticeTexts: [],
  };
}

function isAscending(s: readonly RecordingSample[]): boolean {
  for (let i = 1; i < s.length; i++) if (!(s[i]!.timeS > s[i - 1]!.timeS)) return false;
  return true;
}

interface GpxPoint {
  lat: number;
  lon: number;
  timeMs: number;
  speedMps?: number;
  point: number;
  line: number;
}

/** Milliseconds since 1970 of an xsd:dateTime; a time without a zone is taken as UTC. NaN when not one. */
export function dateTimeMs(raw: string): number {
  const m = DATE_TIME.exec(raw);
  if (!m) return Number.NaN;
  const [, y, mo, d, h, mi, s, frac, zone] = m;
  const base = Date.UTC(Number(y), Number(mo) - 1, Number(d), Number(h), Number(mi), Number(s));
  if (Number(mo) < 1 || Number(mo) > 12 || Number(d) < 1 || Number(d) > 31 || Number(h) > 24 || Number(mi) > 59 || Number(s) > 60) return Number.NaN;
  let ms = base + (frac ? Number(`0${frac}`) * 1000 : 0);
  if (zone && zone !== "Z") {
    const sign = zone.startsWith("-") ? -1 : 1;
    ms -= sign * (Number(zone.slice(1, 3)) * 60 + Number(zone.slice(4, 6))) * 60_000;
  }
  return ms;
}

/** Mean Earth radius, m (IUGG mean radius R1 = 6371.0088 km; Moritz, "Geodetic Reference System 1980", 2000). */
const EARTH_M = 6_371_008.8;

/** Read a GPX track (not yet checked as a start: `readRecording` does that). */
export function readGpx(text: string): ReadRecording {
  const parser = new SaxesParser({ xmlns: false, position: true });
  const points: GpxPoint[] = [];
  const notices: ReviewText[] = [];
  const path: string[] = [];
  let root: string | null = null;
  let pointNo = 0;
  let cur: { lat: number; lon: number; time?: string; speed?: string; line: number; point: number } | null = null;
  let textBuf = "";
  let failure: RecordingFileError | null = null;
  const local = (name: string) => name.slice(name.indexOf(":") + 1);
  parser.on("doctype", (doctype) => {
    if (/<!ENTITY/i.test(doctype)) failure ??= new RecordingFileError(RECORDING_WORDS.gpxEntities);
  });
  parser.on("opentag", (tag) => {
    const name = local(tag.name);
    if (root === null) {
      root = name;
      if (name !== "gpx") failure ??= new RecordingFileError(RECORDING_WORDS.gpxRoot(tag.name));
    }
    path.push(name);
    textBuf = "";
    if (name === "trkpt" && path[path.length - 2] === "trkseg") {
      pointNo++;
      if (pointNo > MAX_SAMPLES) failure ??= new RecordingFileError(RECORDING_WORDS.tooMany);
      const attr = (k: string) => {
        const v = tag.attributes[k];
        return typeof v === "string" && NUMBER.test(v) ? Number(v) : Number.NaN;
      };
      const lat = attr("lat");
      const lon = attr("lon");
      if (!(Math.abs(lat) <= 90 && Math.abs(lon) <= 180)) failure ??= new RecordingFileError(RECORDING_WORDS.gpxLatLon(pointNo, parser.line));
      cur = { lat, lon, line: parser.line, point: pointNo };
    }
  });
  parser.on("text", (t) => {
    textBuf += t;
  });
  parser.on("closetag", (tag) => {
    const name = local(tag.name);
    if (cur) {
      if (name === "time" && path[path.length - 2] === "trkpt") cur.time = textBuf.trim();
      // GPX 1.0 put speed in the point; GPX 1.1 files carry it in an extension (any namespace), m/s.
      else if (name === "speed" && (path[path.length - 2] === "trkpt" || path.includes("extensions"))) cur.speed = textBuf.trim();
      else if (name === "trkpt") {
        const p = cur;
        cur = null;
        if (p.time === undefined) notices.push(RECORDING_WORDS.gpxNoTime(p.point, p.line));
        else {
          const ms = dateTimeMs(p.time);
          if (Number.isNaN(ms)) failure ??= new RecordingFileError(RECORDING_WORDS.gpxTime(p.point, p.line, p.time));
          const pt: GpxPoint = { lat: p.lat, lon: p.lon, timeMs: ms, point: p.point, line: p.line };
          if (p.speed !== undefined) {
            if (!NUMBER.test(p.speed) || Number(p.speed) < 0) failure ??= new RecordingFileError(RECORDING_WORDS.gpxSpeed(p.point, p.line, p.speed));
            pt.speedMps = Number(p.speed);
          }
          points.push(pt);
        }
      }
    }
    path.pop();
    textBuf = "";
  });
  parser.on("error", (e) => {
    failure ??= new RecordingFileError(RECORDING_WORDS.gpxNotXml(parser.line, parser.column, e.message));
  });
  try {
    parser.write(text.replace(/^\ufeff/, "")).close();
  } catch (e) {
    failure ??= new RecordingFileError(RECORDING_WORDS.gpxNotXml(parser.line, parser.column, (e as Error).message));
  }
  if (failure) throw failure;
  if (pointNo === 0) throw new RecordingFileError(RECORDING_WORDS.gpxNoPoints);
  // Lay the points on a local plane (equirectangular about the first point: metres east and north; over
  // the few kilometres of a start the error is far below the fixes' own).
  const p0 = points[0];
  if (!p0) return { kind: "gpx", recording: { samples: [], notchLogged: false, currentLogged: false }, ...noticesOf(notices) };
  const k = Math.PI / 180;
  const east = points.map((p) => (p.lon - p0.lon) * k * EARTH_M * Math.cos(p0.lat * k));
  const north = points.map((p) => (p.lat - p0.lat) * k * EARTH_M);
  const timeS = points.map((p) => (p.timeMs - p0.timeMs) / 1000);
  const at = (p: GpxPoint) => `point ${p.point} (line ${p.line})`;
  // Time order is checked before smoothing (the smoother needs it); the other checks come after.
  const samples: RecordingSample[] = points.map((p, i) => ({ timeS: timeS[i]!, speedMps: 0, at: at(p) }));
  if (isAscending(samples)) {
    const tr = trackSpeeds(timeS, east, north);
    const logged = points.every((p) => p.speedMps !== undefined);
    samples.forEach((s, i) => {
      s.speedMps = logged ? points[i]!.speedMps! : tr.speedMps[i]!;
      s.distanceM = tr.distanceM[i]!;
    });
    notices.push(logged ? RECORDING_WORDS.gpxSpeedUsed : RECORDING_WORDS.gpxSpeedDerived);
    // The path's length never runs backwards: a reversal shows as progress lost along the line from the
    // first fix to the farthest one.
    let far = 0;
    for (let i = 1; i < points.length; i++) if (Math.hypot(east[i]!, north[i]!) > Math.hypot(east[far]!, north[far]!)) far = i;
    const len = Math.hypot(east[far]!, north[far]!);
    if (len > 0) {
      let most = -Infinity;
      for (let i = 0; i < points.length; i++) {
        const along = (east[i]! * east[far]! + north[i]! * north[far]!) / len;
        most = Math.max(most, along);
        if (most - along > REVERSE_M) throw new RecordingFileError(problemLine({ kind: "reversing", at: at(points[i]!), backM: most - along }));
      }
    }
  }
  return { kind: "gpx", recording: { samples, notchLogged: false, currentLogged: false }, ...noticesOf(notices) };
}
