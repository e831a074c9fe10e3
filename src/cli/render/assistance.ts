/** Readable assistance options, the divided train and margins per rail condition. */
import type { AssistanceReport, ConditionMarginReport, DivideReport, PlanReport } from "../../profiles/report.js";
import { num, textTable } from "../table.js";
import { wrap } from "./wrap.js";
import { LIMIT_WORDS } from "../../core/planner/outcome.js";

export const VERDICT_WORDS: Record<PlanReport["verdict"], string> = {
  starts: "STARTS",
  marginal: "MARGINAL",
  "needs-assistance": "NEEDS ASSISTANCE",
};

/** A place in words: "at the head", "at the rear", "after wagon 30"; combined places joined with "+". */
export function where(position: string): string {
  return position
    .split(" + ")
    .map((p) => p.replace(/^(\d+ )?(head|rear)$/, (_m, n: string | undefined, end: string) => `${n ?? ""}at the ${end}`))
    .join(" + ");
}

/** One option in a line: "1 × id at the rear"; units in two places: "2 × id (1 after wagon 9, 1 at the rear)". */
export function optionLine(a: AssistanceReport): string {
  if (a.position.includes(" + ")) return `${a.add} (${where(a.position).split(" + ").join(", ")})`;
  return `${a.add} ${where(a.position)}`;
}

/** The divided train in a line. */
export function divideLine(d: DivideReport): string {
  const wagons = (n: number) => `${n} wagon${n === 1 ? "" : "s"}`;
  return `divide the train: first ${wagons(d.firstPart.wagons)} (${d.firstPart.trailingMass_t} t), ${wagons(d.remaining.wagons)} (${d.remaining.trailingMass_t} t) left`;
}

/** The "Assistance" section of a plan. */
export function renderAssistance(p: PlanReport): string[] {
  const lines: string[] = [];
  const s = p.assistanceSearch;
  if (!s && p.assistance.length === 0) return lines;
  lines.push("");
  lines.push("Assistance options:");
  if (p.assistance.length > 0) {
    lines.push(
      textTable(
        ["#", "add", "where", "verdict", "peak pull kN", "peak push kN", "to target s"],
        p.assistance.map((a, i) => [
          String(i + 1),
          a.add,
          where(a.position),
          VERDICT_WORDS[a.verdict].toLowerCase(),
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
      if (a.note) lines.push(...wrap(`  ${i + 1}. ${a.note}`, 100, "     "));
    });
  } else {
    lines.push(`  No option with one or two more units${s ? ` of ${s.profile}` : ""} makes this train start.`);
  }
  if (p.divide) {
    const d = p.divide;
    lines.push(...wrap(`  Otherwise ${divideLine(d)}; about ${d.trips} trips in all.${d.verdict === "starts" ? ` The first part starts (peak coupler ${num(d.peakCouplerForce_kN)} kN).` : ""}`, 100, "    "));
  }
  if (s) {
    // Grouped by what ruled them out: "coupler: 1 at the head, 2 at the head".
    const groups = new Map<string, string[]>();
    for (const x of s.ruledOut) {
      const key = x.reasons.length > 0 ? x.reasons.join(" and ") : VERDICT_WORDS[x.verdict].toLowerCase();
      const units = /^(\d+) ×/.exec(x.add)?.[1] ?? x.add;
      groups.set(key, [...(groups.get(key) ?? []), x.position.includes(" + ") ? where(x.position) : `${units} ${where(x.position)}`]);
    }
    for (const [why, list] of groups) lines.push(...wrap(`  Ruled out by ${why}: ${list.join(", ")}.`, 100, "    "));
    lines.push(`  Search: ${s.plannerRuns} planner runs (cap ${s.budget})${s.complete ? "" : "; the cap cut it short"}.`);
  }
  return lines;
}

/** Verdict and margins for every rail condition. */
export function renderConditions(rows: readonly ConditionMarginReport[]): string[] {
  if (rows.length === 0) return [];
  return [
    "",
    "By rail condition (margin = allowance ÷ demand of the limit that binds):",
    ...textTable(
      ["rail", "sand", "verdict", "margin", "adhesion", "power", "coupler", "limited by"],
      rows.map((m) => [m.rail, m.sand ? "yes" : "no", VERDICT_WORDS[m.verdict].toLowerCase(), num(m.margin, 2), num(m.margins.adhesion, 2), num(m.margins.power, 2), num(m.margins.coupler, 2), m.binding ? LIMIT_WORDS[m.binding] : m.limitedBy]),
    )
      .split("\n")
      .map((l) => `  ${l}`),
  ];
}
