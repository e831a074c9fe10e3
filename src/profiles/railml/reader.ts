/**
 * A streaming reader of railML 2.x infrastructure: text goes in chunk by chunk (a 50 MB file never sits in
 * memory as a tree), the railML model comes out (model.ts). Pure: no file, DOM or Worker API, so the same
 * code runs in the command line and in the app's import worker.
 *
 * The XML itself is parsed by saxes, a strict, non-validating streaming parser: it checks well-formedness,
 * expands only XML's five predefined entities and character references, and never fetches anything. A
 * document type that declares entities is refused outright (that is how "billion laughs" and external
 * entities arrive), so no entity is ever expanded or resolved.
 *
 * Accepted: a root `railml` element in a railML 2 namespace, `http://www.railml.org/schemas/YYYY` or its
 * `https://` form (railML 2.2 and 2.3 use .../2013, 2.4 .../2018, 2.5 .../2021), with an `infrastructure`
 * holding `tracks`. railML 3.x files and anything else get a message saying what the file is.
 */
import { SaxesParser, type SaxesTagNS } from "saxes";
import { counted, railmlEnglish, say, type RailmlText } from "./text.js";
import { xmlProblemCode } from "../xmlProblem.js";
import type { PlacedThing, RailmlDir, RailmlModel, RailmlOcp, RailmlThingKind, RailmlTrack, TrackEndInfo } from "./model.js";

/** A file that cannot be read as railML infrastructure; the message is for the user. */
export class RailmlError extends Error {
  override name = "RailmlError";
  /** The same as data, for words in another language. */
  readonly text: RailmlText;
  constructor(text: RailmlText) {
    super(railmlEnglish(text));
    this.text = text;
  }
}

/** What the XML parser (saxes) found wrong, from its English message, as a text of ours (xmlProblem.ts). */
export function xmlProblem(message: string): RailmlText {
  const p = xmlProblemCode(message);
  return p.tag === undefined ? say(p.code) : say(p.code, { tag: p.tag });
}

/** railML 2.x namespaces: a year, over http or https. */
const RAILML2_NS = /^https?:\/\/www\.railml\.org\/schemas\/(\d{4})\/?$/;
/** railML 3.x namespaces: "3", "3.1", "3.2" … */
const RAILML3_NS = /^https?:\/\/www\.railml\.org\/schemas\/3(\.\d+)?\/?$/;

/** Most characters read before giving up: about 256 MB of text. */
export const MAX_RAILML_CHARS = 256 * 1024 * 1024;
/** Most elements read before giving up (a railML line of a few hundred km has far fewer). */
export const MAX_RAILML_ELEMENTS = 5_000_000;

const THING_ELEMENTS: Record<string, RailmlThingKind> = {
  signal: "signal",
  switch: "points",
  crossing: "points",
  levelCrossing: "level-crossing",
  tunnel: "tunnel",
  bridge: "bridge",
  platformEdge: "platform",
};

