/**
 * Departures from files the user picked: a JSON list of start cases, or a CSV (`id,case,rail,sand`) whose
 * `case` column names start-case files by path — in the browser those are files picked alongside it,
 * matched by file name (the folders in the path are not looked at). Rows are read by src/profiles, the same
 * reader `taut check` uses, so a row's error reads the same.
 */
import { caseFileJson, departuresFromCsv, departuresFromJson, type Departure } from "../../../profiles/departures.js";
import { formatIssues, type FieldIssue } from "../../../profiles/issues.js";
import type { Library } from "../../../profiles/library.js";

export interface PickedFile {
  name: string;
  text: string;
}

export type PickedRead =
  | {
      ok: true;
      /** The departures file's name. */
      file: string;
      kind: "json" | "csv";
      departures: Departure[];
      /** Case files a CSV names that were not picked (their rows carry an error). */
      missing: string[];
      /** Picked files the CSV does not name. */
      unused: string[];
    }
  | { ok: false; message: string };

/** The last part of a path written with / or \. */
export function baseName(path: string): string {
  return path.split(/[\\/]/).filter((p) => p !== "").at(-1) ?? path;
}

const isJsonList = (f: PickedFile) => /^\s*\[/.test(f.text);

/** Which picked file is the departures file: the one CSV, else the one JSON list. */
function departuresFile(files: readonly PickedFile[]): PickedFile | string {
  const csvs = files.filter((f) => /\.csv$/i.test(f.name));
  if (csvs.length > 1) return `pick one departures file at a time (got ${csvs.map((f) => f.name).join(", ")})`;
  if (csvs.length === 1) return csvs[0]!;
  const lists = files.filter(isJsonList);
  if (lists.length > 1) return `pick one departures file at a time (got ${lists.map((f) => f.name).join(", ")})`;
  if (lists.length === 1) return lists[0]!;
  if (files.length === 0) return "no file picked";
  return `no departures file among ${files.map((f) => f.name).join(", ")}: a departures file is a CSV (id,case,rail,sand) or a JSON list of start cases ([ {...}, {...} ])`;
}

/** Read the picked files into departures. */
export function readPickedDepartures(files: readonly PickedFile[], lib: Library): PickedRead {
  const main = departuresFile(files);
  if (typeof main === "string") return { ok: false, message: main };
  const fail = (message: string, issues?: FieldIssue[]): PickedRead => ({ ok: false, message: `${main.name}: ${message}${issues && issues.length > 0 ? ` — ${formatIssues(issues).split("\n").join("; ")}` : ""}` });
  const json = /\.json$/i.test(main.name) || (!/\.csv$/i.test(main.name) && isJsonList(main));
  if (json) {
    const r = departuresFromJson(main.text, lib);
    if (!r.ok) return fail(r.message, r.issues);
    return { ok: true, file: main.name, kind: "json", departures: r.departures, missing: [], unused: files.filter((f) => f !== main).map((f) => f.name) };
  }
  const others = files.filter((f) => f !== main);
  const used = new Set<PickedFile>();
  const missing: string[] = [];
  const find = (path: string): PickedFile | undefined => {
    const name = baseName(path);
    return others.find((f) => f.name === name) ?? others.find((f) => f.name.toLowerCase() === name.toLowerCase());
  };
  const r = departuresFromCsv(
    main.text,
    (casePath) => {
      const f = find(casePath);
      if (!f) {
        missing.push(baseName(casePath));
        return new Error(`not among the picked files: pick ${baseName(casePath)} together with ${main.name}`);
      }
      used.add(f);
      return caseFileJson(f.text);
    },
    lib,
  );
  if (!r.ok) return fail(r.message, r.issues);
  return { ok: true, file: main.name, kind: "csv", departures: r.departures, missing, unused: others.filter((f) => !used.has(f)).map((f) => f.name) };
}

/** Read browser File objects as text. */
export async function pickedFiles(list: Iterable<File>): Promise<PickedFile[]> {
  return Promise.all([...list].map(async (f) => ({ name: f.name, text: await f.text() })));
}
