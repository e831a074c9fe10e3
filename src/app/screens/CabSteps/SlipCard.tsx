/**
 * "If wheels slip": for the step in hand, one headline in the order things are done — hold the notch while
 * the protection acts, and only if the slip keeps returning, drop to the fallback notch; then what the
 * driver does, in order; what the locomotive's protection does, as the reason for holding; and what to do
 * if the train stalls — from the plan's slip guidance.
 */
import { For, onCleanup, onMount, Show, type JSX } from "solid-js";
import { slipHeadline } from "../../../core/planner/slip.js";
import type { SlipGuidance } from "../../../core/planner/types.js";
import { Icon } from "../../components/Icon.js";
import { localiseText, type UnitSystem } from "../../format.js";
import { notchText } from "../../steps.js";
import { steps } from "../../../i18n/en/steps.js";
import { tr } from "../../i18n.js";
import { slipGuidanceText, slipHeadlineText } from "../../../i18n/renderSlip.js";
import { Figures } from "../../components/Figures.js";

const t = tr.ns(steps);

export interface SlipCardProps {
  guidance: SlipGuidance;
  units: UnitSystem;
  /** The step in hand (number from 1) and its notches, when there is one. */
  step?: { number: number; notch: number; fallbackNotch: number } | undefined;
  /** Whether the locomotives have sanders (the headline then says to sand). */
  sanders?: boolean;
  onClose: () => void;
}

export function SlipCard(props: SlipCardProps): JSX.Element {
  let heading!: HTMLHeadingElement;
  const onKey = (e: KeyboardEvent) => {
    if (e.key === "Escape") props.onClose();
  };
  onMount(() => {
    heading.focus();
    document.addEventListener("keydown", onKey);
  });
  onCleanup(() => document.removeEventListener("keydown", onKey));
  const g = () => props.guidance;
  const words = () => slipGuidanceText(tr, g());
  const empty = () => g().protection.length + g().driver.length + g().stall.length === 0;
  return (
    <div class="slip-card" role="dialog" aria-modal="true" aria-labelledby="slip-h">
      <div class="slip-head">
        <h2 id="slip-h" tabIndex={-1} ref={heading}>
          <Icon name="slip" size={36} /> {t("ifWheelsSlip")}
        </h2>
        <button type="button" class="button big" onClick={() => props.onClose()}>
          <Icon name="close" /> {t("close")}
        </button>
      </div>
      <Show when={props.step}>
        {(s) => {
          const h = () => slipHeadlineText(tr, slipHeadline(s().notch, s().fallbackNotch, props.sanders ?? true));
          const drops = () => s().notch > 0 && s().fallbackNotch > 0 && s().fallbackNotch < s().notch;
          return (
            <div class="slip-now">
              <p class="slip-step">
                {t("slipStep", { number: s().number, notch: notchText(s().notch) })}
              </p>
              <p class="slip-hold">
                <span class="slip-order" aria-hidden="true">1</span>
                <span>{h().hold}</span>
              </p>
              <p class="slip-then">
                <span class="slip-order" aria-hidden="true">2</span>
                <Show when={drops()} fallback={<span>{h().then}</span>}>
                  <span>
                    <span class="fallback-label">{t("stillSlippingDrop")}</span> <strong class="fallback-notch">{notchText(s().fallbackNotch)}</strong>
                  </span>
                </Show>
              </p>
            </div>
          );
        }}
      </Show>
      <div class="slip-lists">
        <SlipList title={t("slipDriver")} items={words().driver} units={props.units} lead />
        <SlipList title={t("slipProtection")} items={words().protection} units={props.units} bullets />
        <SlipList title={t("slipStall")} items={words().stall} units={props.units} />
      </div>
      <Show when={empty()}>
        <p class="placeholder-text">{t("slipNone")}</p>
      </Show>
      <div class="slip-foot">
        <button type="button" class="button huge" onClick={() => props.onClose()}>
          <Icon name="back" size={36} /> {t("backToStep")}
        </button>
      </div>
    </div>
  );
}

function SlipList(props: { title: string; items: readonly string[]; units: UnitSystem; lead?: boolean; bullets?: boolean }): JSX.Element {
  const items = () => <For each={props.items}>{(t) => (
        <li>
          <Figures text={localiseText(t, props.units)} />
        </li>
      )}</For>;
  return (
    <Show when={props.items.length > 0}>
      <section class="slip-list" classList={{ lead: props.lead === true, reason: props.bullets === true }}>
        <h3>{props.title}</h3>
        <Show when={props.bullets} fallback={<ol>{items()}</ol>}>
          <ul>{items()}</ul>
        </Show>
      </section>
    </Show>
  );
}
