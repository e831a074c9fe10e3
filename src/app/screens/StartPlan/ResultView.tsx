/** Start plan result: verdict, reasons, margins, key figures, numbered steps, charts and cautions. */
import { createMemo, For, Index, Show, type JSX } from "solid-js";
import type { PlanResult } from "../../../core/planner/types.js";
import type { Reason } from "../../../core/planner/outcome.js";
import type { StartCase } from "../../../core/train/types.js";
import { couplerChart } from "../../charts/couplerAlong.js";
import { effortChart } from "../../charts/effortSpeed.js";
import type { ChartPalette } from "../../charts/palette.js";
import type { ChartSpec } from "../../charts/spec.js";
import { speedNotchChart } from "../../charts/speedNotch.js";
import { Chart } from "../../components/Chart.js";
import { Icon } from "../../components/Icon.js";
import { REASON_LINE, VerdictBanner } from "../../components/VerdictBanner.js";
import { duration, localiseText, margin, percent, show, type UnitSystem } from "../../format.js";
import type { RunStatus } from "../../state/createPlanRun.js";
import { StepCard } from "./StepCard.js";

export interface ResultViewProps {
  status: RunStatus;
  progress: number;
  result: PlanResult | null;
  /** The result belongs to the inputs on screen. */
  current: boolean;
  /** The largest-startable-mass search is still running. */
  massPending?: boolean;
  error: string | null;
  /** The validated case on screen, or null while the inputs break a rule. */
  startCase: StartCase | null;
  units: UnitSystem;
  palette: ChartPalette;
  illustrative: boolean;
  onOpenCab: () => void;
  onRetry: () => void;
}

const MARGIN_WORD: Record<Reason, string> = { adhesion: "Adhesion", power: "Power", coupler: "Coupler", distance: "Distance" };

