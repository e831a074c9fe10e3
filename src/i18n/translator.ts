/**
 * A translator: the messages of one language with its way of writing numbers. The command line makes one
 * per run (`createTranslator`); the app keeps one whose language follows Settings (app/i18n.ts). Both hand
 * it to the shared renderers (render/), so a figure or a reason reads the same on screen and in a terminal.
 */
import type { Lang } from "./language.js";
import { fill, type Catalog, type Message, type Messages, type Namespace, type ParamArgs } from "./messages.js";
import { formatNumberIn, type NumberOptions } from "./numbers.js";

/** The messages of one namespace, by key: `t("verdict", { word })`. */
export type MessageFn<M extends Messages> = <K extends keyof M & string>(key: K, ...params: ParamArgs<M[K]>) => string;

export interface Translator {
  readonly lang: Lang;
  /** The messages of a namespace in this language (English where the catalog lacks one, which the types forbid). */
  ns<M extends Messages>(n: Namespace<string, M>): MessageFn<M>;
  /** A number with `decimals` decimals as this language writes it. */
  num(x: number, decimals: number): string;
}

/** The message for a key: the catalog's, else the English one. */
export function messageOf(n: Namespace, key: string, catalog: Catalog | null): Message {
  return catalog?.[n.name]?.[key] ?? n.en[key] ?? key;
}

/** A translator for `lang` with its catalog (null for English); numbers as `numbers` says (default: no grouping, "-"). */
export function createTranslator(lang: Lang, catalog: Catalog | null, numbers: NumberOptions = { grouping: false, minus: "-" }): Translator {
  const num = (x: number, d: number) => formatNumberIn(lang, x, d, numbers);
  const whole = (x: number) => num(x, Number.isInteger(x) ? 0 : 1);
  return {
    lang,
    ns<M extends Messages>(n: Namespace<string, M>): MessageFn<M> {
      return ((key: string, params?: Readonly<Record<string, string | number>>) => fill(messageOf(n, key, lang === "en" ? null : catalog), params, whole)) as MessageFn<M>;
    },
    num,
  };
}
