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

export function SaveConflictDialog(props: { conflict: SaveConflict; onChoose: (choice: ConflictChoice | null) => void }): JSX.Element {
  const theirs = () => props.conflict.theirs;
  const rev = () => {
    const t = theirs();
    if (!t) return "";
    const r = latestRevision(t.note);
    return `last revision ${r.date} by ${r.initials}: ${r.change}; saved ${new Date(t.savedAt).toLocaleString()}`;
  };
  const removed = () => !theirs() && !props.conflict.damaged;
  return (
    <div class="notes-dialog-backdrop">
      <div class="notes-dialog" role="dialog" aria-modal="true" aria-labelledby="notes-save-conflict-title">
        <h2 id="notes-save-conflict-title">
          {removed() ? "This note was removed elsewhere while you edited it" : props.conflict.damaged ? "The stored note is damaged" : "This note was saved elsewhere while you edited it"}
        </h2>
        <Show when={theirs()}>
          <p>
            Another tab or window of Taut on this device saved <strong>{theirs()!.note.name}</strong> after you opened it ({rev()}). Saving now would lose that change.
          </p>
        </Show>
        <Show when={props.conflict.damaged}>
          <p>The note stored under this id cannot be read ({props.conflict.damaged!.message}). Export it from the library first if you may want what it holds.</p>
        </Show>
        <Show when={removed()}>
          <p>Another tab or window of Taut on this device removed it after you opened it.</p>
        </Show>
        <div class="notes-row-actions">
          <button type="button" class="button primary" onClick={() => props.onChoose("mine")}>
            {removed() ? "Save mine again" : "Keep mine"}
          </button>
          <Show when={theirs()}>
            <button type="button" class="button" onClick={() => props.onChoose("theirs")}>
              Take theirs
            </button>
          </Show>
          <Show when={removed()}>
            <button type="button" class="button" onClick={() => props.onChoose("theirs")}>
              Leave it removed
            </button>
          </Show>
          <Show when={!removed()}>
            <button type="button" class="button" onClick={() => props.onChoose("both")}>
              Keep both
            </button>
          </Show>
          <button type="button" class="button" onClick={() => props.onChoose(null)}>
            Not now
          </button>
        </div>
        <p class="notes-small">Keep mine writes your edit over it; take theirs drops your edit and opens the stored note; keep both saves your edit as a copy with a new name.</p>
      </div>
    </div>
  );
}
