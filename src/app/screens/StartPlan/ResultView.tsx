/**
 * Start plan result: verdict, reasons, margins, key figures, numbered steps, charts and cautions. While the
 * inputs break a rule there is no plan: that is said where the verdict stands, and the last plan (and its
 * Cab steps) is withdrawn. A compact line of the verdict — word, margin, binding limit — stays in view at
 * the top of the pane once the full verdict has scrolled away.
 */
import { createEffect, createMemo, createSignal, For, Index, onCleanup, Show, type JSX } from "solid-js";
import type { PlanResult } from "../../../core/planner/types.js";
import type { Reason } from "../../../core/planner/outcome.js";
import type { StartCase } from "../../../core/train/types.js";
import type { ChartPalette } from "../../charts/palette.js";
import type { ChartSpec } from "../../charts/spec.js";
import { Chart } from "../../components/Chart.js";
// The charts' code loads after the verdict is painted; until then each builder gives undefined (the chart's box stands in).
import { couplerChart, effortChart, speedNotchChart } from "../../components/planCharts.js";
import { Icon } from "../../components/Icon.js";
import { VerdictBanner, VerdictIcon } from "../../components/VerdictBanner.js";
import { words } from "../../words.js";
import { issueLine } from "../../fields.js";
import type { FieldIssue } from "../../../profiles/issues.js";
import { adviceWords } from "../../lines.js";
import { duration, localiseText, margin, percent, percentOf, show, showAtMost, showForce, type UnitSystem } from "../../format.js";
import type { RunStatus } from "../../state/createPlanRun.js";
import { StepCard } from "./StepCard.js";
import { massesLine } from "./masses.js";
import { cautionWords } from "../../cautions.js";
import { plan } from "../../../i18n/en/plan.js";
import { appNumber, tr } from "../../i18n.js";
import { Figures } from "../../components/Figures.js";

const t = tr.ns(plan);

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
  /** What the inputs break (when `status` is "invalid"), in the user's units. */
  issues?: readonly FieldIssue[];
  /** Show the inputs (portrait: switch to the Inputs pane). */
  onShowInputs?: () => void;
  onOpenCab: () => void;
  onRetry: () => void;
}

const MARGIN_WORD: Record<Reason, () => string> = {
  adhesion: () => t("marginAdhesion"),
  power: () => t("marginPower"),
  coupler: () => t("marginCoupler"),
  distance: () => t("marginDistance"),
  brake: () => t("marginBrake"),
};

/**
 * The limit that binds, in words: the one the plan names (`binding`, decision.ts), whose margin is the one
 * shown.
 */
export function bindingLimit(res: PlanResult): string {
  return words.limit(res.binding);
}

/** The verdict in one line, kept in view at the top of the plan's pane. */
export function VerdictSummary(props: { result: PlanResult; stale: boolean; shown: boolean }): JSX.Element {
  const v = () => props.result.verdict;
  return (
    <div
      class={`verdict-summary verdict-${v()}`}
      classList={{ stale: props.stale, shown: props.shown }}
      data-verdict={v()}
      aria-hidden={props.shown ? undefined : "true"}
      role="status"
      aria-label={t("verdictLabel", { word: words.verdict(v()) })}
    >
      <VerdictIcon verdict={v()} size={30} />
      <span class="summary-word">{words.verdict(v())}</span>
      <span class="summary-margin">{t("margin", { value: margin(props.result.margin) })}</span>
      <span class="summary-limit">{bindingLimit(props.result)}</span>
      <Show when={props.stale}>
        <span class="summary-stale">{t("staleShort")}</span>
      </Show>
    </div>
  );
}

