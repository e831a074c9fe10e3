/**
 * The question an import asks when a note in the file shares its id with one on this device but carries
 * another revision: keep mine, take theirs, or keep both (the file's note then gets a new id). Nothing is
 * written until every conflict has an answer and the trainer confirms.
 */
import { createSignal, For, Show, type JSX } from "solid-js";
import { createStore } from "solid-js/store";
import { latestRevision } from "../../../profiles/notes.js";
import type { ConflictChoice, ImportConflict } from "../../../notes/merge.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";

const OPTIONS: ReadonlyArray<{ value: ConflictChoice; label: string }> = [
  { value: "mine", label: "Keep mine" },
  { value: "theirs", label: "Take theirs" },
  { value: "both", label: "Keep both" },
];

export function ConflictDialog(props: { conflicts: readonly ImportConflict[]; onDone: (choices: Record<string, ConflictChoice> | null) => void }): JSX.Element {
  const [choices, setChoices] = createStore<Record<string, ConflictChoice>>({});
  const [tried, setTried] = createSignal(false);
  const missing = () => props.conflicts.filter((c) => choices[c.id] === undefined).length;
  const all = (c: ConflictChoice) => {
    for (const x of props.conflicts) setChoices(x.id, c);
  };
  const rev = (n: ImportConflict["theirs"]) => {
    const r = latestRevision(n);
    return `revised ${r.date} by ${r.initials}: ${r.change}`;
  };
  return (
    <div class="notes-dialog-backdrop">
      <div class="notes-dialog" role="dialog" aria-modal="true" aria-labelledby="notes-conflict-title">
        <h2 id="notes-conflict-title">
          {props.conflicts.length === 1 ? "A note in the file differs from yours" : `${props.conflicts.length} notes in the file differ from yours`}
        </h2>
        <p class="notes-hint">Same place, another revision. Choose for each: keep mine (ignore the file's), take theirs (replace mine), or keep both (the file's is added as a copy).</p>
        <div class="notes-row-actions">
          <button type="button" class="button small" onClick={() => all("mine")}>
            Keep mine for all
          </button>
          <button type="button" class="button small" onClick={() => all("theirs")}>
            Take theirs for all
          </button>
          <button type="button" class="button small" onClick={() => all("both")}>
            Keep both for all
          </button>
        </div>
        <ul class="notes-conflicts">
          <For each={props.conflicts}>
            {(c) => (
              <li>
                <h3>{c.mine?.name ?? c.theirs.name}</h3>
                <Show
                  when={c.mine}
                  fallback={
                    <p>
                      <strong>On this device:</strong> a damaged record of this id that cannot be shown ({c.damaged}). Keep mine leaves it as it is (export it raw from the library first if you may want it); take theirs replaces it.
                    </p>
                  }
                >
                  {(mine) => (
                    <p>
                      <strong>On this device:</strong> {rev(mine())}
                    </p>
                  )}
                </Show>
                <p>
                  <strong>In the file:</strong> {rev(c.theirs)}
                  {c.mine && c.theirs.name !== c.mine.name ? ` (named "${c.theirs.name}")` : ""}
                </p>
                <Show when={c.sameRevision}>
                  <p class="notes-small">Both carry the same last revision entry, yet they differ: one was changed without a new revision entry.</p>
                </Show>
                <SegmentedButtons label={`For ${c.mine?.name ?? c.theirs.name}`} hideLabel options={OPTIONS} value={choices[c.id] ?? ("" as ConflictChoice)} onChange={(v) => setChoices(c.id, v)} />
              </li>
            )}
          </For>
        </ul>
        <Show when={tried() && missing() > 0}>
          <p class="notes-issue-box" role="alert">
            Choose for {missing()} more note{missing() === 1 ? "" : "s"} first.
          </p>
        </Show>
        <div class="notes-row-actions">
          <button
            type="button"
            class="button primary"
            onClick={() => {
              setTried(true);
              if (missing() === 0) props.onDone({ ...choices });
            }}
          >
            Import with these choices
          </button>
          <button type="button" class="button" onClick={() => props.onDone(null)}>
            Cancel import
          </button>
        </div>
      </div>
    </div>
  );
}
