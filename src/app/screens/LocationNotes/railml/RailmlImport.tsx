/**
 * Import from railML (props → JSX): pick a railML 2.x file (read in a worker, with progress and Cancel),
 * choose where the front of the standing train is (an operational point, a line position or a position on
 * a track), which way it goes and how far behind and ahead to take, see the stretch on the profile sketch
 * with the reference train on it, then save it as a new note or open it in the editor first.
 */
import { createMemo, createSignal, For, Match, Show, Switch, type JSX } from "solid-js";
import type { Library as ProfileLibrary } from "../../../../profiles/library.js";
import type { Stretch } from "../../../../profiles/railml/index.js";
import { referenceCase } from "../../../../profiles/referenceTrain.js";
import type { TrainPresetFile } from "../../../../profiles/schemas.js";
import { QuantityField } from "../../../components/QuantityField.js";
import { SegmentedButtons } from "../../../components/SegmentedButtons.js";
import { formatNumber, show, type UnitSystem } from "../../../format.js";
import { SelectField, TextField } from "../fields.js";
import { profileModel } from "../profileModel.js";
import { ProfileSketch } from "../ProfileSketch.js";
import type { FrontKind, RailmlImport } from "./createRailmlImport.js";
import { hazardWord } from "../draft.js";
import { notes } from "../../../../i18n/en/notes.js";
import { tr } from "../../../i18n.js";
import { railmlWords } from "../../../../profiles/railml/text.js";
import { localiseIssue } from "../../../fieldWords.js";

const t = tr.ns(notes);

export interface RailmlImportProps {
  imp: RailmlImport;
  units: UnitSystem;
  presets: readonly TrainPresetFile[];
  library: ProfileLibrary;
  busy: boolean;
  onSave: (s: Stretch) => void;
  onEdit: (s: Stretch) => void;
  onClose: () => void;
}

