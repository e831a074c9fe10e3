/**
 * The command line's error paths in Hungarian and German (issue 16): every command run the wrong way —
 * a missing file, a folder, bad JSON, a file of another kind, a bad option, a bad value, a departures file
 * whose rows cannot be read — says so in the language asked for, with no English sentence left. The test
 * takes the English run of the same command as the list of English sentences: no phrase of it (two or more
 * words of running English) may appear in the Hungarian or German run. Also: a check row's error stays
 * English in JSON and CSV whatever the language (the printout says it from the codes carried with the row),
 * and every --help lists its options, --lang among them, with their descriptions in one column.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { commands } from "../../src/cli/main.js";
import { setCliLanguage } from "../../src/cli/lang.js";
import { rowErrorText } from "../../src/cli/render/check.js";
import type { DepartureRow } from "../../src/cli/batch/checkDepartures.js";
import { taut, tautWithEnv, type Run } from "../tools/cli.js";
import { helpText } from "../../src/cli/help.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const demoCase = `${repo}profiles/cases/demo-aggregate-ashvale.json`;
const dir = mkdtempSync(join(tmpdir(), "taut-cli-errors-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const f = (name: string, text: string) => {
  writeFileSync(join(dir, name), text);
  return join(dir, name);
};
const missing = join(dir, "missing.json");
const folder = join(dir, "folder.json");
mkdirSync(folder);
const badJson = f("bad.json", "{bad");
const notACase = f("note.json", '{"schema":"taut/location@1"}');
const emptyObject = f("empty.json", "{}");
const notAList = f("object.json", '{"a":1}');
const unclosed = f("unclosed.csv", 'id,case\n"a,b\n');
const emptyCsv = f("empty.csv", "");
const noCaseColumn = f("nocase.csv", "a,b\n1,2\n");
const badRecording = f("rec.csv", "speed,when\n1,2\n");
// Rows that cannot be read, one of each kind: a missing case file, a folder, bad JSON, another kind of
// file, a case that is not valid, a bad cell, an empty case cell, a case outside the CSV's folder.
const badRows = f(
  "rows.csv",
  ["id,case,rail,sand", "a,missing.json,dry,no", "b,folder.json,,", "c,bad.json,,", "d,note.json,,", "e,empty.json,,", "f,demo-aggregate-ashvale,mud,", "g,,,", "h,../outside.json,,", "i,demo-aggregate-ashvale,,maybe"].join("\n"),
);
const badJsonRows = f("rows.json", '[{"id":"x"}, 5, {"id":"y","schema":"taut/start-case@1"}]');

/** Every command run the wrong way (arguments before --lang). */
const ERROR_PATHS: string[][] = [
  ["frobnicate"],
  ["plan"],
  ["plan", missing],
  ["plan", folder],
  ["plan", badJson],
  ["plan", notACase],
  ["plan", emptyObject],
  ["plan", demoCase, demoCase],
  ["plan", "--demo", "--frob"],
  ["plan", "--demo", "--mass"],
  ["plan", "--demo", "--json=x"],
  ["plan", "--demo", "--notes", missing],
  ["plan", "--demo", "--notes", folder],
  ["plan", "--demo", "--notes", badJson],
  ["plan", "--demo", "--location", "nowhere"],
  ["plan", "--demo", "--helper", "nope"],
  ["plan", "--demo", "--helper-control", "x"],
  ["plan", "--demo", "--rail", "mud"],
  ["plan", "--demo", "--sand", "--no-sand"],
  ["plan", "--demo", "--mass", "heavy"],
  ["plan", "--demo", "--grade", "steep"],
  ["check"],
  ["check", missing],
  ["check", folder],
  ["check", badJson],
  ["check", notAList],
  ["check", unclosed],
  ["check", emptyCsv],
  ["check", noCaseColumn],
  ["check", badRows, "--quiet"],
  ["check", badJsonRows, "--quiet"],
  ["check", badRows, "--sort", "x"],
  ["check", badRows, "--jobs", "0"],
  ["check", badRows, "--shard", "3/2"],
  ["check", badRows, "--json", "--csv"],
  ["table"],
  ["table", missing],
  ["table", folder],
  ["table", badJson],
  ["table", notACase],
  ["table", "cinderfield-yard", "--loco", "nope"],
  ["table", "cinderfield-yard", "--wagon-type", "nope", "--loco", "illustrative-4axle-1100"],
  ["table", "cinderfield-yard", "--count", "99", "--loco", "illustrative-4axle-1100"],
  ["simulate"],
  ["simulate", missing, "--sequence", "1@0"],
  ["simulate", folder, "--sequence", "1@0"],
  ["simulate", demoCase],
  ["simulate", demoCase, "--sequence", "x"],
  ["review"],
  ["review", missing, badRecording],
  ["review", demoCase, missing],
  ["review", demoCase, folder],
  ["review", demoCase, badRecording],
  ["notes"],
  ["notes", "frobnicate"],
  ["notes", "from-railml"],
  ["notes", "from-railml", missing, "--at", "1", "--direction", "up"],
  ["notes", "from-railml", folder, "--at", "1", "--direction", "up"],
];

