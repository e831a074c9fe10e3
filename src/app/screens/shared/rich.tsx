/**
 * A translated message with marked-up parts: each `{name}` placeholder is replaced by the element given for
 * it (a `<code>` literal, a `<strong>` phrase), so the words around it come from the catalog and keep the
 * language's own order. A placeholder without an element stays as written, so a gap shows.
 */
import type { JSX } from "solid-js";

export function rich(text: string, parts: Readonly<Record<string, JSX.Element>>): JSX.Element {
  return text.split(/(\{[^{}]+\})/).map((piece) => {
    const name = /^\{([^{}]+)\}$/.exec(piece)?.[1];
    return name !== undefined && name in parts ? parts[name] : piece;
  });
}

/** Placeholders kept as written, for a message whose parts `rich` fills: `t("key", kept("file"))`. */
export function kept<const N extends string>(...names: N[]): Record<N, string> {
  return Object.fromEntries(names.map((n) => [n, `{${n}}`])) as Record<N, string>;
}
