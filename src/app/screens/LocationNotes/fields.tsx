/** Small form controls of the notes editor: a labelled text field or text area, and a labelled select. */
import { For, Show, type JSX } from "solid-js";

let counter = 0;
const nextId = (p: string) => `${p}-${++counter}`;

export function TextField(props: {
  label: string;
  value: string;
  onValue: (v: string) => void;
  name?: string;
  issue?: string | undefined;
  hint?: string;
  multiline?: boolean;
  rows?: number;
  maxLength?: number;
  placeholder?: string;
  class?: string;
}): JSX.Element {
  const id = nextId("nt");
  return (
    <div class={`field notes-field ${props.class ?? ""}`} classList={{ invalid: !!props.issue }} data-field={props.name}>
      <label class="field-label" for={id}>
        {props.label}
      </label>
      <Show
        when={props.multiline}
        fallback={
          <input
            id={id}
            name={props.name}
            type="text"
            value={props.value}
            maxLength={props.maxLength}
            placeholder={props.placeholder}
            aria-invalid={props.issue ? "true" : undefined}
            aria-describedby={props.issue ? `${id}-issue` : undefined}
            onInput={(e) => props.onValue(e.currentTarget.value)}
          />
        }
      >
        <textarea
          id={id}
          name={props.name}
          rows={props.rows ?? 4}
          value={props.value}
          maxLength={props.maxLength}
          placeholder={props.placeholder}
          aria-invalid={props.issue ? "true" : undefined}
          aria-describedby={props.issue ? `${id}-issue` : undefined}
          onInput={(e) => props.onValue(e.currentTarget.value)}
        />
      </Show>
      <Show when={props.issue}>
        <p class="field-issue" id={`${id}-issue`} role="alert">
          {props.issue}
        </p>
      </Show>
      <Show when={props.hint}>
        <p class="field-hint">{props.hint}</p>
      </Show>
    </div>
  );
}

export function SelectField<T extends string>(props: {
  label: string;
  value: T;
  options: ReadonlyArray<{ value: T; label: string }>;
  onValue: (v: T) => void;
  name?: string;
  class?: string;
}): JSX.Element {
  const id = nextId("ns");
  return (
    <div class={`field notes-field ${props.class ?? ""}`} data-field={props.name}>
      <label class="field-label" for={id}>
        {props.label}
      </label>
      <select class="select" id={id} name={props.name} value={props.value} onChange={(e) => props.onValue(e.currentTarget.value as T)}>
        <For each={props.options}>{(o) => <option value={o.value} selected={o.value === props.value}>{o.label}</option>}</For>
      </select>
    </div>
  );
}
