/** Settings: units, theme, safety settings with their defaults explained, the moving lock, offline, About. */
import { createEffect, createSignal, For, Show, type JSX } from "solid-js";
import { STANDARD_CAUTIONS } from "../../../core/planner/cautions.js";
import { cautionWords } from "../../cautions.js";
import { Icon } from "../../components/Icon.js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { Toggle } from "../../components/Toggle.js";
import { percent, type UnitSystem } from "../../format.js";
import type { MotionLockStatus } from "../../state/createMotionLock.js";
import { DEFAULT_APP_SETTINGS, SAFETY_BOUNDS, type AppSettings, type ThemeChoice } from "../../state/createSettings.js";
import { settings as en } from "../../../i18n/en/settings.js";
import { LANGS, LANGUAGE_NAMES } from "../../../i18n/language.js";
import { appNumber, tr, type LanguageChoice } from "../../i18n.js";
import { sources } from "../../../i18n/en/sources.js";

const t = tr.ns(en);
const ts = tr.ns(sources);

export interface SettingsViewProps {
  settings: AppSettings;
  onChange: (patch: Partial<AppSettings>) => void;
  onResetSafety: () => void;
  motionStatus: MotionLockStatus;
  offlineReady: boolean;
  offlineSupported: boolean;
  onCheckUpdate: () => void;
  /** Where the numbers come from (rail-condition table sources). */
  sources: readonly string[];
  version: string;
}

const MOTION_TEXT: Record<MotionLockStatus, () => string> = {
  off: () => t("motionOff"),
  watching: () => t("motionWatching"),
  unsupported: () => t("motionUnsupported"),
  denied: () => t("motionDenied"),
  unavailable: () => t("motionUnavailable"),
};

