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
    return { model: profileModel({ ...geometry, hazards: s.hazards }, r.ok ? r.value : undefined), issue: r.ok ? undefined : r.issues.map((i) => i.message).join("; ") };
  });
  const kinds = (): Array<{ value: FrontKind; label: string }> => [
    ...((imp().summary()?.ocps.length ?? 0) > 0 ? [{ value: "ocp" as const, label: "Operational point" }] : []),
    { value: "absPos", label: "Line position" },
    { value: "pos", label: "Track and position" },
  ];

  return (
    <section class="panel notes-section notes-railml" aria-labelledby="notes-railml-title">
      <h2 id="notes-railml-title">Import from railML</h2>
      <p class="notes-hint">
        A railML 2.2 to 2.5 infrastructure file: the tracks' gradients and curves are followed through their connections and laid end to end around the
        place where the front of the train stands. The file is read on this device; it can be tens of megabytes.
      </p>

      <div class="notes-row-actions">
        <button type="button" class="button primary" disabled={imp().phase() === "reading"} onClick={() => fileInput.click()}>
          {imp().phase() === "pick" ? "Choose railML file" : "Choose another file"}
        </button>
        <input
          ref={fileInput}
          class="visually-hidden"
          type="file"
          accept=".xml,.railml,.railML,application/xml,text/xml"
          aria-label="railML file to import"
          tabIndex={-1}
          onChange={(e) => {
            const f = e.currentTarget.files?.[0];
            e.currentTarget.value = "";
            if (f) imp().pick(f);
          }}
        />
        <button type="button" class="button" onClick={() => props.onClose()}>
          Back to the library
        </button>
      </div>

      <Switch>
        <Match when={imp().phase() === "reading"}>
          <p class="notes-hint" aria-live="polite">
            Reading {imp().fileName()}…
          </p>
          <div class="progress" role="progressbar" aria-label="railML file read" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(imp().progress() * 100)}>
            <span style={{ width: `${Math.max(4, imp().progress() * 100)}%` }} />
          </div>
          <div class="notes-row-actions">
            <button type="button" class="button" onClick={() => imp().cancel()}>
              Cancel import
            </button>
          </div>
        </Match>
        <Match when={imp().phase() === "failed"}>
          <p class="notes-issue-box" role="alert">
            {imp().fileName()}: {imp().problem()}
          </p>
        </Match>
        <Match when={imp().phase() === "ready" && imp().summary()}>
          {(sum) => (
            <>
              <p class="notes-small">
                {imp().fileName()}: railML {sum().version || "2"}, {formatNumber(sum().tracks, 0)} track(s), {formatNumber(sum().gradientChanges, 0)} gradient and{" "}
                {formatNumber(sum().radiusChanges, 0)} radius changes
                {sum().absPosRange ? `; line positions ${dist(sum().absPosRange!.min)} to ${dist(sum().absPosRange!.max)}` : ""}.
              </p>
              <Show when={sum().warnings.length > 0}>
                <ul class="notes-small">
                  <For each={sum().warnings}>{(w) => <li>{w}</li>}</For>
                </ul>
              </Show>

              <div class="notes-grid">
                <SegmentedButtons label="Where the front stands" options={kinds()} value={c().kind} onChange={(k) => imp().setChoice("kind", k)} name="railml.kind" />
                <Switch>
                  <Match when={c().kind === "ocp"}>
                    <SelectField
                      label="Operational point"
                      name="railml.ocp"
                      value={c().ocp}
                      options={sum().ocps.map((o) => ({ value: o.id, label: o.label }))}
                      onValue={(v) => {
                        imp().setChoice("ocp", v);
                        imp().setChoice("name", sum().ocps.find((o) => o.id === v)?.label ?? v);
                      }}
                    />
                  </Match>
                  <Match when={c().kind === "absPos"}>
                    <QuantityField label="Line position of the front (absPos)" name="railml.absPos" value={c().absPos} units={u()} measure="distance" fileUnit="m" onValue={(v) => imp().setChoice("absPos", v)} />
                  </Match>
                  <Match when={c().kind === "pos"}>
                    <QuantityField label="Position along the track (pos)" name="railml.pos" value={c().pos} units={u()} measure="distance" fileUnit="m" onValue={(v) => imp().setChoice("pos", v)} />
                  </Match>
                </Switch>
                <TextField
                  label={c().kind === "pos" ? "Track id" : "Track id (where a position is on several tracks)"}
                  name="railml.track"
                  value={c().track}
                  onValue={(v) => imp().setChoice("track", v)}
                  maxLength={200}
                />
                <SegmentedButtons
                  label="Direction of travel"
                  options={[
                    { value: "up", label: "Up (increasing pos)" },
                    { value: "down", label: "Down (decreasing pos)" },
                  ]}
                  value={c().direction}
                  onChange={(d) => imp().setChoice("direction", d)}
                  name="railml.direction"
                />
                <QuantityField label="Take behind the front" name="railml.behind" value={c().behindM} units={u()} measure="distance" fileUnit="m" step={{ metric: 100, us: 300 }} min={0} onValue={(v) => imp().setChoice("behindM", v)} />
                <QuantityField label="Take ahead of the front" name="railml.ahead" value={c().aheadM} units={u()} measure="distance" fileUnit="m" step={{ metric: 100, us: 300 }} min={0} onValue={(v) => imp().setChoice("aheadM", v)} />
                <TextField label="Name of the note" name="railml.name" value={c().name} onValue={(v) => imp().setChoice("name", v)} maxLength={120} />
              </div>

              <Show when={imp().result()} fallback={<p class="notes-hint">Making the stretch…</p>}>
                {(r) => (
                  <Show when={stretch()} fallback={<p class="notes-issue-box" role="alert">{r().ok ? "" : (r() as { message: string }).message}</p>}>
                    {(s) => (
                      <div class="notes-railml-preview" aria-label="The stretch from railML">
                        <p class="notes-small">
                          {dist(s().behindM)} behind and {dist(s().aheadM)} ahead of the front, at {s().frontWords}; {s().segments.length} segment(s)
                          {s().speedLimit_kmh !== undefined ? `; speed limit ${show("speed", s().speedLimit_kmh! / 3.6, u(), 0)}` : ""}.
                        </p>
                        <Show when={placed()?.model}>{(m) => <ProfileSketch model={m()} units={u()} />}</Show>
                        <Show when={placed()?.issue}>
                          <p class="notes-issue-box">{placed()!.issue}</p>
                        </Show>
                        <Show when={s().notes.length > 0}>
                          <ul class="notes-small">
                            <For each={s().notes}>{(n) => <li>{n}</li>}</For>
                          </ul>
                        </Show>
                        <table class="notes-railml-segs">
                          <caption>Segments, from the rear end of the stretch</caption>
                          <thead>
                            <tr>
                              <th scope="col">From</th>
                              <th scope="col">Length</th>
                              <th scope="col">Gradient</th>
                              <th scope="col">Curve</th>
                            </tr>
                          </thead>
                          <tbody>
                            <For each={showAll() ? s().segments : s().segments.slice(0, 12)}>
                              {(g) => (
                                <tr>
                                  <td>{dist(g.from_m)}</td>
                                  <td>{dist(g.length_m)}</td>
                                  <td>{show("grade", g.gradient_permille / 1000, u())}</td>
                                  <td>{g.curveRadius_m > 0 ? show("radius", g.curveRadius_m, u()) : "straight"}</td>
                                </tr>
                              )}
                            </For>
                          </tbody>
                        </table>
                        <Show when={s().segments.length > 12 && !showAll()}>
                          <button type="button" class="button" onClick={() => setShowAll(true)}>
                            Show all {s().segments.length} segments
                          </button>
                        </Show>
                        <Show when={s().hazards.length > 0}>
                          <p class="notes-small">Hazards offered: {s().hazards.map((h) => `${h.kind} at ${dist(h.at_m)}`).join(", ")}.</p>
                        </Show>
                        <div class="notes-row-actions">
                          <button type="button" class="button primary" disabled={props.busy || c().name.trim() === ""} onClick={() => props.onSave(s())}>
                            Save as a new note
                          </button>
                          <button type="button" class="button" disabled={props.busy} onClick={() => props.onEdit(s())}>
                            Open in the editor first
                          </button>
                        </div>
                        <Show when={c().name.trim() === ""}>
                          <p class="notes-hint">Give the note a name to save it.</p>
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
