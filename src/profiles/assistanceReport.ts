/**
 * The assistance search, margins per rail condition and load tables in the output shape: units in field
 * names, rounded for people and scripts (INTERFACE.md: add fields freely, never rename).
 */
import type { AssistanceOption, AssistanceResult, RejectedOption } from "../core/dispatch/assistance.js";
import type { AddedUnits } from "../core/dispatch/assistPlacement.js";
import type { ConditionMargin } from "../core/dispatch/conditionMargins.js";
import type { DividedTrain } from "../core/dispatch/divideTrain.js";
import type { LoadTableRow } from "../core/dispatch/loadTable.js";
import { splitName } from "../i18n/renderLines.js";
import { assistanceNoteText } from "../i18n/renderAssistNote.js";
import { ENGLISH, ENGLISH_SI, lineReport } from "./lineReport.js";
import { r, type AssistanceReport, type AssistanceSearchReport, type ConditionMarginReport, type DivideReport } from "./report.js";

const kN = (n: number): number => r(n / 1000, 1);
const t = (kg: number): number => Math.floor(kg / 1000);

/** "1 × id" for the units added. */
export function addWords(added: readonly AddedUnits[], profile: string): string {
  const n = added.reduce((s, a) => s + a.count, 0);
  return `${n} × ${profile}`;
}

/** "rear", "head", "after wagon 30"; for units in more than one place, with counts: "1 after wagon 30 + 1 rear". */
export function positionText(added: readonly AddedUnits[]): string {
  const word = (a: AddedUnits) => (typeof a.position === "string" ? a.position : `after wagon ${a.position.afterWagon}`);
  if (added.length === 1) return word(added[0]!);
  return added.map((a) => `${a.count} ${word(a)}`).join(" + ");
}

export function optionReport(o: AssistanceOption, profile: string): AssistanceReport {
  const couplings = o.plan?.couplerCompressionPeaksN.length ?? 0;
  return {
    add: addWords(o.added, profile),
    position: positionText(o.added),
    verdict: o.verdict,
    peakCouplerForce_kN: kN(o.peakCouplerForceN),
    timeToTarget_s: o.timeToTargetS === null ? null : r(o.timeToTargetS, 0),
    peakCompression_kN: kN(o.peakCompressionN),
    reasons: o.reasons,
    margin: r(o.margin, 3),
    units: o.units,
    locomotives: o.added.map((a) => {
      const entry = o.case.locomotives[o.case.locomotives.length - o.added.length + o.added.indexOf(a)];
      return { profile, count: a.count, position: typeof a.position === "string" ? a.position : { afterWagon: a.position.afterWagon }, ...(entry?.control ? { control: entry.control } : {}) };
    }),
    peakCompressionAt: { coupling: o.peakCompressionAt + 1, of: couplings },
    headCompression_kN: kN(o.headCompressionN),
    note: assistanceNoteText(ENGLISH, ENGLISH_SI, o.note),
    noteCode: lineReport(o.note),
    effortSplit: o.effortSplit.map((g) => ({ name: splitName(ENGLISH, g.place), place: g.place, notch: g.notch, share: r(g.share, 3) })),
  };
}

export function divideReport(d: DividedTrain): DivideReport {
  return {
    firstPart: { wagons: d.wagons, trailingMass_t: t(d.trailingMassKg), length_m: r(d.lengthM, 0) },
    remaining: { wagons: d.remainingWagons, trailingMass_t: Math.ceil(d.remainingMassKg / 1000) },
    trips: d.trips,
    maxParts: d.maxParts,
    verdict: d.plan ? d.plan.verdict : null,
    peakCouplerForce_kN: d.plan ? kN(d.plan.peakCouplerForceN) : null,
    timeToTarget_s: d.plan && d.plan.timeToTargetS !== null ? r(d.plan.timeToTargetS, 0) : null,
  };
}

function ruledOut(x: RejectedOption, profile: string): AssistanceSearchReport["ruledOut"][number] {
  return { add: addWords(x.added, profile), position: positionText(x.added), verdict: x.verdict, reasons: x.reasons, by: x.by };
}

/** The search in report form: options cheapest first, the divided train when nothing works, and the search's extent. */
export function assistanceReport(a: AssistanceResult, budget: number): { assistance: AssistanceReport[]; divide: DivideReport | null; search: AssistanceSearchReport } {
  const profile = a.spec.id;
  return {
    assistance: a.options.map((o) => optionReport(o, profile)),
    divide: a.divide && a.divide.wagons > 0 ? divideReport(a.divide) : null,
    search: { profile, plannerRuns: a.plannerRuns, budget, complete: a.complete, ruledOut: a.rejected.map((x) => ruledOut(x, profile)) },
  };
}

export function conditionMarginReport(m: ConditionMargin): ConditionMarginReport {
  const round = (x: number) => r(x, 3);
  return {
    rail: m.rail,
    sand: m.sand,
    verdict: m.verdict,
    reasons: m.reasons,
    margin: round(m.margin),
    margins: { adhesion: round(m.margins.adhesion), power: round(m.margins.power), coupler: round(m.margins.coupler), distance: round(m.margins.distance), brake: round(m.margins.brake) },
    limitedBy: m.limitedBy,
    binding: m.binding,
  };
}

/** A load-table row in the output shape: whole tonnes, rounded down (the table never claims more). */
export function loadTableRowReport(row: LoadTableRow): { rail: string; sand: boolean; maxTrailingMass_t: number } {
  return { rail: row.rail, sand: row.sand, maxTrailingMass_t: t(row.maxTrailingMassKg) };
}
