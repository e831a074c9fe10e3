/**
 * The `taut` command line: the same core as the app, for scripts. Exit codes: 0 success,
 * 2 bad input (with the field and the rule broken), 1 internal error.
 */
import { readFileSync } from "node:fs";
import { parseArgs } from "node:util";
import type { Command, Output } from "./command.js";
import { EXIT_BAD_INPUT, EXIT_INTERNAL, EXIT_OK, InputError } from "./errors.js";
import { printable, quoted, terminalSafe } from "../profiles/text.js";
import { readStandardInput } from "./files.js";
import { planCommand } from "./commands/plan.js";
import { simulateCommand } from "./commands/simulate.js";
import { checkCommand } from "./commands/check.js";
import { tableCommand } from "./commands/table.js";
import { notesCommand } from "./commands/notes.js";
import { reviewCommand } from "./commands/review.js";

const COMMANDS: Command[] = [planCommand, checkCommand, tableCommand, simulateCommand, reviewCommand, notesCommand];

/** Register a command (each issue's command adds itself here). */
export function commands(): readonly Command[] {
  return COMMANDS;
}

export function addCommand(c: Command): void {
  if (!COMMANDS.some((x) => x.name === c.name)) COMMANDS.push(c);
}

function topHelp(): string {
  const width = Math.max(...COMMANDS.map((c) => c.name.length));
  return [
    "taut — starting advisor for heavy trains (advisory only: operating rules, local instructions",
    "and the locomotive's own instructions prevail)",
    "",
    "Usage: taut <command> [options]",
    "",
    "Commands:",
    ...COMMANDS.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    "",
    "Run `taut <command> --help` for a command's options; `taut --version` prints the version.",
    "Exit codes: 0 success, 2 bad input, 1 internal error.",
  ].join("\n");
}

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
export async function main(argv: string[], rawIo: Output = stdio): Promise<number> {
  const io = safeOutput(rawIo);
  const [name, ...rest] = argv;
  if (name === undefined || name === "--help" || name === "-h" || name === "help") {
    io.out(topHelp());
    return name === undefined ? EXIT_BAD_INPUT : EXIT_OK;
  }
  if (name === "--version" || name === "-V") {
    io.out(`taut ${packageVersion()}`);
    return EXIT_OK;
  }
  const cmd = COMMANDS.find((c) => c.name === name);
  if (!cmd) {
    io.err(`taut: unknown command ${quoted(name)}. Commands: ${COMMANDS.map((c) => c.name).join(", ")}. See taut --help.`);
    return EXIT_BAD_INPUT;
  }
  try {
    let parsed;
    try {
      parsed = parseArgs({ args: rest, options: { ...cmd.options, help: { type: "boolean", short: "h" } }, allowPositionals: true, strict: true });
    } catch (e) {
      throw new InputError(`${printable((e as Error).message.replace(/\. To specify a positional.*$/s, ""))}\n  usage: ${cmd.usage}`);
    }
    if (parsed.values.help) {
      io.out(`Usage: ${cmd.usage}\n\n${cmd.help}`);
      return EXIT_OK;
    }
    return await cmd.run(parsed as { values: Record<string, unknown>; positionals: string[] }, io);
  } catch (e) {
    if (e instanceof InputError) {
      io.err(`taut ${cmd.name}: ${e.describe()}`);
      return EXIT_BAD_INPUT;
    }
    io.err(`taut ${cmd.name}: internal error: ${printable((e as Error).message)}\nPlease report this with the input file.`);
    if (process.env.TAUT_DEBUG) io.err(String((e as Error).stack));
    return EXIT_INTERNAL;
  }
}
