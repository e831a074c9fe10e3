/** A large on/off button with its state in words (not a tiny checkbox). */
import type { JSX } from "solid-js";
import { Icon, type IconName } from "./Icon.js";
import { shell } from "../../i18n/en/shell.js";
import { tr } from "../i18n.js";

const t = tr.ns(shell);

export function Toggle(props: { label: string; on: boolean; onChange: (on: boolean) => void; icon?: IconName; onText?: string; offText?: string; name?: string }): JSX.Element {
  return (
    <div class="field" data-field={props.name}>
      <button type="button" class="toggle" aria-pressed={props.on} onClick={() => props.onChange(!props.on)}>
        {props.icon && <Icon name={props.icon} size={28} />}
        <span class="toggle-label">{props.label}</span>
        <span class="toggle-state">{props.on ? (props.onText ?? t("on")) : (props.offText ?? t("off"))}</span>
      </button>
    </div>
  );
}
