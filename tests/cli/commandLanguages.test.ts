/**
 * The command line's other commands in three languages (issue 16): `taut simulate`, `taut notes`, every
 * command's --help and the errors about options and files print in Hungarian and German with no English
 * sentence left and the same figures as English (a decimal comma for a decimal point); their JSON is the
 * same bytes in every language; English is what it always was. The English help in the catalog (the
 * source of the translations) equals each command's own help, so the two cannot drift apart.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { commands } from "../../src/cli/main.js";
import { fillHelp, type HelpName } from "../../src/cli/help.js";
import { stretchText } from "../../src/cli/commands/notes.js";
import { setCliLanguage } from "../../src/cli/lang.js";
import { createTranslator } from "../../src/i18n/translator.js";
import { cliSimulate } from "../../src/i18n/en/cliSimulate.js";
import { cliSimulateDe } from "../../src/i18n/de/cliSimulate.js";
import { cliSimulateHu } from "../../src/i18n/hu/cliSimulate.js";
import { cliNotesDe } from "../../src/i18n/de/cliNotes.js";
import { cliNotesHu } from "../../src/i18n/hu/cliNotes.js";
import { createRailmlReader, railmlStretch, stretchWords } from "../../src/profiles/railml/index.js";
import { chain, railmlFile } from "../tools/railml.js";
import { taut, tautWithEnv } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const demo = `${repo}profiles/cases/demo-aggregate-ashvale.json`;
const dir = mkdtempSync(join(tmpdir(), "taut-cli-lang-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The figures of a printout, as numbers (a decimal comma read as a point), sorted: word order may move them. */
function figures(text: string): number[] {
  return [...text.matchAll(/\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", "."))).sort((a, b) => a - b);
}

/**
 * English words that no Hungarian or German sentence of ours uses (common function words; "is" and "was"
 * are left out: they are Hungarian and German words too). Option names, their values and file formats'
 * own names (railML elements, JSON fields) hold none of them.
 */
const ENGLISH_WORDS = ["the", "of", "and", "with", "when", "which", "default", "must", "needed", "from", "for", "into", "were", "not", "given", "only", "after", "before", "every", "each", "option", "options", "usage", "notch", "wheels", "slipped", "train", "reached"];
// Lower case or capitalised (an option's metavariable in capitals, FILE, is not a word of a sentence).
const ENGLISH = new RegExp(`\\b(${ENGLISH_WORDS.map((w) => `[${w[0]}${w[0]!.toUpperCase()}]${w.slice(1)}`).join("|")})\\b`, "g");
const englishIn = (text: string) => [...text.replace(/\bfrom-railml\b/g, "").matchAll(ENGLISH)].map((m) => m[0]);

// A railML line of our own (as tests/cli/railml.test.ts): two tracks, 4 ‰ then 9 ‰, a 700 m curve.
const [a, b] = chain([2000, 2000], 5000);
a!.name = "Felső fővonal";
a!.gradients = [
  { pos: 0, dir: "up", value: 4 },
  { pos: 1500, dir: "up", value: 9 },
];
a!.radii = [{ pos: 0, dir: "up", value: 0 }];
b!.gradients = [{ pos: 0, dir: "up", value: 9 }];
b!.radii = [
  { pos: 0, dir: "up", value: 0 },
  { pos: 400, dir: "up", value: 700 },
  { pos: 900, dir: "up", value: 0 },
];
b!.signals = [{ id: "s1", pos: 600, dir: "up", name: "Ausfahrt 3" }];
b!.speeds = [{ pos: 0, dir: "up", value: 40 }];
b!.crossSections = [{ id: "cs1", pos: 200, ocpRef: "o1" }];
const line = join(dir, "line.railml");
writeFileSync(line, railmlFile({ tracks: [a!, b!], ocps: [{ id: "o1", name: "Holló kitérő" }] }));

describe("taut simulate in Hungarian and German", () => {
  for (const seq of ["1@0,2@20,4@35,8@50", "1@0,2@20,3@35,4@50,5@70"]) {
    it(`--sequence ${seq}: translated, the same figures as English, the same JSON`, async () => {
      const args = ["simulate", demo, "--sequence", seq];
      const en = await tautWithEnv({ LANG: "C" }, ...args);
      const hu = await tautWithEnv({ LANG: "hu_HU.UTF-8" }, ...args);
      const de = await taut(...args, "--lang", "de");
      for (const r of [en, hu, de]) expect(r.code, r.stderr).toBe(0);
      expect(englishIn(hu.stdout), hu.stdout).toEqual([]);
      expect(englishIn(de.stdout), de.stdout).toEqual([]);
      expect(englishIn(en.stdout).length).toBeGreaterThan(10);
      expect(figures(hu.stdout)).toEqual(figures(en.stdout));
      expect(figures(de.stdout)).toEqual(figures(en.stdout));
      // A decimal comma where English has a point: the locomotive brake's moment and the end time.
      expect(de.stdout).toMatch(/\b\d+,\d s\b/);
      expect(hu.stdout).not.toMatch(/\b\d+\.\d+\b/);
      const json = await Promise.all([taut(...args, "--json"), tautWithEnv({ LANG: "hu_HU.UTF-8" }, ...args, "--json"), taut(...args, "--json", "--lang", "de")]);
      expect(json[1].stdout).toBe(json[0].stdout);
      expect(json[2].stdout).toBe(json[0].stdout);
    }, 60_000);
  }

  it("a run that slips opens with the warning in the language (the JSON's warning stays English)", async () => {
    const args = ["simulate", demo, "--sequence", "1@0,2@20,4@35,8@50"];
    const hu = await taut(...args, "--lang", "hu");
    const de = await taut(...args, "--lang", "de");
    const start = (m: string) => m.split("{")[0]!;
    expect(hu.stdout.startsWith(start(cliSimulateHu.warning as string) + start(cliSimulateHu.slipped as string))).toBe(true);
    expect(de.stdout.startsWith(start(cliSimulateDe.warning as string) + start(cliSimulateDe.slipped as string))).toBe(true);
    const j = JSON.parse((await taut(...args, "--json", "--lang", "de")).stdout) as { warnings: string[] };
    expect(j.warnings[0]).toMatch(new RegExp(`^${start(cliSimulate.en.slipped)}[\\d.]+ s in all`));
  }, 60_000);

  it("its errors in the language", async () => {
    const de = await taut("simulate", demo, "--sequence", "99@0", "--lang", "de");
    expect(de.code).toBe(2);
    expect(de.stderr).toBe("taut simulate: --sequence: Eintrag 1 verlangt Fahrstufe 99; die Lok hat 8");
    const hu = await tautWithEnv({ LC_ALL: "hu_HU.UTF-8" }, "simulate", demo, "--sequence", "1@0", "--adhesion-quantile", "2");
    expect(hu.code).toBe(2);
    expect(englishIn(hu.stderr.replace("--adhesion-quantile", ""))).toEqual([]);
  });
});

describe("taut notes in Hungarian and German", () => {
  const args = ["notes", "from-railml", line, "--at", "Holló kitérő", "--direction", "up", "--behind", "1000", "--ahead", "1000", "--name", "Holló kitérő", "--no-hazards"];

  it("the note's stretch, profile and limits translated, the same figures as English, the same JSON", async () => {
    const en = await tautWithEnv({ LANG: "C" }, ...args);
    const hu = await tautWithEnv({ LANG: "hu_HU.UTF-8" }, ...args);
    const de = await tautWithEnv({ LANG: "de_AT.UTF-8" }, ...args);
    for (const r of [en, hu, de]) expect(r.code, r.stderr).toBe(0);
    expect(englishIn(hu.stdout), hu.stdout).toEqual([]);
    expect(englishIn(de.stdout), de.stdout).toEqual([]);
    expect(figures(hu.stdout)).toEqual(figures(en.stdout));
    expect(figures(de.stdout)).toEqual(figures(en.stdout));
    // What the reader and the stretch say on stderr (here the speed limit ahead), in the language too.
    expect(en.stderr).toContain("Speed limit: 40 km/h");
    expect(englishIn(hu.stderr), hu.stderr).toEqual([]);
    expect(englishIn(de.stderr), de.stderr).toEqual([]);
    expect(figures(de.stderr)).toEqual(figures(en.stderr));
    expect(hu.stdout).toContain(cliNotesHu.straight as string);
    expect(de.stdout).toContain(`${cliNotesDe.hazards === "" ? "" : "Zugspitze bei 1000,0 m; 1000,0 m voraus; zulässige Geschwindigkeit 40 km/h."}`);
    // The note itself: the same codes and figures in every language; the words it holds for the driver to
    // read (where the front stands, the direction, the revision entry) in the run's language.
    const json = await Promise.all([taut(...args, "--json"), taut(...args, "--json", "--lang", "hu"), taut(...args, "--json", "--lang", "de")]);
    expect(json[0].code).toBe(0);
    const said = ["direction", "standing", "revisions"] as const;
    const notes = json.map((j) => JSON.parse(j.stdout) as Record<string, unknown>);
    const rest = notes.map((n) => Object.fromEntries(Object.entries(n).filter(([k]) => !(said as readonly string[]).includes(k))));
    expect(rest[1]).toEqual(rest[0]);
    expect(rest[2]).toEqual(rest[0]);
    const words = (n: Record<string, unknown>) => JSON.stringify(said.map((k) => n[k]));
    expect(words(notes[0]!)).toContain("Front at operational point");
    expect(englishIn(words(notes[1]!)), words(notes[1]!)).toEqual([]);
    expect(englishIn(words(notes[2]!)), words(notes[2]!)).toEqual([]);
    expect(figures(words(notes[1]!))).toEqual(figures(words(notes[0]!)));
    expect(figures(words(notes[2]!))).toEqual(figures(words(notes[0]!)));
  });

  it("the English stretch words from the catalog are the railML reader's own, byte for byte", async () => {
    const reader = createRailmlReader();
    reader.write(railmlFile({ tracks: [a!, b!], ocps: [{ id: "o1", name: "Holló kitérő" }] }));
    const model = reader.close();
    const places = [
      { kind: "ocp", ocp: "Holló kitérő" },
      { kind: "absPos", absPos: 7200 },
      { kind: "pos", track: a!.id, pos: 1200 },
    ] as const;
    setCliLanguage("en");
    for (const front of places) {
      for (const direction of ["up", "down"] as const) {
        const r = railmlStretch(model, { front, direction, behindM: 600, aheadM: 500 });
        if (!r.ok) return expect.fail(r.message);
        expect(stretchText(r.value)).toBe(stretchWords(r.value));
      }
    }
  });

  it("its errors in the language, the railML reader's refusals too", async () => {
    for (const at of ["99999", "Nowhere"]) {
      const en = await taut("notes", "from-railml", line, "--at", at, "--direction", "up");
      const hu = await taut("notes", "from-railml", line, "--at", at, "--direction", "up", "--lang", "hu");
      expect(hu.code).toBe(2);
      expect(englishIn(hu.stderr), hu.stderr).toEqual([]);
      expect(figures(hu.stderr)).toEqual(figures(en.stderr));
    }
    const notXml = await taut("notes", "from-railml", demo, "--at", "1", "--direction", "up", "--lang", "de");
    expect(notXml.stderr).toMatch(/: Die Datei ist kein wohlgeformtes XML \(/);
    const de = await taut("notes", "from-railml", line, "--at", "7200", "--direction", "east", "--lang", "de");
    expect(de.code).toBe(2);
    expect(de.stderr).toBe('taut notes: --direction: up oder down wird gebraucht (erhalten: "east")');
    const hu = await taut("notes", "--lang", "hu");
    expect(hu.code).toBe(2);
    expect(englishIn(hu.stderr.split("\n")[0]!)).toEqual([]);
    // The usage line's placeholders that are words are in the language (FILE: FÁJL), the options as they are.
    expect(hu.stderr).toContain("használat: taut notes from-railml FÁJL --at POS --direction up|down");
  });
});

describe("--help in three languages", () => {
  const names = commands().map((c) => c.name);

  it("the catalog's English help and summary are each command's own, byte for byte", () => {
    const en = createTranslator("en", null);
    for (const c of commands()) {
      expect(fillHelp(en, c.name as HelpName), c.name).toBe(c.help);
    }
    expect(names.sort()).toEqual(["check", "notes", "plan", "review", "simulate", "table"]);
  });

  for (const lang of ["hu", "de"] as const) {
    it(`${lang}: every command's --help and the top-level help, no English sentence left`, async () => {
      const top = await taut("--help", "--lang", lang);
      expect(englishIn(top.stdout.replace(/--lang en\|hu\|de/, "")), top.stdout).toEqual([]);
      for (const name of names) {
        const en = await taut(name, "--help");
        const r = await taut(name, "--help", "--lang", lang);
        expect(r.code).toBe(0);
        // The usage line is the command line's contract (option names and their values), as in English; the
        // placeholders that are words (FILE, CASE.json, PERMILLE) are in the language, the symbols (N, ID) as they are.
        const [usage, ...rest] = r.stdout.split("\n");
        const enUsage = en.stdout.split("\n")[0]!.replace(/^Usage: /, "");
        const contract = (u: string) => u.replace(/^\S+: /, "").replace(/\b[A-ZÁÉÍÓÖŐÚÜŰ][A-ZÁÉÍÓÖŐÚÜŰ-]*[A-ZÁÉÍÓÖŐÚÜŰ]\b/g, "X").replace(/\b[A-Z]\b/g, "X");
        expect(contract(usage!), `${lang} ${name}`).toBe(contract(`Usage: ${enUsage}`));
        expect(usage, `${lang} ${name}`).not.toMatch(/\b(FILE|CASE|DEPARTURES|LOCATION|RECORDING|PERMILLE|NOTE-ID)\b/);
        // A README heading and a CSV header's column names are names, not sentences.
        const body = rest.join("\n").replace(/README: [A-Za-z ]+/, "").replace(/time_s,\S+/, "");
        expect(englishIn(body), `${lang} ${name}`).toEqual([]);
        // Every option of the English help is described in the translation too.
        const options = (t: string) => [...new Set([...t.matchAll(/^ {2}(--[a-z-]+)/gm)].map((m) => m[1]))].sort();
        expect(options(r.stdout), `${lang} ${name}`).toEqual(options(en.stdout));
        expect(figures(r.stdout.replace(/\b(?:taut\/[a-z-]+@\d|railML[ -]\d(?:\.\d)?(?:–\d\.\d)?|GPX[ -]1\.1|2\.x)\b/g, "")).length).toBeGreaterThan(0);
      }
    });
  }
});

describe("errors about options and files in the language", () => {
  it("an unknown option, a missing file, a bad --jobs", async () => {
    const r1 = await taut("plan", "--demo", "--frob", "--lang", "de");
    expect(r1.stderr.split("\n")[0]).toBe("taut plan: Unbekannte Option --frob");
    expect(r1.stderr.split("\n")[1]).toMatch(/^ {2}Aufruf: taut plan /);
    const r2 = await taut("simulate", join(dir, "missing.json"), "--sequence", "1@0", "--lang", "hu");
    expect(r2.stderr).toBe(`taut simulate: ${join(dir, "missing.json")}: nincs ilyen fájl`);
    const r3 = await tautWithEnv({ LANG: "de_CH.UTF-8" }, "check", `${repo}profiles/departures/demo-day.csv`, "--jobs", "0");
    expect(r3.code).toBe(2);
    expect(englishIn(r3.stderr)).toEqual([]);
    // The overrides, the load table's and the batch check's options.
    for (const args of [
      ["plan", "--demo", "--rail", "ice"],
      ["plan", "--demo", "--sand", "--no-sand"],
      ["table", "cinderfield-yard", "--count", "9", "--loco", "illustrative-4axle-1100"],
      ["table", "cinderfield-yard", "--json", "--csv"],
      ["check", `${repo}profiles/departures/demo-day.csv`, "--sort", "x"],
      ["check"],
    ]) {
      for (const lang of ["hu", "de"]) {
        const r = await taut(...args, "--lang", lang);
        expect(r.code, args.join(" ")).toBe(2);
        const first = r.stderr.split("\n")[0]!.replace(/^taut \w+: /, "");
        expect(englishIn(first), `${lang}: ${first}`).toEqual([]);
        expect(first, lang).not.toBe((await taut(...args)).stderr.split("\n")[0]!.replace(/^taut \w+: /, ""));
      }
    }
    // English as it always was.
    expect((await taut("plan", "--demo", "--frob")).stderr.split("\n")[0]).toBe("taut plan: Unknown option '--frob'");
  });
});
