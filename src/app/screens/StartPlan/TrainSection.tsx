/**
 * Start plan inputs, train: trailing mass, wagons, coupling, slack, bearings and the slack at the start — or,
 * for a mixed train, its wagon groups from the head (wagons, type and mass of each).
 */
import { For, lazy, Show, Suspense, type JSX } from "solid-js";
import { Icon } from "../../components/Icon.js";
import type { Library } from "../../../profiles/library.js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { show, type UnitSystem } from "../../format.js";
import { COUPLING_DEFAULTS } from "../../state/caseDraft.js";
import { issueFinder, type InputSectionProps } from "./inputSection.js";
import { train } from "../../../i18n/en/train.js";
import { tr } from "../../i18n.js";
import { Figures } from "../../components/Figures.js";

const t = tr.ns(train);

/**
 * The wagon-groups form of a mixed train, a chunk of its own: the first plan's screen shows one trailing
 * mass, so the form loads when a train is entered as groups (or when the page is idle after the first plan,
 * `preloadWagonGroups`), keeping it out of the JavaScript loaded before the first verdict.
 */
const WagonGroups = lazy(() => import("./WagonGroups.js"));
export const preloadWagonGroups = (): Promise<unknown> => WagonGroups.preload();

export interface TrainSectionProps extends InputSectionProps {
  library: Library;
}

/** The trailing load and its couplings. */
export function TrainSection(props: TrainSectionProps): JSX.Element {
  const s = props.store;
  const d = s.draft;
  const issue = issueFinder(s);
  return (
    <section class="panel">
      <h2>{t("train")}</h2>
      <Show
        when={(d.train.groups ?? []).length > 0}
        fallback={
          <>
      <QuantityField
        name="train.trailingMass_t"
        label={t("trailingMass")}
        measure="mass"
        fileUnit="t"
        value={d.train.trailingMass_t}
        onValue={(v) => s.set("train", "trailingMass_t", v)}
        units={props.units}
        step={50}
        min={0}
        issue={issue("train.trailingMass_t")}
      />
      <div class="row">
        <QuantityField
          name="train.wagons"
          label={t("wagons")}
          value={d.train.wagons}
          onValue={(v) => s.set("train", "wagons", v)}
          units={props.units}
          integer
          step={1}
          min={1}
          max={400}
          issue={issue("train.wagons")}
        />
        <QuantityField
          name="train.length_m"
          label={t("lengthOfWagons")}
          measure="distance"
          fileUnit="m"
          value={d.train.length_m}
          onValue={(v) => s.set("train", "length_m", v)}
          units={props.units}
          issue={issue("train.length_m")}
          hint={<Figures text={perWagon(d.train.length_m, d.train.wagons, props.units)} />}
        />
      </div>
      <div class="field" data-field="train.wagonType">
        <label class="field-label" for="wagon-type">
          {t("wagonType")}
        </label>
        <select id="wagon-type" class="select" value={d.train.wagonType} onChange={(e) => s.set("train", "wagonType", e.currentTarget.value)}>
          <option value="">{t("plainBogie")}</option>
          <For each={[...props.library.wagons.values()]}>{(w) => <option value={w.id}>{w.label}</option>}</For>
        </select>
      </div>
            <button type="button" class="button subtle" data-action="add-wagon-group" onClick={() => s.addWagonGroup()}>
              <Icon name="add" /> {t("enterGroups")}
            </button>
          </>
        }
      >
        <Suspense fallback={<p class="placeholder-text">{t("loadingGroups")}</p>}>
          <WagonGroups {...props} />
        </Suspense>
      </Show>
      <SegmentedButtons
        name="train.coupling"
        label={t("coupling")}
        value={d.train.coupling}
        onChange={(v) => s.set("train", "coupling", v)}
        options={[
          { value: "knuckle", label: t("knuckle") },
          { value: "screw", label: t("screw") },
        ]}
      />
      <div class="row">
        <QuantityField
          name="train.couplerSlack_mm"
          label={t("freeSlack")}
          measure="slack"
          fileUnit="mm"
          value={d.train.couplerSlack_mm}
          onValue={(v) => s.set("train", "couplerSlack_mm", v)}
          units={props.units}
          step={{ metric: 5, us: 0.25 }}
          min={0}
          issue={issue("train.couplerSlack_mm")}
        />
        <QuantityField
          name="train.couplerLimit_kN"
          label={t("couplerLimit")}
          measure="force"
          fileUnit="kN"
          value={d.train.couplerLimit_kN}
          onValue={(v) => s.set("train", "couplerLimit_kN", v)}
          units={props.units}
          issue={issue("train.couplerLimit_kN")}
          hint={<Figures text={t("typical", { force: show("force", COUPLING_DEFAULTS[d.train.coupling].couplerLimit_kN * 1000, props.units) })} />}
        />
      </div>
      <SegmentedButtons
        name="train.bearing"
        label={t("bearings")}
        value={d.train.bearing}
        onChange={(v) => s.set("train", "bearing", v)}
        options={[
          { value: "roller", label: t("roller") },
          { value: "plain", label: t("plain") },
        ]}
      />
      <SegmentedButtons
        name="train.slackState"
        label={t("slackAtStart")}
        value={d.train.slackState}
        onChange={(v) => s.set("train", "slackState", v)}
        options={[
          { value: "from-profile", label: t("fromTrack") },
          { value: "bunched", label: t("bunched") },
          { value: "stretched", label: t("stretched") },
        ]}
      />
    </section>
  );
}

function perWagon(lengthM: number, wagons: number, units: UnitSystem): string {
  if (!(lengthM > 0) || !(wagons >= 1)) return "";
  return t("perWagon", { value: show("distance", lengthM / wagons, units, 1) });
}
