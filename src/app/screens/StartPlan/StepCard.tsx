/** One numbered step of the plan: the notch large, when to advance, and the figures behind it. */
import { For, Show, type JSX } from "solid-js";
import type { PlanStep } from "../../../core/planner/types.js";
import type { Target } from "../../../core/train/types.js";
import { percentOf, show, type UnitSystem } from "../../format.js";
import { helperCallWords, whyText } from "../../lines.js";
import { advanceLead, advanceOthers, groupNotchesText, notchText, phaseWord, stillSlippingLabel, stillSlipping } from "../../steps.js";
import { steps } from "../../../i18n/en/steps.js";
import { tr } from "../../i18n.js";
import { Figures } from "../../components/Figures.js";

const t = tr.ns(steps);

export interface StepCardProps {
  step: PlanStep;
  index: number;
  count: number;
  units: UnitSystem;
  target?: Target | undefined;
  slipThreshold: number;
  /** The coupler allowance: the working limit ÷ the safety factor, N. */
  couplerWorkingN: number;
}

export function StepCard(props: StepCardProps): JSX.Element {
  const s = () => props.step;
  const risky = () => s().slipRisk > props.slipThreshold;
  // A risk just over the threshold can round to the same whole percent ("10 % — above your 10 %" would read as a
  // contradiction); the figures stay whole percent as everywhere else, the words say it is only just over.
  const riskTiesThreshold = () => percentOf(s().slipRisk, 0) === percentOf(props.slipThreshold, 0);
  const heavy = () => s().peakCouplerForceN > props.couplerWorkingN;
  return (
    <li class={`step-card phase-${s().phase}`} aria-label={t("stepOf", { number: props.index + 1, count: props.count, notch: notchText(s().notch) })}>
      <div class="step-notch">
        <span class="step-number">{t("step", { number: props.index + 1 })}</span>
        <span class="notch-label">{t("notch")}</span>
        <span class="notch-value">{notchText(s().notch)}</span>
        <Show when={s().groups}>{(gs) => <span class="notch-groups" data-testid="group-notches">{groupNotchesText(gs())}</span>}</Show>
      </div>
      <div class="step-body">
        <p class="step-phase">{phaseWord(s().phase)}</p>
        <p class="step-advance">
          <strong>{advanceLead(s(), props.units, props.target)}</strong>
          <Show when={advanceOthers(s(), props.units).length > 0}>
            <span class="muted">
              {" "}
              <Figures text={`(${advanceOthers(s(), props.units).join(" · ")})`} />
            </span>
          </Show>
        </p>
        <dl class="figures">
          <div>
            <dt>{t("expectedSpeed")}</dt>
            <dd>{show("speed", s().speedMps, props.units)}</dd>
          </div>
          <div classList={{ alert: risky() }}>
            <dt>{t("slipRisk")}</dt>
            <dd>
              {percentOf(s().slipRisk, 0)}
              <Show when={risky()}>{t(riskTiesThreshold() ? "justAboveYour" : "aboveYour", { threshold: percentOf(props.slipThreshold, 0) })}</Show>
            </dd>
          </div>
          <div>
            <dt>{stillSlippingLabel()}</dt>
            <dd>{stillSlipping(s())}</dd>
          </div>
          <div>
            <dt>{t("tractiveEffort")}</dt>
            <dd>
              {show("force", s().tractiveEffortN, props.units)}
              <span class="basis">
                <Figures text={t("atStepEnd", { speed: show("speed", s().speedMps, props.units) })} />
              </span>
            </dd>
          </div>
          <div classList={{ alert: heavy() }}>
            <dt>{t("peakCoupler")}</dt>
            <dd>
              {show("force", s().peakCouplerForceN, props.units)}
              <Show when={Number.isFinite(props.couplerWorkingN)}>
                <span class="basis">
                  <Figures text={t("ofAllowed", { force: show("force", props.couplerWorkingN, props.units) })} />
                </span>
              </Show>
            </dd>
          </div>
          <div>
            <dt>{t("adhesionUsed")}</dt>
            <dd>
              {percentOf(s().adhesionUse, 0)}
              <span class="basis">
                <Figures text={t("highestAt", { speed: show("speed", s().adhesionUseAt.speedMps, props.units), force: show("force", s().adhesionUseAt.tractiveEffortN, props.units) })} />
              </span>
            </dd>
          </div>
        </dl>
        <p class="step-why">
          <Figures text={whyText(s().why, props.units)} />
        </p>
        <For each={(s().groups ?? []).filter((g) => g.coordination)}>{(g) => <p class="step-coordination">{helperCallWords(g.coordination!)}</p>}</For>
      </div>
    </li>
  );
}