const NUMBER = /^\s*[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?\s*$/;

export interface RailmlReader {
  /** Feed the next piece of the document's text. Throws RailmlError on anything it cannot read. */
  write(chunk: string): void;
  /** End of the document: the model, or a RailmlError. */
  close(): RailmlModel;
}

export interface RailmlReaderLimits {
  maxChars?: number;
  maxElements?: number;
}

export function createRailmlReader(limits: RailmlReaderLimits = {}): RailmlReader {
  const maxChars = limits.maxChars ?? MAX_RAILML_CHARS;
  const maxElements = limits.maxElements ?? MAX_RAILML_ELEMENTS;
  const parser = new SaxesParser({ xmlns: true, position: true });
  const model: RailmlModel = { version: "", namespace: "", tracks: [], ocps: [], warnings: [], warningTexts: [] };
  /** Local names of the open railML elements; "#other" for elements of another namespace. */
  const stack: string[] = [];
  let railmlNs: string | undefined;
  let sawInfrastructure = false;
  let track: RailmlTrack | undefined;
  let trackEnd: TrackEndInfo | undefined;
  let chars = 0;
  let elements = 0;
  let noDir = 0;
  let failure: RailmlError | undefined;

  const fail = (text: RailmlText): never => {
    throw new RailmlError(text);
  };
  const warn = (text: RailmlText) => {
    model.warnings.push(railmlEnglish(text));
    model.warningTexts.push(text);
  };

  const attr = (tag: SaxesTagNS, name: string): string | undefined => {
    const a = tag.attributes[name];
    return a && a.uri === "" ? a.value : undefined;
  };
  const label = (tag: SaxesTagNS) => {
    const id = attr(tag, "id");
    return id ? say("elementId", { tag: tag.local, id }) : say("elementAtLine", { tag: tag.local, line: String(parser.line) });
  };
  const num = (tag: SaxesTagNS, name: string): number | undefined => {
    const v = attr(tag, name);
    if (v === undefined) return undefined;
    if (!NUMBER.test(v)) fail(say("notNumber", { element: label(tag), name, value: v }));
    const x = Number(v);
    if (!Number.isFinite(x)) fail(say("notFinite", { element: label(tag), name, value: v }));
    return x;
  };
  const needNum = (tag: SaxesTagNS, name: string): number => {
    const x = num(tag, name);
    if (x === undefined) fail(say("noAttribute", { element: label(tag), name }));
    return x!;
  };
  const dir = (tag: SaxesTagNS): RailmlDir => {
    const d = attr(tag, "dir");
    if (d === "up" || d === "down") return d;
    if (d === undefined) noDir++;
    return "both";
  };

  const openRoot = (tag: SaxesTagNS) => {
    if (tag.local !== "railml" && tag.local !== "railML") {
      fail(say("notRailml", { tag: tag.name, ns: tag.uri ? say("inNamespace", { uri: tag.uri }) : "" }));
    }
    const version = attr(tag, "version") ?? "";
    if (RAILML3_NS.test(tag.uri) || /^3(\.|$)/.test(version)) {
      fail(say("railml3", { version: version ? say("versionNamed", { version }) : "" }));
    }
    if (!RAILML2_NS.test(tag.uri)) {
      if (tag.uri !== "") fail(say("notRailml2", { tag: tag.name, uri: tag.uri }));
      warn(say("noNamespace"));
    }
    if (version !== "" && !/^2\.[0-9]+$/.test(version)) warn(say("otherVersion", { version }));
    if (/^2\.[01]$/.test(version)) warn(say("olderVersion", { version }));
    railmlNs = tag.uri;
    model.version = version;
    model.namespace = tag.uri;
  };

  const parent = (k = 1) => stack[stack.length - k];

  const open = (tag: SaxesTagNS) => {
    if (++elements > maxElements) fail(say("tooManyElements", { max: counted(maxElements) }));
    if (stack.length === 0) {
      openRoot(tag);
      stack.push(tag.local);
      return;
    }
    // Elements of other namespaces (a supplier's extensions) and everything inside them are skipped.
    if (tag.uri !== railmlNs || parent() === "#other") {
      stack.push("#other");
      return;
    }
    const name = tag.local;
    const inTrack = track !== undefined;
    if (name === "infrastructure" && parent() === "railml") sawInfrastructure = true;
    else if (name === "track" && parent() === "tracks" && sawInfrastructure) {
      const id = attr(tag, "id") ?? `track ${model.tracks.length + 1}`;
      const t: RailmlTrack = { id, gradients: [], radii: [], speeds: [], things: [], crossSections: [] };
      const nm = attr(tag, "name");
      const type = attr(tag, "type");
      if (nm) t.name = nm;
      if (type) t.type = type;
      track = t;
    } else if (inTrack && (name === "trackBegin" || name === "trackEnd") && parent() === "trackTopology") {
      const e: TrackEndInfo = { pos: needNum(tag, "pos") };
      const abs = num(tag, "absPos");
      if (abs !== undefined) e.absPos = abs;
      trackEnd = e;
      if (name === "trackBegin") track!.begin = e;
      else track!.end = e;
    } else if (inTrack && trackEnd && (parent() === "trackBegin" || parent() === "trackEnd")) {
      if (name === "connection") {
        const id = attr(tag, "id");
        const ref = attr(tag, "ref");
        if (id && ref) trackEnd.connection = { id, ref };
      } else trackEnd.closed = name === "openEnd" || name === "bufferStop" ? name : "other";
    } else if (inTrack && name === "gradientChange") {
      track!.gradients.push({ ...idOf(tag), pos: needNum(tag, "pos"), dir: dir(tag), value: needNum(tag, "slope") });
    } else if (inTrack && name === "radiusChange") {
      track!.radii.push({ ...idOf(tag), pos: needNum(tag, "pos"), dir: dir(tag), value: needNum(tag, "radius") });
    } else if (inTrack && name === "speedChange") {
      const v = num(tag, "vMax");
      if (v !== undefined) track!.speeds.push({ ...idOf(tag), pos: needNum(tag, "pos"), dir: dir(tag), value: v });
    } else if (inTrack && name === "crossSection") {
      const ref = attr(tag, "ocpRef");
      if (ref) track!.crossSections.push({ pos: needNum(tag, "pos"), ocpRef: ref });
    } else if (inTrack && THING_ELEMENTS[name] && (name !== "switch" && name !== "crossing" ? true : parent() === "connections")) {
      const pos = num(tag, "pos");
      if (pos !== undefined) {
        const thing: PlacedThing = { kind: THING_ELEMENTS[name]!, pos, dir: attr(tag, "dir") === undefined ? "both" : dir(tag), ...idOf(tag) };
        const nm = attr(tag, "name");
        const length = num(tag, "length");
        if (nm) thing.name = nm;
        if (length !== undefined) thing.length = length;
        track!.things.push(thing);
      }
    } else if (name === "ocp" && parent() === "operationControlPoints") {
      const id = attr(tag, "id");
      if (id) {
        const o: RailmlOcp = { id };
        const nm = attr(tag, "name");
        const code = attr(tag, "code");
        if (nm) o.name = nm;
        if (code) o.code = code;
        model.ocps.push(o);
      }
    }
    stack.push(name);
  };

  const idOf = (tag: SaxesTagNS) => {
    const id = attr(tag, "id");
    return id ? { id } : {};
  };

  const close = () => {
    const name = stack.pop();
    if (name === "track" && parent() === "tracks" && track) {
      model.tracks.push(track);
      track = undefined;
    } else if (name === "trackBegin" || name === "trackEnd") trackEnd = undefined;
  };

  parser.on("doctype", (doctype) => {
    if (/<!ENTITY/i.test(doctype)) fail(say("entities"));
  });
  parser.on("xmldecl", (decl) => {
    if (decl.encoding && !/^utf-?8$/i.test(decl.encoding)) warn(say("encoding", { encoding: decl.encoding }));
  });
  parser.on("opentag", open);
  parser.on("closetag", close);
  parser.on("error", (e) => {
    // saxes writes "line:column: what." in English: the place as figures, what went wrong as one of our codes.
    const m = /(\d+):(\d+):\s*(.*)$/s.exec(e.message);
    throw new RailmlError(say("notWellFormed", { detail: xmlProblem(m?.[3] ?? e.message), line: m?.[1] ?? String(parser.line), column: m?.[2] ?? String(parser.column) }));
  });

  const guard = (f: () => void) => {
    if (failure) throw failure;
    try {
      f();
    } catch (e) {
      failure = e instanceof RailmlError ? e : new RailmlError(say("couldNotRead", { detail: (e as Error).message }));
      throw failure;
    }
  };

  return {
    write(chunk) {
      guard(() => {
        chars += chunk.length;
        if (chars > maxChars) fail(say("tooLarge", { max: counted(Math.max(1, Math.round(maxChars / 1024 / 1024))) }));
        parser.write(chunk);
      });
    },
    close() {
      guard(() => {
        parser.close();
      });
      if (!railmlNs && model.namespace === "" && stack.length === 0 && elements === 0) throw new RailmlError(say("empty"));
      if (!sawInfrastructure) throw new RailmlError(say("noInfrastructure"));
      if (model.tracks.length === 0) throw new RailmlError(say("noTracks"));
      if (model.tracks.every((t) => t.gradients.length === 0 && t.radii.length === 0)) {
        warn(say("noProfile"));
      }
      if (noDir > 0) warn(say("noDir", { count: counted(noDir) }));
      const noAbs = model.tracks.filter((t) => t.begin?.absPos === undefined || t.end?.absPos === undefined).length;
      if (noAbs > 0) warn(say("noAbs", { count: counted(noAbs), all: counted(model.tracks.length) }));
      return model;
    },
  };
}

/** Read a whole document given as one string (tests and small files). */
export function readRailmlText(text: string, chunkChars = 1 << 16, limits: RailmlReaderLimits = {}): RailmlModel {
  const r = createRailmlReader(limits);
  for (let k = 0; k < text.length; k += chunkChars) r.write(text.slice(k, k + chunkChars));
  return r.close();
}
