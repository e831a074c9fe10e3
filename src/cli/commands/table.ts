/** `taut table LOCATION.json --loco ID` — the load table of a location: largest startable mass per rail condition. */
import { STANDARD_CAUTIONS } from "../../core/planner/cautions.js";
import { cautionsInEnglish } from "../../profiles/report.js";
import { cautionText } from "../../i18n/render.js";
import { loadTableCells, type LoadTableRow } from "../../core/dispatch/loadTable.js";
import type { StartCase } from "../../core/train/types.js";
import { referenceCaseFile, referenceOf, DEFAULT_REFERENCE_TEMPERATURE_C } from "../../profiles/referenceTrain.js";
import { loadTableRowReport } from "../../profiles/assistanceReport.js";
import { builtinTrains } from "../../profiles/builtin.js";
import type { Library } from "../../profiles/library.js";
import { parseStartCaseFile, resolveStartCase } from "../../profiles/parse.js";
import type { LocationNoteFile, StartCaseFile } from "../../profiles/schemas.js";
import { errorWords, InputError, usageLine } from "../errors.js";
import { printable, quoted } from "../../profiles/text.js";
import { checkWork, library, readNotesFiles } from "../files.js";
import type { Command } from "../command.js";
import { JobPool } from "../batch/pool.js";
import type { MassOutcome } from "../batch/jobs.js";
import { asGiven, csv, num, textTable } from "../table.js";
import { cli } from "../../i18n/en/cli.js";
import { RAIL_CONDITIONS, type RailCondition } from "../../core/physics/types.js";
import { cliTr, cliWords } from "../lang.js";
import { where } from "../render/assistance.js";
import { wrap } from "../render/wrap.js";
import { jobsOption, progressReporter } from "../options.js";
import { existsSync } from "node:fs";
import { readerText } from "../../i18n/renderReaders.js";

/** The train made from the train options (--wagons, --wagon-type, --slack, --limit) where they leave something out. */
export const TABLE_DEFAULTS = { wagons: 40, wagonType: "bogie-hopper-loaded", targetKmh: 20 } as const;
/** Default working limit by coupling kind, kN (PHYSICS.md §4: knuckle 970 kN, screw coupling 850 kN). */
const DEFAULT_LIMIT_KN = { knuckle: 970, screw: 850 } as const;