export function ResultView(props: ResultViewProps): JSX.Element {
  const r = () => props.result;
  // The effort chart depends on the locomotives, the rail and the settings, not on the train's mass:
  // recomputed only when what it shows changes (a mass edit then costs no chart work).
  let effortKey = "";
  const effortSpec = createMemo<ChartSpec | null>((prev) => {
    const c = props.startCase;
    if (!c) return null;
    const requiredN = r()?.static.requiredN;
    const key = JSON.stringify([c.locomotives, c.adhesion, c.conditions, c.settings.slipRiskThreshold, c.target, props.units, requiredN]);
    if (key === effortKey && prev) return prev;
    effortKey = key;
    return effortChart(c, props.units, requiredN);
  }, null);
  const limitN = () => props.startCase?.train.couplerLimitN ?? null;
  const factor = () => props.startCase?.settings.couplerSafetyFactor ?? 1.2;
  const threshold = () => props.startCase?.settings.slipRiskThreshold ?? 0.1;
  const smallest = (res: PlanResult): Reason => {
    const m = res.margins;
    const keys: Reason[] = ["adhesion", "power", "coupler"];
    return keys.reduce((a, b) => (m[b] < m[a] ? b : a));
  };
  return (
    <div class="result" aria-live="polite" aria-busy={props.status === "running" || props.status === "waiting"}>
      <Show when={props.illustrative}>
        <p class="illustrative-note">
          <Icon name="info" size={20} /> Illustrative demo data: invented places, trains and locomotive profiles (not real classes).
        </p>
      </Show>

      <Show when={props.status === "running" || props.status === "waiting"}>
        <div class="progress" role="progressbar" aria-label="Planning" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(props.progress * 100)}>
          <span style={{ width: `${Math.max(4, props.progress * 100)}%` }} />
        </div>
      </Show>

      <Show when={props.status === "failed"}>
        <div class="problem" role="alert">
          <p>The planner could not finish: {props.error}</p>
          <button type="button" class="button" onClick={() => props.onRetry()}>
            Try again
          </button>
        </div>
      </Show>

      <Show
        when={r()}
        fallback={
          <p class="placeholder-text">{props.status === "invalid" ? "Fix the inputs marked in red to get a plan." : "Planning…"}</p>
        }
      >
        {(res) => (
          <>
            <VerdictBanner
              verdict={res().verdict}
              reasons={res().reasons}
              stale={!props.current}
              detail={`Smallest margin ${margin(res().margin)} (${MARGIN_WORD[smallest(res())].toLowerCase()})`}
            />
            <Show when={res().reasons.length > 0}>
              <ul class="reasons">
                <For each={res().reasons}>{(reason) => <li>{REASON_LINE[reason]}</li>}</For>
              </ul>
            </Show>

            <section class="panel" aria-labelledby="steps-h">
              <div class="panel-head">
                <h2 id="steps-h">Steps</h2>
                <button type="button" class="button primary" onClick={() => props.onOpenCab()}>
                  <Icon name="cab" /> Open Cab steps
                </button>
              </div>
              <Show
                when={res().steps.length > 0}
                fallback={
                  <p class="placeholder-text" data-empty-steps>
                    No notch steps in this plan{res().verdict === "needs-assistance" ? ": it is not expected to start as it stands." : "."}
                  </p>
                }
              >
                <ol class="steps">
                  <Index each={res().steps}>
                    {(step, i) => (
                      <StepCard
                        step={step()}
                        index={i}
                        count={res().steps.length}
                        units={props.units}
                        target={props.startCase?.target}
                        slipThreshold={threshold()}
                        couplerWorkingN={(limitN() ?? Infinity) / factor()}
                      />
                    )}
                  </Index>
                </ol>
              </Show>
            </section>

            <section class="panel" aria-labelledby="margins-h">
              <h2 id="margins-h">Margins (available ÷ needed)</h2>
              <ul class="margins">
                <For each={["adhesion", "power", "coupler", "distance"] as Reason[]}>
                  {(k) => (
                    <li classList={{ limiting: res().reasons.includes(k) }}>
                      <span class="margin-name">{MARGIN_WORD[k]}</span>
                      <span class="margin-bar" aria-hidden="true">
                        <span style={{ width: `${Math.min(100, (res().margins[k] / 2) * 100)}%` }} classList={{ under: res().margins[k] < 1 }} />
                      </span>
                      <span class="margin-value">{margin(res().margins[k])}</span>
                    </li>
                  )}
                </For>
              </ul>
              <p class="muted">The bar's middle is × 1: below it the need is larger than what is available.</p>
            </section>

            <section class="panel" aria-labelledby="figures-h">
              <h2 id="figures-h">Key figures</h2>
              <dl class="figures wide">
                <div>
                  <dt>Tractive effort needed to start</dt>
                  <dd>{show("force", res().static.requiredN, props.units)}</dd>
                </div>
                <div>
                  <dt>Rails give at {percent(threshold(), 0)} slip risk</dt>
                  <dd>{show("force", res().static.adhesionLimitN, props.units)}</dd>
                </div>
                <div>
                  <dt>Slip risk at the start</dt>
                  <dd>{percent(res().static.slipRiskAtStart)}</dd>
                </div>
                <div>
                  <dt>Peak coupler force</dt>
                  <dd>
                    {show("force", res().peakCouplerForceN, props.units)}
                    <Show when={limitN()}>{(l) => <span class="muted"> of {show("force", l(), props.units)}</span>}</Show>
                  </dd>
                </div>
                <div>
                  <dt>Largest trailing mass that starts</dt>
                  <dd>{Number.isFinite(res().maxStartableMassKg) ? show("mass", res().maxStartableMassKg, props.units) : props.massPending ? "working it out…" : "–"}</dd>
                </div>
                <div>
                  <dt>Time to the target</dt>
                  <dd>{res().timeToTargetS === null ? "not computed" : duration(res().timeToTargetS!)}</dd>
                </div>
              </dl>
            </section>

            <Chart
              title="Speed and notch"
              caption="Locomotive speed and notch over time in the verifying run of the plan."
              spec={speedNotchChart(res(), props.units)}
              palette={props.palette}
              empty="No time series in this plan: the chart appears when the plan carries its verifying run."
            />
            <Chart
              title="Peak coupler force along the train"
              caption="Largest tension in each coupling during the start, head to tail, against the limit."
              spec={limitN() !== null ? couplerChart(res(), limitN()!, factor(), props.units) : null}
              palette={props.palette}
              empty="No force per coupling in this plan: the chart appears when the plan carries its verifying run."
            />
            <Chart
              title="Tractive effort and adhesion"
              caption={`Each notch's tractive effort against speed; each band runs from the adhesion with ${percent(threshold(), 0)} slip risk up to the median (50 %).`}
              spec={effortSpec()}
              palette={props.palette}
              height={340}
              empty="Appears when the inputs are valid."
            />
          </>
        )}
      </Show>

      <Show when={r()}>
        {(res) => (
          <section class="panel cautions" aria-labelledby="cautions-h">
            <h2 id="cautions-h">Cautions</h2>
            <ul>
              <For each={res().cautions}>{(c) => <li>{localiseText(c, props.units)}</li>}</For>
            </ul>
          </section>
        )}
      </Show>
    </div>
  );
}
