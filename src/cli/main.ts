/**
 * The `taut` command line: the same core as the app, for scripts. Exit codes: 0 success,
 * 2 bad input (with the field and the rule broken), 1 internal error.
 */
import { readFileSync } from "node:fs";
import { parseArgs } from "node:util";
import type { Command, Output } from "./command.js";
import { EXIT_BAD_INPUT, EXIT_INTERNAL, EXIT_OK, InputError, parseErrorText, usageLine, usageText } from "./errors.js";
import { helpText, summaryText, withLangOption } from "./help.js";
import { printable, quoted, terminalSafe } from "../profiles/text.js";
import { readStandardInput } from "./files.js";
import { planCommand } from "./commands/plan.js";
import { simulateCommand } from "./commands/simulate.js";
import { checkCommand } from "./commands/check.js";
import { tableCommand } from "./commands/table.js";
import { notesCommand } from "./commands/notes.js";
import { reviewCommand } from "./commands/review.js";
import { cli } from "../i18n/en/cli.js";
import { cliTr, languageOf, setCliLanguage } from "./lang.js";
import { wrap } from "./render/wrap.js";

const COMMANDS: Command[] = [planCommand, checkCommand, tableCommand, simulateCommand, reviewCommand, notesCommand];

/** Register a command (each issue's command adds itself here). */
export function commands(): readonly Command[] {
  return COMMANDS;
}

export function addCommand(c: Command): void {
  if (!COMMANDS.some((x) => x.name === c.name)) COMMANDS.push(c);
}

function topHelp(): string {
  const t = cliTr().ns(cli);
  const width = Math.max(...COMMANDS.map((c) => c.name.length));
  // Lines of at most 104 columns; English keeps its own break of the title (it always printed it so).
  const title = cliTr().lang === "en" ? [t("topTitle"), t("topTitle2")] : wrap(`${t("topTitle")} ${t("topTitle2")}`, 104, "");
  return [
    ...title,
    "",
    t("usage"),
    "",
    t("commandsTitle"),
    ...COMMANDS.flatMap((c) => wrap(`  ${c.name.padEnd(width)}  ${summaryText(c)}`, 104, " ".repeat(width + 4))),
    "",
    t("topHelpMore"),
    ...wrap(t("topHelpLang"), 104, ""),
    t("exitCodes"),
  ].join("\n");
}

/** Every command takes --lang (the language of its text; JSON and CSV do not change). */
const LANG_OPTION = { lang: { type: "string" } } as const;

const stdio: Output = {
  out: (t) => process.stdout.write(t.endsWith("\n") ? t : `${t}\n`),
  err: (t) => process.stderr.write(t.endsWith("\n") ? t : `${t}\n`),
  stdin: () => readStandardInput(),
};

/** The version in the package's own package.json (the one place it is written). */
export function packageVersion(): string {
  const pkg = JSON.parse(readFileSync(new URL("../../package.json", import.meta.url), "utf8")) as { version?: unknown };
  return typeof pkg.version === "string" ? pkg.version : "unknown";
}

/**
 * Everything the command line writes goes through `terminalSafe`: whatever a file or an argument put in a
 * label, an id or a message, no control character or bidirectional override reaches the terminal raw.
 */
function safeOutput(io: Output): Output {
  return { ...io, out: (t) => io.out(terminalSafe(t)), err: (t) => io.err(terminalSafe(t)) };
}

/** Run the command line; returns the exit code. */
export async function main(argv: string[], rawIo: Output = stdio, env: Readonly<Record<string, string | undefined>> = process.env): Promise<number> {
  const io = safeOutput(rawIo);
  const chosen = languageOf(argv, env);
  setCliLanguage(chosen.lang);
  const t = cliTr().ns(cli);
  // --lang may come before the command: `taut --lang de plan --demo`.
  const [name, ...rest] = stripLeadingLang(argv);
  if (name === undefined || name === "--help" || name === "-h" || name === "help") {
    io.out(topHelp());
    return name === undefined ? EXIT_BAD_INPUT : EXIT_OK;
  }
  if (chosen.bad !== undefined) {
    io.err(`taut: ${t("badLang", { value: quoted(chosen.bad) })}`);
    return EXIT_BAD_INPUT;
  }
  if (name === "--version" || name === "-V") {
    io.out(`taut ${packageVersion()}`);
    return EXIT_OK;
  }
  const cmd = COMMANDS.find((c) => c.name === name);
  if (!cmd) {
    io.err(t("unknownCommand", { name: quoted(name), list: COMMANDS.map((c) => c.name).join(", ") }));
    return EXIT_BAD_INPUT;
  }
  try {
    let parsed;
    try {
      parsed = parseArgs({ args: rest, options: { ...cmd.options, ...LANG_OPTION, help: { type: "boolean", short: "h" } }, allowPositionals: true, strict: true });
    } catch (e) {
      throw new InputError(`${printable(parseErrorText(e as Error, (e as Error).message.replace(/\. To specify a positional.*$/s, "")))}\n  ${usageLine(cmd.usage)}`);
    }
    if (parsed.values.help) {
      io.out(`${t("usageOf", { usage: usageText(cmd.usage) })}\n\n${withLangOption(helpText(cmd))}`);
      return EXIT_OK;
    }
    return await cmd.run(parsed as { values: Record<string, unknown>; positionals: string[] }, io);
  } catch (e) {
    if (e instanceof InputError) {
      io.err(`taut ${cmd.name}: ${e.describe()}`);
      return EXIT_BAD_INPUT;
    }
    io.err(t("internalError", { command: cmd.name, message: printable((e as Error).message) }));
    if (process.env.TAUT_DEBUG) io.err(String((e as Error).stack));
    return EXIT_INTERNAL;
  }
}

/** The arguments without a --lang given before the command's name. */
function stripLeadingLang(argv: readonly string[]): string[] {
  const out = [...argv];
  while (out[0] === "--lang" || out[0]?.startsWith("--lang=")) out.splice(0, out[0] === "--lang" ? 2 : 1);
  return out;
}
