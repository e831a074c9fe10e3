/**
 * Start plan: inputs and plan side by side in landscape; in portrait one at a time, switched by two large
 * buttons of which the plan's carries the verdict, so it stays in view while editing — marked when it is
 * for the previous inputs (updating) and replaced by "fix inputs" while the inputs break a rule.
 */
import { createSignal, Show, type JSX } from "solid-js";
import type { Verdict } from "../../../core/planner/outcome.js";
import { VerdictIcon } from "../../components/VerdictBanner.js";
import { words } from "../../words.js";
import { InputsView, type InputsViewProps } from "./InputsView.js";
import { ResultView, type ResultViewProps } from "./ResultView.js";

export interface StartPlanViewProps {
  inputs: InputsViewProps;
  result: ResultViewProps;
}

export function StartPlanView(props: StartPlanViewProps): JSX.Element {
  const [pane, setPane] = createSignal<"inputs" | "plan">("plan");
  const invalid = () => props.result.status === "invalid";
  const verdict = (): Verdict | null => (invalid() ? null : (props.result.result?.verdict ?? null));
  const stale = () => verdict() !== null && !props.result.current;
  let inputsPane!: HTMLDivElement;
  /** To the inputs, at the first one that breaks a rule. */
  const showInputs = () => {
    setPane("inputs");
    queueMicrotask(() => {
      const bad = inputsPane.querySelector<HTMLElement>('[aria-invalid="true"]');
      bad?.scrollIntoView({ block: "center" });
      bad?.focus();
    });
  };
  return (
    <div class="start-plan" data-pane={pane()}>
      <div class="pane-switch" role="tablist" aria-label="Start plan view">
        <button type="button" role="tab" id="tab-inputs" aria-controls="pane-inputs" aria-selected={pane() === "inputs"} onClick={() => setPane("inputs")}>
          Inputs
          <Show when={props.inputs.store.issues().length > 0}>
            <span class="badge">{props.inputs.store.issues().length} to fix</span>
          </Show>
        </button>
        <button
          type="button"
          role="tab"
          id="tab-plan"
          aria-controls="pane-plan"
          aria-selected={pane() === "plan"}
          onClick={() => setPane("plan")}
          classList={{ stale: stale(), "no-plan-tab": invalid() }}
        >
          Plan
          <Show when={verdict()}>
            {(v) => (
              <span class={`pane-verdict verdict-${v()}`}>
                <VerdictIcon verdict={v()} size={24} />
                {words.verdict(v())}
                <Show when={stale()}>
                  <span class="pane-stale">updating…</span>
                </Show>
              </span>
            )}
          </Show>
          <Show when={invalid()}>
            <span class="pane-verdict pane-no-plan">no plan: fix inputs</span>
          </Show>
        </button>
      </div>
      <div class="pane pane-inputs" id="pane-inputs" role="region" aria-label="Inputs" ref={inputsPane}>
        <InputsView {...props.inputs} />
      </div>
      <div class="pane pane-plan" id="pane-plan" role="region" aria-label="Plan">
        <ResultView {...props.result} onShowInputs={showInputs} />
      </div>
    </div>
  );
}
