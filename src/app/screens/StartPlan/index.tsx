/** Start plan wiring: the case being edited, its plan run and the settings, into the view. */
import type { JSX } from "solid-js";
import { builtinCases, builtinTrains } from "../../../profiles/builtin.js";
import { PALETTES } from "../../charts/palette.js";
import { useApp } from "../../context.js";
import { declarePrintStatus } from "../../state/printStatus.js";
import { StartPlanView } from "./View.js";
import { printWaits } from "../../../i18n/en/printWaits.js";
import { tr } from "../../i18n.js";

export default function StartPlan(): JSX.Element {
  const app = useApp();
  const units = () => app.settings.settings().units;
  const checked = () => app.draft.checked();
  declarePrintStatus(() => {
    const s = app.run.status();
    const c = checked();
    return {
      complete: !(s === "running" || s === "waiting" || (s === "done" && (!app.run.current() || app.run.massPending()))),
      waitingFor: tr.ns(printWaits)("plan"),
      inputs: c.ok ? c.value : null,
    };
  });
  return (
    <StartPlanView
      inputs={{
        store: app.draft,
        get units() {
          return units();
        },
        get library() {
          return app.locations.library();
        },
        get locations() {
          return app.locations.choices();
        },
        get locationsError() {
          return app.locations.error();
        },
        presets: builtinTrains,
        cases: builtinCases,
        get settings() {
          const s = app.settings.settings();
          return { couplerSafetyFactor: s.couplerSafetyFactor, slipRiskThreshold: s.slipRiskThreshold };
        },
      }}
      result={{
        get status() {
          return app.run.status();
        },
        get progress() {
          return app.run.progress();
        },
        get result() {
          return app.run.result();
        },
        get current() {
          return app.run.current();
        },
        get massPending() {
          return app.run.massPending();
        },
        get error() {
          return app.run.error();
        },
        get startCase() {
          const c = checked();
          return c.ok ? c.value : null;
        },
        get units() {
          return units();
        },
        get palette() {
          return PALETTES[app.theme()];
        },
        get illustrative() {
          return app.draft.draft.illustrative;
        },
        get issues() {
          return app.draft.issues();
        },
        onOpenCab: () => app.nav.go("cab-steps"),
        onRetry: () => app.run.retry(),
      }}
    />
  );
}
