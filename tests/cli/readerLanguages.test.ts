/**
 * What the readers say about a bad file, in three languages: a departures file's bad rows and a departures
 * file refused as a whole, a notes bundle with a repeated id, a note whose reference train is unknown.
 * `taut` names the same rows, cells, fields and figures in Hungarian and German as in English, and the
 * English is the text it has always printed, byte for byte.
 */
import { describe, expect, it } from "vitest";
import { taut } from "../tools/cli.js";

const DIR = "tests/fixtures/in/readers";
/** The numbers in a text (a decimal comma read as a point). */
const numbers = (s: string) => [...s.matchAll(/\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", "."))).sort((a, b) => a - b);
/** The quoted values in a text (ids, cells, file kinds): the same in every language. */
const quotedValues = (s: string) => [...s.matchAll(/"[^"\n]*"/g)].map((m) => m[0]).sort();
/** The field paths and cell names before a message ("  notes[1].id: ", "  - line 2: case: "). */
const fieldPaths = (s: string) => [...s.matchAll(/(?:^|: |\n {2})([a-z]+(?:\[\d+\])?(?:\.[A-Za-z_]+)*): /g)].map((m) => m[1]).sort();

async function inEach(...args: string[]) {
  const out = [];
  for (const l of ["en", "hu", "de"]) out.push(await taut(...args, "--lang", l));
  return out as [Awaited<ReturnType<typeof taut>>, Awaited<ReturnType<typeof taut>>, Awaited<ReturnType<typeof taut>>];
}

/** The "not answered" rows of a check printout. */
const badRows = (s: string) => s.split("\n").filter((l) => /^ {2}- (line \d|\d+\. sor|Zeile \d)/.test(l));

describe("a departures file's bad rows in Hungarian and German", () => {
  it("names the same lines and cells with the same values; English as before", async () => {
    const [en, hu, de] = await inEach("check", `${DIR}/departures-bad-rows.csv`);
    // Bad rows are bad input (exit 2), the rows that can be read are still answered.
    for (const r of [en, hu, de]) expect(r.code).toBe(2);
    expect(badRows(en.stdout)).toEqual([
      "  - line 2: case: a start-case file is needed",
      '  - line 3: rail: must be one of dry, damp, wet, frost, leaves, greasy (got "icy")',
      '  - line 4: sand: must be yes or no (true/false, 1/0) (got "maybe")',
    ]);
    expect(badRows(hu.stdout)).toEqual([
      "  - 2. sor: case: indítási eset fájl szükséges",
      '  - 3. sor: rail: ezek egyike kell legyen: dry, damp, wet, frost, leaves, greasy (megadva: "icy")',
      '  - 4. sor: sand: igen vagy nem kell legyen (yes/no, true/false, 1/0) (megadva: "maybe")',
    ]);
    expect(badRows(de.stdout)[0]).toBe("  - Zeile 2: case: eine Anfahrfall-Datei ist nötig");
    for (const r of [hu, de]) {
      const [a, b] = [badRows(en.stdout).join("\n"), badRows(r.stdout).join("\n")];
      expect(numbers(b)).toEqual(numbers(a));
      expect(quotedValues(b)).toEqual(quotedValues(a));
    }
  });

  it("the JSON and CSV outputs are the same in every language (the row's error in English)", async () => {
    for (const format of ["--json", "--csv"]) {
      const [en, hu, de] = await inEach("check", `${DIR}/departures-bad-rows.csv`, format);
      expect(hu.stdout).toBe(en.stdout);
      expect(de.stdout).toBe(en.stdout);
      expect(en.stdout).toContain("line 3: rail: must be one of dry, damp, wet, frost, leaves, greasy");
    }
  });

  it("a file refused as a whole: no case column, an unclosed quote, JSON that is not a list", async () => {
    const cases: Array<[string, string, string, string]> = [
      ["departures-no-case.csv", 'line 1: the header must name the columns id,case,rail,sand (its 3 columns include no "case")', "1. sor: a fejlécnek", "Zeile 1: die Kopfzeile muss"],
      ["departures-unclosed-quote.csv", "line 2: a quoted field is not closed", "2. sor: egy idézőjeles mező nincs lezárva", "Zeile 2: ein Feld in Anführungszeichen ist nicht geschlossen"],
      ["departures-not-a-list.json", "a departures file in JSON is a list of start cases ([ {...}, {...} ])", "indítási esetek listája ([ {...}, {...} ])", "Liste von Anfahrfällen ([ {...}, {...} ])"],
    ];
    for (const [file, english, hungarian, german] of cases) {
      const [en, hu, de] = await inEach("check", `${DIR}/${file}`);
      for (const r of [en, hu, de]) expect(r.code).toBe(2);
      expect(en.stderr).toBe(`taut check: ${DIR}/${file}: ${english}`);
      expect(hu.stderr).toContain(hungarian);
      expect(de.stderr).toContain(german);
      for (const r of [hu, de]) expect(numbers(r.stderr)).toEqual(numbers(en.stderr));
    }
  });
});

describe("a notes bundle and a reference train in Hungarian and German", () => {
  it("a bundle repeating an id: the headline names the bad note, the issue its field; English as before", async () => {
    const [en, hu, de] = await inEach("check", `${DIR}/departures-bad-rows.csv`, "--notes", `${DIR}/notes-bundle-duplicate-id.json`);
    for (const r of [en, hu, de]) expect(r.code).toBe(2);
    expect(en.stderr).toBe(
      `taut check: ${DIR}/notes-bundle-duplicate-id.json: The bundle holds 2 notes; note 2 ("The same id again (test)") is not valid, so none was imported.\n` +
        '  notes[1].id: repeats the id of note 1 ("lantern-dip"); ids must be unique in a bundle',
    );
    expect(hu.stderr).toContain('A csomagban 2 jegyzet van; a(z) 2. jegyzet ("The same id again (test)") nem érvényes');
    expect(hu.stderr).toContain('notes[1].id: a(z) 1. jegyzet azonosítóját ismétli ("lantern-dip")');
    expect(de.stderr).toContain('Das Paket enthält 2 Notizen; Notiz 2 ("The same id again (test)") ist ungültig');
    expect(de.stderr).toContain('notes[1].id: wiederholt die Kennung von Notiz 1 ("lantern-dip")');
    for (const r of [hu, de]) {
      expect(numbers(r.stderr)).toEqual(numbers(en.stderr));
      expect(quotedValues(r.stderr)).toEqual(quotedValues(en.stderr));
      expect(fieldPaths(r.stderr)).toContain("notes[1].id");
    }
  });

  it("a note naming an unknown reference train: taut table says which and lists the known ones", async () => {
    const [en, hu, de] = await inEach("table", `${DIR}/note-unknown-reference-train.json`);
    for (const r of [en, hu, de]) expect(r.code).toBe(2);
    expect(en.stderr).toBe(
      "taut table: lantern-dip-unknown-train: the reference train cannot be used\n" +
        '  referenceTrain.train: names no known train ("ore-9999"; known: aggregate-1400, ore-5200, goods-1100)',
    );
    expect(hu.stderr).toBe(
      "taut table: lantern-dip-unknown-train: a mintavonat nem használható\n" +
        '  referenceTrain.train: nem ismert mintavonatot nevez meg ("ore-9999"; ismertek: aggregate-1400, ore-5200, goods-1100)',
    );
    expect(de.stderr).toBe(
      "taut table: lantern-dip-unknown-train: der Referenzzug ist nicht verwendbar\n" +
        '  referenceTrain.train: nennt keinen bekannten Referenzzug ("ore-9999"; bekannt: aggregate-1400, ore-5200, goods-1100)',
    );
  });
});