export function SettingsView(props: SettingsViewProps): JSX.Element {
  const s = () => props.settings;
  // What the user typed, kept even when it is out of range (then shown with the rule, and not applied).
  const [factor, setFactor] = createSignal(s().couplerSafetyFactor);
  const [threshold, setThreshold] = createSignal(s().slipRiskThreshold * 100);
  const [bound, setBound] = createSignal(s().marginalSlipRisk * 100);
  createEffect(() => setFactor(s().couplerSafetyFactor));
  createEffect(() => setThreshold(s().slipRiskThreshold * 100));
  createEffect(() => setBound(s().marginalSlipRisk * 100));
  const bb = { min: SAFETY_BOUNDS.marginalSlipRisk.min * 100, max: SAFETY_BOUNDS.marginalSlipRisk.max * 100 };
  const fb = SAFETY_BOUNDS.couplerSafetyFactor;
  const tb = { min: SAFETY_BOUNDS.slipRiskThreshold.min * 100, max: SAFETY_BOUNDS.slipRiskThreshold.max * 100 };
  return (
    <div class="settings">
      <section class="panel">
        <h2>{t("display")}</h2>
        <SegmentedButtons<LanguageChoice>
          name="language"
          label={t("language")}
          value={s().language}
          onChange={(language) => props.onChange({ language })}
          options={[...LANGS.map((l) => ({ value: l as LanguageChoice, label: LANGUAGE_NAMES[l] })), { value: "auto", label: t("languageAuto") }]}
        />
        <p class="muted">{t("languageNote")}</p>
        <SegmentedButtons<UnitSystem>
          name="units"
          label={t("units")}
          value={s().units}
          onChange={(units) => props.onChange({ units })}
          options={[
            { value: "metric", label: t("unitsMetric") },
            { value: "us", label: t("unitsUs") },
          ]}
        />
        <SegmentedButtons<ThemeChoice>
          name="theme"
          label={t("theme")}
          value={s().theme}
          onChange={(theme) => props.onChange({ theme })}
          options={[
            { value: "day", label: t("themeDay") },
            { value: "night", label: t("themeNight") },
            { value: "system", label: t("themeSystem") },
          ]}
        />
        <p class="muted">{t("themeNote")}</p>
      </section>

      <section class="panel">
        <h2>{t("safety")}</h2>
        <p class="muted">{t("safetyNote")}</p>
        <QuantityField
          name="couplerSafetyFactor"
          label={t("couplerFactor")}
          value={factor()}
          onValue={(v) => {
            setFactor(v);
            if (!outOfRange(v, fb)) props.onChange({ couplerSafetyFactor: v });
          }}
          units={s().units}
          unit="×"
          decimals={2}
          step={SAFETY_BOUNDS.couplerSafetyFactor.step}
          min={SAFETY_BOUNDS.couplerSafetyFactor.min}
          max={SAFETY_BOUNDS.couplerSafetyFactor.max}
          issue={outOfRange(factor(), fb)}
          hint={t("couplerFactorHint", { value: appNumber(DEFAULT_APP_SETTINGS.couplerSafetyFactor, 1) })}
        />
        <QuantityField
          name="slipRiskThreshold"
          label={t("slipThreshold")}
          value={threshold()}
          onValue={(v) => {
            setThreshold(v);
            if (!outOfRange(v, tb)) props.onChange({ slipRiskThreshold: v / 100 });
          }}
          units={s().units}
          unit="%"
          decimals={0}
          step={1}
          min={SAFETY_BOUNDS.slipRiskThreshold.min * 100}
          max={SAFETY_BOUNDS.slipRiskThreshold.max * 100}
          issue={outOfRange(threshold(), tb, " %")}
          hint={t("slipThresholdHint", { value: percent(DEFAULT_APP_SETTINGS.slipRiskThreshold, 0) })}
        />
        <QuantityField
          name="marginalSlipRisk"
          label={t("marginalUpTo")}
          value={bound()}
          onValue={(v) => {
            setBound(v);
            if (!outOfRange(v, bb)) props.onChange({ marginalSlipRisk: v / 100 });
          }}
          units={s().units}
          unit="%"
          decimals={0}
          step={1}
          min={bb.min}
          max={bb.max}
          issue={outOfRange(bound(), bb, " %")}
          hint={t("marginalUpToHint", { value: percent(DEFAULT_APP_SETTINGS.marginalSlipRisk, 0) })}
        />
        <button type="button" class="button" onClick={() => props.onResetSafety()}>
          {t("resetSafety", { factor: appNumber(DEFAULT_APP_SETTINGS.couplerSafetyFactor, 1), threshold: percent(DEFAULT_APP_SETTINGS.slipRiskThreshold, 0), bound: percent(DEFAULT_APP_SETTINGS.marginalSlipRisk, 0) })}
        </button>
      </section>

      <section class="panel">
        <h2>{t("moving")}</h2>
        <Toggle name="motionLock" label={t("motionLock")} icon="moving" on={s().motionLock} onChange={(motionLock) => props.onChange({ motionLock })} />
        <p class="muted">
          {MOTION_TEXT[props.motionStatus]()}
          {t("motionRule")}
        </p>
      </section>

      <section class="panel">
        <h2>{t("offline")}</h2>
        <p>
          <Show when={props.offlineSupported} fallback={t("offlineUnsupported")}>
            {props.offlineReady ? t("offlineReady") : t("offlineSaving")}
          </Show>
        </p>
        <Show when={props.offlineSupported}>
          <button type="button" class="button" onClick={() => props.onCheckUpdate()}>
            <Icon name="update" /> {t("checkUpdate")}
          </button>
          <p class="muted">{t("updateNote")}</p>
        </Show>
      </section>

      <section class="panel about">
        <h2>{t("about")}</h2>
        <p>{t("aboutText", { version: props.version })}</p>
        <h3>{t("cautions")}</h3>
        <ul>
          <For each={STANDARD_CAUTIONS}>{(c) => <li>{cautionWords(c)}</li>}</For>
        </ul>
        <h3>{t("demoData")}</h3>
        <p>{t("demoDataText")}</p>
        <h3>{t("sources")}</h3>
        <ul class="sources">
          {/* The subjects in the language on screen; the works as they were published. */}
          <li>{ts("adhesionSpeed", { work: "E. W. Curtius and A. Kniffler, Elektrische Bahnen 20 (1950)." })}</li>
          <li>{ts("adhesionStatistics", { work: "S. Johnsson, IMechE (1963)." })}</li>
          <li>{ts("runningResistance", { work: "W. J. Davis Jr., General Electric Review 29 (1926)." })}</li>
          <li>{ts("curveResistance", { formula: "Röckl" })}</li>
          <li>{ts("startingResistance", { work: "W. W. Hay, Railroad Engineering, 2nd ed. (1982)." })}</li>
          <li>{ts("traction", { work: "W. J. White, How Diesel-Electric Locomotives Operate (1997)." })}</li>
          <li>{ts("trainDynamics", { work: "C. Cole, in Handbook of Railway Vehicle Dynamics (2006); Wu, Spiryagin and Cole, Vehicle System Dynamics 54 (2016)." })}</li>
          <For each={props.sources}>{(src) => <li>{src}</li>}</For>
        </ul>
      </section>
    </div>
  );
}

function outOfRange(v: number, b: { min: number; max: number }, unit = ""): string | undefined {
  if (!Number.isFinite(v)) return t("mustBeNumber");
  const bound = (x: number) => `${appNumber(x, Number.isInteger(x) ? 0 : 2)}${unit}`;
  return v < b.min - 1e-9 || v > b.max + 1e-9 ? t("mustBeBetween", { min: bound(b.min), max: bound(b.max) }) : undefined;
}
