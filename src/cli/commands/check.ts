/** `taut check DEPARTURES.csv|json` — a day's departures checked at once, in parallel worker threads. */
import { STANDARD_CAUTIONS } from "../../core/planner/cautions.js";
import { cautionsInEnglish } from "../../profiles/report.js";
import { EXIT_BAD_INPUT, EXIT_INTERNAL, EXIT_OK, errorWords, InputError, usageLine } from "../errors.js";
import { library, readNotesFiles } from "../files.js";
import type { Command } from "../command.js";
import { checkDepartures, publicRow } from "../batch/checkDepartures.js";
import { readDepartures } from "../batch/departures.js";
import { parseShard, shardOf } from "../batch/shard.js";
import { CHECK_ASSISTANCE_BUDGET, CHECK_DIVIDE_BUDGET } from "../batch/jobs.js";
import { defaultPoolSize, JobPool } from "../batch/pool.js";
import { checkCsv, renderCheck, summarise } from "../render/check.js";
import { helperSpec, jobsOption, progressReporter } from "../options.js";
import { sortByRisk } from "../../profiles/riskOrder.js";
import { asGiven } from "../table.js";

export const checkCommand: Command = {
  name: "check",
  summary: "batch check of departures: verdict, margin, largest mass, cheapest assistance",
  usage: "taut check DEPARTURES.csv|DEPARTURES.json [--sort file|risk] [--notes FILE]... [--helper ID] [--jobs N] [--shard K/N] [--allow-outside] [--quiet] [--json|--csv]",
  help: [
    "Checks many departures at once: one row each with the verdict, its reasons, the margin (allowance ÷",
    "demand) of the limit that binds, the largest trailing masses that start and that are at least marginal",
    "(the same figures `taut plan` gives), and the cheapest assistance that makes it start (one or two more",
    "units of the lead unit's profile, or --helper; when none works and the train needs assistance, dividing",
    "it into no more than three parts).",
    "",
    "Input:",
    "  CSV   a header line naming the columns id,case,rail,sand (and optionally location); `case` is a",
    "        start-case file relative to the CSV (in its folder or below), `rail` and `sand` (yes/no)",
    "        override its conditions, `location` (a location note id) its location. Empty cells keep",
    "        the case's own values.",
    "  JSON  a list of start cases ([ {...}, {...} ]), each with an optional \"id\".",
    "A case's location may name a location note by id (built-in, or from --notes).",
    "",
    "A row that cannot be read is reported with its line (CSV, the header is line 1) or its index (JSON,",
    "from 0); the other rows are still answered. Identical departures are worked out once.",
    "",
    "Options:",
    "  --sort risk   most at risk first, as the app's Departures screen: needs assistance, then marginal,",
    "                then starts, each by margin (smallest first), rows not answered last; ties in file",
    "                order. --sort file (the default) keeps the file's order.",
    "  --json        rows as JSON: { schema, departures: [...], summary, cautions }",
    "  --csv         rows as CSV",
    "  --notes FILE  location notes (a taut/location@1 note or a taut/notes-bundle@2 bundle); repeatable",
    "  --helper ID   locomotive profile the assistance options add (default: each train's lead unit's)",
    `  --jobs N      worker threads (default: the available cores, here ${defaultPoolSize()}; 1 runs on this thread)`,
    "  --shard K/N   answer only every N-th departure of the file, from the K-th (K = 1…N): N jobs of a",
    "                batch scheduler's job array split a day among machines; join their CSV outputs after",
    "                (README: Splitting a day among machines)",
    "  --quiet       no progress lines on stderr",
    "  --allow-outside",
    "                also read case files outside the CSV's folder (by default only that folder and the",
    "                folders below it)",
    "",
    `Each departure's assistance search is capped at ${CHECK_ASSISTANCE_BUDGET} planner runs for the options and ${CHECK_DIVIDE_BUDGET} for dividing`,
    "the train; `taut plan` on the case lists every option that starts.",
    "",
    "Exit codes: 0 when every row was answered; 2 when some rows were bad input (they are listed, the",
    "others still answered) or the file itself cannot be read; 1 when the calculation failed on a row.",
  ].join("\n"),
  options: {
    json: { type: "boolean" },
    csv: { type: "boolean" },
    notes: { type: "string", multiple: true },
    helper: { type: "string" },
    jobs: { type: "string" },
    shard: { type: "string" },
    quiet: { type: "boolean" },
    sort: { type: "string" },
    "allow-outside": { type: "boolean" },
  },
  async run({ values, positionals }, io) {
    const path = positionals[0];
    if (!path) throw new InputError(`${errorWords()("departuresNeeded")}\n  ${usageLine(checkCommand.usage)}`);
    if (positionals.length > 1) throw new InputError(errorWords()("oneDepartures", { count: String(positionals.length) }));
    if (values.json && values.csv) throw new InputError(errorWords()("jsonOrCsv"));
    const sort = (values.sort as string | undefined) ?? "file";
    if (sort !== "file" && sort !== "risk") throw new InputError(errorWords()("sortValue", { value: `"${sort}"` }));
    const jobs = jobsOption(values.jobs as string | undefined);
    const shard = values.shard === undefined ? null : parseShard(values.shard as string);
    const lib = library(readNotesFiles((values.notes as string[] | undefined) ?? []));
    const helper = helperSpec(lib, values.helper as string | undefined);
    const all = readDepartures(path, lib, { allowOutside: values["allow-outside"] === true });
    const deps = shard ? shardOf(all, shard) : all;
    const t0 = performance.now();
    const pool = new JobPool(jobs);
    const progress = values.quiet ? undefined : progressReporter(io, errorWords()("progressDepartures"));
    let result;
    try {
      // TAUT_BENCH_CHECK_ORDER=input: the file's order, for the batch benchmark's comparison (not a user setting).
      const order = process.env.TAUT_BENCH_CHECK_ORDER === "input" ? "input" : "costliest-first";
      result = await checkDepartures(deps, pool, { order, ...(helper ? { helper } : {}), ...(progress ? { onProgress: progress } : {}) });
    } finally {
      await pool.close();
    }
    const elapsedS = (performance.now() - t0) / 1000;
    const { stats } = result;
    const rows = sort === "risk" ? sortByRisk(result.rows, (x, order) => ({ verdict: x.verdict, margin: x.margin, order, failed: x.error !== undefined })) : result.rows;
    const summary = {
      ...summarise(rows),
      ...(shard ? { shard: `${shard.k}/${shard.n}`, departuresInFile: all.length } : {}),
      elapsed_s: Math.round(elapsedS * 10) / 10,
      workers: jobs,
      distinctChecks: stats.checks,
      distinctMassSearches: stats.massSearches,
      medianCheck_ms: Math.round(median(stats.checkMs)),
      medianMassSearch_ms: Math.round(median(stats.massMs)),
      // The work the threads did (each job's time on its thread), for the batch benchmark.
      maxCheck_ms: Math.round(Math.max(0, ...stats.checkMs)),
      maxMassSearch_ms: Math.round(Math.max(0, ...stats.massMs)),
      threadWork_s: Math.round([...stats.checkMs, ...stats.massMs].reduce((a, b) => a + b, 0) / 100) / 10,
    };
    if (values.json) io.out(JSON.stringify({ schema: "taut/departures-check@1", file: path, order: sort, departures: rows.map(publicRow), summary, cautions: cautionsInEnglish(STANDARD_CAUTIONS) }, null, 2));
    else if (values.csv) io.out(checkCsv(rows));
    else io.out(renderCheck(rows, STANDARD_CAUTIONS));
    if (!values.quiet) io.err(`taut check: ${errorWords()("checkDone", { shard: shard ? errorWords()("checkShard", { k: String(shard.k), n: String(shard.n) }) : "", rows: String(rows.length), of: shard ? errorWords()("checkOf", { all: String(all.length) }) : "", time: asGiven(summary.elapsed_s), count: jobs, checks: String(stats.checks), searches: String(stats.massSearches) })}`);
    if (summary.internalErrors > 0) return EXIT_INTERNAL;
    return summary.badRows > 0 ? EXIT_BAD_INPUT : EXIT_OK;
  },
};

function median(xs: readonly number[]): number {
  if (xs.length === 0) return 0;
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
}
