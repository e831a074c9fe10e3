/**
 * Cab steps: one step at a time, full screen, very large type; Back and Next at the bottom; "If wheels
 * slip" one tap away on every step; the time since the step began.
 */
import { createSignal, For, Show, type JSX } from "solid-js";
import type { PlanResult } from "../../../core/planner/types.js";
import type { Target } from "../../../core/train/types.js";
import { Icon } from "../../components/Icon.js";
import { VerdictIcon } from "../../components/VerdictBanner.js";
import { words } from "../../words.js";
import { clock, percentOf, show, type UnitSystem } from "../../format.js";
import { groupWords, whyText } from "../../lines.js";
import type { WakeLockState } from "../../state/createWakeLock.js";
import { advanceLead, advanceOthers, groupNotchesText, helperLine, notchText, phaseLine, phaseWord, stillSlippingLabel, stillSlipping } from "../../steps.js";
import { shell } from "../../../i18n/en/shell.js";
import { steps } from "../../../i18n/en/steps.js";
import { cab } from "../../../i18n/en/cab.js";
import { tr } from "../../i18n.js";
import { SlipCard } from "./SlipCard.js";
import { Figures } from "../../components/Figures.js";

export interface CabStepsViewProps {
  result: PlanResult | null;
  /** The plan is for the inputs on screen. */
  current: boolean;
  /** The inputs on Start plan break a rule: there is no plan, and the last one's steps are not shown. */
  invalid?: boolean;
  index: number;
  onIndex: (i: number) => void;
  units: UnitSystem;
  target?: Target | undefined;
  slipThreshold: number;
  /** Seconds since the step on screen began. */
  stepSeconds: number;
  wakeLock: WakeLockState;
  slipOpen: boolean;
  /** Whether the locomotives have sanders (default yes). */
  sanders?: boolean;
  onSlip: (open: boolean) => void;
  onClose: () => void;
}

const t = tr.ns(steps);
const tt = tr.ns(cab);
/** A button's words with a capital first letter (a group's name, which starts them in some languages, is written in lower case). */
const capitalised = (s: string) => s.charAt(0).toLocaleUpperCase(tr.lang) + s.slice(1);

const WAKE_TEXT: Record<WakeLockState, () => string> = {
  on: () => t("wakeOn"),
  off: () => t("wakeOff"),
  unsupported: () => t("wakeUnsupported"),
  refused: () => t("wakeRefused"),
};

