/**
 * Field messages on screen: an issue's code and figures in the language on screen, its figures in the
 * user's units ("must be at most 200 mm" reads "must be at most 7.87 in", "höchstens 7,87 in"). Loaded
 * with the draft's checker (state/draftChecker.ts), never before the first plan: the English words come
 * with this module, the Hungarian and German ones as a part of the catalog loaded with it.
 */
import type { FieldCode } from "../i18n/en/fields.js";
import { fields } from "../i18n/en/fields.js";
import type { FieldIssue } from "../profiles/issues.js";
import { figureIn, renderField, type FieldCoded } from "../profiles/issueText.js";
import { readerMessage } from "../i18n/renderReaders.js";
import { fieldOf, type LocalIssue } from "./fields.js";
import { decimalsOf, formatNumber, localiseText, toDisplay, unitSymbol, type MeasureKey, type UnitSystem } from "./format.js";
import { addCatalogPart, tr } from "./i18n.js";

/** Hungarian and German field words, loaded with this module and with every language chosen later. */
export const fieldWords: Promise<void> = addCatalogPart(async (l) => {
  if (l === "hu") return { fields: (await import("../i18n/hu/fields.js")).fieldsHu };
  if (l === "de") return { fields: (await import("../i18n/de/fields.js")).fieldsDe };
  return null;
});

/** The measure of a file's unit symbol as a message gives it (the app converts these). */
const MEASURE_OF_UNIT: Readonly<Record<string, { m: MeasureKey; from: string }>> = {
  t: { m: "mass", from: "t" },
  m: { m: "distance", from: "m" },
  mm: { m: "slack", from: "mm" },
  kN: { m: "force", from: "kN" },
  "km/h": { m: "speed", from: "kmh" },
  "‰": { m: "grade", from: "permille" },
  "°C": { m: "temperature", from: "C" },
};

/** The figures of each code that are quantities in the field's unit (the rest are counts or names). */
const QUANTITIES: Partial<Record<FieldCode, readonly string[]>> = {
  range: ["min", "max"],
  rangeIn: ["min", "max"],
  atLeast: ["min"],
  greaterThan: ["min"],
  atMost: ["max"],
  lessThan: ["max"],
  straightOrRadius: ["min"],
  segmentGap: ["gap", "end"],
  segmentOverlap: ["overlap", "end"],
  perWagon: ["min", "max", "value"],
  groupsMass: ["mass", "value"],
  rearBeforeProfile: ["length", "rear", "start"],
  beyondProfile: ["end"],
};
/** Codes whose figures are limits of a physical range: three significant figures rather than the field's decimals. */
const PRECISE: ReadonlySet<FieldCode> = new Set(["range", "rangeIn", "perWagon"]);

/** `v` with at most `d` decimals and no trailing zeros ("60", "7.87"), in the language on screen. */
function trimmed(v: number, d: number): string {
  const r = Number(v.toFixed(d));
  let k = 0;
  while (k < d && Number(r.toFixed(k)) !== r) k++;
  return formatNumber(v, k);
}

const t = tr.ns(fields);

/** The label of the field at `path` in the language on screen. */
export function fieldLabel(path: string): string {
  const f = fieldOf(path);
  return f ? t(f.label) : path || t("labelTheCase");
}

/**
 * The issue as the user should read it, in the language on screen: bounds and the value given in the
 * display units of the field, and "must be a number" for text that is not one. An issue without a code
 * (a message written as text) keeps its words, its figures put in the user's units.
 */
export function localiseIssue(issue: FieldIssue, system: UnitSystem): LocalIssue {
  const label = fieldLabel(issue.path);
  // A reader's message (a notes file, a reference train) or the work cap's refusal: its own words.
  if (issue.reader) return { ...issue, message: readerMessage(tr, issue.reader), label };
  if (!issue.code) return { ...legacyLocaliseIssue(issue, system), label };
  const c: FieldCoded = { code: issue.code, ...(issue.figures ? { figures: issue.figures } : {}), ...(issue.got !== undefined ? { got: issue.got } : {}) };
  const notANumber = c.got === "NaN" || c.got === "null" || ((c.code === "mustBe" || c.code === "required") && c.figures?.expected === "number");
  if (notANumber) return { path: issue.path, message: renderField(t, (x) => figureIn(tr, x), { code: "mustBe", figures: { expected: "number" } }), code: "mustBe", label };
  return { ...issue, message: renderField(t, (x) => figureIn(tr, x), inUserUnits(issue.path, c, system)), label };
}

