/**
 * The command line's language: `--lang en|hu|de` on any command, else the POSIX locale (LC_ALL,
 * LC_MESSAGES, LANG), else English. Chosen once per run (`setCliLanguage`, by main) and read by every
 * printout through `cliTr()`. Only text is translated: JSON and CSV are the same in every language.
 */
import { cliDe } from "../i18n/de/cli.js";
import { deChecks } from "../i18n/de/checks.js";
import { de } from "../i18n/de/index.js";
import { cliHu } from "../i18n/hu/cli.js";
import { huCliCommands } from "../i18n/hu/cliCommands.js";
import { deCliCommands } from "../i18n/de/cliCommands.js";
import { fieldsDe } from "../i18n/de/fields.js";
import { fields } from "../i18n/en/fields.js";
import { fieldsHu } from "../i18n/hu/fields.js";
import { huChecks } from "../i18n/hu/checks.js";
import { hu } from "../i18n/hu/index.js";
import { langFromEnvironment, isLang, type Lang } from "../i18n/language.js";
import type { Catalog } from "../i18n/messages.js";
import { createTranslator, type MessageFn, type Translator } from "../i18n/translator.js";
import { wordsOf } from "../i18n/words.js";

const CATALOGS: Readonly<Record<Lang, Catalog | null>> = {
  en: null,
  hu: { ...hu, ...huChecks, ...huCliCommands, cli: cliHu, fields: fieldsHu },
  de: { ...de, ...deChecks, ...deCliCommands, cli: cliDe, fields: fieldsDe },
};

let current: Translator = createTranslator("en", null);

export function setCliLanguage(l: Lang): void {
  current = createTranslator(l, CATALOGS[l]);
}

/** The translator of this run. */
export function cliTr(): Translator {
  return current;
}

/** The field messages and the headlines over them in this run's language. */
export function cliFieldWords(): MessageFn<typeof fields.en> {
  return current.ns(fields);
}

/** The words for a plan's codes in this run's language. */
export function cliWords(): ReturnType<typeof wordsOf> {
  return wordsOf(current);
}

/**
 * The language asked for on the command line (`--lang X` or `--lang=X`, looked for before the options are
 * parsed so that even a parse error is written in it), else the environment's. `undefined` value: not a
 * language of ours (the caller says so).
 */
export function languageOf(args: readonly string[], env: Readonly<Record<string, string | undefined>>): { lang: Lang; bad?: string } {
  for (let i = 0; i < args.length; i++) {
    const a = args[i]!;
    if (a === "--") break;
    const v = a === "--lang" ? args[i + 1] : a.startsWith("--lang=") ? a.slice("--lang=".length) : undefined;
    if (v === undefined) continue;
    return isLang(v) ? { lang: v } : { lang: langFromEnvironment(env), bad: v };
  }
  return { lang: langFromEnvironment(env) };
}
