/**
 * `taut notes from-railml FILE --at POS --direction up|down [--behind M] [--ahead M] [--json]` — a location
 * note (taut/location@1) from a railML 2.x infrastructure file: the stretch of line around the standing
 * train's front, its gradients and curves laid end to end (src/profiles/railml). The file is read as a
 * stream, so a large export is never held whole in memory.
 */
import { createReadStream, writeFileSync } from "node:fs";
import { openRegularFile, pathText } from "../files.js";
import { basename } from "node:path";
import { builtinTrains } from "../../profiles/builtin.js";
import { createRailmlReader, noteIdFrom, RailmlError, railmlDirection, railmlNote, railmlStretch, type FrontPlace, type RailmlModel } from "../../profiles/railml/index.js";
import type { Command } from "../command.js";
import { errorWords, InputError, usageLine } from "../errors.js";
import { asGiven, num, textTable } from "../table.js";
import { cliNotes } from "../../i18n/en/cliNotes.js";
import { cliTr } from "../lang.js";
import type { Translator } from "../../i18n/translator.js";
import type { Stretch } from "../../profiles/railml/index.js";
import { given, railmlWords, say } from "../../profiles/railml/text.js";

/** The words of `taut notes` in this run's language. */
const words = () => cliTr().ns(cliNotes);

export const RAILML_DEFAULTS = { behindM: 1500, aheadM: 1000 } as const;

const USAGE = "taut notes from-railml FILE --at POS --direction up|down [--behind M] [--ahead M] [--track ID] [--name TEXT] [--id ID] [--initials XX] [--no-hazards] [--out FILE] [--json]";

export const notesCommand: Command = {
  name: "notes",
  summary: "location notes from other files: from-railml (a stretch of a railML 2.x line)",
  usage: USAGE,
  help: [
    "from-railml: a location note from a railML 2.2–2.5 infrastructure file. The tracks' gradientChanges and",
    "radiusChanges are followed through their trackBegin / trackEnd connections for --behind metres behind",
    "the front of the standing train and --ahead metres ahead of it, and laid end to end: chainage 0 at the",
    "rear end of the stretch, gradients rising positive in the direction of travel, radius 0 for straight.",
    "Signals facing the train, points, level crossings, tunnels, bridges and platform edges in the stretch",
    "become the note's hazards; the lowest vMax ahead of the front its speed limit.",
    "",
    "Options:",
    "  --at POS           where the front stands: a line position in metres (railML absPos), a pos on the",
    "                     track given with --track, or the name, id or code of an operational point",
    "  --direction D      up: towards increasing pos of the front's track (railML dir=\"up\"); down: the other way",
    `  --behind M         metres of line behind the front (default ${RAILML_DEFAULTS.behindM}; at least the train's length)`,
    `  --ahead M          metres of line ahead of the front (default ${RAILML_DEFAULTS.aheadM}); the note's clear distance`,
    "  --track ID         the track the front stands on (needed where a line position is on several tracks)",
    "  --name TEXT        the note's name (default: the operational point or track and position)",
    "  --id ID            the note's id (default: made from the name)",
    "  --initials XX      initials for the note's first revision entry (default: railML)",
    "  --no-hazards       leave out the hazards",
    "  --out FILE         write the note to FILE",
    "  --json             print the note (taut/location@1) on standard output",
    "",
    "railML 3 files are recognised and refused. XML entity declarations are refused, never expanded.",
  ].join("\n"),
  options: {
    at: { type: "string" },
    direction: { type: "string" },
    behind: { type: "string" },
    ahead: { type: "string" },
    track: { type: "string" },
    name: { type: "string" },
    id: { type: "string" },
    initials: { type: "string" },
    "no-hazards": { type: "boolean" },
    out: { type: "string" },
    json: { type: "boolean" },
  },
  async run({ values, positionals }, io) {
    const [sub, file, ...extra] = positionals;
    const t = words();
    // This run's language, taken before the file is read (runs in one process may overlap, as in the tests).
    const tl = cliTr();
    if (sub !== "from-railml") throw new InputError(`${sub === undefined ? t("subcommandNeeded") : t("subcommandUnknown", { name: `"${sub}"` })}: taut notes from-railml …\n  ${usageLine(USAGE)}`);
    if (!file) throw new InputError(`${t("fileNeeded")}\n  ${usageLine(USAGE)}`);
    if (extra.length > 0) throw new InputError(t("oneFile", { count: String(extra.length + 1) }));
    const direction = values.direction;
    if (direction !== "up" && direction !== "down") throw new InputError(direction === undefined ? t("directionNeeded") : t("directionGot", { value: `"${String(direction)}"` }));
    const at = values.at as string | undefined;
    if (at === undefined || at.trim() === "") throw new InputError(t("atNeeded"));
    const track = values.track as string | undefined;
    const front = frontPlace(at, track);
    const behindM = metres(values.behind as string | undefined, "--behind", RAILML_DEFAULTS.behindM, false);
    const aheadM = metres(values.ahead as string | undefined, "--ahead", RAILML_DEFAULTS.aheadM, true);

    const model = await readRailmlFile(file);
    const r = railmlStretch(model, { front, direction, behindM, aheadM });
    if (!r.ok) throw new InputError(`${file}: ${r.text ? railmlWords(tl, r.text) : r.message}`);
    const s = r.value;
    const name = (values.name as string | undefined) ?? defaultName(front, s.tracks[0]?.id, tl);
    const n = railmlNote(s, {
      id: (values.id as string | undefined) ?? noteIdFrom(name),
      name,
      direction: railmlDirection(direction, tl),
      date: today(),
      initials: (values.initials as string | undefined) ?? "railML",
      source: basename(file),
      hazards: values["no-hazards"] !== true,
      ...(builtinTrains[0] ? { referenceTrain: { train: builtinTrains[0].id } } : {}),
    }, tl);
    if (!n.ok) throw new InputError(t("notValidNote", { file }), n.issues);
    const text = `${JSON.stringify(n.value, null, 2)}\n`;
    if (values.out) {
      try {
        writeFileSync(values.out as string, text);
      } catch (e) {
        throw new InputError(t("cannotWrite", { file: values.out as string, code: (e as NodeJS.ErrnoException).code ?? (e as Error).message }));
      }
    }
    for (const w of [...model.warningTexts, ...s.noteTexts]) io.err(`taut notes: ${railmlWords(tl, w)}`);
    if (values.json) {
      io.out(text);
      return 0;
    }
    io.out(
      [
        `${n.value.name}`,
        t("from", { file: basename(file), version: model.version || "2", stretch: stretchText(s) }),
        "",
        textTable(
          [t("colFrom"), t("colLength"), t("colGradient"), t("colRadius")],
          s.segments.map((g) => [num(g.from_m, 1), num(g.length_m, 1), num(g.gradient_permille, 2), g.curveRadius_m === 0 ? t("straight") : num(g.curveRadius_m, 0)]),
        ),
        "",
        t("frontAt", { front: num(s.frontAt_m, 1), ahead: num(s.aheadM, 1), limit: s.speedLimit_kmh !== undefined ? t("speedLimit", { speed: asGiven(s.speedLimit_kmh) }) : "" }),
        // A hazard's note is the note's own text (written into the file, as the app writes it), shown as it is.
        ...(n.value.hazards.length > 0 ? [t("hazards"), ...n.value.hazards.map((h) => `  ${num(h.at_m ?? Number.NaN, 1)} m  ${h.note ?? h.kind}`)] : []),
        "",
        values.out ? t("written", { file: values.out as string }) : t("howToKeep"),
      ].join("\n"),
    );
    return 0;
  },
};

