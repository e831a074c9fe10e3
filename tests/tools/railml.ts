/**
 * railML 2.x infrastructure files written by the tests themselves, with the standard's element and
 * attribute names (the public sources each name was checked against are listed beside the tests in
 * tests/profiles/railml.test.ts). Tracks are joined trackEnd → trackBegin unless a test joins them
 * otherwise; every value is given, so a test knows the profile it expects without asking the program.
 */

export interface TestChange {
  pos: number;
  dir?: "up" | "down";
  value: number;
  absPos?: number;
}

export interface TestTrack {
  id: string;
  name?: string;
  type?: string;
  beginPos?: number;
  endPos: number;
  beginAbs?: number;
  endAbs?: number;
  /** Connection ids at each end and the ids they join ("" for an open end). */
  beginConn?: { id: string; ref: string };
  endConn?: { id: string; ref: string };
  gradients?: TestChange[];
  radii?: TestChange[];
  speeds?: TestChange[];
  signals?: Array<{ id: string; pos: number; dir: "up" | "down"; name?: string }>;
  switches?: Array<{ id: string; pos: number; name?: string }>;
  levelCrossings?: Array<{ id: string; pos: number }>;
  crossSections?: Array<{ id: string; pos: number; ocpRef: string }>;
}

export interface TestFile {
  /** Default: railML 2.2's namespace over http. */
  namespace?: string;
  version?: string;
  tracks: TestTrack[];
  ocps?: Array<{ id: string; name: string }>;
  /** Text put before the root element (a DOCTYPE, say). */
  prolog?: string;
}

export const RAILML_22_NS = "http://www.railml.org/schemas/2013";
export const RAILML_24_NS = "https://www.railml.org/schemas/2018";
export const RAILML_25_NS = "https://www.railml.org/schemas/2021";

const a = (name: string, v: string | number | undefined) => (v === undefined ? "" : ` ${name}="${v}"`);

function changes(tag: string, valueAttr: string, list: TestChange[] | undefined, track: string): string {
  if (!list || list.length === 0) return "";
  const items = list.map((c, k) => `          <${tag} id="${track}_${tag}_${k}"${a("pos", c.pos)}${a("absPos", c.absPos)}${a("dir", c.dir)}${a(valueAttr, c.value)}/>`).join("\n");
  return `        <${tag}s>\n${items}\n        </${tag}s>\n`;
}

function end(tag: "trackBegin" | "trackEnd", id: string, pos: number, abs: number | undefined, conn: { id: string; ref: string } | undefined): string {
  const inner = conn ? `<connection id="${conn.id}" ref="${conn.ref}"/>` : `<openEnd id="${id}_open"/>`;
  return `        <${tag} id="${id}"${a("pos", pos)}${a("absPos", abs)}>${inner}</${tag}>\n`;
}

export function trackXml(t: TestTrack): string {
  const switches = (t.switches ?? []).map((s) => `          <switch id="${s.id}"${a("pos", s.pos)}${a("name", s.name)}/>`).join("\n");
  const ocs = (t.signals ?? []).map((s) => `            <signal id="${s.id}"${a("pos", s.pos)}${a("dir", s.dir)}${a("name", s.name)} type="main"/>`).join("\n");
  const lx = (t.levelCrossings ?? []).map((l) => `          <levelCrossing id="${l.id}"${a("pos", l.pos)}/>`).join("\n");
  const cs = (t.crossSections ?? []).map((c) => `          <crossSection id="${c.id}"${a("pos", c.pos)} ocpRef="${c.ocpRef}"/>`).join("\n");
  return (
    `    <track id="${t.id}"${a("name", t.name)}${a("type", t.type)}>\n` +
    `      <trackTopology>\n` +
    end("trackBegin", `${t.id}_b`, t.beginPos ?? 0, t.beginAbs, t.beginConn) +
    end("trackEnd", `${t.id}_e`, t.endPos, t.endAbs, t.endConn) +
    (switches ? `        <connections>\n${switches}\n        </connections>\n` : "") +
    `      </trackTopology>\n` +
    `      <trackElements>\n` +
    changes("speedChange", "vMax", t.speeds, t.id) +
    changes("gradientChange", "slope", t.gradients, t.id) +
    changes("radiusChange", "radius", t.radii, t.id) +
    (lx ? `        <levelCrossings>\n${lx}\n        </levelCrossings>\n` : "") +
    (cs ? `        <crossSections>\n${cs}\n        </crossSections>\n` : "") +
    `      </trackElements>\n` +
    (ocs ? `      <ocsElements>\n        <signals>\n${ocs}\n        </signals>\n      </ocsElements>\n` : "") +
    `    </track>\n`
  );
}

export function railmlHead(f: Pick<TestFile, "namespace" | "version" | "prolog">): string {
  const ns = f.namespace ?? RAILML_22_NS;
  return (
    `<?xml version="1.0" encoding="UTF-8"?>\n${f.prolog ?? ""}` +
    `<railml xmlns="${ns}" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" version="${f.version ?? "2.2"}">\n` +
    `  <infrastructure id="inf1" name="Test line (invented)">\n    <tracks>\n`
  );
}

export function railmlTail(ocps: TestFile["ocps"] = []): string {
  const o = ocps.map((x) => `      <ocp id="${x.id}" name="${x.name}"/>`).join("\n");
  return `    </tracks>\n` + (o ? `    <operationControlPoints>\n${o}\n    </operationControlPoints>\n` : "") + `  </infrastructure>\n</railml>\n`;
}

export function railmlFile(f: TestFile): string {
  return railmlHead(f) + f.tracks.map(trackXml).join("") + railmlTail(f.ocps);
}

/** Tracks T1..Tn of the given lengths laid end to end (trackEnd of one joins trackBegin of the next), absPos from `startAbs`. */
export function chain(lengths: number[], startAbs = 0): TestTrack[] {
  let abs = startAbs;
  return lengths.map((len, k) => {
    const id = `T${k + 1}`;
    const t: TestTrack = { id, endPos: len, beginAbs: abs, endAbs: abs + len };
    if (k > 0) t.beginConn = { id: `${id}_in`, ref: `T${k}_out` };
    if (k < lengths.length - 1) t.endConn = { id: `${id}_out`, ref: `T${k + 2}_in` };
    abs += len;
    return t;
  });
}