/** Words that are the same in every language here: our name, file formats, the environment's variables. */
const NAMES = new Set(["taut", "json", "csv", "gpx", "xml", "railml", "lang", "readme", "id", "ids"]);
/** Words that are Hungarian or German words too, so a phrase of nothing else proves nothing. */
const SHARED = new Set(["a", "an", "in", "is", "so", "on", "am", "was", "an", "hat", "die", "also", "war", "per"]);

/**
 * The phrases of running English in a text: two or more words in a row (between punctuation), at least one
 * of them a word of four or more letters that is no word of the other languages. Paths, option names,
 * numbers, units (t, s) and quoted values are not words and break a phrase.
 */
export function englishPhrases(text: string): string[] {
  const phrases: string[] = [];
  for (const segment of text.replace(/"[^"\n]*"|'[^'\n]*'|`[^`\n]*`/g, " | ").split(/[\n:;,.()[\]{}=|÷…—]+/)) {
    let run: string[] = [];
    const end = () => {
      if (run.length >= 2 && run.some((w) => w.length >= 4 && !SHARED.has(w))) phrases.push(run.join(" "));
      run = [];
    };
    for (const token of segment.trim().split(/\s+/)) {
      const w = token.toLowerCase();
      if ((/^[a-z]{2,}$/.test(w) || w === "a") && !NAMES.has(w)) run.push(w);
      else end();
    }
    end();
  }
  return [...new Set(phrases)];
}

/** The English phrases of `english` found in `other` (as whole words, any case). */
function englishLeft(english: string, other: string): string[] {
  const text = other.toLowerCase().replace(/\s+/g, " ");
  return englishPhrases(english).filter((p) => new RegExp(`(?<![\\p{L}])${p}(?![\\p{L}])`, "u").test(text));
}

async function inEach(args: readonly string[]): Promise<{ en: Run; hu: Run; de: Run }> {
  const en = await taut(...args);
  const hu = await taut(...args, "--lang", "hu");
  const de = await tautWithEnv({ LANG: "de_DE.UTF-8" }, ...args);
  return { en, hu, de };
}

describe("the phrase finder the test relies on", () => {
  it("finds running English and nothing in a path, an option or a quoted value", () => {
    expect(englishPhrases("taut plan: /tmp/x/missing.json: no such file")).toEqual(["no such file"]);
    expect(englishPhrases('--rail: must be one of dry, wet (got "icy")')).toEqual(["must be one of dry"]);
    expect(englishPhrases("--mass T  trailing mass, tonnes")).toEqual(["trailing mass"]);
    expect(englishLeft("line 2: no such file", "Zeile 2: keine solche Datei")).toEqual([]);
    expect(englishLeft("line 2: no such file", "2. sor: No such file")).toEqual(["no such file"]);
  });
});

describe("error paths in Hungarian and German: no English sentence left", () => {
  for (const args of ERROR_PATHS) {
    const name = args.map((a) => a.replace(dir, "…")).join(" ");
    it(name, async () => {
      const { en, hu, de } = await inEach(args);
      expect(en.code, en.stderr).not.toBe(0);
      const english = `${en.stdout}\n${en.stderr}`;
      expect(englishPhrases(english).length, english).toBeGreaterThan(0);
      for (const [lang, r] of [["hu", hu], ["de", de]] as const) {
        expect(r.code, `${lang}: exit code`).toBe(en.code);
        const text = `${r.stdout}\n${r.stderr}`;
        expect(text, lang).not.toBe(english);
        expect(englishLeft(english, text), `${lang}: ${text}`).toEqual([]);
      }
    });
  }
});