/** A number is a line position (or a pos, with --track); anything else names an operational point. */
export function frontPlace(at: string, track: string | undefined): FrontPlace {
  const x = Number(at.trim());
  if (at.trim() !== "" && Number.isFinite(x)) return track ? { kind: "pos", track, pos: x } : { kind: "absPos", absPos: x };
  return track ? { kind: "ocp", ocp: at, track } : { kind: "ocp", ocp: at };
}

function metres(v: string | undefined, option: string, fallback: number, zeroOk: boolean): number {
  if (v === undefined) return fallback;
  const x = Number(v);
  if (!Number.isFinite(x) || x < 0 || (!zeroOk && x === 0) || x > 100_000) throw new InputError(words()(zeroOk ? "metresFromZero" : "metresAboveZero", { option, value: `"${v}"` }));
  return x;
}

/**
 * The stretch in words, in this run's language, from its data (the railML reader's own `stretchWords` is
 * English; the English printout keeps it byte for byte).
 */
export function stretchText(s: Stretch): string {
  const t = words();
  const names = [...new Set(s.tracks.map((x) => x.name ?? x.id))];
  return t("stretch", {
    behind: asGiven(s.behindM),
    ahead: asGiven(s.aheadM),
    front: railmlWords(cliTr(), s.frontText),
    tracks: t("tracks", { count: names.length }),
    names: names.join(", "),
  });
}

function defaultName(front: FrontPlace, track: string | undefined, tl: Translator): string {
  if (front.kind === "ocp") return front.ocp.trim().slice(0, 120);
  if (front.kind === "pos") return railmlWords(tl, say("nameTrack", { track: front.track, pos: given(front.pos) })).slice(0, 120);
  return railmlWords(tl, say("nameLine", { absPos: given(front.absPos), onTrack: track ? say("nameOnTrack", { track }) : "" })).slice(0, 120);
}

function today(now = new Date()): string {
  const p = (n: number) => String(n).padStart(2, "0");
  return `${now.getFullYear()}-${p(now.getMonth() + 1)}-${p(now.getDate())}`;
}

/** Read a railML file as a stream of text into the reader. */
export async function readRailmlFile(path: string, tl: Translator = cliTr()): Promise<RailmlModel> {
  // A regular file only, checked on the open handle (a named pipe would be waited on for ever).
  const opened = openRegularFile(path);
  if (!opened.ok) throw new InputError(`${pathText(path)}: ${opened.why}`);
  const reader = createRailmlReader();
  try {
    for await (const chunk of createReadStream(path, { fd: opened.fd, encoding: "utf8", highWaterMark: 1 << 20 })) reader.write(chunk as string);
    return reader.close();
  } catch (e) {
    if (e instanceof RailmlError) throw new InputError(`${pathText(path)}: ${railmlWords(tl, e.text)}`);
    const code = (e as NodeJS.ErrnoException).code;
    if (code) throw new InputError(`${pathText(path)}: ${errorWords()("cannotRead", { code })}`);
    throw e;
  }
}
