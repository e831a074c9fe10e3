/**
 * Assistance check (view): for the train being edited in Start plan — its verdict as it stands, the
 * assistance options as large cards (what to add and where, verdict word and shape, peak pull and push,
 * time to the target, what to watch), dividing the train when nothing works, and the margins per rail
 * condition as a chart and a table. Props in, JSX out.
 */
import { For, Show, type JSX } from "solid-js";
import type { ConditionMargin } from "../../../core/dispatch/conditionMargins.js";
import type { RailCondition } from "../../../core/physics/types.js";
import type { Reason } from "../../../core/planner/outcome.js";
import type { AssistanceAnswer, AssistanceOptionData } from "../../../worker/protocol.js";
import type { ChartPalette } from "../../charts/palette.js";
import { Chart } from "../../components/Chart.js";
import { Icon } from "../../components/Icon.js";
import { VerdictBanner, VerdictIcon } from "../../components/VerdictBanner.js";
import { words } from "../../words.js";
import { duration, margin, percentOf, show, type UnitSystem } from "../../format.js";
import { appQuantities, splitWords } from "../../lines.js";
import { assistanceNoteText } from "../../../i18n/renderAssistNote.js";
import { tr } from "../../i18n.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { Cautions } from "../shared/Cautions.js";
import { divideLine, limitWord, optionHeadline, placeWords, REASON_SHORT } from "../shared/words.js";
import type { CheckStatus } from "./createAssistanceCheck.js";
import { marginChart, MARGIN_AXIS_TOP } from "./marginChart.js";
import { RailSandTable } from "../shared/RailSandTable.js";

export interface CaseInfo {
  /** The case's name, or a made-up one. */
  title: string;
  /** Locomotives, train, place and rail in a few lines. */
  lines: string[];
  rail: RailCondition;
  sand: boolean;
}

export interface AssistanceViewProps {
  info: CaseInfo | null;
  status: CheckStatus;
  progress: number;
  margins: ConditionMargin[] | null;
  answer: AssistanceAnswer | null;
  error: string | null;
  units: UnitSystem;
  palette: ChartPalette;
  /** Whether an option can be put into the Start plan's case (its profile is in the library). */
  canTry: boolean;
  onCancel: () => void;
  onRetry: () => void;
  onEdit: () => void;
  onTry: (o: AssistanceOptionData) => void;
  /** The locomotive profiles an option may add, the one chosen ("" for the lead unit's), and how added units are driven. */
  profiles?: Array<{ id: string; label: string }>;
  added?: { profile: string; control: "remote" | "helper" };
  onAdded?: (a: { profile: string; control: "remote" | "helper" }) => void;
}

export function AssistanceView(props: AssistanceViewProps): JSX.Element {
  const running = () => props.status === "running";
  return (
    <div class="dispatch assistance-check">
      <p class="advisory">
        <Icon name="info" size={22} /> Advisory only: operating rules, local instructions and the locomotive's own instructions prevail. Decisions on assistance belong to
        those your railway's rules name.
      </p>

      <section class="panel dispatch-case" aria-labelledby="case-h">
        <div class="panel-head">
          <h2 id="case-h">{props.info ? `Train: ${props.info.title}` : "Train"}</h2>
          <button type="button" class="button" onClick={() => props.onEdit()}>
            <Icon name="plan" /> Edit in Start plan
          </button>
        </div>
        <Show
          when={props.info}
          fallback={<p class="problem">The case in Start plan breaks a rule, so it cannot be checked. Fix the inputs marked there first.</p>}
        >
          {(i) => <For each={i().lines}>{(l) => <p class="dispatch-line">{l}</p>}</For>}
        </Show>
        <Show when={props.profiles && props.added && props.onAdded}>
          <div class="row added-unit" data-field="added-unit">
            <div class="field">
              <label class="field-label" for="added-profile">
                Unit to add
              </label>
              <select id="added-profile" class="select" value={props.added!.profile} onChange={(e) => props.onAdded!({ ...props.added!, profile: e.currentTarget.value })}>
                <option value="">Same as the lead unit</option>
                <For each={props.profiles!}>{(p) => <option value={p.id}>{p.label}</option>}</For>
              </select>
            </div>
            <SegmentedButtons<"remote" | "helper">
              name="added-control"
              label="Mid-train and rear units driven as"
              value={props.added!.control}
              onChange={(v) => props.onAdded!({ ...props.added!, control: v })}
              options={[
                { value: "remote", label: "Remote (own notch from the head)" },
                { value: "helper", label: "Helper (own driver)" },
              ]}
            />
          </div>
        </Show>
      </section>

      <Show when={running() || props.status === "cancelled" || props.status === "failed"}>
        <div class="dispatch-run" aria-live="polite">
          <Show when={running()}>
            <div class="dispatch-run-row">
              <div class="progress grow" role="progressbar" aria-label="Checking" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(props.progress * 100)}>
                <span style={{ width: `${Math.max(4, props.progress * 100)}%` }} />
              </div>
              <button type="button" class="button" onClick={() => props.onCancel()}>
                <Icon name="close" /> Cancel
              </button>
            </div>
            <p class="muted">Every option and every rail condition is planned in the train dynamics model: this takes several seconds.</p>
          </Show>
          <Show when={props.status === "cancelled" || props.status === "failed"}>
            <div class="dispatch-run-row">
              <p class="grow">{props.status === "cancelled" ? "Check cancelled." : `The check could not finish. ${props.error ?? ""}`}</p>
              <button type="button" class="button primary" onClick={() => props.onRetry()}>
                <Icon name="update" /> Check again
              </button>
            </div>
          </Show>
        </div>
      </Show>

      <div class="dispatch-columns">
        <div class="dispatch-col">
          <Show when={props.answer} fallback={<Show when={running()}><p class="placeholder-text">Looking for assistance…</p></Show>}>
            {(a) => <Options answer={a()} units={props.units} canTry={props.canTry} onTry={props.onTry} />}
          </Show>
        </div>
        <div class="dispatch-col">
          <MarginsPanel rows={props.margins} info={props.info} running={running()} palette={props.palette} />
        </div>
      </div>

      <Cautions />
    </div>
  );
}

