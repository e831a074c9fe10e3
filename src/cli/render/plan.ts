/** The readable form of a plan: verdict first, then the figures and a numbered step table. */
import type { PlanReport } from "../../profiles/report.js";
import { num, pct, textTable } from "../table.js";

const VERDICT_WORDS: Record<PlanReport["verdict"], string> = {
  starts: "STARTS",
  marginal: "MARGINAL",
  "needs-assistance": "NEEDS ASSISTANCE",
};

export function renderPlan(p: PlanReport): string {
  const lines: string[] = [];
  if (p.case.label) lines.push(p.case.label);
  lines.push(`Verdict: ${VERDICT_WORDS[p.verdict]}${p.reasons.length ? ` (limited by ${p.reasons.join(", ")})` : ""}   margin ${num(p.margin, 2)}`);
  lines.push(
    `Resistance at start: ${num(p.resistance_kN.total)} kN  (breakaway ${num(p.resistance_kN.starting)} + running ${num(p.resistance_kN.running)} + grade ${num(p.resistance_kN.grade)} + curve ${num(p.resistance_kN.curve)})`,
  );
  lines.push(
    `Adhesion: μ ${num(p.adhesion.mu, 3)} median, ${num(p.adhesion.muDesign, 3)} at ${pct(p.adhesion.slipRiskThreshold)} slip risk → ${num(p.adhesion.maxTractiveEffort_kN)} kN; needed ${num(p.adhesion.requiredTractiveEffort_kN)} kN (slip risk ${pct(p.adhesion.slipRiskAtStart, 1)})`,
  );
  lines.push(`Largest trailing mass that starts here: ${num(p.maxStartableMass_t)} t`);
  if (p.timeToTarget_s !== null) lines.push(`Time to target: ${num(p.timeToTarget_s)} s   peak coupler force ${num(p.peakCouplerForce_kN)} kN`);
  if (p.steps.length > 0) {
    lines.push("");
    lines.push(
      textTable(
        ["#", "phase", "notch", "advance when", "speed km/h", "TE kN", "adhesion", "slip risk", "coupler kN", "if slip", "why"],
        p.steps.map((s, i) => [
          String(i + 1),
          s.phase,
          String(s.notch),
          advance(s.advanceWhen),
          num(s.speed_kmh, 1),
          num(s.tractiveEffort_kN),
          pct(s.adhesionUse),
          pct(s.slipRisk, 1),
          num(s.peakCouplerForce_kN),
          String(s.fallbackNotch),
          s.why,
        ]),
      ),
    );
  }
  if (p.assistance.length > 0) {
    lines.push("");
    lines.push("Assistance options:");
    for (const a of p.assistance) lines.push(`  ${a.add} at ${a.position}: ${VERDICT_WORDS[a.verdict].toLowerCase()}, peak coupler ${num(a.peakCouplerForce_kN)} kN`);
  }
  lines.push("");
  lines.push("Cautions:");
  for (const c of p.cautions) lines.push(`  - ${c}`);
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
