/** Start plan inputs, locomotives: groups of one profile, how many, where in the train and how they are driven. */
import { For, Index, Show, type JSX } from "solid-js";
import type { Library } from "../../../profiles/library.js";
import { Icon } from "../../components/Icon.js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import type { DraftPosition } from "../../state/caseDraft.js";
import type { UnitControl } from "../../../core/train/types.js";
import { issueFinder, type InputSectionProps } from "./inputSection.js";
import { train } from "../../../i18n/en/train.js";
import { tr } from "../../i18n.js";

const t = tr.ns(train);

export interface LocomotivesSectionProps extends InputSectionProps {
  library: Library;
}

/** Locomotive groups: profile, count and position; up to eight groups. */
export function LocomotivesSection(props: LocomotivesSectionProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const issue = issueFinder(s);
  return (
    <section class="panel">
      <h2>{t("locomotives")}</h2>
      <Index each={d.locomotives}>
        {(loco, k) => (
          <div class="loco-group">
            <div class="field" data-field={`locomotives[${k}].profile`}>
              <label class="field-label" for={`loco-${k}`}>
                {t("locoProfile")}
              </label>
              <select id={`loco-${k}`} class="select" value={loco().profile} onChange={(e) => s.set("locomotives", k, "profile", e.currentTarget.value)}>
                <For each={[...props.library.locomotives.values()]}>{(l) => <option value={l.spec.id}>{l.spec.label}</option>}</For>
              </select>
              <Show when={issue(`locomotives[${k}].profile`)}>
                <p class="field-issue" role="alert">
                  {t("locoProfileIssue", { issue: issue(`locomotives[${k}].profile`) ?? "" })}
                </p>
              </Show>
            </div>
            <div class="row">
              <QuantityField
                name={`locomotives[${k}].count`}
                label={t("howMany")}
                value={loco().count}
                onValue={(v) => s.set("locomotives", k, "count", v)}
                units={props.units}
                integer
                step={1}
                min={1}
                max={8}
                issue={issue(`locomotives[${k}].count`)}
              />
              <SegmentedButtons<DraftPosition>
                name={`locomotives[${k}].position`}
                label={t("position")}
                value={loco().position}
                onChange={(v) => s.set("locomotives", k, "position", v)}
                options={[
                  { value: "head", label: t("head") },
                  { value: "after", label: t("midTrain") },
                  { value: "rear", label: t("rear") },
                ]}
              />
            </div>
            <Show when={loco().position === "after"}>
              <QuantityField
                name={`locomotives[${k}].position.afterWagon`}
                label={t("afterWagon")}
                value={loco().afterWagon}
                onValue={(v) => s.set("locomotives", k, "afterWagon", v)}
                units={props.units}
                integer
                step={1}
                min={1}
                issue={issue(`locomotives[${k}].position.afterWagon`, `locomotives[${k}].position`)}
              />
            </Show>
            <SegmentedButtons<UnitControl>
              name={`locomotives[${k}].control`}
              label={t("driven")}
              value={loco().control ?? (loco().position === "head" ? "with-head" : "remote")}
              onChange={(v) => s.set("locomotives", k, "control", v)}
              options={[
                { value: "with-head", label: t("inMultiple") },
                { value: "remote", label: t("remote") },
                { value: "helper", label: t("helper") },
              ]}
            />
            <Show when={d.locomotives.length > 1}>
              <button type="button" class="button subtle" onClick={() => s.removeLocomotive(k)}>
                <Icon name="remove" /> {t("removeGroup")}
              </button>
            </Show>
          </div>
        )}
      </Index>
      <Show when={d.locomotives.length < 8}>
        <button type="button" class="button" onClick={() => s.addLocomotive()}>
          <Icon name="add" /> {t("addLocomotives")}
        </button>
      </Show>
    </section>
  );
}
