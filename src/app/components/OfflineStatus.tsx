/** "Ready offline", "Offline", or "Saving for offline use…", in the top bar. */
import { Show, type JSX } from "solid-js";
import type { OfflineState } from "../state/createOffline.js";
import { Icon } from "./Icon.js";

export function OfflineStatus(props: { offline: OfflineState }): JSX.Element {
  const o = props.offline;
  const text = () => {
    if (!o.supported) return "Online only";
    if (!o.online()) return o.ready() ? "Offline — working from the saved copy" : "Offline";
    return o.ready() ? "Ready offline" : "Saving for offline use…";
  };
  return (
    <p class="offline-status" classList={{ ready: o.ready(), away: !o.online() }} role="status" data-ready={o.ready() ? "yes" : "no"}>
      <Icon name={o.online() ? "ready" : "offline"} size={20} />
      <span>{text()}</span>
      <Show when={o.problem()}>
        <span class="visually-hidden">{o.problem()}</span>
      </Show>
    </p>
  );
}

/** Asks before updating: a new version is installed and waits for the user's word. */
export function UpdatePrompt(props: { offline: OfflineState }): JSX.Element {
  return (
    <Show when={props.offline.updateWaiting()}>
      <div class="update-prompt" role="alertdialog" aria-labelledby="update-title" aria-describedby="update-text">
        <Icon name="update" size={28} />
        <div>
          <p id="update-title" class="update-title">
            A new version of Taut is ready
          </p>
          <p id="update-text">Update now (the page reloads; your inputs are kept), or later — the current version keeps working offline.</p>
        </div>
        <button type="button" class="button primary" onClick={() => void props.offline.update()}>
          Update now
        </button>
        <button type="button" class="button" onClick={() => props.offline.later()}>
          Later
        </button>
      </div>
    </Show>
  );
}
