/**
 * "If wheels slip": the fallback notch of the step in hand, then what the locomotive's protection does,
 * what the driver does, and what to do if the train stalls — from the plan's slip guidance.
 */
import { For, onCleanup, onMount, Show, type JSX } from "solid-js";
import type { SlipGuidance } from "../../../core/planner/types.js";
import { Icon } from "../../components/Icon.js";
import { localiseText, type UnitSystem } from "../../format.js";
import { notchText } from "../../steps.js";

export interface SlipCardProps {
  guidance: SlipGuidance;
  units: UnitSystem;
  /** The step in hand (number from 1) and its notches, when there is one. */
  step?: { number: number; notch: number; fallbackNotch: number } | undefined;
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
  const empty = () => g().protection.length + g().driver.length + g().stall.length === 0;
  return (
    <div class="slip-card" role="dialog" aria-modal="true" aria-labelledby="slip-h">
      <div class="slip-head">
        <h2 id="slip-h" tabIndex={-1} ref={heading}>
          <Icon name="slip" size={36} /> If wheels slip
        </h2>
        <button type="button" class="button big" onClick={() => props.onClose()}>
          <Icon name="close" /> Close
        </button>
      </div>
      <Show when={props.step}>
        {(s) => (
          <p class="slip-fallback">
            Step {s().number}, notch {notchText(s().notch)}: <span class="fallback-label">drop to notch</span> <strong class="fallback-notch">{notchText(s().fallbackNotch)}</strong>
          </p>
        )}
      </Show>
      <div class="slip-lists">
        <SlipList title="What the locomotive does" items={g().protection} units={props.units} />
        <SlipList title="What you do" items={g().driver} units={props.units} />
        <SlipList title="If the train stalls" items={g().stall} units={props.units} />
      </div>
      <Show when={empty()}>
        <p class="placeholder-text">This plan carries no slip guidance. Follow the locomotive's own instructions and your railway's rules.</p>
      </Show>
      <div class="slip-foot">
        <button type="button" class="button huge" onClick={() => props.onClose()}>
          <Icon name="back" size={36} /> Back to the step
        </button>
      </div>
    </div>
  );
}

function SlipList(props: { title: string; items: readonly string[]; units: UnitSystem }): JSX.Element {
  return (
    <Show when={props.items.length > 0}>
      <section class="slip-list">
        <h3>{props.title}</h3>
        <ol>
          <For each={props.items}>{(t) => <li>{localiseText(t, props.units)}</li>}</For>
        </ol>
      </section>
    </Show>
  );
}
