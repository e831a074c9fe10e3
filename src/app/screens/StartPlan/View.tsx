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

import { inputs } from "../../../i18n/en/inputs.js";
import { tr } from "../../i18n.js";

const t = tr.ns(inputs);

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
      <div class="pane-switch" role="tablist" aria-label={t("viewLabel")}>
        <button type="button" role="tab" id="tab-inputs" aria-controls="pane-inputs" aria-selected={pane() === "inputs"} onClick={() => setPane("inputs")}>
          {t("inputs")}
          <Show when={props.inputs.store.issues().length > 0}>
            <span class="badge">{t("toFix", { count: props.inputs.store.issues().length })}</span>
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
          {t("plan")}
          <Show when={verdict()}>
            {(v) => (
              <span class={`pane-verdict verdict-${v()}`}>
                <VerdictIcon verdict={v()} size={24} />
                {words.verdict(v())}
                <Show when={stale()}>
                  <span class="pane-stale">{t("updating")}</span>
                </Show>
              </span>
            )}
          </Show>
          <Show when={invalid()}>
            <span class="pane-verdict pane-no-plan">{t("noPlanFix")}</span>
          </Show>
        </button>
      </div>
      <div class="pane pane-inputs" id="pane-inputs" role="region" aria-label={t("inputs")} ref={inputsPane}>
        <InputsView {...props.inputs} />
      </div>
      <div class="pane pane-plan" id="pane-plan" role="region" aria-label={t("plan")}>
        <ResultView {...props.result} onShowInputs={showInputs} />
      </div>
    </div>
  );
}
