/**
 * A reader's message in words (src/i18n/en/readers.ts): a code with its figures — counts, line numbers,
 * ids and file kinds as the file gives them — and the work cap's refusal, whose figures come in SI from
 * the core (core/planner/workCap.ts) and are written here: large counts as "5.0 × 10^8", the step in the
 * time unit that reads best (ms, µs, ns), the lightest mass in t, kg or g. One renderer for the English the
 * readers carry, the command line and the app.
 */
import type { PlanWorkProblem } from "../core/planner/workCap.js";
import { readers, type ReaderCode } from "./en/readers.js";
import type { Translator } from "./translator.js";

/** Codes that are words inside other messages, never a message of their own. */
type Part = "workCap" | "withoutEnd" | "noteWithoutName" | "bundleHolds" | "bundleNote" | "bundleNoteNamed" | "rowLine";

/**
 * A reader's message as data: its code and figures (text as it is; numbers in the language's digits). A
 * note without a name is said in words; a refused bundle names its bad notes by number (and name).
 */
export type ReaderCoded =
  | { [K in Exclude<ReaderCode, Part | "bundleBad" | "noteNotValid">]: { code: K; figures?: Readonly<Record<string, string | number>> } }[Exclude<ReaderCode, Part | "bundleBad" | "noteNotValid">]
  | { code: "noteNotValid"; figures?: { name: string } }
  | { code: "bundleBad"; notes: number; named: ReadonlyArray<{ number: number; name?: string }> };

/** The message of a reader's code. */
export function readerText(tr: Translator, c: ReaderCoded): string {
  const t = tr.ns(readers);
  switch (c.code) {
    case "noteNotValid":
      return t("noteNotValid", { name: c.figures?.name ?? t("noteWithoutName") });
    case "bundleBad": {
      const named = c.named.map((n) => (n.name === undefined ? t("bundleNote", { number: n.number }) : t("bundleNoteNamed", { number: n.number, name: n.name })));
      return `${t("bundleHolds", { count: c.notes })}; ${t("bundleBad", { count: c.named.length, named: named.join(", ") })}`;
    }
    default:
      return (t as (k: string, p?: Readonly<Record<string, string | number>>) => string)(c.code, c.figures);
  }
}

/** Two significant figures, in the language's digits (4.2, 42, 0.5). */
function sig2(tr: Translator, x: number): string {
  const v = Number(x.toPrecision(2));
  const s = String(v);
  return tr.num(v, /e/.test(s) ? 2 : (s.split(".")[1]?.length ?? 0));
}

/** A count in scientific form ("5.0 × 10^8"), or "without end". */
function sci(tr: Translator, x: number): string {
  if (!Number.isFinite(x)) return tr.ns(readers)("withoutEnd");
  const [m, e] = x.toExponential(1).split("e");
  return `${tr.num(Number(m), 1)} × 10^${e!.replace(/^\+/, "")}`;
}

/** A short time in the unit that reads best: ms, µs or ns. */
function duration(tr: Translator, s: number): string {
  return s >= 1e-4 ? `${sig2(tr, s * 1000)} ms` : s >= 1e-7 ? `${sig2(tr, s * 1e6)} µs` : `${sig2(tr, s * 1e9)} ns`;
}

/** A mass in the unit that reads best: t, kg or g. */
function mass(tr: Translator, kg: number): string {
  return kg >= 1000 ? `${sig2(tr, kg / 1000)} t` : kg >= 1 ? `${sig2(tr, kg)} kg` : `${sig2(tr, kg * 1000)} g`;
}

/** Why a case is refused for its work (the core's figures in SI). */
export function workCapText(tr: Translator, w: PlanWorkProblem): string {
  return tr.ns(readers)("workCap", {
    steps: sci(tr, w.vehicleSteps),
    vehicles: w.vehicles,
    step: duration(tr, w.stepS),
    lightest: mass(tr, w.lightestKg),
    cap: sci(tr, w.capVehicleSteps),
  });
}

/** A reader's message or the work cap's refusal, as an issue carries it. */
export function readerMessage(tr: Translator, r: ReaderCoded | PlanWorkProblem): string {
  return r.code === "work-cap" ? workCapText(tr, r) : readerText(tr, r);
}
