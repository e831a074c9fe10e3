/**
 * Recording files for the Start review: GPX variants seen in public files, and broken files refused with a
 * message naming the line or point. GPX structure after the GPX 1.1 schema (gpx.xsd: trk, trkseg, trkpt
 * lat/lon, ele, time, extensions); the speed element in m/s as GPX 1.0 placed it in the point and as
 * GPX 1.1 files carry it inside extensions (e.g. the TrackPointExtension v2 `speed` and the `tpx:extras`
 * speed of Logiqx/gpx-ideas docs/xmlschemas/tpx/1/0/README.md; trackpoint table of Logiqx/gps-wizard
 * docs/formats/gpx.md). Expected distances from the haversine formula (R. W. Sinnott, "Virtues of the
 * Haversine", Sky and Telescope 68(2), 1984, p. 159), computed here independently of the reader.
 */
import { describe, expect, it } from "vitest";
import { dateTimeMs, readRecording, RecordingFileError } from "../../src/profiles/recording.js";

const R = 6_371_008.8;
function haversineM(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const k = Math.PI / 180;
  const a = Math.sin(((lat2 - lat1) * k) / 2) ** 2 + Math.cos(lat1 * k) * Math.cos(lat2 * k) * Math.sin(((lon2 - lon1) * k) / 2) ** 2;
  return 2 * R * Math.asin(Math.sqrt(a));
}

/** A train standing 20 s, then accelerating at 0.1 m/s² northwards along a meridian, 1 fix a second. */
function points(n = 90): Array<{ lat: number; lon: number; t: number; v: number }> {
  const lat0 = 46.5;
  return Array.from({ length: n }, (_, i) => {
    const tm = Math.max(0, i - 20);
    const d = 0.05 * tm * tm;
    return { lat: lat0 + (d / R) * (180 / Math.PI), lon: 18.25, t: i, v: 0.1 * tm };
  });
}

const iso = (t: number, zone = "Z") => {
  const base = new Date(Date.UTC(2026, 10, 3, 5, 40, 0) + t * 1000).toISOString().slice(0, 19);
  if (zone === "Z") return `${base}Z`;
  // The same instant written in a zone east of UTC: local clock = UTC + offset.
  const h = Number(zone.slice(1, 3));
  return `${new Date(Date.UTC(2026, 10, 3, 5 + h, 40, 0) + t * 1000).toISOString().slice(0, 19)}${zone}`;
};

function gpx(body: string): string {
  return `<?xml version="1.0" encoding="UTF-8"?>\n<gpx version="1.1" creator="taut tests" xmlns="http://www.topografix.com/GPX/1/1" xmlns:tpx="urn:example:tpx">\n<trk><name>test</name>\n${body}\n</trk>\n</gpx>\n`;
}
const pt = (p: { lat: number; lon: number; t: number }, inner: string) => `<trkpt lat="${p.lat.toFixed(8)}" lon="${p.lon}">${inner}</trkpt>`;

function refused(name: string, text: string): string {
  try {
    readRecording(name, text);
  } catch (e) {
    expect(e).toBeInstanceOf(RecordingFileError);
    return (e as Error).message;
  }
  throw new Error("the file was accepted");
}

describe("GPX variants", () => {
  it("one segment with elevation: the distance is the track's length (haversine)", () => {
    const ps = points();
    const r = readRecording("a.gpx", gpx(`<trkseg>${ps.map((p) => pt(p, `<ele>101.5</ele><time>${iso(p.t)}</time>`)).join("\n")}</trkseg>`));
    const last = r.recording.samples[r.recording.samples.length - 1]!;
    const expected = haversineM(ps[0]!.lat, ps[0]!.lon, ps[ps.length - 1]!.lat, ps[ps.length - 1]!.lon);
    expect(Math.abs(last.distanceM! - expected)).toBeLessThan(0.01 * expected);
    expect(r.recording.samples).toHaveLength(ps.length);
    expect(r.recording.notchLogged).toBe(false);
  });

  it("several segments and no elevation read as one recording, the same as one segment", () => {
    const ps = points();
    const one = readRecording("a.gpx", gpx(`<trkseg>${ps.map((p) => pt(p, `<time>${iso(p.t)}</time>`)).join("")}</trkseg>`));
    const split = readRecording("a.gpx", gpx(`<trkseg>${ps.slice(0, 40).map((p) => pt(p, `<time>${iso(p.t)}</time>`)).join("")}</trkseg><trkseg>${ps.slice(40).map((p) => pt(p, `<time>${iso(p.t)}</time>`)).join("")}</trkseg>`));
    expect(split.recording.samples.map((s) => s.speedMps)).toEqual(one.recording.samples.map((s) => s.speedMps));
  });

  it("time zones: the same instants written with +02:00 give the same recording as with Z", () => {
    const ps = points();
    const z = readRecording("a.gpx", gpx(`<trkseg>${ps.map((p) => pt(p, `<time>${iso(p.t)}</time>`)).join("")}</trkseg>`));
    const east = readRecording("a.gpx", gpx(`<trkseg>${ps.map((p) => pt(p, `<time>${iso(p.t, "+02:00")}</time>`)).join("")}</trkseg>`));
    expect(east.recording.samples.map((s) => s.timeS)).toEqual(z.recording.samples.map((s) => s.timeS));
    expect(dateTimeMs("2026-11-03T07:40:00+02:00")).toBe(dateTimeMs("2026-11-03T05:40:00Z"));
    expect(dateTimeMs("2026-11-03T05:40:00.250Z") - dateTimeMs("2026-11-03T05:40:00Z")).toBe(250);
  });

  it("a speed in the points' extensions (m/s) is used as logged", () => {
    const ps = points();
    const r = readRecording("a.gpx", gpx(`<trkseg>${ps.map((p) => pt(p, `<time>${iso(p.t)}</time><extensions><tpx:extras><tpx:speed>${p.v.toFixed(3)}</tpx:speed></tpx:extras></extensions>`)).join("")}</trkseg>`));
    r.recording.samples.forEach((s, i) => expect(s.speedMps).toBeCloseTo(ps[i]!.v, 3));
    expect(r.notices.join(" ")).toMatch(/speed logged/);
  });

  it("a point without a time is left out, and said so", () => {
    const ps = points();
    const r = readRecording("a.gpx", gpx(`<trkseg>${ps.map((p, i) => pt(p, i === 50 ? "<ele>3</ele>" : `<time>${iso(p.t)}</time>`)).join("\n")}</trkseg>`));
    expect(r.recording.samples).toHaveLength(ps.length - 1);
    expect(r.notices.some((n) => /point 51 .*no time/.test(n))).toBe(true);
  });
});