export function ResultView(props: ResultViewProps): JSX.Element {
  const r = () => props.result;
  // No plan while the inputs break a rule: the last one is withdrawn, not shown as if it still held.
  const invalid = () => props.status === "invalid";
  const shownResult = () => (invalid() ? null : r());
  // The effort chart depends on the locomotives, the rail and the settings, not on the train's mass:
  // recomputed only when what it shows changes (a mass edit then costs no chart work).
  let effortKey = "";
  const effortSpec = createMemo<ChartSpec | null | undefined>((prev) => {
    const c = props.startCase;
    if (!c) return null;
    const res = shownResult();
    const requiredN = res?.static.requiredN;
    // Each step where it uses the most adhesion: the point its card's "adhesion used" is read at.
    const steps = (res?.steps ?? []).map((st, i) => ({ number: i + 1, speedMps: st.adhesionUseAt.speedMps, effortN: st.adhesionUseAt.tractiveEffortN })).filter((m) => m.effortN > 0);
    // The language is part of what it shows (its legend and axes), and reading it here redraws on a switch.
    const key = JSON.stringify([tr.lang, c.locomotives, c.adhesion, c.conditions, c.settings.slipRiskThreshold, c.target, props.units, requiredN, steps]);
    if (key === effortKey && prev) return prev;
    effortKey = key;
    return effortChart(c, props.units, requiredN, steps);
  }, null);
  const limitN = () => props.startCase?.train.couplerLimitN ?? null;
  const factor = () => props.startCase?.settings.couplerSafetyFactor ?? 1.2;
  const threshold = () => props.startCase?.settings.slipRiskThreshold ?? 0.1;
  // The full verdict's place on screen: the compact line shows once it has scrolled out of view.
  const [banner, setBanner] = createSignal<HTMLElement>();
  const [bannerInView, setBannerInView] = createSignal(true);
  createEffect(() => {
    const el = banner();
    if (!el || typeof IntersectionObserver === "undefined") return;
    const io = new IntersectionObserver((entries) => setBannerInView(entries.some((e) => e.isIntersecting)), { root: el.closest(".pane"), threshold: 0.05 });
    io.observe(el);
    onCleanup(() => {
      io.disconnect();
      setBannerInView(true);
    });
  });
  return (
    <div class="result" aria-live="polite" aria-busy={props.status === "running" || props.status === "waiting"}>
      <Show when={shownResult()}>{(res) => <VerdictSummary result={res()} stale={!props.current} shown={!bannerInView()} />}</Show>
      <Show when={props.illustrative}>
        <p class="illustrative-note">
          <Icon name="info" size={20} /> {t("illustrative")}
        </p>
      </Show>

      <Show when={props.status === "running" || props.status === "waiting"}>
        <div class="progress" role="progressbar" aria-label={t("planning")} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(props.progress * 100)}>
          <span style={{ width: `${Math.max(4, props.progress * 100)}%` }} />
        </div>
      </Show>

      <Show when={props.status === "failed"}>
        <div class="problem" role="alert">
          <p>{t("failed", { error: props.error ?? "" })}</p>
          <button type="button" class="button" onClick={() => props.onRetry()}>
            {t("tryAgain")}
          </button>
        </div>
      </Show>

      <Show when={invalid()}>
        <section class="no-plan" role="alert" aria-label={t("noPlanLabel")} data-no-plan>
          <p class="no-plan-word">
            <svg class="no-plan-icon" width="44" height="44" viewBox="0 0 48 48" aria-hidden="true">
              <circle cx="24" cy="24" r="21" />
              <path d="M14 34 34 14" />
            </svg>
            {t("noPlanWord")}
          </p>
          <p>{(props.issues ?? []).length > 0 ? t("brokenInputs", { count: (props.issues ?? []).length }) : t("brokenSome")}</p>
          <Show when={(props.issues ?? []).length > 0}>
            <ul>
              <For each={(props.issues ?? []).slice(0, 4)}>{(i) => <li>{issueLine(i)}</li>}</For>
            </ul>
          </Show>
          <Show when={props.onShowInputs}>
            <button type="button" class="button primary show-inputs" onClick={() => props.onShowInputs?.()}>
              <Icon name="back" /> {t("goToInputs")}
            </button>
          </Show>
        </section>
      </Show>

      <Show when={shownResult()} fallback={<Show when={!invalid()}>{<p class="placeholder-text">{t("planningDots")}</p>}</Show>}>
        {(res) => {
          /** This margin is the one the plan's own margin is of (the binding limit's). */
          const binds = (k: Reason) => res().limits.find((l) => l.name === res().binding)?.reason === k;
          return (
          <>
            <div ref={setBanner}>
              <VerdictBanner
                verdict={res().verdict}
                reasons={res().reasons}
                stale={!props.current}
                detail={t("detail", { margin: margin(res().margin), limit: bindingLimit(res()) }) + (res().startKind === "gravity" ? t("gravity") : "")}
                masses={massesLine(res(), props.units, props.massPending === true)}
              />
            </div>
            <Show when={res().reasons.length > 0}>
              <ul class="reasons">
                <For each={res().reasons}>{(reason) => <li>{words.reasonLine(reason)}</li>}</For>
              </ul>
            </Show>
            <Show when={res().advice.length > 0}>
              <ul class="reasons advice" data-advice>
                <For each={res().advice}>{(a) => (
                    <li>
                      <Figures text={adviceWords(a, props.units)} />
                    </li>
                  )}</For>
              </ul>
            </Show>

            <section class="panel" aria-labelledby="steps-h">
              <div class="panel-head">
                <h2 id="steps-h">{t("steps")}</h2>
                <button type="button" class="button primary" onClick={() => props.onOpenCab()}>
                  <Icon name="cab" /> {t("openCab")}
                </button>
              </div>
              <Show
                when={res().steps.length > 0}
                fallback={
                  <p class="placeholder-text" data-empty-steps>
                    {res().verdict === "needs-assistance" ? t("noStepsAssist") : t("noSteps")}
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
              <h2 id="margins-h">{t("margins")}</h2>
              <ul class="margins">
                {/* A row for each kind of limit the plan judged, as `taut plan` lists them: a train that never moved
                    has no distance limit, and showed "Distance × 99+" here. */}
                <For each={(["adhesion", "power", "coupler", "distance", "brake"] as Reason[]).filter((k) => res().limits.some((l) => l.reason === k) && (k !== "brake" || res().margins.brake < 99))}>
                  {(k) => (
                    // The limit that binds is marked bold; it is red only when it is not met (below × 1, as its bar):
                    // a red "× 1.40" beside a green "Starts" read as an alarm where there is none.
                    <li classList={{ limiting: binds(k), short: binds(k) && res().margins[k] < 1 }}>
                      <span class="margin-name">{MARGIN_WORD[k]()}</span>
                      <span class="margin-bar" aria-hidden="true">
                        <span style={{ width: `${Math.min(100, (res().margins[k] / 2) * 100)}%` }} classList={{ under: res().margins[k] < 1 }} />
                      </span>
                      <span class="margin-value">{margin(res().margins[k])}</span>
                    </li>
                  )}
                </For>
              </ul>
              <p class="muted">{t("marginNote")}</p>
            </section>

            <section class="panel" aria-labelledby="figures-h">
              <h2 id="figures-h">{t("keyFigures")}</h2>
              <dl class="figures wide">
                <div>
                  <dt>{t("needed")}</dt>
                  <dd>
                    {showForce(res().static.resistance.totalN, props.units)}
                    <span class="basis">{t("neededBasis")}</span>
                  </dd>
                </div>
                <div>
                  <dt>{t("railsGive", { risk: percent(threshold(), 0) })}</dt>
                  <dd>
                    {showForce(res().static.adhesionLimitN, props.units)}
                    <span class="basis">{t("atStandstill")}</span>
                  </dd>
                </div>
                <div>
                  <dt>{t("slipAtStart")}</dt>
                  <dd>{percentOf(res().static.slipRiskAtStart)}</dd>
                </div>
                <div>
                  <dt>{t("peakCoupler")}</dt>
                  <dd>
                    {showForce(res().peakCouplerForceN, props.units)}
                    <Show when={limitN()}>
                      {(l) => (
                        <span class="basis" data-coupler-basis>
                          <Figures text={t("couplerBasis", { allowed: show("force", l() / factor(), props.units), limit: show("force", l(), props.units), factor: appNumber(factor(), Number.isInteger(factor() * 10) ? 1 : 2) })} />
                        </span>
                      )}
                    </Show>
                  </dd>
                </div>
                <div>
                  <dt>{t("largestMass")}</dt>
                  <dd>
                    {Number.isFinite(res().maxStartableMassKg) ? showAtMost("mass", res().maxStartableMassKg, props.units) : props.massPending ? t("workingOut") : "–"}
                    <Show when={Number.isFinite(res().largestMarginalMassKg) && res().largestMarginalMassKg > res().maxStartableMassKg}>
                      <span class="muted"><Figures text={t("marginalUpTo", { mass: showAtMost("mass", res().largestMarginalMassKg, props.units) })} /></span>
                    </Show>
                  </dd>
                </div>
                <div>
                  <dt>{t("timeToTarget")}</dt>
                  <dd>{res().timeToTargetS === null || res().steps.length === 0 ? "–" : duration(res().timeToTargetS!)}</dd>
                </div>
              </dl>
              {/* A marginal plan is made on the rail at the marginal bound: say which rail each figure belongs to. */}
              <Show when={res().steps.length > 0 && Math.abs(res().planQuantile - threshold()) > 1e-9}>
                <p class="muted" data-plan-rail>
                  {t("planRail", { plan: percent(res().planQuantile, 0), threshold: percent(threshold(), 0) })}
                </p>
              </Show>
            </section>

            <Chart
              title={t("chartSpeed")}
              caption={t("chartSpeedCaption")}
              spec={speedNotchChart(res(), props.units)}
              palette={props.palette}
              empty={t("chartSpeedEmpty")}
            />
            <Chart
              title={t("chartCoupler")}
              caption={t("chartCouplerCaption")}
              spec={limitN() !== null ? couplerChart(res(), limitN()!, factor(), props.units) : null}
              palette={props.palette}
              empty={t("chartCouplerEmpty")}
            />
            <Chart
              title={t("chartEffort")}
              caption={t("chartEffortCaption", { risk: percent(threshold(), 0) })}
              spec={effortSpec()}
              palette={props.palette}
              height={340}
              empty={t("chartEffortEmpty")}
            />
          </>
          );
        }}
      </Show>

      <Show when={shownResult()}>
        {(res) => (
          <section class="panel cautions" aria-labelledby="cautions-h">
            <h2 id="cautions-h">{t("cautions")}</h2>
            <ul>
              <For each={res().cautions}>{(c) => <li>{localiseText(cautionWords(c), props.units)}</li>}</For>
            </ul>
          </section>
        )}
      </Show>
    </div>
  );
}
