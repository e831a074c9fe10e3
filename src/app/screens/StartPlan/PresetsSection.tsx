/** Start plan inputs, quick fill: the demo case and the train presets, one tap each. */
import { For, Show, type JSX } from "solid-js";
import type { TrainPresetFile } from "../../../profiles/schemas.js";
import type { CaseDraftStore } from "../../state/createCaseDraft.js";

export interface PresetsSectionProps {
  store: CaseDraftStore;
  presets: readonly TrainPresetFile[];
}

/** Quick fill: the demo case and the presets; the case's label once one is loaded. */
export function PresetsSection(props: PresetsSectionProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  return (
    <section class="panel">
      <h2>Quick fill</h2>
      <p class="muted">One tap fills the locomotives and the train. Demo trains are illustrative.</p>
      <div class="preset-row">
        <button type="button" class="button preset" onClick={() => s.loadDemo()}>
          <span class="preset-name">
            Demo case<span class="visually-hidden">:</span>
          </span>{" "}
          <span class="preset-detail">train, place, rail and target</span>
        </button>
        <For each={props.presets}>
          {(p) => (
            <button type="button" class="button preset" onClick={() => s.applyPreset(p)}>
              <span class="preset-name">
                {presetName(p.label)}
                <span class="visually-hidden">,</span>
              </span>{" "}
              <span class="preset-detail">{presetDetail(p.label)}</span>
            </button>
          )}
        </For>
      </div>
      <Show when={d.label}>
        <p class="case-label">
          <strong>{d.label}</strong>
          <Show when={s.edited()}> — edited</Show>
        </p>
      </Show>
    </section>
  );
}

/** "Ore block, 5200 t, …" → "Ore block" and the rest. */
const presetName = (label: string) => label.split(",")[0]!.trim();
const presetDetail = (label: string) => label.split(",").slice(1).join(",").trim();