describe("broken recordings are refused with the line or point named", () => {
  const ps = points();
  const good = (f: (p: (typeof ps)[number], i: number) => string) => gpx(`<trkseg>\n${ps.map(f).join("\n")}\n</trkseg>`);

  it.each([
    ["not XML", "this is not xml", /not well-formed XML/],
    ["cut short", good((p) => pt(p, `<time>${iso(p.t)}</time>`)).slice(0, 900), /not well-formed XML \(line \d+/],
    ["another root", '<?xml version="1.0"?><kml><trk/></kml>', /root element is <kml>/],
    ["no points", gpx("<trkseg></trkseg>"), /no track points/],
    ["entities", '<?xml version="1.0"?><!DOCTYPE gpx [<!ENTITY a "x">]><gpx></gpx>', /declares its own XML entities/],
    ["a bad latitude", good((p, i) => (i === 7 ? `<trkpt lat="95" lon="1"><time>${iso(p.t)}</time></trkpt>` : pt(p, `<time>${iso(p.t)}</time>`))), /point 8 \(line \d+\): lat and lon/],
    ["a bad time", good((p, i) => pt(p, `<time>${i === 12 ? "yesterday" : iso(p.t)}</time>`)), /point 13 .*"yesterday" is not an ISO date/],
    ["out of order", good((p, i) => pt(p, `<time>${iso(i === 30 ? 10 : p.t)}</time>`)), /point 31 .*not later than at point 30/],
    ["a gap", good((p, i) => pt(p, `<time>${iso(i >= 40 ? p.t + 30 : p.t)}</time>`)), /point 41 .*gap longer than 5 s/],
    ["never moving", gpx(`<trkseg>${ps.map((p) => pt({ ...p, lat: 46.5 }, `<time>${iso(p.t)}</time>`)).join("")}</trkseg>`), /does not start/],
    ["reversing", good((p, i) => pt(i > 70 ? { ...p, lat: 46.5 + ((p.lat - 46.5) * (90 - i)) / 20 } : p, `<time>${iso(p.t)}</time>`)), /point \d+ .*run \d+ m back/],
  ])("GPX: %s", (_name, text, message) => {
    expect(refused("start.gpx", text)).toMatch(message);
  });

  it.each([
    ["no header", "0,0\n1,0\n", /header "time_s,speed_kmh"/],
    ["an unknown column", "time_s,speed_kmh,speed_mph\n0,0,0\n", /line 1: column "speed_mph"/],
    ["a bad number", `time_s,speed_kmh\n${Array.from({ length: 20 }, (_, i) => `${i},${i === 9 ? "fast" : i}`).join("\n")}\n`, /line 11: speed_kmh must be a number/],
    ["a fractional notch", `time_s,speed_kmh,notch\n${Array.from({ length: 20 }, (_, i) => `${i},${i},${i === 4 ? 2.5 : 1}`).join("\n")}\n`, /line 6: notch must be a whole number/],
    ["a negative speed", `time_s,speed_kmh\n${Array.from({ length: 30 }, (_, i) => `${i},${i === 25 ? -3 : i}`).join("\n")}\n`, /line 27: the speed is negative/],
    ["a distance running back", `time_s,speed_kmh,distance_m\n${Array.from({ length: 30 }, (_, i) => `${i},${10},${i < 20 ? 3 * i : 60 - 3 * (i - 20)}`).join("\n")}\n`, /line \d+: the train has run \d+ m back/],
    ["a partly filled column", `time_s,speed_kmh,notch\n${Array.from({ length: 30 }, (_, i) => `${i},${i},${i === 3 ? "" : 1}`).join("\n")}\n`, /notch is filled on some lines/],
    ["empty", "", /empty/],
  ])("CSV: %s", (_name, text, message) => {
    expect(refused("start.csv", text)).toMatch(message);
  });

  it("a file that is neither .gpx nor .csv is refused", () => {
    expect(refused("start.txt", "time_s,speed_kmh\n")).toMatch(/GPX track \(\.gpx\) or a CSV log/);
  });
});
