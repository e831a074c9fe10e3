/**
 * `taut check` where no departure could be answered: a sentence saying so, in the run's language, instead of
 * a table's header over nothing; the rows' problems below it and the summary's count as before (common
 * practice: an empty result is said, not drawn).
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { taut } from "../tools/cli.js";

const dir = mkdtempSync(join(tmpdir(), "taut-none-answered-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("taut check with no row answered", () => {
  const bad = join(dir, "bad.csv");
  writeFileSync(bad, "id,case,rail,sand\nx,no-such-case,dry,no\ny,demo-aggregate-ashvale,lava,no\n");
  const good = join(dir, "good.csv");
  writeFileSync(good, "id,case,rail,sand\na,demo-aggregate-ashvale,dry,no\nx,no-such-case,dry,no\n");

  it.each([
    ["en", "No departure could be checked", "Rows not answered (2):"],
    ["hu", "Egyetlen indulás sem ellenőrizhető", "Megválaszolatlan sorok (2):"],
    ["de", "Keine Abfahrt ließ sich prüfen", "Nicht beantwortete Zeilen (2):"],
  ])("%s: a sentence, no empty table", async (lang, sentence, heading) => {
    const r = await taut("check", bad, "--lang", lang);
    const lines = r.stdout.split("\n");
    expect(lines[0]).toContain(sentence);
    expect(r.stdout).toContain(heading);
    expect(r.stdout).not.toMatch(/^-+ {2}-+/m); // a table's rule under its header
  });

  it("a table as before when one row is answered", async () => {
    const r = await taut("check", good);
    expect(r.stdout).not.toContain("No departure could be checked");
    expect(r.stdout).toMatch(/^-+ {2}-+/m);
    expect(r.stdout).toContain("Rows not answered (1):");
  });
});
