/** "Ready offline", "Offline", or "Saving for offline use…", in the top bar. */
import { Show, type JSX } from "solid-js";
import type { Observation } from "../state/createConnection.js";
import type { OfflineState } from "../state/createOffline.js";
import { Icon } from "./Icon.js";
import { shell } from "../../i18n/en/shell.js";
import { tr } from "../i18n.js";

const t = tr.ns(shell);

/** Hours and minutes, written out (no Intl: its locale data would load for this alone). */
function clock(at: number): string {
  const d = new Date(at);
  return `${String(d.getHours()).padStart(2, "0")}:${String(d.getMinutes()).padStart(2, "0")}`;
}

/** What the status rests on, in words: the device's own report, or the app's last request to its server. */
export function observationText(o: Observation): string {
  if (o.source === "browser") return o.online ? t("deviceOnline") : t("deviceOffline");
  return o.online ? t("serverAnswered", { time: clock(o.at) }) : t("serverSilent", { time: clock(o.at) });
}

export function OfflineStatus(props: { offline: OfflineState }): JSX.Element {
  const o = props.offline;
  const text = () => {
    if (!o.supported) return t("onlineOnly");
    if (!o.online()) return o.ready() ? t("offlineSaved") : t("offline");
    return o.ready() ? t("readyOffline") : t("savingOffline");
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
            {t("updateTitle")}
          </p>
          <p id="update-text">{t("updateText")}</p>
        </div>
        <button type="button" class="button primary" onClick={() => void props.offline.update()}>
          {t("updateNow")}
        </button>
        <button type="button" class="button" onClick={() => props.offline.later()}>
          {t("updateLater")}
        </button>
      </div>
    </Show>
  );
}