export function RailmlImportView(props: RailmlImportProps): JSX.Element {
  let fileInput!: HTMLInputElement;
  const imp = () => props.imp;
  const c = () => imp().choice;
  const u = () => props.units;
  const dist = (m: number) => show("distance", m, u());
  const stretch = () => {
    const r = imp().result();
    return r?.ok ? r.value : undefined;
  };
  const [showAll, setShowAll] = createSignal(false);
  const placed = createMemo(() => {
    const s = stretch();
    if (!s) return undefined;
    const geometry = { segments: s.segments, frontAt_m: s.frontAt_m, clearAhead_m: s.aheadM, ...(s.speedLimit_kmh !== undefined ? { speedLimit_kmh: s.speedLimit_kmh } : {}) };
    const r = referenceCase(geometry, props.presets, props.library);
    return { model: profileModel({ ...geometry, hazards: s.hazards }, r.ok ? r.value : undefined), issues: r.ok ? undefined : r.issues };
  });
  const kinds = (): Array<{ value: FrontKind; label: string }> => [
    ...((imp().summary()?.ocps.length ?? 0) > 0 ? [{ value: "ocp" as const, label: t("rmOcp") }] : []),
    { value: "absPos", label: t("rmAbsPos") },
    { value: "pos", label: t("rmPos") },
  ];

  return (
    <section class="panel notes-section notes-railml" aria-labelledby="notes-railml-title">
      <h2 id="notes-railml-title">{t("rmTitle")}</h2>
      <p class="notes-hint">{t("rmHint")}</p>

      <div class="notes-row-actions">
        <button type="button" class="button primary" disabled={imp().phase() === "reading"} onClick={() => fileInput.click()}>
          {imp().phase() === "pick" ? t("rmChoose") : t("rmChooseAnother")}
        </button>
        <input
          ref={fileInput}
          class="visually-hidden"
          type="file"
          accept=".xml,.railml,.railML,application/xml,text/xml"
          aria-label={t("rmFileLabel")}
          tabIndex={-1}
          onChange={(e) => {
            const f = e.currentTarget.files?.[0];
            e.currentTarget.value = "";
            if (f) imp().pick(f);
          }}
        />
        <button type="button" class="button" onClick={() => props.onClose()}>
          {t("backToLibrary")}
        </button>
      </div>

      <Switch>
        <Match when={imp().phase() === "reading"}>
          <p class="notes-hint" aria-live="polite">
            {t("rmReading", { file: imp().fileName() })}
          </p>
          <div class="progress" role="progressbar" aria-label={t("rmReadLabel")} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(imp().progress() * 100)}>
            <span style={{ width: `${Math.max(4, imp().progress() * 100)}%` }} />
          </div>
          <div class="notes-row-actions">
            <button type="button" class="button" onClick={() => imp().cancel()}>
              {t("cfCancel")}
            </button>
          </div>
        </Match>
        <Match when={imp().phase() === "failed"}>
          <p class="notes-issue-box" role="alert">
            {imp().fileName()}: {imp().problem()?.()}
          </p>
        </Match>
        <Match when={imp().phase() === "ready" && imp().summary()}>
          {(sum) => (
            <>
              <p class="notes-small">
                {t("rmSummary", { file: imp().fileName(), version: sum().version || "2", tracks: formatNumber(sum().tracks, 0), gradients: formatNumber(sum().gradientChanges, 0), radii: formatNumber(sum().radiusChanges, 0) })}
                {sum().absPosRange ? t("rmLinePositions", { min: dist(sum().absPosRange!.min), max: dist(sum().absPosRange!.max) }) : ""}.
              </p>
              <Show when={sum().warningTexts.length > 0}>
                <ul class="notes-small">
                  <For each={sum().warningTexts}>{(w) => <li>{railmlWords(tr, w)}</li>}</For>
                </ul>
              </Show>

              <div class="notes-grid">
                <SegmentedButtons label={t("rmWhereFront")} options={kinds()} value={c().kind} onChange={(k) => imp().setChoice("kind", k)} name="railml.kind" />
                <Switch>
                  <Match when={c().kind === "ocp"}>
                    <SelectField
                      label={t("rmOcp")}
                      name="railml.ocp"
                      value={c().ocp}
                      options={sum().ocps.map((o) => ({ value: o.id, label: o.label }))}
                      class="wide"
                      onValue={(v) => {
                        imp().setChoice("ocp", v);
                        imp().setChoice("name", sum().ocps.find((o) => o.id === v)?.label ?? v);
                      }}
                    />
                  </Match>
                  <Match when={c().kind === "absPos"}>
                    <QuantityField label={t("rmAbsPosLabel")} name="railml.absPos" value={c().absPos} units={u()} measure="distance" fileUnit="m" onValue={(v) => imp().setChoice("absPos", v)} />
                  </Match>
                  <Match when={c().kind === "pos"}>
                    <QuantityField label={t("rmPosLabel")} name="railml.pos" value={c().pos} units={u()} measure="distance" fileUnit="m" onValue={(v) => imp().setChoice("pos", v)} />
                  </Match>
                </Switch>
                <TextField
                  label={c().kind === "pos" ? t("rmTrack") : t("rmTrackSeveral")}
                  name="railml.track"
                  value={c().track}
                  onValue={(v) => imp().setChoice("track", v)}
                  maxLength={200}
                />
                <SegmentedButtons
                  label={t("rmDirection")}
                  options={[
                    { value: "up", label: t("rmUp") },
                    { value: "down", label: t("rmDown") },
                  ]}
                  value={c().direction}
                  onChange={(d) => imp().setChoice("direction", d)}
                  name="railml.direction"
                />
                <QuantityField label={t("rmBehind")} name="railml.behind" value={c().behindM} units={u()} measure="distance" fileUnit="m" step={{ metric: 100, us: 300 }} min={0} onValue={(v) => imp().setChoice("behindM", v)} />
                <QuantityField label={t("rmAhead")} name="railml.ahead" value={c().aheadM} units={u()} measure="distance" fileUnit="m" step={{ metric: 100, us: 300 }} min={0} onValue={(v) => imp().setChoice("aheadM", v)} />
                <TextField label={t("rmName")} name="railml.name" value={c().name} onValue={(v) => imp().setChoice("name", v)} maxLength={120} class="wide" />
              </div>

              <Show when={imp().result()} fallback={<p class="notes-hint">{t("rmMaking")}</p>}>
                {(r) => (
                  <Show when={stretch()} fallback={<p class="notes-issue-box" role="alert">{(() => { const x = r(); return x.ok ? "" : x.words(); })()}</p>}>
                    {(s) => (
                      <div class="notes-railml-preview" aria-label={t("rmPreviewLabel")}>
                        <p class="notes-small">
                          {t("rmStretch", { behind: dist(s().behindM), ahead: dist(s().aheadM), front: railmlWords(tr, s().frontText), count: s().segments.length })}
                          {s().speedLimit_kmh !== undefined ? t("rmSpeedLimit", { speed: show("speed", s().speedLimit_kmh! / 3.6, u(), 0) }) : ""}.
                        </p>
                        <Show when={placed()?.model}>{(m) => <ProfileSketch model={m()} units={u()} />}</Show>
                        <Show when={placed()?.issues}>
                          {(issues) => <p class="notes-issue-box">{issues().map((i) => localiseIssue(i, u()).message).join("; ")}</p>}
                        </Show>
                        <Show when={s().noteTexts.length > 0}>
                          <ul class="notes-small">
                            <For each={s().noteTexts}>{(n) => <li>{railmlWords(tr, n)}</li>}</For>
                          </ul>
                        </Show>
                        <table class="notes-railml-segs">
                          <caption>{t("rmSegsCaption")}</caption>
                          <thead>
                            <tr>
                              <th scope="col">{t("rmFrom")}</th>
                              <th scope="col">{t("rmLength")}</th>
                              <th scope="col">{t("rmGradient")}</th>
                              <th scope="col">{t("rmCurve")}</th>
                            </tr>
                          </thead>
                          <tbody>
                            <For each={showAll() ? s().segments : s().segments.slice(0, 12)}>
                              {(g) => (
                                <tr>
                                  <td>{dist(g.from_m)}</td>
                                  <td>{dist(g.length_m)}</td>
                                  <td>{show("grade", g.gradient_permille / 1000, u())}</td>
                                  <td>{g.curveRadius_m > 0 ? show("radius", g.curveRadius_m, u()) : t("rmStraight")}</td>
                                </tr>
                              )}
                            </For>
                          </tbody>
                        </table>
                        <Show when={s().segments.length > 12 && !showAll()}>
                          <button type="button" class="button" onClick={() => setShowAll(true)}>
                            {t("rmShowAll", { count: s().segments.length })}
                          </button>
                        </Show>
                        <Show when={s().hazards.length > 0}>
                          <p class="notes-small">{t("rmHazards", { list: s().hazards.map((h) => t("rmHazardAt", { kind: hazardWord(h.kind), at: dist(h.at_m) })).join(", ") })}</p>
                        </Show>
                        <div class="notes-row-actions">
                          <button type="button" class="button primary" disabled={props.busy || c().name.trim() === ""} onClick={() => props.onSave(s())}>
                            {t("rmSave")}
                          </button>
                          <button type="button" class="button" disabled={props.busy} onClick={() => props.onEdit(s())}>
                            {t("rmEdit")}
                          </button>
                        </div>
                        <Show when={c().name.trim() === ""}>
                          <p class="notes-hint">{t("rmNeedName")}</p>
                        </Show>
                      </div>
                    )}
                  </Show>
                )}
              </Show>
            </>
          )}
        </Match>
      </Switch>
    </section>
  );
}
