/** The readable form of a plan: verdict first, then the figures and a numbered step table. */
import type { PlanReport } from "../../profiles/report.js";
import { LIMIT_WORDS, type LimitName } from "../../core/planner/outcome.js";
import { num, pct, textTable } from "../table.js";
import { renderAssistance, renderConditions, VERDICT_WORDS } from "./assistance.js";
import { wrap } from "./wrap.js";
import { describeOverrides } from "../caseOverrides.js";
import { printable } from "../../profiles/text.js";

export { wrap };

export function renderPlan(p: PlanReport): string {
  const lines: string[] = [];
  if (p.case.label) lines.push(printable(p.case.label));
  if (p.case.overrides && Object.keys(p.case.overrides).length > 0) lines.push(`Changed from the case file: ${describeOverrides(p.case.overrides)}`);
  lines.push(`Verdict: ${VERDICT_WORDS[p.verdict]}   ${marginText(p.margin, p.binding)}${p.startKind === "gravity" ? "   (brake-controlled start: gravity starts the train)" : ""}`);
  lines.push(
    `Resistance at start: ${num(p.resistance_kN.total)} kN  (breakaway ${num(p.resistance_kN.starting)} + running ${num(p.resistance_kN.running)} + grade ${num(p.resistance_kN.grade)} + curve ${num(p.resistance_kN.curve)})`,
  );
  lines.push(
    `Adhesion: μ ${num(p.adhesion.mu, 3)} median, ${num(p.adhesion.muDesign, 3)} at ${pct(p.adhesion.slipRiskThreshold)} slip risk → ${num(p.adhesion.maxTractiveEffort_kN)} kN; needed ${num(p.adhesion.requiredTractiveEffort_kN)} kN (slip risk ${pct(p.adhesion.slipRiskAtStart, 1)})`,
  );
  const atCeiling = p.massSearchCeiling_t !== undefined && p.maxStartableMass_t >= p.massSearchCeiling_t;
  lines.push(
    `Largest trailing mass that starts here: ${atCeiling ? `no limit up to ${num(p.maxStartableMass_t)} t (250 t a wagon)` : p.maxStartableMass_t > 0 ? `${num(p.maxStartableMass_t)} t` : "none"}${p.largestMarginalMass_t !== undefined && p.largestMarginalMass_t > p.maxStartableMass_t ? `; at least marginal up to ${num(p.largestMarginalMass_t)} t` : ""}`,
  );
  if (p.limits && p.limits.length > 0) {
    lines.push("");
    lines.push("Limits (margin = allowance ÷ demand; starts when every one is at least 1):");
    lines.push(
      textTable(
        ["limit", "margin", "", "what"],
        p.limits.map((l) => [LIMIT_WORDS[l.name], num(l.margin, 2), l.level === "within" ? "ok" : l.level === "soft" ? "marginal" : "over", l.what]),
      )
        .split("\n")
        .map((x) => `  ${x}`)
        .join("\n"),
    );
  }
  if (p.stretch && p.stretch.lastVehicleMoves_s !== null) {
    lines.push(`Stretch: last vehicle moves ${num(p.stretch.lastVehicleMoves_s, 0)} s after taking power, after ${num(p.stretch.locoTravelToStretch_m, 1)} m of locomotive travel`);
  }
  if (p.steps.length > 0) {
    lines.push(`Time to target: ${p.timeToTarget_s === null ? "not reached" : `${num(p.timeToTarget_s)} s from taking power`}   peak coupler force ${num(p.peakCouplerForce_kN)} kN`);
  }
  if (p.steps.length > 0) {
    lines.push("");
    lines.push(
      textTable(
        ["#", "phase", "notch", "advance when", "km/h", "TE kN", "adhesion", "slip risk", "coupler kN", "still slipping"],
        p.steps.map((s, i) => [
          String(i + 1),
          s.phase,
          String(s.notch),
          advance(s.advanceWhen),
          num(s.speed_kmh, 1),
          num(s.tractiveEffort_kN),
          s.adhesionUseAt_kmh !== undefined ? `${pct(s.adhesionUse)} @${num(s.adhesionUseAt_kmh, 1)}` : pct(s.adhesionUse),
          `${pct(s.slipRisk, 1)}${s.protectionActs ? " *" : ""}`,
          num(s.peakCouplerForce_kN),
          s.notch === 0 ? "—" : `notch ${s.fallbackNotch}`,
        ]),
      ),
    );
    lines.push(...wrap("km/h and TE kN: at the end of each step. adhesion: the step's highest share of the median adhesion, reached at the speed after @ (km/h). coupler kN: the step's peak, against the allowance (limit ÷ safety factor).", 100, ""));
    if (p.steps.some((s) => s.protectionActs)) lines.push("* the notch asks for more than the rail may give: the slip protection is expected to act in this step.");
    lines.push("");
    lines.push("Why:");
    p.steps.forEach((s, i) => lines.push(...wrap(`${i + 1}. ${s.why}`, 100, "   ")));
  } else if (p.verdict === "needs-assistance") {
    lines.push("");
    lines.push("No notch sequence is offered: this train should not be started here as it stands.");
  }
  if (p.advice && p.advice.length > 0) {
    lines.push("");
    for (const a of p.advice) lines.push(...wrap(a, 100, "  "));
  }
  if (p.ifWheelsSlip && p.steps.some((s) => s.notch > 0)) {
    lines.push("");
    lines.push("If wheels slip:");
    lines.push(...wrap("  In every step, hold its notch while the protection acts; only if the slip keeps returning, drop to the notch in the table's \"still slipping\" column.", 100, "  "));
    lines.push("  What you do, in order:");
    p.ifWheelsSlip.driver.forEach((t, i) => lines.push(...wrap(`  ${i + 1}. ${t}`, 100, "     ")));
    lines.push("  Why you hold — what the locomotive does:");
    for (const t of p.ifWheelsSlip.protection) lines.push(...wrap(`  - ${t}`, 100, "    "));
    lines.push("  If the train stalls:");
    for (const t of p.ifWheelsSlip.stall) lines.push(...wrap(`  - ${t}`, 100, "    "));
  }
  lines.push(...renderAssistance(p));
  lines.push(...renderConditions(p.byCondition ?? []));
  lines.push("");
  lines.push("Cautions:");
  for (const c of p.cautions) lines.push(...wrap(`  - ${c}`, 100, "    "));
  return lines.join("\n");
}

function advance(a: PlanReport["steps"][number]["advanceWhen"]): string {
  switch (a.primary) {
    case "moved":
      return `moved ${num(a.moved_m, 1)} m`;
    case "speed":
      return `${num(a.speed_kmh, 1)} km/h`;
    case "target":
      return "target";
    default:
      return `after ${num(a.after_s)} s`;
  }
}

/** "margin 0.93 (adhesion)": the binding limit's margin, named. */
export function marginText(margin: number, binding?: LimitName): string {
  return `margin ${num(margin, 2)}${binding ? ` (${LIMIT_WORDS[binding]})` : ""}`;
}
