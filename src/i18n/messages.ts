/**
 * Messages and their catalogs, typed. English is written once, per namespace (`namespace("plan", {...})`),
 * beside nothing but its words; Hungarian and German give the same keys with the same placeholders
 * (`translation<typeof plan.en>()({...})`), so a key missing or a placeholder misspelt in any language is a
 * compile error that names the key. A message is a template with `{name}` placeholders, or a pair of
 * templates chosen by `{count}` (one: exactly 1; other: every other number — the rule of all three
 * languages for whole numbers, CLDR).
 */

/** A message chosen by `count`: `one` when it is exactly 1, else `other`. */
export interface Plural {
  readonly one: string;
  readonly other: string;
}
export type Message = string | Plural;
export type Messages = Readonly<Record<string, Message>>;

type Holes<S extends string> = S extends `${string}{${infer P}}${infer R}` ? P | Holes<R> : never;
/** The placeholders of a message (a plural always has `count`). */
export type HolesOf<M> = M extends string ? Holes<M> : M extends Plural ? Holes<M["one"]> | Holes<M["other"]> | "count" : never;
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
type ShapeOf<M> = M extends string ? string : Plural;

/** What a message's placeholders are given: text, or a whole number (written in the language's digits). */
export type Params<M> = { readonly [P in HolesOf<M>]: string | number };
/** The arguments after the key: none for a message without placeholders, else its values. */
export type ParamArgs<M> = [HolesOf<M>] extends [never] ? [] : [params: Params<M>];

/** A namespace of English messages; the name is its key in every other language's catalog. */
export interface Namespace<N extends string = string, M extends Messages = Messages> {
  readonly name: N;
  readonly en: M;
}

/** Declare a namespace with its English messages (literal types kept, for the placeholder checks). */
export function namespace<const N extends string, const M extends Messages>(name: N, en: M): Namespace<N, M> {
  return { name, en };
}

/**
 * A translation of the English messages `E`: every key, no other, each with the same placeholders.
 * A mismatch reads "Type 'string' is not assignable to type '{ placeholdersMustBe: ... }'" at the key.
 */
export type Translation<E, T> = {
  readonly [K in keyof E]: K extends keyof T ? (Same<HolesOf<E[K]>, HolesOf<T[K]>> extends true ? ShapeOf<E[K]> : { placeholdersMustBe: HolesOf<E[K]> }) : ShapeOf<E[K]>;
} & { readonly [K in Exclude<keyof T, keyof E>]: never };

/** Check a translation against its English at compile time: `translation<typeof plan.en>()({...})`. */
export function translation<E extends Messages>() {
  return <const T extends Translation<E, T>>(t: T): Readonly<Record<keyof E, Message>> => t as unknown as Readonly<Record<keyof E, Message>>;
}

/** A catalog of another language: each namespace's messages by name. */
export type Catalog = Readonly<Record<string, Readonly<Record<string, Message>>>>;

/** The placeholders in a template, in order of first use. */
export function placeholdersOf(m: Message): string[] {
  const out: string[] = [];
  const texts = typeof m === "string" ? [m] : [m.one, m.other];
  for (const t of texts) for (const x of t.matchAll(/\{([^{}]+)\}/g)) if (!out.includes(x[1]!)) out.push(x[1]!);
  if (typeof m !== "string" && !out.includes("count")) out.push("count");
  return out;
}

/**
 * Fill a message: pick the plural form by `count`, then put each value in its placeholder; a number is
 * written by `num` (whole numbers in the language's digits). A placeholder without a value stays as it is,
 * so a missing value shows rather than vanishing.
 */
export function fill(m: Message, params: Readonly<Record<string, string | number>> | undefined, num: (x: number) => string): string {
  const text = typeof m === "string" ? m : params?.count === 1 ? m.one : m.other;
  if (!params) return text;
  return text.replace(/\{([^{}]+)\}/g, (all, name: string) => {
    const v = params[name];
    return v === undefined ? all : typeof v === "number" ? num(v) : v;
  });
}
