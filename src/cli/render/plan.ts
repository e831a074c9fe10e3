/** The readable form of a plan: verdict first, then the figures and a numbered step table. */
import { cautionOf, type PlanReport } from "../../profiles/report.js";
import { cautionText } from "../../i18n/render.js";
import type { LimitName } from "../../core/planner/outcome.js";
import { cli } from "../../i18n/en/cli.js";
import { cliTr, cliWords } from "../lang.js";
import { marginNum, num, pct, textTable } from "../table.js";
import { renderAssistance, renderConditions, verdictWord } from "./assistance.js";
import { wrap } from "./wrap.js";
import { partsSummingTo } from "../../i18n/rounding.js";
import { describeOverrides } from "../caseOverrides.js";
import { printable } from "../../profiles/text.js";
import { lineOf } from "../../profiles/lineReport.js";
import { groupName, helperCallText, percent, siQuantities, stepWhyText } from "../../i18n/renderLines.js";
import { adviceText, limitWhatText, vehicleText } from "../../i18n/renderAdvice.js";
import { slipGuidanceText } from "../../i18n/renderSlip.js";
import { steps as stepWords } from "../../i18n/en/steps.js";
import { slipHeadline } from "../../core/planner/slip.js";
import { advice as adviceWords } from "../../i18n/en/advice.js";
import type { AdviceLine, GroupPlace, HelperCall, LimitWhat, StepWhy, VehicleRef } from "../../core/planner/lines.js";

export { wrap };

export function renderPlan(p: PlanReport): string {
  const t = cliTr().ns(cli);
  const w = cliWords();
  const rs = cliTr().ns(adviceWords);
  // The planner's lines in this run's language, from the codes the report carries beside its English text.
  const q = siQuantities(cliTr());
  const group = (g: { name: string; place?: GroupPlace }) => (g.place ? groupName(cliTr(), g.place) : g.name);
  const lines: string[] = [];
  if (p.case.label) lines.push(printable(p.case.label));
  if (p.case.overrides && Object.keys(p.case.overrides).length > 0) lines.push(t("changedFromCase", { what: describeOverrides(p.case.overrides) }));
  lines.push(t("verdictLine", { verdict: verdictWord(p.verdict), margin: marginText(p.margin, p.binding) }) + (p.startKind === "gravity" ? t("gravityStart") : ""));
  const r = p.resistance_kN;
  // The parts rounded so that they add up to the total printed beside them.
  const [starting, running, grade, curve] = partsSummingTo([r.starting, r.running, r.grade, r.curve]);
  lines.push(t("resistance", { total: num(r.total), starting: num(starting), running: num(running), grade: num(grade), curve: num(curve) }));
  const a = p.adhesion;
  lines.push(
    t("adhesion", { mu: num(a.mu, 3), muDesign: num(a.muDesign, 3), threshold: pct(a.slipRiskThreshold), max: num(a.maxTractiveEffort_kN), needed: num(r.total), risk: pct(a.slipRiskAtStart, 1) }),
  );
  const atCeiling = p.massSearchCeiling_t !== undefined && p.maxStartableMass_t >= p.massSearchCeiling_t;
  const largest = atCeiling ? t("largestMassNoLimit", { mass: num(p.maxStartableMass_t) }) : p.maxStartableMass_t > 0 ? t("largestMassValue", { mass: num(p.maxStartableMass_t) }) : t("largestMassNone");
  const marginalTo = p.largestMarginalMass_t !== undefined && p.largestMarginalMass_t > p.maxStartableMass_t ? t("largestMarginal", { mass: num(p.largestMarginalMass_t) }) : "";
  // The train's own trailing mass beside the largest masses: starts ⇔ it is at most the largest startable.
  const train = num(p.trailingMass_t, Number.isInteger(p.trailingMass_t) ? 0 : 1);
  lines.push(t("massesLine", { train, largest, marginal: marginalTo }) + (p.massSearchScales ? rs("scalingLoads") : ""));
  if (p.limits && p.limits.length > 0) {
    lines.push("");
    lines.push(t("limitsTitle"));
    lines.push(
      textTable(
        [t("colLimit"), t("colMargin"), "", t("colWhat")],
        p.limits.map((l) => [w.limit(l.name), marginNum(l.margin), l.level === "within" ? t("levelOk") : l.level === "soft" ? t("levelMarginal") : t("levelOver"), l.whatCode ? limitWhatText(cliTr(), q, lineOf<LimitWhat>(l.whatCode)) : l.what]),
      )
        .split("\n")
        .map((x) => `  ${x}`)
        .join("\n"),
    );
  }
  if (p.stretch && p.stretch.lastVehicleMoves_s !== null) {
    // Printed as the report carries them (0.1 s, 0.01 m), as `taut simulate` prints them: rounding the
    // report's 0.25 m again read "0.3 m" beside the stretch step's "about 0.2 m" (0.246 m).
    lines.push(t("stretch", { time: num(p.stretch.lastVehicleMoves_s, 1), travel: num(p.stretch.locoTravelToStretch_m, 2) }));
  }
  if (p.wheelClimb) {
    const w = p.wheelClimb;
    const vehicle = w.vehicleCode ? vehicleText(cliTr(), q, lineOf<VehicleRef>(w.vehicleCode)) : w.vehicle;
    lines.push(rs("wheelClimbLine", { ratio: num(w.ratio, 2), vehicle, force: `${num(w.buff_kN)} kN`, radius: `${num(w.curveRadius_m)} m`, allowance: num(w.allowance, 2), nadal: num(w.nadalLimit, 2) }));
  }
  // A marginal plan is made on the rail at the marginal bound, not the threshold the limits judge: say which
  // rail the steps, the time to target and the peak belong to, so they cannot be read against the limits.
  const planQ = p.planAdhesionQuantile;
  if (p.steps.length > 0 && planQ !== undefined && Math.abs(planQ - p.adhesion.slipRiskThreshold) > 1e-9) {
    lines.push(...wrap(t("planRail", { plan: railQuantile(planQ), threshold: railQuantile(p.adhesion.slipRiskThreshold) }), 100, ""));
  }
  if (p.steps.length > 0) {
    lines.push(t("timeToTarget", { time: p.timeToTarget_s === null ? t("targetNotReached") : t("targetAfter", { time: num(p.timeToTarget_s) }), peak: num(p.peakCouplerForce_kN) }));
  }
  if (p.steps.length > 0) {
    // A step the slip protection acts in is marked " *"; the others keep room for the mark, so the figures line up.
    const marked = p.steps.some((s) => s.protectionActs);
    lines.push("");
    lines.push(
      textTable(
        ["#", t("colPhase"), t("colNotch"), t("colAdvance"), "km/h", t("colTe"), t("colAdhesion"), t("colSlipRisk"), t("colCoupler"), t("colStillSlipping")],
        p.steps.map((s, i) => [
          String(i + 1),
          w.phaseInline(s.phase),
          s.groups ? s.groups.map((g) => `${group(g)} ${g.notch}`).join(" · ") : String(s.notch),
          advance(s.advanceWhen),
          num(s.speed_kmh, 1),
          num(s.tractiveEffort_kN),
          s.adhesionUseAt_kmh !== undefined ? `${pct(s.adhesionUse)} @${num(s.adhesionUseAt_kmh, 1)}` : pct(s.adhesionUse),
          // Whole percent, as the step's why line gives it (rounding.ts wholePercent).
          `${pct(s.slipRisk)}${s.protectionActs ? " *" : marked ? "  " : ""}`,
          num(s.peakCouplerForce_kN),
          stillSlipping(s),
        ]),
      ),
    );
    lines.push(...wrap(t("stepsNote"), 100, ""));
    if (p.steps.some((s) => s.protectionActs)) lines.push(t("protectionNote"));
    lines.push("");
    lines.push(t("why"));
    p.steps.forEach((s, i) => {
      lines.push(...wrap(`${i + 1}. ${s.whyCode ? stepWhyText(cliTr(), q, lineOf<StepWhy>(s.whyCode)) : s.why}`, 100, "   "));
      for (const g of s.groups ?? []) if (g.coordination) lines.push(...wrap(`   ${g.coordinationCode ? helperCallText(cliTr(), lineOf<HelperCall>(g.coordinationCode)) : g.coordination}`, 100, "   "));
    });
  } else if (p.verdict === "needs-assistance") {
    lines.push("");
    lines.push(t("noSteps"));
  }
  if (p.advice && p.advice.length > 0) {
    lines.push("");
    const advice = p.adviceCodes ? p.adviceCodes.map((a) => adviceText(cliTr(), q, lineOf<AdviceLine>(a))) : p.advice;
    for (const a of advice) lines.push(...wrap(a, 100, "  "));
  }
  if (p.ifWheelsSlip && p.steps.some((s) => s.notch > 0)) {
    lines.push("");
    lines.push(t("slipTitle"));
    lines.push(...wrap(t("slipHold"), 100, "  "));
    lines.push(t("slipDriver"));
    const card = p.ifWheelsSlipCodes ? slipGuidanceText(cliTr(), p.ifWheelsSlipCodes) : p.ifWheelsSlip;
    card.driver.forEach((t, i) => lines.push(...wrap(`  ${i + 1}. ${t}`, 100, "     ")));
    lines.push(t("slipProtection"));
    for (const t of card.protection) lines.push(...wrap(`  - ${t}`, 100, "    "));
    lines.push(t("slipStall"));
    for (const t of card.stall) lines.push(...wrap(`  - ${t}`, 100, "    "));
  }
  lines.push(...renderAssistance(p));
  lines.push(...renderConditions(p.byCondition ?? []));
  lines.push("");
  lines.push(t("cautions"));
  for (const c of p.cautionCodes) lines.push(...wrap(`  - ${cautionText(cliTr(), cautionOf(c))}`, 100, "    "));
  return lines.join("\n");
}

