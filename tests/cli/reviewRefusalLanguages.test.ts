/**
 * `taut review` refusing a CSV recording whose quoted field is never closed (issue 16): Hungarian and
 * German say it from a code with the same line number as English, no English sentence left; English is
 * what it always was.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { setCliLanguage } from "../../src/cli/lang.js";
import { taut } from "../tools/cli.js";

const repo = fileURLToPath(new URL("../../", import.meta.url));
const demo = `${repo}profiles/cases/demo-aggregate-ashvale.json`;
const dir = mkdtempSync(join(tmpdir(), "taut-review-lang-"));
afterAll(() => {
  setCliLanguage("en");
  rmSync(dir, { recursive: true, force: true });
});
const open = join(dir, "open.csv");
writeFileSync(open, 'time_s,speed_kmh\n0,0\n1,1\n2,"2\n3,3\n');

describe("taut review: an unclosed quote in the recording's language", () => {
  it("en: as it always was", async () => {
    const r = await taut("review", demo, open);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe(`taut review: ${open}: The file is not readable CSV: line 4: a quoted field is not closed.`);
  });
  for (const [lang, words] of [
    ["hu", /A fájl nem olvasható CSV: 4\. sor: egy idézőjeles mező nincs lezárva\./],
    ["de", /Die Datei ist kein lesbares CSV: Zeile 4: ein Feld in Anführungszeichen ist nicht geschlossen\./],
  ] as const) {
    it(`${lang}: the line from the code, no English`, async () => {
      const r = await taut("review", demo, open, "--lang", lang);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(words);
      expect(r.stderr).not.toMatch(/\b(line|quoted|field|closed|not)\b/);
      // The same figures as English.
      expect([...r.stderr.replace(open, "").matchAll(/\d+/g)].map((m) => m[0])).toEqual(["4"]);
    });
  }
});
