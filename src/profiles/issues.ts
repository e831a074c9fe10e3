/**
 * Validation results as data: every problem names the field (a dotted path) and the rule broken,
 * in words a driver or a script author can act on. Used by the CLI (exit 2) and the app (shown at the field).
 */
import type { PlanWorkProblem } from "../core/planner/workCap.js";
import type { ReaderCoded } from "../i18n/renderReaders.js";
import { englishField, type FieldCoded, type GotValue } from "./issueText.js";
import { printable, quoted } from "./text.js";

/**
 * A problem at a field. `message` is in English; a coded issue (most from the schemas and the case's
 * resolution) also carries its code and figures, from which other languages render it (issueText.ts).
 */
export interface FieldIssue extends Partial<FieldCoded> {
  /** Dotted path of the field, e.g. "train.trailingMass_t" or "locomotives[0].profile"; "" for the whole file. */
  path: string;
  message: string;
  /** A reader's message (a notes file, a departures file, a reference train) or the work cap's refusal, as a code with its figures (i18n/renderReaders.ts). */
  reader?: ReaderCoded | PlanWorkProblem;
}

/** A coded issue at `path`, its English message written from the code. */
export function coded(path: string, c: FieldCoded): FieldIssue {
  return { path, message: englishField(c), ...c };
}

export type ParseResult<T> = { ok: true; value: T } | { ok: false; issues: FieldIssue[] };

export const ok = <T>(value: T): ParseResult<T> => ({ ok: true, value });
export const fail = <T = never>(issues: FieldIssue[]): ParseResult<T> => ({ ok: false, issues });

/** Join path parts as `a.b[2].c`. */
export function pathToString(parts: ReadonlyArray<PropertyKey>): string {
  let s = "";
  for (const p of parts) {
    if (typeof p === "number") s += `[${p}]`;
    else s += s === "" ? String(p) : `.${String(p)}`;
  }
  return s;
}

/** Prefix every issue's path (for a nested file, a CSV row, a bundle entry). */
export function prefixIssues(prefix: string, issues: FieldIssue[]): FieldIssue[] {
  return issues.map((i) => ({ ...i, path: i.path === "" ? prefix : i.path.startsWith("[") ? `${prefix}${i.path}` : `${prefix}.${i.path}` }));
}

/** At most this many issues are listed; the rest are counted ("…and 30 more"). */
export const MAX_LISTED_ISSUES = 12;

/**
 * One line per issue, `path: message`, at most `max` of them and then how many more. Each line is made
 * safe to print: a path or message that carries text from the file cannot break the line or move a cursor.
 */
export function formatIssues(issues: readonly FieldIssue[], max = MAX_LISTED_ISSUES): string {
  const lines = issues.slice(0, max).map((i) => printable(i.path ? `${i.path}: ${i.message}` : i.message));
  if (issues.length > max) lines.push(`…and ${issues.length - max} more`);
  return lines.join("\n");
}

/** The subset of a zod issue this module reads (zod and zod/mini share it). */
export interface RawIssue {
  code: string;
  path: ReadonlyArray<PropertyKey>;
  message: string;
  input?: unknown;
  expected?: string;
  minimum?: number | bigint;
  maximum?: number | bigint;
  inclusive?: boolean;
  origin?: string;
  values?: readonly unknown[];
  keys?: readonly string[];
  errors?: ReadonlyArray<ReadonlyArray<RawIssue>>;
  format?: string;
  divisor?: number;
  /** A rule of ours (schemas.ts `rule`): its code and figures. */
  params?: { code?: FieldCoded["code"]; figures?: FieldCoded["figures"] };
}

/** Turn zod issues into field issues with specific messages. */
export function fromZodIssues(raw: ReadonlyArray<RawIssue>, base: ReadonlyArray<PropertyKey> = []): FieldIssue[] {
  const out: FieldIssue[] = [];
  for (const issue of raw) {
    const path = [...base, ...issue.path];
    if (issue.code === "invalid_union" && issue.errors && issue.errors.length > 0) {
      out.push(...fromZodIssues(bestBranch(issue.errors), path));
      continue;
    }
    const d = describe(issue);
    out.push(d.code ? coded(pathToString(path), d) : { path: pathToString(path), message: d.message });
  }
  return out;
}

/** The union branch the author most likely meant: the one whose issues go deepest, then the fewest. */
function bestBranch(branches: ReadonlyArray<ReadonlyArray<RawIssue>>): ReadonlyArray<RawIssue> {
  let best = branches[0]!;
  let bestScore = -Infinity;
  for (const b of branches) {
    const depth = Math.min(...b.map((i) => i.path.length));
    const score = depth * 1000 - b.length;
    if (score > bestScore) {
      best = b;
      bestScore = score;
    }
  }
  return best;
}

