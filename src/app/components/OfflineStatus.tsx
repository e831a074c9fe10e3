/** "Ready offline", "Offline", or "Saving for offline use…", in the top bar. */
import { Show, type JSX } from "solid-js";
import type { Observation } from "../state/createConnection.js";
import type { OfflineState } from "../state/createOffline.js";
import { Icon } from "./Icon.js";

/** Hours and minutes, written out (no Intl: its locale data would load for this alone). */
function clock(at: number): string {
  const d = new Date(at);
  return `${String(d.getHours()).padStart(2, "0")}:${String(d.getMinutes()).padStart(2, "0")}`;
}

/** What the status rests on, in words: the device's own report, or the app's last request to its server. */
export function observationText(o: Observation): string {
  if (o.source === "browser") return o.online ? "The device reports a network connection" : "The device reports no network connection";
  return o.online ? `The server answered at ${clock(o.at)}` : `No answer from the server at ${clock(o.at)}`;
}

export function OfflineStatus(props: { offline: OfflineState }): JSX.Element {
  const o = props.offline;
  const text = () => {
    if (!o.supported) return "Online only";
    if (!o.online()) return o.ready() ? "Offline — working from the saved copy" : "Offline";
    return o.ready() ? "Ready offline" : "Saving for offline use…";
  };
  return (
    <p
      class="offline-status"
      classList={{ ready: o.ready(), away: !o.online() }}
      role="status"
      data-ready={o.ready() ? "yes" : "no"}
      data-online={o.online() ? "yes" : "no"}
      title={o.supported ? observationText(o.observation()) : undefined}
    >
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
