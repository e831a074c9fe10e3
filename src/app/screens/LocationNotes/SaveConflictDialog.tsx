/**
 * The question a save asks when the note changed on this device since it was opened (another tab or
 * window saved or removed it): keep mine (write this edit over it), take theirs (drop this edit and open
 * the stored note) or keep both (this edit saved as a copy under a new id). Nothing is written until the
 * trainer chooses; closing the question keeps the edit open.
 */
import { Show, type JSX } from "solid-js";
import type { ConflictChoice } from "../../../notes/merge.js";
import type { SaveConflict } from "../../../notes/store.js";
import { latestRevision } from "../../../profiles/notes.js";
import { notes } from "../../../i18n/en/notes.js";
import { LOCALE_TAGS } from "../../../i18n/language.js";
import { appLang, tr } from "../../i18n.js";
import { kept, rich } from "../shared/rich.js";
import { recordProblemWords } from "./createNotesLibrary.js";

const n = tr.ns(notes);

export function SaveConflictDialog(props: { conflict: SaveConflict; onChoose: (choice: ConflictChoice | null) => void }): JSX.Element {
  const theirs = () => props.conflict.theirs;
  const rev = () => {
    const t = theirs();
    if (!t) return "";
    const r = latestRevision(t.note);
    return n("scLastRevision", { date: r.date, initials: r.initials, change: r.change, savedAt: new Date(t.savedAt).toLocaleString(LOCALE_TAGS[appLang()]) });
  };
  const removed = () => !theirs() && !props.conflict.damaged;
  return (
    <div class="notes-dialog-backdrop">
      <div class="notes-dialog" role="dialog" aria-modal="true" aria-labelledby="notes-save-conflict-title">
        <h2 id="notes-save-conflict-title">
          {removed() ? n("scRemovedTitle") : props.conflict.damaged ? n("scDamagedTitle") : n("scSavedTitle")}
        </h2>
        <Show when={theirs()}>
          <p>
            {rich(n("scSavedText", kept("name", "revision")), { name: <strong>{theirs()!.note.name}</strong>, revision: rev() })}
          </p>
        </Show>
        <Show when={props.conflict.damaged}>
          <p>{n("scDamagedText", { problem: recordProblemWords(props.conflict.damaged!) })}</p>
        </Show>
        <Show when={removed()}>
          <p>{n("scRemovedText")}</p>
        </Show>
        <div class="notes-row-actions">
          <button type="button" class="button primary" onClick={() => props.onChoose("mine")}>
            {removed() ? n("scSaveAgain") : n("cfKeepMine")}
          </button>
          <Show when={theirs()}>
            <button type="button" class="button" onClick={() => props.onChoose("theirs")}>
              {n("cfTakeTheirs")}
            </button>
          </Show>
          <Show when={removed()}>
            <button type="button" class="button" onClick={() => props.onChoose("theirs")}>
              {n("scLeaveRemoved")}
            </button>
          </Show>
          <Show when={!removed()}>
            <button type="button" class="button" onClick={() => props.onChoose("both")}>
              {n("cfKeepBoth")}
            </button>
          </Show>
          <button type="button" class="button" onClick={() => props.onChoose(null)}>
            {n("scNotNow")}
          </button>
        </div>
        <p class="notes-small">{n("scHint")}</p>
      </div>
    </div>
  );
}
