/** A row of large buttons of which one is chosen (a radio group), with optional icons above the words. */
import { For, Show, type JSX } from "solid-js";
import { Icon, type IconName } from "./Icon.js";

export interface Segment<T extends string> {
  value: T;
  label: string;
  icon?: IconName;
}

export interface SegmentedButtonsProps<T extends string> {
  label: string;
  options: readonly Segment<T>[];
  value: T;
  onChange: (value: T) => void;
  /** Icons stacked above the words, for big pickers (rail condition). */
  tall?: boolean;
  hideLabel?: boolean;
  issue?: string | undefined;
  name?: string;
}

export function SegmentedButtons<T extends string>(props: SegmentedButtonsProps<T>): JSX.Element {
  const id = `seg-${Math.random().toString(36).slice(2, 9)}`;
  let group!: HTMLDivElement;
  // Arrow keys move the choice, as in a radio group.
  const onKey = (e: KeyboardEvent) => {
    const k = props.options.findIndex((o) => o.value === props.value);
    const step = e.key === "ArrowRight" || e.key === "ArrowDown" ? 1 : e.key === "ArrowLeft" || e.key === "ArrowUp" ? -1 : 0;
    if (step === 0) return;
    e.preventDefault();
    const next = props.options[(k + step + props.options.length) % props.options.length]!;
    props.onChange(next.value);
    queueMicrotask(() => (group.querySelector('[aria-checked="true"]') as HTMLElement | null)?.focus());
  };
  return (
    <div class="field" data-field={props.name}>
      <Show when={!props.hideLabel}>
        <span class="field-label" id={`${id}-label`}>
          {props.label}
        </span>
      </Show>
      <div
        ref={group}
        class="segmented"
        classList={{ tall: props.tall === true }}
        role="radiogroup"
        aria-labelledby={props.hideLabel ? undefined : `${id}-label`}
        aria-label={props.hideLabel ? props.label : undefined}
        onKeyDown={onKey}
      >
        <For each={props.options}>
          {(o) => (
            <button
              type="button"
              role="radio"
              aria-checked={o.value === props.value}
              tabIndex={o.value === props.value ? 0 : -1}
              class="segment"
              onClick={() => props.onChange(o.value)}
            >
              <Show when={o.icon}>{(name) => <Icon name={name()} size={props.tall ? 36 : 22} />}</Show>
              <span>{o.label}</span>
            </button>
          )}
        </For>
      </div>
      <Show when={props.issue}>
        <p class="field-issue" role="alert">
          {props.issue}
        </p>
      </Show>
    </div>
  );
}
