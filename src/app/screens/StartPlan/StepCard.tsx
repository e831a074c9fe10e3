/** One numbered step of the plan: the notch large, when to advance, and the figures behind it. */
import { Show, type JSX } from "solid-js";
import type { PlanStep } from "../../../core/planner/types.js";
import type { Target } from "../../../core/train/types.js";
import { localiseText, percentOf, show, type UnitSystem } from "../../format.js";
import { advanceLead, advanceOthers, notchText, PHASE_WORD, STILL_SLIPPING_LABEL, stillSlipping } from "../../steps.js";

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
              {percentOf(s().slipRisk)}
              <Show when={risky()}> — above your {percentOf(props.slipThreshold, 0)}</Show>
            </dd>
          </div>
          <div>
            <dt>{STILL_SLIPPING_LABEL}</dt>
            <dd>{stillSlipping(s())}</dd>
          </div>
          <div>
            <dt>Tractive effort</dt>
            <dd>
              {show("force", s().tractiveEffortN, props.units)}
              <span class="basis">at {show("speed", s().speedMps, props.units)}, the step's end</span>
            </dd>
          </div>
          <div classList={{ alert: heavy() }}>
            <dt>Peak coupler force</dt>
            <dd>
              {show("force", s().peakCouplerForceN, props.units)}
              <Show when={Number.isFinite(props.couplerWorkingN)}>
                <span class="basis">of {show("force", props.couplerWorkingN, props.units)} allowed</span>
              </Show>
            </dd>
          </div>
          <div>
            <dt>Adhesion used</dt>
            <dd>
              {percentOf(s().adhesionUse, 0)}
              <span class="basis">
                highest, at {show("speed", s().adhesionUseAt.speedMps, props.units)} ({show("force", s().adhesionUseAt.tractiveEffortN, props.units)})
              </span>
            </dd>
          </div>
        </dl>
        <p class="step-why">{localiseText(s().why, props.units)}</p>
      </div>
    </li>
  );
}