function Options(props: { answer: AssistanceAnswer; units: UnitSystem; canTry: boolean; onTry: (o: AssistanceOptionData) => void }): JSX.Element {
  const a = () => props.answer;
  return (
    <>
      <Show when={a().needed}>
        <VerdictBanner verdict={a().base.verdict} reasons={a().base.reasons} detail={`As it stands: margin ${margin(a().base.margin)} (${limitWord(a().base.binding)})`} compact />
      </Show>
      <Show when={a().needed && a().base.reasons.length > 0}>
        <ul class="reasons">
          <For each={a().base.reasons}>{(r: Reason) => <li>{words.reasonLine(r)}</li>}</For>
        </ul>
      </Show>
      <Show when={a().needed} fallback={<StartsAlready answer={a()} units={props.units} />}>
        <section class="panel" aria-labelledby="options-h">
          <h2 id="options-h">Assistance options</h2>
          <p class="muted">
            Each adds {a().helper.label}: at the head in multiple with the head unit (same notch); mid-train and at the rear{" "}
            {a().control === "helper" ? "as a helper with its own driver, each notch change called by radio" : "as remote power with its own notch, set from the head cab"}. Each is checked in the train
            dynamics model against the coupler and wheel-climb limits. Cheapest first.
          </p>
          <Show when={a().options.length > 0} fallback={<NothingWorks answer={a()} units={props.units} />}>
            <ol class="option-cards">
              <For each={a().options}>{(o, k) => <OptionCard option={o} rank={k() + 1} units={props.units} canTry={props.canTry} onTry={props.onTry} />}</For>
            </ol>
          </Show>
          <Show when={!a().complete}>
            <p class="muted">The search reached its cap of planner runs before every placement was judged; more options may exist.</p>
          </Show>
        </section>
      </Show>
    </>
  );
}

function StartsAlready(props: { answer: AssistanceAnswer; units: UnitSystem }): JSX.Element {
  const b = () => props.answer.base;
  return (
    <section class="panel starts-already" aria-labelledby="starts-h">
      <h2 id="starts-h">
        <VerdictIcon verdict="starts" size={32} /> Starts already: no assistance needed
      </h2>
      <p>
        With its own locomotives this train is expected to start here in these conditions (margin {margin(b().margin)} ({limitWord(b().binding)}), peak coupler force{" "}
        {show("force", b().peakCouplerForceN, props.units)}
        {b().timeToTargetS !== null ? `, target reached after ${duration(b().timeToTargetS!)}` : ""}). The margins per rail condition show how much worse the rail can get before it no longer does.
      </p>
    </section>
  );
}

function OptionCard(props: { option: AssistanceOptionData; rank: number; units: UnitSystem; canTry: boolean; onTry: (o: AssistanceOptionData) => void }): JSX.Element {
  const o = () => props.option;
  const f = (n: number) => show("force", n, props.units);
  return (
    <li class={`option-card verdict-${o().verdict}`} data-option={props.rank}>
      <div class="option-head">
        <span class="option-rank" aria-hidden="true">
          {props.rank}
        </span>
        <div class="option-what">
          <h3>
            <span class="visually-hidden">Option {props.rank}: </span>Add {optionHeadline(o())}
          </h3>
          <p class="option-verdict">
            <VerdictIcon verdict={o().verdict} size={28} />
            <span>{words.verdict(o().verdict)}</span>
            <span class="muted">with this help, margin {margin(o().margin)}</span>
          </p>
        </div>
      </div>
      <dl class="figures option-figures">
        <div>
          <dt>Peak pull</dt>
          <dd>{f(o().peakCouplerForceN)}</dd>
        </div>
        <div>
          <dt>Peak push</dt>
          <dd>
            {f(o().peakCompressionN)}
            <Show when={o().couplings > 0 && o().peakCompressionN > 0}>
              <span class="muted"> at coupling {o().peakCompressionAt + 1} of {o().couplings}</span>
            </Show>
          </dd>
        </div>
        <div>
          <dt>Time to the target</dt>
          <dd>{o().timeToTargetS === null ? "not reached" : duration(o().timeToTargetS!)}</dd>
        </div>
        <Show when={(o().effortSplit ?? []).length > 1}>
          <div>
            <dt>Effort split</dt>
            <dd data-testid="effort-split">{o().effortSplit.map((g) => `${splitWords(g.place)} ${percentOf(g.share, 0)} (notch ${g.notch})`).join(" · ")}</dd>
          </div>
        </Show>
      </dl>
      <p class="option-note">{assistanceNoteText(tr, appQuantities(props.units), o().note)}</p>
      <div class="option-actions">
        <button type="button" class="button" disabled={!props.canTry} onClick={() => props.onTry(o())}>
          <Icon name="add" /> Plan with this help
        </button>
        <span class="muted">Adds the {o().units === 1 ? "unit" : "units"} to the case in Start plan ({o().added.map((x) => `${x.count} ${placeWords(x.position)}`).join(", ")}).</span>
      </div>
    </li>
  );
}

