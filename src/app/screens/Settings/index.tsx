/** Settings wiring. */
import type { JSX } from "solid-js";
import { builtinRailConditions } from "../../../profiles/builtin.js";
import { useApp } from "../../context.js";
import { SettingsView } from "./View.js";

declare const __TAUT_VERSION__: string | undefined;

export default function Settings(): JSX.Element {
  const app = useApp();
  return (
    <SettingsView
      settings={app.settings.settings()}
      onChange={(p) => app.settings.update(p)}
      onResetSafety={() => app.settings.resetSafety()}
      motionStatus={app.motion.status()}
      offlineReady={app.offline.ready()}
      offlineSupported={app.offline.supported}
      onCheckUpdate={() => void app.offline.check()}
      sources={Object.entries(builtinRailConditions.conditions).map(([rail, c]) => `Rail condition "${rail}" (median μ ${c.median}, ${c.sanded} with sand): ${c.source}`)}
      version={typeof __TAUT_VERSION__ === "string" ? __TAUT_VERSION__ : "dev"}
    />
  );
}
