/**
 * Start plan inputs, quick fill and files: the three demo cases (each the whole case, as in profiles/cases),
 * the train presets (the train only), and a case opened from or saved to a JSON file in the command line's
 * schema (`taut plan FILE` plans the same case).
 */
import { createSignal, For, Show, type JSX } from "solid-js";
import type { FieldIssue } from "../../../profiles/issues.js";
import type { Library } from "../../../profiles/library.js";
import type { StartCaseFile, TrainPresetFile } from "../../../profiles/schemas.js";
import { ErrorList } from "../../components/ErrorList.js";
import { Icon } from "../../components/Icon.js";
import { download } from "../../download.js";
import type { CaseSettings } from "../../state/caseDraft.js";
import type { CaseDraftStore } from "../../state/createCaseDraft.js";
import { loadDraftChecker, type DraftChecker } from "../../state/draftChecker.js";
import { caseFileName, caseFileText } from "./caseFile.js";

import { inputs } from "../../../i18n/en/inputs.js";
import { tr } from "../../i18n.js";

const t = tr.ns(inputs);

export interface PresetsSectionProps {
  store: CaseDraftStore;
  presets: readonly TrainPresetFile[];
  /** The demo cases (profiles/cases), each filled whole. */
  cases?: readonly StartCaseFile[];
  library?: Library;
  /** The app's safety settings, to say when an opened file's differ. */
  settings?: CaseSettings;
}

type Opened = { kind: "ok"; name: string; notes: string[] } | { kind: "bad"; message: string; issues: FieldIssue[]; localise: DraftChecker["localise"] } | null;

/** Quick fill: the demo cases and the presets; open and save a case file; the case's label once one is loaded. */
export function PresetsSection(props: PresetsSectionProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const [opened, setOpened] = createSignal<Opened>(null);
  let picker!: HTMLInputElement;
  const open = async (file: File) => {
    const text = await file.text();
    const settings = props.settings ?? { couplerSafetyFactor: 1.2, slipRiskThreshold: 0.1 };
    // The schemas load with the first file opened, not with the screen.
    const { readCaseFile } = await import("./openCaseFile.js");
    const r = props.library ? readCaseFile(file.name, text, props.library, settings) : { ok: false as const, message: "no library", issues: [] };
    if (!r.ok) {
      // The issues in the words of the language on screen, their figures in the file's own (metric) units.
      const { localise } = await loadDraftChecker();
      setOpened({ kind: "bad", message: r.message, issues: r.issues, localise });
      return;
    }
    s.loadCase(r.file);
    setOpened({ kind: "ok", name: file.name, notes: r.notes });
  };
  const save = () => {
    const json = s.caseJson();
    download(caseFileText(json), caseFileName(json), "application/json");
  };
  return (
    <section class="panel">
      <h2>{t("quickFill")}</h2>
      <Show when={(props.cases ?? []).length > 0}>
        <p class="muted">{t("casesNote")}</p>
        <div class="preset-row" data-quick="cases">
          <For each={props.cases}>
            {(c) => (
              <button type="button" class="button preset" data-case={c.id} onClick={() => (s.loadCase(c), setOpened(null))}>
                <span class="preset-name">
                  {caseName(c.label ?? c.id ?? "")}
                  <span class="visually-hidden">,</span>
                </span>{" "}
                <span class="preset-detail">{caseDetail(c.label ?? "")}</span>
              </button>
            )}
          </For>
        </div>
      </Show>
      <p class="muted">{t("trainsNote")}</p>
      <div class="preset-row" data-quick="trains">
        <For each={props.presets}>
          {(p) => (
            <button type="button" class="button preset" data-train={p.id} onClick={() => (s.applyPreset(p), setOpened(null))}>
              <span class="preset-name">
                {presetName(p.label)}
                <span class="visually-hidden">,</span>
              </span>{" "}
              <span class="preset-detail">{presetDetail(p.label)}</span>
            </button>
          )}
        </For>
      </div>
      <div class="file-actions case-files">
        <button type="button" class="button" onClick={() => picker.click()}>
          <Icon name="open" /> {t("openFile")}
        </button>
        <input
          ref={picker}
          class="visually-hidden"
          type="file"
          accept=".json,application/json"
          aria-label={t("fileToOpen")}
          tabIndex={-1}
          onChange={(e) => {
            const f = e.currentTarget.files?.[0];
            e.currentTarget.value = "";
            if (f) void open(f);
          }}
        />
        <button type="button" class="button" onClick={save}>
          <Icon name="ready" /> {t("saveFile")}
        </button>
      </div>
      <p class="muted small-print">{t("fileNote")}</p>
      <Show when={opened()} keyed>
        {(v) =>
          v.kind === "bad" ? (
            <div class="problem" role="alert">
              <p>{t("nothingChanged", { message: v.message })}</p>
              <ErrorList issues={v.issues.map((i) => v.localise(i, "metric"))} title={t("fileBreaks")} />
            </div>
          ) : (
            <div class="opened-case" role="status">
              <p>{t("opened", { name: v.name })}</p>
              <For each={v.notes}>{(n) => <p class="alert-text">{n}</p>}</For>
            </div>
          )
        }
      </Show>
      <Show when={d.label}>
        <p class="case-label">
          <strong>{d.label}</strong>
          <Show when={s.edited()}>{t("edited")}</Show>
        </p>
      </Show>
    </section>
  );
}

/** "Ore block, 5200 t, …" → "Ore block" and the rest. */
const presetName = (label: string) => label.split(",")[0]!.trim();
const presetDetail = (label: string) => label.split(",").slice(1).join(",").trim();

/** "Aggregate block leaving Ashvale Loop on a dry afternoon (illustrative)" → "Aggregate block" and "leaving Ashvale Loop on a dry afternoon". */
const CASE_SPLIT = / (?=leaving |restarting |starting |departing |out of )/;
const plain = (label: string) => label.replace(/\s*\(illustrative\)\s*$/, "").trim();
export const caseName = (label: string) => plain(label).split(CASE_SPLIT)[0]!.trim();
export const caseDetail = (label: string) => plain(label).split(CASE_SPLIT).slice(1).join(" ").trim();
