/** Readable assistance options, the divided train and margins per rail condition. */
import type { AssistanceReport, ConditionMarginReport, DivideReport, PlanReport } from "../../profiles/report.js";
import { marginNum, num, textTable } from "../table.js";
import { wrap } from "./wrap.js";
import { cli } from "../../i18n/en/cli.js";
import { RAIL_CONDITIONS, type RailCondition } from "../../core/physics/types.js";
import { cliTr, cliWords } from "../lang.js";
import { lineOf } from "../../profiles/lineReport.js";
import { siQuantities } from "../../i18n/renderLines.js";
import { assistanceNoteText } from "../../i18n/renderAssistNote.js";
import type { AssistanceNote } from "../../core/dispatch/assistance.js";

/** The verdict as the printout's headline shows it: "STARTS", "NEEDS ASSISTANCE". */
export function verdictWord(v: PlanReport["verdict"]): string {
  const t = cliTr().ns(cli);
  return v === "starts" ? t("verdictStarts") : v === "marginal" ? t("verdictMarginal") : t("verdictNeedsAssistance");
}

/** A place in words: "at the head", "at the rear", "after wagon 30"; combined places joined with "+". */
export function where(position: string, neutral = false): string {
  const t = neutral ? (k: "atHead" | "atRear" | "afterWagon", p?: { wagon: string }) => (k === "atHead" ? "at the head" : k === "atRear" ? "at the rear" : `after wagon ${p!.wagon}`) : cliTr().ns(cli);
  return position
    .split(" + ")
    .map((p) =>
      p
        .replace(/^(\d+ )?(head|rear)$/, (_m, n: string | undefined, end: string) => `${n ?? ""}${end === "head" ? t("atHead") : t("atRear")}`)
        .replace(/^(\d+ )?after wagon (\d+)$/, (_m, n: string | undefined, wagon: string) => `${n ?? ""}${t("afterWagon", { wagon })}`),
    )
    .join(" + ");
}

/** One option in a line (`neutral`: in English whatever the language, as CSV carries it): "1 × id at the rear"; units in two places: "2 × id (1 after wagon 9, 1 at the rear)". */
export function optionLine(a: AssistanceReport, neutral = false): string {
  if (a.position.includes(" + ")) return `${a.add} (${where(a.position, neutral).split(" + ").join(", ")})`;
  return `${a.add} ${where(a.position, neutral)}`;
}

/** A figure with the decimals it has, in this run's language. */
function asGiven(x: number): string {
  return num(x, Number.isInteger(x) ? 0 : (String(x).split(".")[1]?.length ?? 0));
}

/** The divided train in a line. */
export function divideLine(d: DivideReport): string {
  const t = cliTr().ns(cli);
  const wagons = (n: number) => t("wagons", { count: n });
  return t("divide", { first: wagons(d.firstPart.wagons), firstMass: asGiven(d.firstPart.trailingMass_t), rest: wagons(d.remaining.wagons), restMass: asGiven(d.remaining.trailingMass_t) });
}

/** The "Assistance" section of a plan. */
export function renderAssistance(p: PlanReport): string[] {
  const t = cliTr().ns(cli);
  const lines: string[] = [];
  const s = p.assistanceSearch;
  if (!s && p.assistance.length === 0) return lines;
  lines.push("");
  lines.push(t("assistanceTitle"));
  if (p.assistance.length > 0) {
    lines.push(
      textTable(
        ["#", t("colAdd"), t("colWhere"), t("colVerdict"), t("colPeakPull"), t("colPeakPush"), t("colToTarget")],
        p.assistance.map((a, i) => [
          String(i + 1),
          a.add,
          where(a.position),
          cliWords().verdictInline(a.verdict),
          num(a.peakCouplerForce_kN),
          a.peakCompression_kN === undefined ? "—" : num(a.peakCompression_kN),
          num(a.timeToTarget_s),
        ]),
      )
        .split("\n")
        .map((l) => `  ${l}`)
        .join("\n"),
    );
    p.assistance.forEach((a, i) => {
      const note = a.noteCode ? assistanceNoteText(cliTr(), siQuantities(cliTr()), lineOf<AssistanceNote>(a.noteCode)) : a.note;
      if (note) lines.push(...wrap(`  ${i + 1}. ${note}`, 100, "     "));
    });
  } else {
    lines.push(s ? t("noOptionOf", { profile: s.profile }) : t("noOption"));
  }
  if (p.divide) {
    const d = p.divide;
    lines.push(...wrap(t("otherwise", { divide: divideLine(d), trips: d.trips }) + (d.verdict === "starts" ? t("firstPartStarts", { peak: num(d.peakCouplerForce_kN) }) : ""), 100, "    "));
  }
  if (s) {
    // Grouped by what ruled them out: "coupler: 1 at the head, 2 at the head".
    const groups = new Map<string, string[]>();
    for (const x of s.ruledOut) {
      const key = x.reasons.length > 0 ? x.reasons.map((r) => cliWords().reason(r)).join(t("and")) : cliWords().verdictInline(x.verdict);
      const units = /^(\d+) ×/.exec(x.add)?.[1] ?? x.add;
      groups.set(key, [...(groups.get(key) ?? []), x.position.includes(" + ") ? where(x.position) : `${units} ${where(x.position)}`]);
    }
    for (const [why, list] of groups) lines.push(...wrap(t("ruledOut", { why, list: list.join(", ") }), 100, "    "));
    lines.push(t(s.complete ? "search" : "searchCut", { runs: s.plannerRuns, cap: s.budget }));
  }
  return lines;
}

/** Verdict and margins for every rail condition. */
export function renderConditions(rows: readonly ConditionMarginReport[]): string[] {
  if (rows.length === 0) return [];
  const t = cliTr().ns(cli);
  const w = cliWords();
  return [
    "",
    t("byConditionTitle"),
    ...textTable(
      [t("colRail"), t("colSand"), t("colVerdict"), t("colMargin"), w.reason("adhesion"), w.reason("power"), w.reason("coupler"), t("colLimitedBy")],
      rows.map((m) => [(RAIL_CONDITIONS as readonly string[]).includes(m.rail) ? w.railInline(m.rail as RailCondition) : m.rail, m.sand ? t("yes") : t("no"), w.verdictInline(m.verdict), marginNum(m.margin), marginNum(m.margins.adhesion), marginNum(m.margins.power), marginNum(m.margins.coupler), m.binding ? w.limit(m.binding) : m.limitedBy]),
    )
      .split("\n")
      .map((l) => `  ${l}`),
  ];
}
