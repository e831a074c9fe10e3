/** Settings wiring. */
import type { JSX } from "solid-js";
import type { RailCondition } from "../../../core/physics/types.js";
import { builtinRailConditions } from "../../../profiles/builtin.js";
import { useApp } from "../../context.js";
import { SettingsView } from "./View.js";
import { sources } from "../../../i18n/en/sources.js";
import { appNumber, tr } from "../../i18n.js";
import { checkWords } from "../../checkWords.js";
import { words } from "../../words.js";
import { railNote } from "./railNotes.js";

// The list of sources in the language on screen (in the catalog part of the screens opened later) comes before the screen shows.
await checkWords;

const ts = tr.ns(sources);
/** A coefficient with the decimals the table gives it, in the language on screen. */
const coefficient = (x: number) => appNumber(x, String(x).split(".")[1]?.length ?? 0);

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
      sources={Object.entries(builtinRailConditions.conditions).map(([rail, c]) => ts("railCondition", { rail: words.railInline(rail as RailCondition), median: coefficient(c.median), sanded: coefficient(c.sanded), source: railNote(rail, c.source) }))}
      version={typeof __TAUT_VERSION__ === "string" ? __TAUT_VERSION__ : "dev"}
    />
  );
}