function NothingWorks(props: { answer: AssistanceAnswer; units: UnitSystem }): JSX.Element {
  const a = () => props.answer;
  // What ruled the placements out, grouped by reason.
  const groups = () => {
    const m = new Map<string, number>();
    for (const x of a().rejected) {
      const key = x.reasons.length > 0 ? x.reasons.map((r) => REASON_SHORT[r]).join(" and ") : words.verdictInline(x.verdict);
      m.set(key, (m.get(key) ?? 0) + 1);
    }
    return [...m.entries()];
  };
  return (
    <div class="nothing-works">
      <p class="nothing-title">
        <VerdictIcon verdict="needs-assistance" size={28} /> No option with one or two more units makes this train start.
      </p>
      <Show when={groups().length > 0}>
        <p class="muted">
          {a().rejected.length} placements tried; ruled out by {groups().map(([why, n]) => `${why} (${n})`).join(", ")}.
        </p>
      </Show>
      <Show
        when={a().divide}
        fallback={<p>Not even a short first part of this train is expected to start here with its own locomotives: consider other locomotives, or another time or place.</p>}
      >
        {(d) => (
          <div class="divide-card">
            <h3>Otherwise: divide the train</h3>
            <p class="divide-line">{divideLine(d(), props.units)}</p>
            <Show when={d().verdict}>
              {(v) => (
                <p>
                  The first part: <VerdictIcon verdict={v()} size={22} /> {words.verdictInline(v())}
                  {d().peakCouplerForceN !== null ? `, peak coupler force ${show("force", d().peakCouplerForceN!, props.units)}` : ""}.
                </p>
              )}
            </Show>
            <p class="muted">The rest has to stand clear on other track meanwhile; the trip count is a guide only.</p>
          </div>
        )}
      </Show>
    </div>
  );
}

function MarginsPanel(props: { rows: ConditionMargin[] | null; info: CaseInfo | null; running: boolean; palette: ChartPalette }): JSX.Element {
  const row = (rail: RailCondition, sand: boolean) => props.rows?.find((r) => r.rail === rail && r.sand === sand);
  const isCurrent = (rail: RailCondition, sand: boolean) => props.info?.rail === rail && props.info?.sand === sand;
  const cell = (rail: RailCondition, sand: boolean) => {
    const r = row(rail, sand);
    if (!r) return <td>–</td>;
    return (
      <td classList={{ current: isCurrent(rail, sand) }} data-verdict={r.verdict}>
        <span class="margin-cell">
          <VerdictIcon verdict={r.verdict} size={22} />
          <span class="margin-num">{margin(r.margin)}</span>
        </span>
        <span class="margin-verdict">
          {words.verdict(r.verdict)}
          {r.verdict !== "starts" ? ` (${REASON_SHORT[r.limitedBy]})` : ""}
        </span>
        <Show when={isCurrent(rail, sand)}>
          <span class="visually-hidden"> (this train's conditions)</span>
        </Show>
      </td>
    );
  };
  return (
    <section class="panel" aria-labelledby="margins-h">
      <h2 id="margins-h">Margins per rail condition</h2>
      <Show when={props.rows} fallback={<p class="placeholder-text">{props.running ? "Planning the start in every rail condition…" : "–"}</p>}>
        {(rows) => (
          <>
            <Chart
              title="Smallest margin by rail condition"
              caption={`Available ÷ needed, without and with sand; below × 1 the need is larger than what is available. Bars stop at × ${MARGIN_AXIS_TOP}.`}
              spec={marginChart(rows())}
              palette={props.palette}
              empty="No margins to show."
              height={260}
            />
            <RailSandTable class="dispatch-table margins-table" caption="Verdict and smallest margin; what limits first in brackets. The outlined cell is this train's forecast." cell={cell} />
          </>
        )}
      </Show>
    </section>
  );
}
