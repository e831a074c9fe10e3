/**
 * Two ways out when stored inputs stop the app: the notice that the Start plan inputs kept on this device
 * could not be used (so the demo opened, the inputs set aside for export), and the screen shown instead
 * of a screen that failed to draw, with a way to set those inputs aside and reload. The location notes
 * live elsewhere (IndexedDB) and are never touched by either.
 */
import type { JSX } from "solid-js";
import { DRAFT_KEY, SET_ASIDE_KEY, type SetAsideDraft } from "../state/createCaseDraft.js";
import { read, safeLocalStorage, write } from "../state/createSettings.js";
import { shell } from "../../i18n/en/shell.js";
import { tr } from "../i18n.js";
import { download } from "../download.js";

const t = tr.ns(shell);


export function SetAsideNotice(props: { aside: SetAsideDraft; onDismiss: () => void }): JSX.Element {
  return (
    <div class="app-notice" role="alert">
      <p>
        <strong>{t("setAsideTitle")}</strong>
        {t("setAsideText", { reason: props.aside.reason })}
      </p>
      <button type="button" class="button" onClick={() => download(props.aside.text, "taut-start-plan-inputs-set-aside.json", "application/json")}>
        {t("setAsideExport")}
      </button>
      <button type="button" class="button" onClick={() => props.onDismiss()}>
        {t("ok")}
      </button>
    </div>
  );
}

/** Move the stored Start plan inputs aside (kept for export) and reload: the app opens on the demo case. */
export function setAsideAndReload(): void {
  const storage = safeLocalStorage();
  const text = read(storage, DRAFT_KEY);
  if (text !== null) write(storage, SET_ASIDE_KEY, text);
  try {
    storage?.removeItem(DRAFT_KEY);
  } catch {
    // nothing stored to remove
  }
  location.reload();
}

export function ScreenFailure(props: { error: unknown; onRetry: () => void }): JSX.Element {
  return (
    <div class="app-notice" role="alert">
      <p>
        <strong>{t("screenFailedTitle")}</strong>
        {t("screenFailedText", { error: props.error instanceof Error ? props.error.message : String(props.error) })}
      </p>
      <button type="button" class="button" onClick={() => props.onRetry()}>
        {t("tryAgain")}
      </button>
      <button type="button" class="button" onClick={() => setAsideAndReload()}>
        {t("setAsideReload")}
      </button>
    </div>
  );
}
