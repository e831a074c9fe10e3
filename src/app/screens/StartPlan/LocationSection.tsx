/**
 * Start plan inputs, location: a saved location note, a quick entry of gradient, curve and distance clear
 * ahead, or — when an opened case file carried one — its track profile, kept as it was.
 */
import { For, Show, type JSX } from "solid-js";
import { gradeAt } from "../../../core/physics/track.js";
import { trackFromSegments } from "../../../profiles/convert.js";
import type { LocationNoteFile } from "../../../profiles/schemas.js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { show, type UnitSystem } from "../../format.js";
import type { LocationChoice } from "../../locations.js";
import { issueFinder, type InputSectionProps } from "./inputSection.js";

import { inputs } from "../../../i18n/en/inputs.js";
import { tr } from "../../i18n.js";

const t = tr.ns(inputs);

export interface LocationSectionProps extends InputSectionProps {
  locations: readonly LocationChoice[];
  /** Why the saved notes could not be read, if they could not. */
  locationsError: string | null | undefined;
}

/** Where the train stands: from a note or entered quickly. */
export function LocationSection(props: LocationSectionProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const issue = issueFinder(s);
  return (
    <section class="panel">
      <h2>{t("location")}</h2>
      <SegmentedButtons
        name="locationMode"
        label={t("locationFrom")}
        hideLabel
        value={d.locationMode}
        onChange={(v) => s.set("locationMode", v)}
        options={[
          { value: "note", label: t("savedNote"), icon: "notes" },
          { value: "quick", label: t("quickEntry"), icon: "plan" },
          ...(d.profile ? [{ value: "profile" as const, label: t("caseProfile"), icon: "table" as const }] : []),
        ]}
      />
      <Show when={d.locationMode === "profile" && d.profile}>
        {(p) => (
          <div class="field" data-field="location">
            <p class="profile-from-file">{profileFacts(p(), props.units)}</p>
            <p class="muted">{t("caseProfileNote")}</p>
            <Show when={issue("location", "location.frontAt_m")}>
              <p class="field-issue" role="alert">
                {t("locationIssue", { issue: issue("location", "location.frontAt_m") ?? "" })}
              </p>
            </Show>
          </div>
        )}
      </Show>
      <Show when={d.locationMode === "note"}>
        <div class="field" data-field="location">
          <div class="note-list" role="radiogroup" aria-label={t("locationNote")}>
            <For each={props.locations} fallback={<p class="muted">{t("noNotes")}</p>}>
              {(c) => (
                <button type="button" role="radio" aria-checked={d.noteId === c.id} class="note-choice" onClick={() => s.set("noteId", c.id)}>
                  <span class="note-name">{c.name}</span>
                  <span class="note-facts">{noteFacts(c.note, props.units)}</span>
                </button>
              )}
            </For>
          </div>
          <Show when={props.locationsError}>
            <p class="field-issue" role="alert">
              {t("notesUnreadable", { error: props.locationsError ?? "" })}
            </p>
          </Show>
          <Show when={issue("location", "location.frontAt_m")}>
            <p class="field-issue" role="alert">
              {t("locationIssue", { issue: issue("location", "location.frontAt_m") ?? "" })}
            </p>
          </Show>
        </div>
      </Show>
      <Show when={d.locationMode === "quick"}>
        <QuantityField
          name="location.gradient_permille"
          label={t("gradient")}
          measure="grade"
          fileUnit="permille"
          value={d.quick.gradient_permille}
          onValue={(v) => s.set("quick", "gradient_permille", v)}
          units={props.units}
          step={{ metric: 1, us: 0.1 }}
          min={props.units === "us" ? -6 : -60}
          max={props.units === "us" ? 6 : 60}
          issue={issue("location.gradient_permille")}
        />
        <div class="row">
          <QuantityField
            name="location.curveRadius_m"
            label={t("curveRadius")}
            measure="radius"
            fileUnit="m"
            value={d.quick.curveRadius_m}
            onValue={(v) => s.set("quick", "curveRadius_m", v)}
            units={props.units}
            issue={issue("location.curveRadius_m")}
          />
          <QuantityField
            name="location.clearAhead_m"
            label={t("clearAhead")}
            measure="distance"
            fileUnit="m"
            value={d.quick.clearAhead_m}
            onValue={(v) => s.set("quick", "clearAhead_m", v)}
            units={props.units}
            issue={issue("location.clearAhead_m")}
          />
        </div>
      </Show>
    </section>
  );
}

/** One line about a case file's profile: segments, gradient at the front, clear ahead. */
export function profileFacts(p: { segments: LocationNoteFile["segments"]; frontAt_m: number; clearAhead_m: number }, units: UnitSystem): string {
  const g = gradeAt(trackFromSegments(p.segments), p.frontAt_m - 1);
  return [t("segments", { count: p.segments.length }), t("atFront", { grade: show("grade", g / 1000, units) }), t("clearAheadIs", { distance: show("distance", p.clearAhead_m, units) })].join(" · ");
}

/** One line about a note: gradient at the front, clear ahead, hazards. */
export function noteFacts(n: LocationNoteFile, units: UnitSystem): string {
  const track = trackFromSegments(n.segments);
  const g = gradeAt(track, n.frontAt_m - 1);
  const parts = [t("atFront", { grade: show("grade", g / 1000, units) }), t("clearAheadIs", { distance: show("distance", n.clearAhead_m, units) })];
  if (n.hazards.length > 0) parts.push(t("hazards", { count: n.hazards.length }));
  if (n.illustrative) parts.push(t("illustrative"));
  return parts.join(" · ");
}
