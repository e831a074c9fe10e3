/** One numbered step of the plan: the notch large, when to advance, and the figures behind it. */
import { Show, type JSX } from "solid-js";
import type { PlanStep } from "../../../core/planner/types.js";
import type { Target } from "../../../core/train/types.js";
import { localiseText, percent, show, type UnitSystem } from "../../format.js";
import { advanceLead, advanceOthers, notchText, PHASE_WORD, STILL_SLIPPING_LABEL, stillSlipping } from "../../steps.js";

export interface StepCardProps {
  step: PlanStep;
  index: number;
  count: number;
  units: UnitSystem;
  target?: Target | undefined;
  slipThreshold: number;
  couplerWorkingN: number;
}

export function StepCard(props: StepCardProps): JSX.Element {
  const s = () => props.step;
  const risky = () => s().slipRisk > props.slipThreshold;
  const heavy = () => s().peakCouplerForceN > props.couplerWorkingN;
  return (
    <li class={`step-card phase-${s().phase}`} aria-label={`Step ${props.index + 1} of ${props.count}: notch ${notchText(s().notch)}`}>
      <div class="step-notch">
        <span class="step-number">Step {props.index + 1}</span>
        <span class="notch-label">Notch</span>
        <span class="notch-value">{notchText(s().notch)}</span>
      </div>
      <div class="step-body">
        <p class="step-phase">{PHASE_WORD[s().phase]}</p>
        <p class="step-advance">
          <strong>{advanceLead(s(), props.units, props.target)}</strong>
          <Show when={advanceOthers(s(), props.units).length > 0}>
            <span class="muted"> ({advanceOthers(s(), props.units).join(" · ")})</span>
          </Show>
        </p>
        <dl class="figures">
          <div>
            <dt>Expected speed</dt>
            <dd>{show("speed", s().speedMps, props.units)}</dd>
          </div>
          <div classList={{ alert: risky() }}>
            <dt>Slip risk</dt>
            <dd>
              {percent(s().slipRisk)}
              <Show when={risky()}> — above your {percent(props.slipThreshold, 0)}</Show>
            </dd>
          </div>
          <div>
            <dt>{STILL_SLIPPING_LABEL}</dt>
            <dd>{stillSlipping(s())}</dd>
          </div>
          <div>
            <dt>Tractive effort</dt>
            <dd>{show("force", s().tractiveEffortN, props.units)}</dd>
          </div>
          <div classList={{ alert: heavy() }}>
            <dt>Peak coupler force</dt>
            <dd>{show("force", s().peakCouplerForceN, props.units)}</dd>
          </div>
          <div>
            <dt>Adhesion used</dt>
            <dd>{percent(s().adhesionUse, 0)}</dd>
          </div>
        </dl>
        <p class="step-why">{localiseText(s().why, props.units)}</p>
      </div>
    </li>
  );
}
