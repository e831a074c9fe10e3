/**
 * Each command's summary and --help in this run's language. English is the command's own `summary` and
 * `help`, printed as they are (byte for byte); Hungarian and German come from the cliHelp namespace, whose
 * English messages are the same text with its figures as placeholders — tests/cli/helpLanguages.test.ts
 * checks that the English messages, filled, equal every command's own help, so the two cannot drift apart.
 */
import { RAIL_CONDITIONS } from "../core/physics/types.js";
import { DEFAULT_REFERENCE_TEMPERATURE_C } from "../profiles/referenceTrain.js";
import { builtinTrains } from "../profiles/builtin.js";
import { cliHelp } from "../i18n/en/cliHelp.js";
import type { Translator } from "../i18n/translator.js";
import { CHECK_ASSISTANCE_BUDGET, CHECK_DIVIDE_BUDGET } from "./batch/jobs.js";
import { defaultPoolSize } from "./batch/pool.js";
import type { Command } from "./command.js";
import { cliTr } from "./lang.js";
import { PLAN_ASSISTANCE_BUDGET, PLAN_ASSISTANCE_FULL_PLANS, PLAN_DIVIDE_BUDGET } from "./commands/plan.js";
import { TABLE_DEFAULTS } from "./commands/table.js";
import { RAILML_DEFAULTS } from "./commands/notes.js";
import { ACCELERATE_MAX_S } from "../core/planner/search.js";
import { wrap } from "./render/wrap.js";

/** The commands whose words are in the catalog (every command of ours). */
export type HelpName = "plan" | "check" | "table" | "simulate" | "review" | "notes";
const NAMES: readonly string[] = ["plan", "check", "table", "simulate", "review", "notes"];

/** The figures each help text states: the constants the commands themselves use. */
export function helpFigures(name: HelpName): Record<string, string> {
  switch (name) {
    case "plan":
      return { budget: String(PLAN_ASSISTANCE_BUDGET), fullPlans: String(PLAN_ASSISTANCE_FULL_PLANS), divide: String(PLAN_DIVIDE_BUDGET), rails: RAIL_CONDITIONS.join(", ") };
    case "check":
      return { jobs: String(defaultPoolSize()), budget: String(CHECK_ASSISTANCE_BUDGET), divide: String(CHECK_DIVIDE_BUDGET), json: "{ schema, departures: [...], summary, cautions }", jsonList: "[ {...}, {...} ]" };
    case "table":
      return { firstTrain: builtinTrains[0]?.id ?? "none", wagons: String(TABLE_DEFAULTS.wagons), wagonType: TABLE_DEFAULTS.wagonType, temperature: String(DEFAULT_REFERENCE_TEMPERATURE_C), target: String(TABLE_DEFAULTS.targetKmh) };
    case "simulate":
      return { cap: String(ACCELERATE_MAX_S) };
    case "review":
      return {};
    case "notes":
      return { behind: String(RAILML_DEFAULTS.behindM), ahead: String(RAILML_DEFAULTS.aheadM) };
  }
}

function isOurs(name: string): name is HelpName {
  return NAMES.includes(name);
}

/** A command's one-line summary (the top-level help's list) in this run's language. */
export function summaryText(cmd: Command, tr: Translator = cliTr()): string {
  if (tr.lang === "en" || !isOurs(cmd.name)) return cmd.summary;
  return tr.ns(cliHelp)(`${cmd.name}Summary`);
}

/** A command's --help text (after its usage line) in this run's language. */
export function helpText(cmd: Command, tr: Translator = cliTr()): string {
  if (tr.lang === "en" || !isOurs(cmd.name)) return cmd.help;
  return fillHelp(tr, cmd.name);
}

/** The catalog's help of a command in a language, its figures filled. */
export function fillHelp(tr: Translator, name: HelpName): string {
  const t = tr.ns(cliHelp) as (key: string, params?: Record<string, string>) => string;
  return t(`${name}Help`, helpFigures(name));
}

/** The --lang option as every command's --help lists it. */
const LANG_SIGNATURE = "--lang en|hu|de";

/**
 * A command's --help with the --lang option added as the last line of its last block of options, its
 * description in that block's column (on the next line when the option is wider than the column) and
 * wrapped as wide as the block's own lines (at least 100 columns).
 */
export function withLangOption(help: string, tr: Translator = cliTr()): string {
  const lines = help.split("\n");
  const isOption = (l: string) => /^ {2}--/.test(l);
  // The last block of options: option lines and the lines continuing them (indented deeper).
  let end = lines.length - 1;
  while (end >= 0 && !isOption(lines[end]!)) end--;
  if (end < 0) return help;
  while (end + 1 < lines.length && /^ {4,}\S/.test(lines[end + 1]!)) end++;
  let start = end;
  while (start > 0 && (isOption(lines[start - 1]!) || /^ {4,}\S/.test(lines[start - 1]!))) start--;
  const block = lines.slice(start, end + 1);
  // The block's column: where most of its option lines' descriptions start.
  const counts = new Map<number, number>();
  for (const l of block) {
    const m = isOption(l) ? /^ {2}--\S*(?: \S+)*? {2,}(?=\S)/.exec(l) : null;
    if (m) counts.set(m[0].length, (counts.get(m[0].length) ?? 0) + 1);
  }
  const column = [...counts].sort((a, b) => b[1] - a[1] || a[0] - b[0])[0]?.[0] ?? 22;
  const width = Math.max(100, ...block.map((l) => l.length));
  const indent = " ".repeat(column);
  const description = tr.ns(cliHelp)("langOption");
  const head = `  ${LANG_SIGNATURE}`;
  const added = head.length + 2 <= column ? wrap(`${head.padEnd(column)}${description}`, width, indent) : [head, ...wrap(`${indent}${description}`, width, indent)];
  return [...lines.slice(0, end + 1), ...added, ...lines.slice(end + 1)].join("\n");
}

