/**
 * A number input with its unit, optional −/+ steppers and the rule it breaks shown at the field. The
 * value lives in a file unit (t, mm, km/h…); the user sees and types display units (metric or US
 * customary) and the field converts both ways. While the user types, the text is theirs; it is
 * rewritten only when the value changes from elsewhere (a preset, a stepper, a switch of units).
 */
import { createEffect, createSignal, on, Show, type JSX } from "solid-js";
import { decimalsOf, fromDisplay, parseNumber, toDisplay, unitSymbol, type MeasureKey, type UnitSystem } from "../format.js";
import { Icon } from "./Icon.js";
import { shell } from "../../i18n/en/shell.js";
import { appLang, fieldNumber, tr } from "../i18n.js";

export interface QuantityFieldProps {
  label: string;
  /** Value in the file unit. */
  value: number;
  onValue: (fileValue: number) => void;
  units: UnitSystem;
  /** With a measure, the value converts; without, it is shown as is with `unit`. */
  measure?: MeasureKey;
  fileUnit?: string;
  unit?: string;
  /** Step of the −/+ buttons in display units; no buttons without it. */
  step?: number | { metric: number; us: number };
  /** Stepper bounds in display units. */
  min?: number;
  max?: number;
  /** Decimals shown (default: the measure's). */
  decimals?: number;
  integer?: boolean;
  issue?: string | undefined;
  hint?: JSX.Element;
  name?: string;
}

let counter = 0;
const t = tr.ns(shell);

export function QuantityField(props: QuantityFieldProps): JSX.Element {
  const id = `q-${++counter}`;
  const decimals = () => props.decimals ?? (props.integer ? 0 : props.measure ? decimalsOf(props.measure, props.units) : 2);
  const toShown = (v: number) => (props.measure && props.fileUnit ? toDisplay(props.measure, v, props.fileUnit, props.units) : v);
  const fromShown = (v: number) => (props.measure && props.fileUnit ? fromDisplay(props.measure, v, props.fileUnit, props.units) : v);
  /** Text for a value: rounded, without grouping, so it reads back unambiguously (a decimal comma in hu and de). */
  const textOf = (v: number) => (Number.isFinite(v) ? fieldNumber(toShown(v), decimals()) : "");
  const [text, setText] = createSignal(textOf(props.value));
  let lastSent = props.value;

  // A value set from elsewhere, or a change of units or of language, rewrites the text.
  let lastUnits = props.units;
  let lastLang = appLang();
  createEffect(
    on([() => props.value, () => props.units, appLang], ([v, units, lang]) => {
      const unitsChanged = units !== lastUnits || lang !== lastLang;
      lastUnits = units;
      lastLang = lang;
      if (unitsChanged || !(Object.is(v, lastSent) || (Number.isNaN(v) && Number.isNaN(lastSent)))) {
        lastSent = v;
        setText(textOf(v));
      }
    }, { defer: true }),
  );

  const send = (fileValue: number) => {
    lastSent = fileValue;
    props.onValue(fileValue);
  };

  const onInput = (t: string) => {
    setText(t);
    const n = parseNumber(t);
    send(Number.isNaN(n) ? Number.NaN : fromShown(n));
  };

  const stepOf = () => {
    const s = props.step;
    if (s === undefined) return undefined;
    return typeof s === "number" ? s : s[props.units];
  };

  const bump = (dir: 1 | -1) => {
    const s = stepOf()!;
    const cur = parseNumber(text());
    const base = Number.isNaN(cur) ? (props.min ?? 0) : cur;
    // Snap to the step grid, then move one step.
    let next = dir > 0 ? Math.floor(base / s + 1e-9) * s + s : Math.ceil(base / s - 1e-9) * s - s;
    if (props.min !== undefined) next = Math.max(props.min, next);
    if (props.max !== undefined) next = Math.min(props.max, next);
    next = Number(next.toFixed(6));
    setText(fieldNumber(next, decimals()));
    send(fromShown(next));
  };

  const unitText = () => (props.measure ? unitSymbol(props.measure, props.units) : (props.unit ?? ""));
  const canDown = () => {
    const cur = parseNumber(text());
    return props.min === undefined || Number.isNaN(cur) || cur > props.min + 1e-9;
  };
  const canUp = () => {
    const cur = parseNumber(text());
    return props.max === undefined || Number.isNaN(cur) || cur < props.max - 1e-9;
  };

  return (
    <div class="field" classList={{ invalid: !!props.issue }} data-field={props.name}>
      <label class="field-label" for={id}>
        {props.label}
        <Show when={unitText()}>
          <span class="visually-hidden"> ({unitText()})</span>
        </Show>
      </label>
      <div class="quantity">
        <Show when={stepOf() !== undefined}>
          <button type="button" class="step-button" aria-label={t("fieldLess", { label: props.label })} disabled={!canDown()} onClick={() => bump(-1)}>
            <Icon name="remove" size={28} />
          </button>
        </Show>
        <div class="quantity-input">
          <input
            id={id}
            name={props.name}
            type="text"
            inputmode={props.integer ? "numeric" : "decimal"}
            autocomplete="off"
            spellcheck={false}
            value={text()}
            onInput={(e) => onInput(e.currentTarget.value)}
            // A tap selects the figure, so a gloved finger replaces it instead of editing it.
            onFocus={(e) => e.currentTarget.select()}
            aria-invalid={props.issue ? "true" : undefined}
            aria-describedby={props.issue ? `${id}-issue` : undefined}
          />
          <Show when={unitText()}>
            <span class="unit" aria-hidden="true">
              {unitText()}
            </span>
          </Show>
        </div>
        <Show when={stepOf() !== undefined}>
          <button type="button" class="step-button" aria-label={t("fieldMore", { label: props.label })} disabled={!canUp()} onClick={() => bump(1)}>
            <Icon name="add" size={28} />
          </button>
        </Show>
      </div>
      <Show when={props.issue}>
        <p class="field-issue" id={`${id}-issue`} role="alert">
          {t("fieldIssue", { label: props.label, issue: props.issue ?? "" })}
        </p>
      </Show>
      <Show when={props.hint}>
        <p class="field-hint">{props.hint}</p>
      </Show>
    </div>
  );
}