/** The value given, as a message quotes it. */
function gotOf(v: unknown): GotValue {
  if (v === undefined) return { word: "nothing" };
  if (typeof v === "string") return quoted(v, 40);
  // A number beyond what a double holds (1e400 in a file reads as infinity) is said in words.
  if (typeof v === "number" && (v === Infinity || v === -Infinity)) return { word: v > 0 ? "tooLarge" : "tooSmall" };
  if (typeof v === "number") return Number.isNaN(v) ? "NaN" : v;
  if (typeof v === "boolean" || v === null) return String(v);
  if (Array.isArray(v)) return { word: "list" };
  return { word: "object" };
}

type Described = FieldCoded | { code?: undefined; message: string };

function describe(i: RawIssue): Described {
  const got = "input" in i ? { got: gotOf(i.input) } : {};
  const n = (x: number | bigint | undefined) => Number(x);
  switch (i.code) {
    case "invalid_type":
      if ("input" in i && i.input === undefined) return { code: "required", figures: { expected: i.expected ?? "" } };
      return { code: "mustBe", figures: { expected: i.expected ?? "" }, ...got };
    case "too_small":
      if (ours(i)) return { ...ours(i)!, ...got };
      if (custom(i)) return { message: `${i.message}${gotText(i)}` };
      if (i.origin === "array") return { code: "minItems", figures: { count: n(i.minimum) } };
      if (i.origin === "string") return i.minimum === 1 ? { code: "notEmpty" } : { code: "minChars", figures: { min: n(i.minimum) } };
      return { code: i.inclusive ? "atLeast" : "greaterThan", figures: { min: n(i.minimum) }, ...got };
    case "too_big":
      if (ours(i)) return { ...ours(i)!, ...got };
      if (custom(i)) return { message: `${i.message}${gotText(i)}` };
      if (i.origin === "array") return { code: "maxItems", figures: { max: n(i.maximum) } };
      if (i.origin === "string") return { code: "maxChars", figures: { max: n(i.maximum) } };
      return { code: i.inclusive ? "atMost" : "lessThan", figures: { max: n(i.maximum) }, ...got };
    case "invalid_value":
      if (i.values && i.values.length === 1) return { code: "oneValue", figures: { value: JSON.stringify(i.values[0]) }, ...got };
      return { code: "oneOf", figures: { values: (i.values ?? []).map((v) => JSON.stringify(v)).join(", ") }, ...got };
    case "not_multiple_of":
      return { code: "multipleOf", figures: { divisor: n(i.divisor) }, ...got };
    case "invalid_format":
      if (ours(i)) return { ...ours(i)!, ...got };
      if (custom(i)) return { message: `${i.message}${gotText(i)}` };
      if (i.format === "regex") return { code: "badForm", ...got };
      return { code: "mustBe", figures: { expected: i.format ?? "" }, ...got };
    case "unrecognized_keys":
      return { code: "unknownFields", figures: { count: (i.keys ?? []).length, keys: (i.keys ?? []).join(", ") } };
    default: {
      // Our own rules ("must be from 5 to 150 t") say what is wrong; the value given is added when they do not quote it.
      const o = ours(i);
      if (o) {
        const english = englishField(o);
        return english.startsWith("must") && !english.includes("(got ") && (typeof i.input === "number" || typeof i.input === "string") ? { ...o, ...got } : o;
      }
      if (custom(i)) return { message: i.message.includes("(got ") || !(typeof i.input === "number" || typeof i.input === "string") ? i.message : `${i.message}${gotText(i)}` };
      return i.message && i.message !== "Invalid input" ? { message: i.message } : { code: "notValid", ...got };
    }
  }
}

/** A rule of ours (schemas.ts `rule`): its code and figures. */
function ours(i: RawIssue): FieldCoded | undefined {
  return i.params?.code ? { code: i.params.code, ...(i.params.figures ? { figures: i.params.figures } : {}) } : undefined;
}

/** The value given in English, for a message written without a code. */
function gotText(i: RawIssue): string {
  return "input" in i ? ` ${englishField({ code: "notValid", got: gotOf(i.input) }).slice("is not valid ".length)}` : "";
}

/** A message written for a rule in schemas.ts without a code (they all start "must"), not zod's default. */
function custom(i: RawIssue): boolean {
  return typeof i.message === "string" && i.message.startsWith("must");
}