/**
 * The "still slipping" cell: the step's fallback notch, or shut off and start again where there is no lower
 * notch to drop to (the core's slipHeadline, as the app's step cards and Cab steps say it) — never "notch 1"
 * beside a step that is already in notch 1.
 */
function stillSlipping(s: PlanReport["steps"][number]): string {
  if (s.notch <= 0) return "—";
  const then = slipHeadline(s.notch, s.fallbackNotch).then;
  return then.code === "drop" ? cliTr().ns(cli)("fallbackNotch", { notch: then.notch }) : cliTr().ns(stepWords)("shutOff");
}

/** A quantile as the limits' lines write it ("10 %"). */
function railQuantile(x: number): string {
  return percent(cliTr(), x);
}

function advance(a: PlanReport["steps"][number]["advanceWhen"]): string {
  const t = cliTr().ns(cli);
  switch (a.primary) {
    case "moved":
      return t("advanceMoved", { distance: num(a.moved_m, 1) });
    case "speed":
      return t("advanceSpeed", { speed: num(a.speed_kmh, 1) });
    case "target":
      return t("advanceTarget");
    default:
      return t("advanceAfter", { time: num(a.after_s) });
  }
}

/** "margin 0.93 (adhesion)": the binding limit's margin, named. */
export function marginText(margin: number, binding?: LimitName): string {
  const t = cliTr().ns(cli);
  return binding ? t("marginNamed", { value: marginNum(margin), limit: cliWords().limit(binding) }) : t("margin", { value: marginNum(margin) });
}
