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
import { notes } from "../../../i18n/en/notes.js";
import { tr } from "../../i18n.js";
import { recordProblemWords } from "./createNotesLibrary.js";

const t = tr.ns(notes);

const options = (): ReadonlyArray<{ value: ConflictChoice; label: string }> => [
  { value: "mine", label: t("cfKeepMine") },
  { value: "theirs", label: t("cfTakeTheirs") },
  { value: "both", label: t("cfKeepBoth") },
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
    return t("cfRevised", { date: r.date, initials: r.initials, change: r.change });
  };
  return (
    <div class="notes-dialog-backdrop">
      <div class="notes-dialog" role="dialog" aria-modal="true" aria-labelledby="notes-conflict-title">
        <h2 id="notes-conflict-title">
          {props.conflicts.length === 1 ? t("cfTitleOne") : t("cfTitleMany", { count: props.conflicts.length })}
        </h2>
        <p class="notes-hint">{t("cfHint")}</p>
        <div class="notes-row-actions">
          <button type="button" class="button small" onClick={() => all("mine")}>
            {t("cfKeepMineAll")}
          </button>
          <button type="button" class="button small" onClick={() => all("theirs")}>
            {t("cfTakeTheirsAll")}
          </button>
          <button type="button" class="button small" onClick={() => all("both")}>
            {t("cfKeepBothAll")}
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
                      <strong>{t("cfOnDevice")}</strong> {t("cfDamaged", { problem: c.damagedWhy ? recordProblemWords({ key: c.id, why: c.damagedWhy }) : String(c.damaged) })}
                    </p>
                  }
                >
                  {(mine) => (
                    <p>
                      <strong>{t("cfOnDevice")}</strong> {rev(mine())}
                    </p>
                  )}
                </Show>
                <p>
                  <strong>{t("cfInFile")}</strong> {rev(c.theirs)}
                  {c.mine && c.theirs.name !== c.mine.name ? t("cfNamed", { name: c.theirs.name }) : ""}
                </p>
                <Show when={c.sameRevision}>
                  <p class="notes-small">{t("cfSameRevision")}</p>
                </Show>
                <SegmentedButtons label={t("cfFor", { name: c.mine?.name ?? c.theirs.name })} hideLabel options={options()} value={choices[c.id] ?? ("" as ConflictChoice)} onChange={(v) => setChoices(c.id, v)} />
              </li>
            )}
          </For>
        </ul>
        <Show when={tried() && missing() > 0}>
          <p class="notes-issue-box" role="alert">
            {t("cfChooseMore", { count: missing() })}
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
            {t("cfImport")}
          </button>
          <button type="button" class="button" onClick={() => props.onDone(null)}>
            {t("cfCancel")}
          </button>
        </div>
      </div>
    </div>
  );
}
