/**
 * `taut check --shard K/N`: N jobs (a batch scheduler's job array) each answer every N-th departure from the
 * K-th, and together answer every departure exactly once; joining their CSV outputs gives the day.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import fc from "fast-check";
import { afterAll, describe, expect, it } from "vitest";
import { parseShard, shardOf } from "../../src/cli/batch/shard.js";
import { parseCsv } from "../../src/cli/csvParse.js";
import { taut } from "../tools/cli.js";

const dir = mkdtempSync(join(tmpdir(), "taut-shard-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("shards of a list", () => {
  it("N shards hold every item exactly once, each in the file's order", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 60 }), fc.integer({ min: 1, max: 12 }), (len, n) => {
        const items = Array.from({ length: len }, (_, i) => i);
        const parts = Array.from({ length: n }, (_, k) => shardOf(items, { k: k + 1, n }));
        expect(parts.flat().sort((a, b) => a - b)).toEqual(items);
        for (const [k, part] of parts.entries()) {
          expect(part).toEqual([...part].sort((a, b) => a - b));
          for (const i of part) expect(i % n).toBe(k);
        }
      }),
    );
  });

  it("reads K/N and refuses what is not a share", () => {
    expect(parseShard("3/8")).toEqual({ k: 3, n: 8 });
    expect(parseShard("1/1")).toEqual({ k: 1, n: 1 });
    for (const bad of ["0/4", "5/4", "1/0", "3", "a/b", "-1/4", "1.5/4", "2/4/6", ""]) expect(() => parseShard(bad), bad).toThrow(/--shard must be K\/N/);
  });
});

describe("taut check --shard", () => {
  // The quickest demo train (a built-in case, named by id) under five rail conditions, and one row that cannot be read.
  const csv = join(dir, "day.csv");
  writeFileSync(
    csv,
    [
      "id,case,rail,sand",
      "d1,demo-goods-cinderfield,dry,yes",
      "d2,demo-goods-cinderfield,wet,yes",
      "d3,no-such-case.json,dry,yes",
      "d4,demo-goods-cinderfield,leaves,yes",
      "d5,demo-goods-cinderfield,dry,yes",
    ].join("\n"),
  );

  it("two jobs answer rows 1, 3, 5 and 2, 4 of the file; their CSV outputs join into the whole day", async () => {
    const outputs = await Promise.all([1, 2].map((k) => taut("check", csv, "--shard", `${k}/2`, "--csv", "--quiet", "--jobs", "1")));
    const tables = outputs.map((o) => parseCsv(o.stdout));
    // One job's exit code tells of its own rows: the unreadable row d3 falls in the first share.
    expect(outputs.map((o) => o.code)).toEqual([2, 0]);
    const header = tables[0]![0]!.fields;
    expect(tables[1]![0]!.fields).toEqual(header);
    const id = header.indexOf("id");
    const line = header.indexOf("line");
    const ids = tables.map((t) => t.slice(1).map((r) => r.fields[id]));
    expect(ids).toEqual([
      ["d1", "d3", "d5"],
      ["d2", "d4"],
    ]);
    // Each row keeps its line in the departures file, so the joined day can be put back in order.
    const joined = tables.flatMap((t) => t.slice(1)).sort((a, b) => Number(a.fields[line]) - Number(b.fields[line]));
    expect(joined.map((r) => r.fields[id])).toEqual(["d1", "d2", "d3", "d4", "d5"]);
    // A departure is answered the same whichever job answers it: d1 and d5 are the same train.
    const row = (k: string) => joined.find((r) => r.fields[id] === k)!.fields.filter((_, c) => c !== id && c !== line);
    expect(row("d5")).toEqual(row("d1"));
  });

  it("says which share it answered in the JSON summary", async () => {
    const r = await taut("check", csv, "--shard", "2/2", "--json", "--quiet", "--jobs", "1");
    expect(r.code).toBe(0);
    const summary = (JSON.parse(r.stdout) as { summary: { shard: string; departures: number; departuresInFile: number } }).summary;
    expect(summary).toMatchObject({ shard: "2/2", departures: 2, departuresInFile: 5 });
  });

  it("refuses a share that does not exist, before any work", async () => {
    const r = await taut("check", csv, "--shard", "3/2");
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--shard must be K\/N/);
  });
});