/** The code with its quantities (and the value given) in the user's units, as text. */
function inUserUnits(path: string, c: FieldCoded, system: UnitSystem): FieldCoded {
  const f = fieldOf(path);
  const given = c.figures?.unit;
  const byUnit = typeof given === "string" ? MEASURE_OF_UNIT[given] : undefined;
  // The field's own measure when the unit is the field's (a radius shows as a radius), else the unit's.
  const field = f?.measure && f.fileUnit && (!byUnit || byUnit.from === f.fileUnit) ? { m: f.measure, from: f.fileUnit } : undefined;
  const u = field ?? byUnit;
  if (!u || (given !== undefined && !byUnit)) return c;
  const sym = unitSymbol(u.m, system);
  const precise = PRECISE.has(c.code);
  const show = (x: number) => {
    const v = toDisplay(u.m, x, u.from, system);
    const d = precise ? Math.max(0, 2 - Math.floor(Math.log10(Math.abs(v) || 1))) : u.m === "distance" && Math.abs(v) < 10 ? 1 : decimalsOf(u.m, system);
    return trimmed(v, d);
  };
  // A rule that names no unit of its own ("at least 0") gets the field's after each figure; a bare range
  // reads as a range in the unit ("from 5 to 60,000 t").
  const bare = given === undefined;
  const code: FieldCode = c.code === "range" && bare ? "rangeIn" : c.code;
  const figures: Record<string, string | number> = { ...(c.figures ?? {}) };
  for (const k of QUANTITIES[c.code] ?? []) {
    const x = figures[k];
    if (typeof x === "number") figures[k] = bare && code !== "rangeIn" ? `${show(x)} ${sym}` : show(x);
  }
  if (given !== undefined || code !== c.code) figures.unit = sym;
  const out: FieldCoded = { code, figures };
  if (c.got !== undefined) out.got = typeof c.got === "number" ? `${trimmed(toDisplay(u.m, c.got, u.from, system), decimalsOf(u.m, system))} ${sym}` : c.got;
  return out;
}

const NUM = "(-?\\d+(?:\\.\\d+)?(?:e[-+]?\\d+)?)";
// A bound may be followed by the file's own unit (" m"), which the display unit replaces.
const BOUND = new RegExp(`\\b(at least|at most|greater than|less than) ${NUM}(?: (?:mm|m|kN|t|km/h|‰|°C)(?![\\w/]))?`, "g");
const GOT = new RegExp(`\\(got ${NUM}\\)`, "g");
// A range with the file's unit after it ("from 5 to 60000 t"), and a figure per wagon ("(got 0.5 t per wagon").
const RANGE = new RegExp(`\\bfrom ${NUM} to ${NUM}(?: (?:mm|m|kN|t|km/h|‰|°C)(?![\\w/]))?`, "g");
const PER_WAGON = new RegExp(`\\(got ${NUM} (?:t|m) per wagon`, "g");

/**
 * An issue written as text (no code) as the user should read it: bounds and the value given in the display
 * units of the field, and "must be a number" for text that is not one.
 */
export function legacyLocaliseIssue(issue: FieldIssue, system: UnitSystem): FieldIssue {
  if (/\(got NaN\)|got null\)|must be a number \(got/.test(issue.message) || /is required \(a number\)/.test(issue.message)) {
    return { ...issue, message: "must be a number" };
  }
  const f = fieldOf(issue.path);
  // Rules without a unit of their own may still quote figures ("the 438 m train").
  if (!f?.measure || !f.fileUnit) return { ...issue, message: localiseText(issue.message, system) };
  const m = f.measure;
  const unit = f.fileUnit;
  // Rounded as the field shows it, without trailing zeros ("60 ‰", "7.87 in").
  const shown = (x: string) => `${formatNumber(toDisplay(m, Number(x), unit, system), decimalsOf(m, system)).replace(/(\.\d*?)0+$/, "$1").replace(/\.$/, "")} ${unitSymbol(m, system)}`;
  // A figure per wagon may be small: three significant figures rather than the field's decimals.
  const precise = (x: string) => {
    const v = toDisplay(m, Number(x), unit, system);
    const decimals = Math.max(0, 2 - Math.floor(Math.log10(Math.abs(v) || 1)));
    return `${formatNumber(v, decimals).replace(/(\.\d*?)0+$/, "$1").replace(/\.$/, "")} ${unitSymbol(m, system)}`;
  };
  const message = issue.message
    .replace(RANGE, (_all, a: string, b: string) => `from ${precise(a).slice(0, -(unitSymbol(m, system).length + 1))} to ${precise(b)}`)
    .replace(PER_WAGON, (_all, x: string) => `(got ${precise(x)} per wagon`)
    .replace(BOUND, (_all, word: string, x: string) => `${word} ${shown(x)}`)
    .replace(GOT, (_all, x: string) => `(got ${shown(x)})`);
  return { ...issue, message };
}