describe("what the overrides changed, in the language", () => {
  it("plan --rail --no-sand --mass --grade: the line saying what changed has no English left, its figures with the language's decimal sign", async () => {
    const { en, hu, de } = await inEach(["plan", "--demo", "--rail", "wet", "--no-sand", "--mass", "2500.5", "--grade", "12"]);
    const changed = (r: Run) => r.stdout.split("\n")[1]!;
    expect(changed(en)).toBe("Changed from the case file: rail wet, no sand, trailing mass 2500.5 t, grade 12 ‰ under the whole train");
    expect(changed(de)).toBe("Gegenüber der Falldatei geändert: Schiene nass, ohne Sanden, Anhängelast 2500,5 t, Neigung 12 ‰ unter dem ganzen Zug");
    expect(englishLeft(changed(en), changed(hu))).toEqual([]);
    expect(changed(hu)).toContain("2500,5 t");
  });
});

describe("a check row's error: English in JSON and CSV, the language on the printout", () => {
  it("JSON and CSV are the same bytes in English, Hungarian and German", async () => {
    for (const format of ["--json", "--csv"]) {
      const { en, hu, de } = await inEach(["check", badRows, "--quiet", format]);
      expect(hu.stdout).toBe(en.stdout);
      expect(de.stdout).toBe(en.stdout);
    }
    const { en } = await inEach(["check", badRows, "--quiet", "--json"]);
    const rows = (JSON.parse(en.stdout) as { departures: Array<Record<string, unknown>> }).departures;
    expect(rows.map((r) => r.error).slice(0, 2)).toEqual(["line 2: missing.json: no such file", "line 3: folder.json: is a folder, not a file: give a JSON or CSV file"]);
    // The codes behind the error stay inside: the JSON row has the fields it always had.
    for (const r of rows) expect(Object.keys(r)).toEqual(["id", "line", "error", "errorKind"].filter((k) => k in r));
  });

  it("the printout names each row in the language, from its codes", async () => {
    const { en, hu, de } = await inEach(["check", badRows, "--quiet"]);
    expect(en.stdout).toContain("  - line 2: missing.json: no such file\n");
    expect(de.stdout).toContain("  - Zeile 2: missing.json: Datei nicht gefunden\n");
    expect(hu.stdout).toContain("  - 2. sor: missing.json: nincs ilyen fájl\n");
    expect(de.stdout).toContain("  - Zeile 3: folder.json: ist ein Ordner, keine Datei: eine JSON- oder CSV-Datei angeben\n");
    expect(hu.stdout).toContain("  - 3. sor: folder.json: mappa, nem fájl: JSON- vagy CSV-fájlt adjon meg\n");
  });

  it("a row the calculation failed on, and a row never read: the words in the language, the failure's own text as it is", () => {
    const failed: DepartureRow = { id: "x", line: 4, error: "line 4: internal error: boom", errorKind: "internal", problem: { kind: "internal", line: 4, message: "boom" } };
    const unread: DepartureRow = { id: "[2]", index: 2, error: "[2]: cannot be read", errorKind: "input", problem: { kind: "unread", index: 2 } };
    try {
      setCliLanguage("en");
      expect(rowErrorText(failed)).toBe("line 4: internal error: boom");
      expect(rowErrorText(unread)).toBe("[2]: cannot be read");
      setCliLanguage("de");
      expect(rowErrorText(failed)).toBe("Zeile 4: interner Fehler: boom");
      expect(rowErrorText(unread)).toBe("[2]: nicht lesbar");
      setCliLanguage("hu");
      expect(rowErrorText(failed)).toBe("4. sor: belső hiba: boom");
      expect(rowErrorText(unread)).toBe("[2]: nem olvasható");
    } finally {
      setCliLanguage("en");
    }
  });
});