export function CabStepsView(props: CabStepsViewProps): JSX.Element {
  const result = () => (props.invalid ? null : props.result);
  const steps = () => result()?.steps ?? [];
  const step = () => steps()[props.index];
  const count = () => steps().length;
  // Whose steps: the head driver's (group 0), or a helper's driver's (the index of a helper group).
  const [driver, setDriver] = createSignal(0);
  const helpers = () => (steps().find((x) => x.groups)?.groups ?? []).map((g, k) => ({ name: groupWords(g.place), k, helper: g.control === "helper" })).filter((g) => g.helper);
  const who = () => (helpers().some((h) => h.k === driver()) ? driver() : 0);
  const notchFor = (st: NonNullable<ReturnType<typeof step>>) => st.groups?.[who()]?.notch ?? st.notch;
  return (
    <div class="cab" data-step={props.index + 1}>
      <header class="cab-top">
        <button type="button" class="button big" onClick={() => props.onClose()}>
          <Icon name="back" /> {tr.ns(shell)("screenStartPlan")}
        </button>
        <p class="cab-count" aria-live="polite">
          <Show when={step()} fallback={result() ? <span>{t("noSteps")}</span> : <span>{t("noPlan")}</span>}>
            {(s) => (
              <>
                {t("stepCount", { number: props.index + 1, count: count(), phase: phaseWord(s().phase) })}
              </>
            )}
          </Show>
        </p>
        <Show when={result()}>
          <button type="button" class="button big slip-button" onClick={() => props.onSlip(true)}>
            <Icon name="slip" size={30} /> {t("ifWheelsSlip")}
          </button>
        </Show>
      </header>

      <Show when={result() && !props.current}>
        <p class="cab-stale" role="status">
          {t("stale")}
        </p>
      </Show>

      <Show
        when={step()}
        fallback={
          <div class="cab-empty">
            <Show
              when={result()}
              fallback={
                props.invalid ? (
                  <p class="cab-no-plan" role="alert">
                    {t("invalid")}
                  </p>
                ) : (
                  <p>{t("noPlanYet")}</p>
                )
              }
            >
              {(r) => (
                <>
                  <p class="cab-verdict">
                    <VerdictIcon verdict={r().verdict} size={56} /> {words.verdict(r().verdict)}
                  </p>
                  <p>{t("noNotchSteps")}</p>
                </>
              )}
            </Show>
          </div>
        }
      >
        {(s) => (
          <main class="cab-main">
            <Show when={helpers().length > 0}>
              <div class="cab-driver" role="group" aria-label={tt("stepsFor")}>
                <button type="button" class="button" aria-pressed={who() === 0} onClick={() => setDriver(0)}>
                  {tt("headDriver")}
                </button>
                <For each={helpers()}>
                  {(h) => (
                    <button type="button" class="button" aria-pressed={who() === h.k} onClick={() => setDriver(h.k)}>
                      {capitalised(tt("groupDriver", { name: h.name }))}
                    </button>
                  )}
                </For>
              </div>
            </Show>
            <div class="cab-notch" aria-label={t("notchIs", { notch: notchText(notchFor(s())) })}>
              <span class="cab-notch-label">{who() === 0 ? t("notch") : tt("notchOfGroup", { name: s().groups?.[who()] ? groupWords(s().groups![who()]!.place) : "" })}</span>
              <span class="cab-notch-value">{notchText(notchFor(s()))}</span>
              <span class="cab-phase-line">{phaseLine(s().phase)}</span>
              <Show when={s().groups}>{(gs) => <span class="cab-groups" data-testid="cab-group-notches">{groupNotchesText(gs())}</span>}</Show>
            </div>
            <div class="cab-info">
              <Show when={who() !== 0 && s().groups?.[who()]}>{(g) => <p class="cab-advance" data-testid="helper-line">{helperLine(g())}</p>}</Show>
              <p class="cab-advance">{advanceLead(s(), props.units, props.target)}</p>
              <Show when={advanceOthers(s(), props.units).length > 0}>
                <p class="cab-others">{advanceOthers(s(), props.units).join(" · ")}</p>
              </Show>
              <dl class="cab-figures">
                <div>
                  <dt>{t("expectedSpeed")}</dt>
                  <dd>{show("speed", s().speedMps, props.units)}</dd>
                </div>
                <div classList={{ alert: s().slipRisk > props.slipThreshold }}>
                  <dt>{t("slipRisk")}</dt>
                  {/* Whole percent, as the step card, the why line and `taut plan` give it (9.9 % read 10 % there). */}
                  <dd>{percentOf(s().slipRisk, 0)}</dd>
                </div>
                <div>
                  <dt>{stillSlippingLabel()}</dt>
                  <dd>{stillSlipping(s())}</dd>
                </div>
              </dl>
              <p class="cab-why">
                <Figures text={whyText(s().why, props.units)} />
              </p>
              <p class="cab-clock" aria-label={t("timeInStep", { time: clock(props.stepSeconds) })}>
                <Icon name="clock" size={32} /> <span>{clock(props.stepSeconds)}</span>
                <span class="cab-small">{t("inThisStep")}</span>
              </p>
            </div>
          </main>
        )}
      </Show>

      <footer class="cab-nav">
        <button type="button" class="button huge" disabled={props.index <= 0 || count() === 0} onClick={() => props.onIndex(props.index - 1)}>
          <Icon name="back" size={36} /> {t("back")}
        </button>
        <Show
          when={props.index < count() - 1}
          fallback={
            <button type="button" class="button huge primary" onClick={() => props.onClose()}>
              {t("done")} <Icon name="next" size={36} />
            </button>
          }
        >
          <button type="button" class="button huge primary" onClick={() => props.onIndex(props.index + 1)}>
            {t("next")} <Icon name="next" size={36} />
          </button>
        </Show>
      </footer>
      <p class="cab-wake">{WAKE_TEXT[props.wakeLock]()}</p>

      <Show when={props.slipOpen && result()}>
        {(_) => (
          <SlipCard
            guidance={result()!.slipGuidance}
            units={props.units}
            step={step() ? { number: props.index + 1, notch: step()!.notch, fallbackNotch: step()!.fallbackNotch } : undefined}
            sanders={props.sanders ?? true}
            onClose={() => props.onSlip(false)}
          />
        )}
      </Show>
    </div>
  );
}
