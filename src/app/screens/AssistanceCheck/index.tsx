/** Assistance check (wiring): the case being edited in Start plan, checked on the planner workers; the view is View.tsx. */
import { words } from "../../words.js";
import { createMemo, createSignal, type JSX } from "solid-js";
import { unwrap } from "solid-js/store";
import type { StartCase } from "../../../core/train/types.js";
import type { AssistanceOptionData } from "../../../worker/protocol.js";
import { PALETTES } from "../../charts/palette.js";
import { useApp } from "../../context.js";
import { show, type UnitSystem } from "../../format.js";
import type { CaseDraft } from "../../state/caseDraft.js";
import { declarePrintStatus } from "../../state/printStatus.js";
import "../shared/dispatch.css";
import { placeWords } from "../shared/words.js";
import { createAssistanceCheck } from "./createAssistanceCheck.js";
import { AssistanceView, type CaseInfo } from "./View.js";
import { assist } from "../../../i18n/en/assist.js";
import { tr } from "../../i18n.js";
import { checkWords } from "../../checkWords.js";

// The screen's Hungarian and German words come in a chunk of their own, before the screen shows.
await checkWords;

const t = tr.ns(assist);

/** The case in a few lines: locomotives, train, place, rail. */
export function caseInfo(c: StartCase, d: CaseDraft, placeName: string | undefined, units: UnitSystem, edited = false): CaseInfo {
  const locos = c.locomotives.map((g) => t("locoGroup", { n: g.count, label: g.spec.label, place: placeWords(g.position) })).join("; ");
  const q = d.quick;
  const place =
    d.locationMode === "note"
      ? (placeName ?? d.noteId)
      : d.locationMode === "profile" && d.profile
        ? t("placeProfile", { count: d.profile.segments.length, distance: show("distance", d.profile.clearAhead_m, units) })
        : t("placeQuick", {
            grade: show("grade", q.gradient_permille / 1000, units),
            curve: q.curveRadius_m > 0 ? t("curve", { radius: show("radius", q.curveRadius_m, units) }) : t("straight"),
            distance: show("distance", q.clearAhead_m, units),
          });
  return {
    // A case changed since it was loaded no longer matches its name's words (a "dry afternoon" on wet rail).
    title: d.label ? (edited ? t("edited", { label: d.label }) : d.label) : t("untitled"),
    lines: [
      t("lineLocos", { locos }),
      t("lineTrain", { mass: show("mass", c.train.trailingMassKg, units), count: c.train.wagons, length: show("distance", c.train.lengthM, units) }),
      t("linePlace", { place }),
      t("lineRail", { rail: words.rail(c.conditions.rail), sand: c.conditions.sand ? t("withSand") : t("withoutSand"), temperature: show("temperature", c.conditions.temperatureC, units) }),
    ],
    rail: c.conditions.rail,
    sand: c.conditions.sand,
  };
}

export default function AssistanceCheck(): JSX.Element {
  const app = useApp();
  const units = () => app.settings.settings().units;
  const startCase = createMemo(() => {
    const c = app.draft.checked();
    return c.ok ? c.value : null;
  });
  const [added, setAdded] = createSignal<{ profile: string; control: "remote" | "helper" }>({ profile: "", control: "remote" });
  const addedSpec = createMemo(() => {
    const a = added();
    const spec = a.profile ? app.locations.library().locomotives.get(a.profile)?.spec : undefined;
    return { ...(spec ? { helper: spec } : {}), control: a.control };
  });
  const check = createAssistanceCheck({ workers: app.pool, startCase, added: addedSpec });
  declarePrintStatus(() => ({ complete: check.status() !== "running", waitingFor: t("waitingFor"), inputs: startCase() }));
  const info = createMemo(() => {
    const c = startCase();
    if (!c) return null;
    const d = app.draft.draft;
    const name = app.locations.choices().find((x) => x.id === d.noteId)?.name ?? app.locations.library().locations.get(d.noteId)?.name;
    return caseInfo(c, unwrap(d), name, units(), app.draft.edited());
  });
  const tryOption = (o: AssistanceOptionData) => {
    const a = check.answer();
    if (!a) return;
    for (const u of o.added) {
      const p = u.position;
      app.draft.set("locomotives", app.draft.draft.locomotives.length, {
        profile: a.helper.id,
        count: u.count,
        position: typeof p === "string" ? p : "after",
        afterWagon: typeof p === "string" ? Math.max(1, Math.floor(app.draft.draft.train.wagons / 2)) : p.afterWagon,
        ...(p !== "head" ? { control: a.control ?? "remote" } : {}),
      });
    }
    app.nav.go("start-plan");
  };
  return (
    <AssistanceView
      info={info()}
      status={check.status()}
      progress={check.progress()}
      margins={check.margins()}
      answer={check.answer()}
      error={check.error()}
      units={units()}
      palette={PALETTES[app.theme()]}
      canTry={(() => {
        const a = check.answer();
        return a !== null && app.locations.library().locomotives.has(a.helper.id);
      })()}
      onCancel={check.cancel}
      onRetry={check.retry}
      onEdit={() => app.nav.go("start-plan")}
      onTry={tryOption}
      profiles={[...app.locations.library().locomotives.values()].map((l) => ({ id: l.spec.id, label: l.spec.label }))}
      added={added()}
      onAdded={setAdded}
    />
  );
}
