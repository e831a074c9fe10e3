/** Settings: units, theme, safety settings with their defaults explained, the moving lock, offline, About. */
import { createEffect, createSignal, For, Show, type JSX } from "solid-js";
import { STANDARD_CAUTIONS } from "../../../core/planner/cautions.js";
import { Icon } from "../../components/Icon.js";
import { QuantityField } from "../../components/QuantityField.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { Toggle } from "../../components/Toggle.js";
import { percent, type UnitSystem } from "../../format.js";
import type { MotionLockStatus } from "../../state/createMotionLock.js";
import { DEFAULT_APP_SETTINGS, SAFETY_BOUNDS, type AppSettings, type ThemeChoice } from "../../state/createSettings.js";

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

const MOTION_TEXT: Record<MotionLockStatus, string> = {
  off: "Off: Taut does not read the device's location.",
  watching: "On: the controls hide while the device reports a speed above 5 km/h (3 mph).",
  unsupported: "This browser gives no location, so the lock cannot work here.",
  denied: "Location was refused: allow it in the browser's site settings, or turn this off.",
  unavailable: "No position fix yet: the lock acts once the device reports its speed.",
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
        <h2>Display</h2>
        <SegmentedButtons<UnitSystem>
          name="units"
          label="Units"
          value={s().units}
          onChange={(units) => props.onChange({ units })}
          options={[
            { value: "metric", label: "Metric (t, kN, km/h, m)" },
            { value: "us", label: "US customary (short tons, klbf, mph, ft)" },
          ]}
        />
        <SegmentedButtons<ThemeChoice>
          name="theme"
          label="Theme"
          value={s().theme}
          onChange={(theme) => props.onChange({ theme })}
          options={[
            { value: "day", label: "Day" },
            { value: "night", label: "Night" },
            { value: "system", label: "Follow the device" },
          ]}
        />
        <p class="muted">Night is dark with dim, warm accents, to keep glare down in a dark cab.</p>
      </section>

      <section class="panel">
        <h2>Safety settings</h2>
        <p class="muted">Every plan uses these. Change them only as your railway's practice says.</p>
        <QuantityField
          name="couplerSafetyFactor"
          label="Coupler safety factor"
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
          hint={
            <>
              Peak coupler force must stay below the coupling's working limit divided by this. Default {DEFAULT_APP_SETTINGS.couplerSafetyFactor}: it leaves room
              for what the model does not capture — uneven slack, worn draft gear, a harder pull than planned.
            </>
          }
        />
        <QuantityField
          name="slipRiskThreshold"
          label="Slip-risk threshold"
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
          hint={
            <>
              The highest chance that the rails give less than the start needs, for "starts". Default {percent(DEFAULT_APP_SETTINGS.slipRiskThreshold, 0)}: real
              adhesion scatters, and planning to the typical (median) value would mean slipping about half the time; planning to the value the rails beat
              nine times in ten keeps slips rare without giving up too much tractive effort.
            </>
          }
        />
        <QuantityField
          name="marginalSlipRisk"
          label="Marginal up to"
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
          hint={
            <>
              A start that needs a better rail than the threshold assumes is "marginal" while the chance that the rails give less stays below this, and
              "needs assistance" beyond it (never below the threshold). Default {percent(DEFAULT_APP_SETTINGS.marginalSlipRisk, 0)}: one start in four failing is as
              far as a careful briefing can carry; beyond that the train needs help.
            </>
          }
        />
        <button type="button" class="button" onClick={() => props.onResetSafety()}>
          Back to the defaults ({DEFAULT_APP_SETTINGS.couplerSafetyFactor}, {percent(DEFAULT_APP_SETTINGS.slipRiskThreshold, 0)} and{" "}
          {percent(DEFAULT_APP_SETTINGS.marginalSlipRisk, 0)})
        </button>
      </section>

      <section class="panel">
        <h2>While the train moves</h2>
        <Toggle name="motionLock" label="Hide the controls while moving" icon="moving" on={s().motionLock} onChange={(motionLock) => props.onChange({ motionLock })} />
        <p class="muted">{MOTION_TEXT[props.motionStatus]} Taut is for planning and briefing before departure; device use in the cab follows local rules.</p>
      </section>

      <section class="panel">
        <h2>Offline</h2>
        <p>
          <Show when={props.offlineSupported} fallback="This browser cannot keep an offline copy.">
            {props.offlineReady ? "Ready offline: Taut works without a connection on this device." : "Saving a copy for offline use…"}
          </Show>
        </p>
        <Show when={props.offlineSupported}>
          <button type="button" class="button" onClick={() => props.onCheckUpdate()}>
            <Icon name="update" /> Check for a new version
          </button>
          <p class="muted">A new version is never installed without asking you first.</p>
        </Show>
      </section>

      <section class="panel about">
        <h2>About Taut</h2>
        <p>
          Taut {props.version} plans the start of a heavy freight train: which notch to start in, how long to hold it while the slack comes out, how far to notch
          up before the wheels slip, and whether the train needs assistance. It computes this from running and starting resistance, grade and curve
          resistance, adhesion with its statistical spread, the locomotives' traction characteristics and the train's couplings.
        </p>
        <h3>Cautions</h3>
        <ul>
          <For each={STANDARD_CAUTIONS}>{(c) => <li>{c}</li>}</For>
        </ul>
        <h3>Demo data</h3>
        <p>The built-in places, trains and locomotive profiles are invented and illustrative; none is a real class, route or place.</p>
        <h3>Sources</h3>
        <ul class="sources">
          <li>Adhesion against speed: E. W. Curtius and A. Kniffler, Elektrische Bahnen 20 (1950).</li>
          <li>Adhesion as a statistical problem: S. Johnsson, IMechE (1963).</li>
          <li>Running resistance: W. J. Davis Jr., General Electric Review 29 (1926).</li>
          <li>Curve resistance: the Röckl formula, cross-checked with the per-degree rule of US practice.</li>
          <li>Starting resistance: W. W. Hay, Railroad Engineering, 2nd ed. (1982).</li>
          <li>Diesel-electric traction: W. J. White, How Diesel-Electric Locomotives Operate (1997).</li>
          <li>Longitudinal train dynamics: C. Cole, in Handbook of Railway Vehicle Dynamics (2006); Wu, Spiryagin and Cole, Vehicle System Dynamics 54 (2016).</li>
          <For each={props.sources}>{(src) => <li>{src}</li>}</For>
        </ul>
      </section>
    </div>
  );
}

function outOfRange(v: number, b: { min: number; max: number }, unit = ""): string | undefined {
  if (!Number.isFinite(v)) return "must be a number";
  return v < b.min - 1e-9 || v > b.max + 1e-9 ? `must be between ${b.min}${unit} and ${b.max}${unit}; the last good value still applies` : undefined;
}