export const tableCommand: Command = {
  name: "table",
  summary: "load table of a location: largest startable mass per rail condition, with and without sand",
  usage: "taut table LOCATION.json [--note ID] [--loco ID] [--count N] [--wagons N] [--wagon-type ID] [--slack MM] [--limit KN] [--temperature C] [--target-kmh V] [--jobs N] [--json|--csv]",
  help: [
    "The largest trailing mass the locomotives start at a location, for every rail condition, without and",
    "with sand. Every figure is a bisection over the start planner's verdict (below the static limit), so a",
    "train just lighter than the figure starts and one just heavier does not. Twelve mass searches, run in",
    "parallel worker threads: expect some seconds.",
    "",
    "LOCATION.json is a location note (taut/location@1), or a bundle (taut/notes-bundle@2) with --note ID;",
    "a built-in note may be named by its id instead of a file.",
    "",
    "The train the table is for: the note's reference train — the one the app's Location notes card uses —",
    `or, for a note that names none, the first train preset (${builtinTrains[0]?.id ?? "none"}); --loco and --count replace its`,
    "locomotives. Any train option (--wagons, --wagon-type, --slack, --limit) makes it a train of --wagons",
    `wagons of --wagon-type instead (default ${TABLE_DEFAULTS.wagons} × ${TABLE_DEFAULTS.wagonType}) with roller bearings.`,
    "",
    "Options:",
    "  --note ID          which note of a bundle",
    "  --loco ID          locomotive profile at the head (default: the reference train's; needed with train options)",
    "  --count N          how many of them (default: the reference train's, or 1)",
    `  --wagons N         wagons in the train (default ${TABLE_DEFAULTS.wagons})`,
    `  --wagon-type ID    wagon type (default ${TABLE_DEFAULTS.wagonType})`,
    "  --slack MM         free slack per coupling (default: the wagon type's)",
    "  --limit KN         coupling working limit, 100 to 5000 (default 970 kN knuckle, 850 kN screw)",
    `  --temperature C    air temperature (default ${DEFAULT_REFERENCE_TEMPERATURE_C} °C, or the reference train's)`,
    `  --target-kmh V     speed the start must reach (default ${TABLE_DEFAULTS.targetKmh} km/h, at most the note's speed limit)`,
    "  --jobs N           worker threads (default: the available cores; 1 runs on this thread)",
    "  --quiet            no progress lines on stderr",
    "  --json | --csv     machine-readable output",
  ].join("\n"),
  options: {
    note: { type: "string" },
    loco: { type: "string" },
    count: { type: "string" },
    wagons: { type: "string" },
    "wagon-type": { type: "string" },
    slack: { type: "string" },
    limit: { type: "string" },
    temperature: { type: "string" },
    "target-kmh": { type: "string" },
    jobs: { type: "string" },
    quiet: { type: "boolean" },
    json: { type: "boolean" },
    csv: { type: "boolean" },
  },
  async run({ values, positionals }, io) {
    const where = positionals[0];
    if (!where) throw new InputError(`${errorWords()("tableNoteNeeded")}\n  ${usageLine(tableCommand.usage)}`);
    if (positionals.length > 1) throw new InputError(errorWords()("oneLocation", { count: String(positionals.length) }));
    if (values.json && values.csv) throw new InputError(errorWords()("jsonOrCsv"));
    const lib = library();
    const note = pickNote(where, values.note as string | undefined, lib);
    const built = tableCase(note, values, lib);
    const jobs = jobsOption(values.jobs as string | undefined);
    const t0 = performance.now();
    const pool = new JobPool(jobs);
    const report = values.quiet ? () => undefined : progressReporter(io, errorWords()("progressTableRows"));
    const cells = loadTableCells();
    let done = 0;
    let rows: LoadTableRow[];
    try {
      rows = await Promise.all(
        cells.map(async ({ rail, sand }) => {
          const c: StartCase = { ...built.c, conditions: { ...built.c.conditions, rail, sand } };
          const o = (await pool.run({ kind: "mass", case: c, startsOnly: true, ofMakeUp: true })) as MassOutcome;
          report({ done: ++done, total: cells.length });
          return { rail, sand, maxTrailingMassKg: o.maxStartableMassKg };
        }),
      );
    } finally {
      await pool.close();
    }
    const elapsedS = Math.round((performance.now() - t0) / 100) / 10;
    const out = rows.map(loadTableRowReport);
    const table = {
      schema: "taut/load-table@1",
      location: { id: note.id, name: note.name },
      locomotives: built.file.locomotives.map((l) => ({ profile: typeof l.profile === "string" ? l.profile : l.profile.id, count: l.count, position: l.position })),
      train: {
        source: built.source,
        ...(built.referenceTrain !== null ? { referenceTrain: built.referenceTrain } : {}),
        wagons: built.file.train.wagons,
        wagonType: built.file.train.wagonType ?? null,
        length_m: built.file.train.length_m ?? Math.round(built.c.train.lengthM),
        couplerSlack_mm: built.file.train.couplerSlack_mm,
        couplerLimit_kN: built.file.train.couplerLimit_kN,
        bearing: built.file.train.bearing,
        temperature_C: built.file.conditions.temperature_C,
        target_kmh: "speed_kmh" in built.file.target ? built.file.target.speed_kmh : null,
      },
      ...(built.capacityT !== null ? { wagonCapacity_t: built.capacityT } : {}),
      rows: out,
      elapsed_s: elapsedS,
      cautions: cautionsInEnglish(STANDARD_CAUTIONS),
    };
    if (values.json) io.out(JSON.stringify(table, null, 2));
    else if (values.csv) io.out(csv(["rail", "sand", "maxTrailingMass_t"], out.map((r) => [r.rail, r.sand, r.maxTrailingMass_t])));
    else io.out(renderTable(table));
    if (!values.quiet) io.err(`taut table: ${errorWords()("tableDone", { rows: String(cells.length), time: asGiven(elapsedS), count: jobs })}`);
    return 0;
  },
};

/** The location note: from a note or bundle file (with --note for a bundle of several), or a built-in note's id. */
function pickNote(where: string, id: string | undefined, lib: Library): LocationNoteFile {
  if (!existsSync(where) && lib.locations.has(where)) return lib.locations.get(where)!;
  const notes = readNotesFiles([where]);
  if (id !== undefined) {
    const n = notes.find((x) => x.id === id);
    if (!n) throw new InputError(errorWords()("noNote", { id: quoted(id), file: printable(where), list: notes.map((x) => x.id).join(", ") }));
    return n;
  }
  if (notes.length !== 1) throw new InputError(errorWords()("chooseNote", { file: printable(where), count: String(notes.length), list: notes.map((x) => x.id).join(", ") }));
  return notes[0]!;
}

type Values = Record<string, unknown>;