/**
 * The blocks of options of a help text: each option line ("  --name VALUE  description") with the lines
 * continuing it (indented deeper). Returns, per block, where each option's description starts (an option
 * wider than its column puts it on the next line) and where each continuation line starts.
 */
function optionBlocks(help: string): Array<{ descriptions: number[]; continuations: number[]; options: string[] }> {
  const blocks: Array<{ descriptions: number[]; continuations: number[]; options: string[] }> = [];
  const lines = help.split("\n");
  let cur: (typeof blocks)[number] | undefined;
  for (let i = 0; i < lines.length; i++) {
    const l = lines[i]!;
    if (/^ {2}--/.test(l)) {
      cur ??= { descriptions: [], continuations: [], options: [] };
      // The option and its value: words after single spaces — another option, "|", a placeholder in capitals,
      // values joined by "|", or a value word before the gap ("--sand, --no-sand", "--json | --csv", "--sort risk").
      const m = /^ {2}(--\S*(?:,? (?:(?:--|\||[A-ZÁÉÍÓÖŐÚÜŰ]|[a-z]+\|)\S*|[a-z]+(?= {2})))*)( *)(\S.*)?$/.exec(l);
      cur.options.push(m?.[1] ?? l.trim());
      if (m?.[3] === undefined) {
        const next = /^( +)\S/.exec(lines[i + 1] ?? "");
        cur.descriptions.push(next ? next[1]!.length : -1);
        i++;
      } else cur.descriptions.push(2 + m[1]!.length + m[2]!.length);
    } else if (cur && /^ {4,}\S/.test(l)) cur.continuations.push(/^ */.exec(l)![0].length);
    else if (cur) {
      blocks.push(cur);
      cur = undefined;
    }
  }
  if (cur) blocks.push(cur);
  return blocks;
}

describe("--help: the options' descriptions in one column, --lang among them", () => {
  it("the column finder sees a misaligned line", () => {
    const good = optionBlocks("Options:\n  --json      as JSON\n  --sort X    order,\n              then more\n  --allow-outside\n              long one");
    expect(good).toEqual([{ descriptions: [14, 14, 14], continuations: [14], options: ["--json", "--sort X", "--allow-outside"] }]);
    const bad = optionBlocks("Options:\n  --json      as JSON\n  --lang en|hu|de     the language");
    expect(new Set(bad[0]!.descriptions).size).toBe(2);
  });

  for (const lang of ["en", "hu", "de"] as const) {
    it(`${lang}: the top-level help's lines, --lang's among them, at most 104 columns`, async () => {
      const top = (await taut("--help", "--lang", lang)).stdout.split("\n");
      expect(top.filter((l) => l.includes("--lang")).length, lang).toBe(1);
      for (const l of top) expect(l.length, `${lang}: ${l}`).toBeLessThanOrEqual(104);
    });

    it(`${lang}: every command`, async () => {
      for (const c of commands()) {
        const r = await taut(c.name, "--help", "--lang", lang);
        expect(r.code).toBe(0);
        const blocks = optionBlocks(r.stdout);
        expect(blocks.length, `${lang} ${c.name}`).toBeGreaterThan(0);
        for (const b of blocks) {
          const column = b.descriptions[0]!;
          expect(column, `${lang} ${c.name}`).toBeGreaterThan(4);
          expect(new Set([...b.descriptions, ...b.continuations]), `${lang} ${c.name}: ${b.options.join(" ")}`).toEqual(new Set([column]));
        }
        // --lang is one of the options, listed once, in the last block.
        expect(blocks.at(-1)!.options, `${lang} ${c.name}`).toContain("--lang en|hu|de");
        expect(r.stdout.match(/^ {2}--lang /gm)?.length, `${lang} ${c.name}`).toBe(1);
        // The --lang lines run no wider than the help's own (the usage line aside), or 100 columns.
        setCliLanguage(lang);
        const width = Math.max(100, ...helpText(c).split("\n").map((l) => l.length));
        setCliLanguage("en");
        for (const l of r.stdout.split("\n").slice(1)) expect(l.length, `${lang} ${c.name}: ${l}`).toBeLessThanOrEqual(width);
      }
    });
  }
});
