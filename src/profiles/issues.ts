/**
 * Validation results as data: every problem names the field (a dotted path) and the rule broken,
 * in words a driver or a script author can act on. Used by the CLI (exit 2) and the app (shown at the field).
 */
import { printable, quoted } from "./text.js";

export interface FieldIssue {
  /** Dotted path of the field, e.g. "train.trailingMass_t" or "locomotives[0].profile"; "" for the whole file. */
  path: string;
  message: string;
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
    out.push({ path: pathToString(path), message: describe(issue) });
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

function shown(v: unknown): string {
  if (v === undefined) return "nothing";
  if (typeof v === "string") return quoted(v, 40);
  // A number beyond what a double holds (1e400 in a file reads as infinity) is said in words.
  if (typeof v === "number" && (v === Infinity || v === -Infinity)) return `a number too ${v > 0 ? "large" : "far below zero"} to hold`;
  if (typeof v === "number" || typeof v === "boolean" || v === null) return String(v);
  if (Array.isArray(v)) return "a list";
  return "an object";
}

function describe(i: RawIssue): string {
  const got = "input" in i ? ` (got ${shown(i.input)})` : "";
  switch (i.code) {
    case "invalid_type":
      if ("input" in i && i.input === undefined) return `is required (${article(i.expected)})`;
      return `must be ${article(i.expected)}${got}`;
    case "too_small":
      if (custom(i)) return `${i.message}${got}`;
      if (i.origin === "array") return `must have at least ${String(i.minimum)} item${i.minimum === 1 ? "" : "s"}`;
      if (i.origin === "string") return i.minimum === 1 ? "must not be empty" : `must be at least ${String(i.minimum)} characters`;
      return `must be ${i.inclusive ? "at least" : "greater than"} ${String(i.minimum)}${got}`;
    case "too_big":
      if (custom(i)) return `${i.message}${got}`;
      if (i.origin === "array") return `must have at most ${String(i.maximum)} items`;
      if (i.origin === "string") return `must be at most ${String(i.maximum)} characters`;
      return `must be ${i.inclusive ? "at most" : "less than"} ${String(i.maximum)}${got}`;
    case "invalid_value":
      if (i.values && i.values.length === 1) return `must be ${JSON.stringify(i.values[0])}${got}`;
      return `must be one of ${(i.values ?? []).map((v) => JSON.stringify(v)).join(", ")}${got}`;
    case "not_multiple_of":
      return `must be a whole multiple of ${String(i.divisor)}${got}`;
    case "invalid_format":
      if (custom(i)) return `${i.message}${got}`;
      if (i.format === "regex") return `is not in the expected form${got}`;
      return `must be ${article(i.format)}${got}`;
    case "unrecognized_keys":
      return `has unknown field${(i.keys ?? []).length === 1 ? "" : "s"} ${(i.keys ?? []).join(", ")}`;
    default:
      // Our own rules ("must be from 5 to 150 t") say what is wrong; the value given is added when they do not quote it.
      if (custom(i)) return i.message.includes("(got ") || !(typeof i.input === "number" || typeof i.input === "string") ? i.message : `${i.message}${got}`;
      return i.message && i.message !== "Invalid input" ? i.message : `is not valid${got}`;
  }
}

/** A message written for the rule in schemas.ts (they all start "must"), not zod's default. */
function custom(i: RawIssue): boolean {
  return typeof i.message === "string" && i.message.startsWith("must");
}

function article(expected: string | undefined): string {
  switch (expected) {
    case "number":
      return "a number";
    case "int":
      return "a whole number";
    case "string":
      return "text";
    case "boolean":
      return "true or false";
    case "array":
      return "a list";
    case "datetime":
      return "a date and time";
    case "object":
      return "an object";
    default:
      return expected ?? "a value";
  }
}
