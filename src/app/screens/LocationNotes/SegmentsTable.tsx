/**
 * The table of track segments: start, length and gradient with large −/+ steppers, the curve radius as
 * a typed field (0 = straight), a remove button per row, and "Add segment" / "Join segments" below.
 * The rules a row breaks are listed under the table and the offending cells are marked.
 */
import { For, Show, type JSX } from "solid-js";
import { QuantityField } from "../../components/QuantityField.js";
import type { UnitSystem } from "../../format.js";
import type { SegmentFile } from "../../../profiles/schemas.js";
import type { NoteIssue } from "./validate.js";
import { notes } from "../../../i18n/en/notes.js";
import { tr } from "../../i18n.js";

const t = tr.ns(notes);

export interface SegmentsTableProps {
  segments: readonly SegmentFile[];
  units: UnitSystem;
  issues: readonly NoteIssue[];
  onChange: (k: number, field: keyof SegmentFile, value: number) => void;
  onAdd: () => void;
  onRemove: (k: number) => void;
  onJoin: () => void;
}

export function SegmentsTable(props: SegmentsTableProps): JSX.Element {
  const bad = (k: number, field: keyof SegmentFile) => props.issues.some((i) => i.severity === "error" && i.path === `segments[${k}].${field}`);
  const rowIssues = () => props.issues.filter((i) => i.path.startsWith("segments"));
  // By the checks' codes, whatever the language on screen.
  const hasJoinIssue = () => rowIssues().some((i) => i.code === "segGap" || i.code === "segOverlap");
  return (
    <section class="panel notes-section" aria-labelledby="notes-seg-title">
      <h3 id="notes-seg-title">{t("segTitle")}</h3>
      <p class="notes-hint">{t("segHint")}</p>
      <div class="notes-seg-wrap">
        <table class="notes-seg">
          <thead>
            <tr>
              <th scope="col">#</th>
              <th scope="col">{t("segStartsAt")}</th>
              <th scope="col">{t("segLength")}</th>
              <th scope="col">{t("segGradient")}</th>
              <th scope="col">{t("segRadius")}</th>
              <th scope="col">
                <span class="visually-hidden">{t("segRemove")}</span>
              </th>
            </tr>
          </thead>
          <tbody>
            <For each={props.segments}>
              {(s, k) => (
                <tr>
                  <th scope="row">{k() + 1}</th>
                  <td classList={{ "notes-cell": true, invalid: bad(k(), "from_m") }}>
                    <QuantityField label={t("segStartsAtN", { n: k() + 1 })} name={`segments[${k()}].from_m`} value={s.from_m} units={props.units} measure="distance" fileUnit="m" onValue={(v) => props.onChange(k(), "from_m", v)} />
                  </td>
                  <td classList={{ "notes-cell": true, invalid: bad(k(), "length_m") }}>
                    <QuantityField
                      label={t("segLengthN", { n: k() + 1 })}
                      name={`segments[${k()}].length_m`}
                      value={s.length_m}
                      units={props.units}
                      measure="distance"
                      fileUnit="m"
                      step={{ metric: 50, us: 100 }}
                      min={0}
                      onValue={(v) => props.onChange(k(), "length_m", v)}
                    />
                  </td>
                  <td classList={{ "notes-cell": true, invalid: bad(k(), "gradient_permille") }}>
                    <QuantityField
                      label={t("segGradientN", { n: k() + 1 })}
                      name={`segments[${k()}].gradient_permille`}
                      value={s.gradient_permille}
                      units={props.units}
                      measure="grade"
                      fileUnit="permille"
                      step={{ metric: 0.5, us: 0.05 }}
                      onValue={(v) => props.onChange(k(), "gradient_permille", v)}
                    />
                  </td>
                  <td classList={{ "notes-cell": true, invalid: bad(k(), "curveRadius_m") }}>
                    <QuantityField label={t("segRadiusN", { n: k() + 1 })} name={`segments[${k()}].curveRadius_m`} value={s.curveRadius_m} units={props.units} measure="radius" fileUnit="m" onValue={(v) => props.onChange(k(), "curveRadius_m", v)} />
                  </td>
                  <td>
                    <button type="button" class="notes-icon-button" aria-label={t("segRemoveN", { n: k() + 1 })} disabled={props.segments.length <= 1} onClick={() => props.onRemove(k())}>
                      ✕
                    </button>
                  </td>
                </tr>
              )}
            </For>
          </tbody>
        </table>
      </div>
      <div class="notes-row-actions">
        <button type="button" class="button" onClick={() => props.onAdd()}>
          {t("segAdd")}
        </button>
        <Show when={hasJoinIssue()}>
          <button type="button" class="button" onClick={() => props.onJoin()}>
            {t("segJoin")}
          </button>
        </Show>
      </div>
      <Show when={rowIssues().length > 0}>
        <ul class="notes-issues" aria-label={t("segProblems")}>
          <For each={rowIssues()}>{(i) => <li classList={{ warning: i.severity === "warning" }}>{i.message}</li>}</For>
        </ul>
      </Show>
    </section>
  );
}
