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
      <h2>Location</h2>
      <SegmentedButtons
        name="locationMode"
        label="Location from"
        hideLabel
        value={d.locationMode}
        onChange={(v) => s.set("locationMode", v)}
        options={[
          { value: "note", label: "Saved note", icon: "notes" },
          { value: "quick", label: "Quick entry", icon: "plan" },
          ...(d.profile ? [{ value: "profile" as const, label: "Case file's profile", icon: "table" as const }] : []),
        ]}
      />
      <Show when={d.locationMode === "profile" && d.profile}>
        {(p) => (
          <div class="field" data-field="location">
            <p class="profile-from-file">{profileFacts(p(), props.units)}</p>
            <p class="muted">The track profile of the opened case file, used as it is. Choose a saved note or quick entry to plan somewhere else.</p>
            <Show when={issue("location", "location.frontAt_m")}>
              <p class="field-issue" role="alert">
                Location {issue("location", "location.frontAt_m")}
              </p>
            </Show>
          </div>
        )}
      </Show>
      <Show when={d.locationMode === "note"}>
        <div class="field" data-field="location">
          <div class="note-list" role="radiogroup" aria-label="Location note">
            <For each={props.locations} fallback={<p class="muted">No saved location notes. Use quick entry, or add notes under Location notes.</p>}>
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
              The saved notes could not be read ({props.locationsError}). The built-in notes and quick entry still work.
            </p>
          </Show>
          <Show when={issue("location", "location.frontAt_m")}>
            <p class="field-issue" role="alert">
              Location {issue("location", "location.frontAt_m")}
            </p>
          </Show>
        </div>
      </Show>
      <Show when={d.locationMode === "quick"}>
        <QuantityField
          name="location.gradient_permille"
          label="Gradient under the train (rising +)"
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
            label="Curve radius (0 = straight)"
            measure="radius"
            fileUnit="m"
            value={d.quick.curveRadius_m}
            onValue={(v) => s.set("quick", "curveRadius_m", v)}
            units={props.units}
            issue={issue("location.curveRadius_m")}
          />
          <QuantityField
            name="location.clearAhead_m"
            label="Clear ahead"
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
  return `${p.segments.length} segment${p.segments.length === 1 ? "" : "s"} · ${show("grade", g / 1000, units)} at the front · ${show("distance", p.clearAhead_m, units)} clear ahead`;
}

/** One line about a note: gradient at the front, clear ahead, hazards. */
export function noteFacts(n: LocationNoteFile, units: UnitSystem): string {
  const track = trackFromSegments(n.segments);
  const g = gradeAt(track, n.frontAt_m - 1);
  const parts = [`${show("grade", g / 1000, units)} at the front`, `${show("distance", n.clearAhead_m, units)} clear ahead`];
  if (n.hazards.length > 0) parts.push(`${n.hazards.length} hazard${n.hazards.length === 1 ? "" : "s"}`);
  if (n.illustrative) parts.push("illustrative");
  return parts.join(" · ");
}