/** `rule`: what the option must be, in this run's language (read only when the value breaks it). */
function numberOption(values: Values, name: string, check: (n: number) => boolean, rule: () => string): number | undefined {
  const v = values[name];
  if (v === undefined) return undefined;
  const n = Number(v);
  if (!Number.isFinite(n) || !check(n)) throw new InputError(errorWords()("mustBe", { name, rule: rule(), value: quoted(String(v)) }));
  return n;
}

/** The start case the table is worked out for (its mass is searched; its rail and sand are varied). */
export function tableCase(
  note: LocationNoteFile,
  values: Values,
  lib: Library,
): { c: StartCase; file: StartCaseFile; source: "referenceTrain" | "defaultReferenceTrain" | "options"; referenceTrain: string | null; capacityT: number | null } {
  let referenceTrain: string | null = null;
  const count = numberOption(values, "count", (n) => Number.isInteger(n) && n >= 1 && n <= 8, () => errorWords()("ruleWhole", { min: "1", max: "8" }));
  const wagons = numberOption(values, "wagons", (n) => Number.isInteger(n) && n >= 1 && n <= 400, () => errorWords()("ruleWhole", { min: "1", max: "400" }));
  const slack = numberOption(values, "slack", (n) => n >= 0 && n <= 200, () => errorWords()("ruleRange", { min: "0", max: "200", unit: "mm" }));
  const limit = numberOption(values, "limit", (n) => n >= 100 && n <= 5000, () => errorWords()("ruleRange", { min: "100", max: "5000", unit: "kN" }));
  const temperature = numberOption(values, "temperature", (n) => n >= -60 && n <= 60, () => errorWords()("ruleRange", { min: "-60", max: "60", unit: "°C" }));
  const targetKmh = numberOption(values, "target-kmh", (n) => n > 0 && n <= 200, () => errorWords()("ruleAbove", { max: "200", unit: "km/h" }));
  const loco = values.loco as string | undefined;
  const wagonTypeId = values["wagon-type"] as string | undefined;
  if (loco !== undefined && !lib.locomotives.has(loco)) throw new InputError(errorWords()("locoUnknown", { id: quoted(loco), list: [...lib.locomotives.keys()].join(", ") }));
  const trainOptions = wagons !== undefined || wagonTypeId !== undefined || slack !== undefined || limit !== undefined;
  const cap = (kmh: number) => Math.min(kmh, note.speedLimit_kmh ?? kmh);
  let file: StartCaseFile;
  let source: "referenceTrain" | "defaultReferenceTrain" | "options";
  if (!trainOptions) {
    // One reference train per note, the same as the app's card (src/profiles/referenceTrain.ts).
    const ref = { ...referenceOf(note, builtinTrains), ...(loco !== undefined ? { locomotive: loco } : {}), ...(count !== undefined ? { count } : {}), ...(temperature !== undefined ? { temperature_C: temperature } : {}) };
    const r = referenceCaseFile(note, builtinTrains, ref);
    if (!r.ok) throw new InputError(readerText(cliTr(), { code: "referenceUnusable", figures: { id: note.id } }), r.issues);
    file = targetKmh !== undefined ? { ...r.value, target: { speed_kmh: cap(targetKmh) } } : r.value;
    source = note.referenceTrain ? "referenceTrain" : "defaultReferenceTrain";
    referenceTrain = ref.train;
  } else {
    if (loco === undefined) throw new InputError(errorWords()("locoNeeded", { list: [...lib.locomotives.keys()].join(", ") }));
    const typeId = wagonTypeId ?? TABLE_DEFAULTS.wagonType;
    const w = lib.wagons.get(typeId);
    if (!w) throw new InputError(errorWords()("wagonTypeUnknown", { id: quoted(typeId), list: [...lib.wagons.keys()].join(", ") }));
    const n = wagons ?? TABLE_DEFAULTS.wagons;
    file = {
      schema: "taut/start-case@1",
      locomotives: [{ profile: loco, count: count ?? 1, position: "head" }],
      train: {
        trailingMass_t: (n * w.maxGrossKg) / 1000,
        wagons: n,
        length_m: n * w.lengthM,
        couplerSlack_mm: slack ?? w.defaultSlackM * 1000,
        bearing: "roller",
        couplerLimit_kN: limit ?? DEFAULT_LIMIT_KN[w.coupling],
        wagonType: typeId,
        slackState: "from-profile",
      },
      location: { segments: note.segments, frontAt_m: note.frontAt_m, clearAhead_m: note.clearAhead_m },
      conditions: { rail: "dry", sand: false, temperature_C: temperature ?? DEFAULT_REFERENCE_TEMPERATURE_C },
      target: { speed_kmh: cap(targetKmh ?? TABLE_DEFAULTS.targetKmh) },
    };
    source = "options";
  }
  // The file the options make is checked as any start case is: every field within its range.
  const valid = parseStartCaseFile(file);
  if (!valid.ok) throw new InputError(errorWords()("tableTrainInvalid"), valid.issues);
  const r = resolveStartCase(valid.value, lib);
  if (!r.ok) throw new InputError(errorWords()("tableTrainMisfit", { id: `"${note.id}"` }), r.issues);
  checkWork(r.value, errorWords()("tableTrainInvalid"));
  const wt = file.train.wagonType !== undefined ? lib.wagons.get(file.train.wagonType) : undefined;
  return { c: r.value, file, source, referenceTrain, capacityT: wt ? Math.round((file.train.wagons * wt.maxGrossKg) / 1000) : null };
}

