/**
 * Two ways out when stored inputs stop the app: the notice that the Start plan inputs kept on this device
 * could not be used (so the demo opened, the inputs set aside for export), and the screen shown instead
 * of a screen that failed to draw, with a way to set those inputs aside and reload. The location notes
 * live elsewhere (IndexedDB) and are never touched by either.
 */
import type { JSX } from "solid-js";
import { DRAFT_KEY, SET_ASIDE_KEY, type SetAsideDraft } from "../state/createCaseDraft.js";
import { read, safeLocalStorage, write } from "../state/createSettings.js";

/** Offer text as a file download. */
function download(text: string, name: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: "application/json" }));
  const a = document.createElement("a");
  a.href = url;
  a.download = name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function SetAsideNotice(props: { aside: SetAsideDraft; onDismiss: () => void }): JSX.Element {
  return (
    <div class="app-notice" role="alert">
      <p>
        <strong>Your last Start plan inputs could not be read</strong> ({props.aside.reason}), so the demo case is open. They are kept on this device: export them to look at
        them or to send them with a report.
      </p>
      <button type="button" class="button" onClick={() => download(props.aside.text, "taut-start-plan-inputs-set-aside.json")}>
        Export the set-aside inputs
      </button>
      <button type="button" class="button" onClick={() => props.onDismiss()}>
        OK
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
        <strong>This screen could not be drawn</strong> ({props.error instanceof Error ? props.error.message : String(props.error)}). Your location notes are not affected.
        If it happens again, set the stored Start plan inputs aside (they are kept for export) and reload.
      </p>
      <button type="button" class="button" onClick={() => props.onRetry()}>
        Try again
      </button>
      <button type="button" class="button" onClick={() => setAsideAndReload()}>
        Set the inputs aside and reload
      </button>
    </div>
  );
}