interface TableReport {
  location: { id: string; name: string };
  locomotives: Array<{ profile: string; count: number; position: unknown }>;
  train: { source: string; referenceTrain?: string; wagons: number; wagonType: string | null; length_m: number; couplerSlack_mm: number; couplerLimit_kN: number; bearing: string; temperature_C: number; target_kmh: number | null };
  wagonCapacity_t?: number;
  rows: Array<{ rail: string; sand: boolean; maxTrailingMass_t: number }>;
  elapsed_s: number;
  cautions: readonly string[];
}

function renderTable(t: TableReport): string {
  const say = cliTr().ns(cli);
  const w = cliWords();
  const lines: string[] = [];
  lines.push(say("tableTitle", { name: printable(t.location.name) }));
  const locos = t.locomotives.map((l) => `${l.count} × ${l.profile} ${where(typeof l.position === "string" ? l.position : `after wagon ${(l.position as { afterWagon: number }).afterWagon}`)}`).join(", ");
  lines.push(say("tableLocos", { list: locos }));
  const tr = t.train;
  const source = tr.source === "referenceTrain" ? say("tableRefTrain", { train: tr.referenceTrain ?? "" }) : tr.source === "defaultReferenceTrain" ? say("tableDefaultTrain", { train: tr.referenceTrain ?? "" }) : "";
  lines.push(
    say("tableTrain", {
      wagons: tr.wagons,
      type: tr.wagonType ?? say("tableWagons"),
      length: num(tr.length_m),
      slack: num(tr.couplerSlack_mm),
      limit: num(tr.couplerLimit_kN),
      bearing: tr.bearing === "roller" ? errorWords()("bearingRoller") : tr.bearing === "plain" ? errorWords()("bearingPlain") : tr.bearing,
      temperature: num(tr.temperature_C),
      target: num(tr.target_kmh),
    }) + source,
  );
  lines.push("");
  lines.push(say("tableHeading"));
  const by = (rail: string, sand: boolean) => t.rows.find((r) => r.rail === rail && r.sand === sand)!.maxTrailingMass_t;
  const rails = [...new Set(t.rows.map((r) => r.rail))];
  const railWord = (r: string) => ((RAIL_CONDITIONS as readonly string[]).includes(r) ? w.railInline(r as RailCondition) : r);
  lines.push(
    textTable(
      [say("colRail"), say("colNoSand"), say("colSand")],
      rails.map((rail) => [railWord(rail), massCell(by(rail, false)), massCell(by(rail, true))]),
    )
      .split("\n")
      .map((l) => `  ${l}`)
      .join("\n"),
  );
  const cap = t.wagonCapacity_t;
  const above = cap === undefined ? [] : t.rows.filter((r) => r.maxTrailingMass_t > cap);
  if (cap !== undefined && above.length > 0) {
    lines.push(...wrap(say("tableAbove", { capacity: num(cap), list: above.map((r) => `${railWord(r.rail)}${r.sand ? say("withSand") : ""}`).join(", ") }), 100, "    "));
  }
  if (t.rows.some((r) => r.maxTrailingMass_t <= 0)) lines.push(say("noneNote"));
  lines.push("");
  lines.push(say("cautions"));
  // The JSON carries the cautions in English; the printout in the run's language.
  for (const c of STANDARD_CAUTIONS) lines.push(...wrap(`  - ${cautionText(cliTr(), c)}`, 100, "    "));
  return lines.join("\n");
}

/** A mass cell as the app shows it: "none" when not even a light train starts (the JSON and CSV keep 0). */
function massCell(t: number): string {
  return t > 0 ? num(t) : cliTr().ns(cli)("none");
}
