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
import { divideLine, limitWord, optionHeadline, placeWords } from "../shared/words.js";
import type { CheckStatus } from "./createAssistanceCheck.js";
import { marginChart, MARGIN_AXIS_TOP } from "./marginChart.js";
import { RailSandTable } from "../shared/RailSandTable.js";
import { assist } from "../../../i18n/en/assist.js";
import { Figures } from "../../components/Figures.js";

const t = tr.ns(assist);

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
        <Icon name="info" size={22} /> {t("advisory")}
      </p>

      <section class="panel dispatch-case" aria-labelledby="case-h">
        <div class="panel-head">
          <h2 id="case-h">{props.info ? t("trainTitle", { title: props.info.title }) : t("train")}</h2>
          <button type="button" class="button" onClick={() => props.onEdit()}>
            <Icon name="plan" /> {t("editInStartPlan")}
          </button>
        </div>
        <Show
          when={props.info}
          fallback={<p class="problem">{t("invalid")}</p>}
        >
          {(i) => <For each={i().lines}>{(l) => (
                <p class="dispatch-line">
                  <Figures text={l} />
                </p>
              )}</For>}
        </Show>
        <Show when={props.profiles && props.added && props.onAdded}>
          <div class="row added-unit" data-field="added-unit">
            <div class="field">
              <label class="field-label" for="added-profile">
                {t("unitToAdd")}
              </label>
              <select id="added-profile" class="select" value={props.added!.profile} onChange={(e) => props.onAdded!({ ...props.added!, profile: e.currentTarget.value })}>
                <option value="">{t("sameAsLead")}</option>
                <For each={props.profiles!}>{(p) => <option value={p.id}>{p.label}</option>}</For>
              </select>
            </div>
            <SegmentedButtons<"remote" | "helper">
              name="added-control"
              label={t("addedDriven")}
              value={props.added!.control}
              onChange={(v) => props.onAdded!({ ...props.added!, control: v })}
              options={[
                { value: "remote", label: t("addedRemote") },
                { value: "helper", label: t("addedHelper") },
              ]}
            />
          </div>
        </Show>
      </section>

      <Show when={running() || props.status === "cancelled" || props.status === "failed"}>
        <div class="dispatch-run" aria-live="polite">
          <Show when={running()}>
            <div class="dispatch-run-row">
              <div class="progress grow" role="progressbar" aria-label={t("checking")} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(props.progress * 100)}>
                <span style={{ width: `${Math.max(4, props.progress * 100)}%` }} />
              </div>
              <button type="button" class="button" onClick={() => props.onCancel()}>
                <Icon name="close" /> {t("cancel")}
              </button>
            </div>
            <p class="muted">{t("takesSeconds")}</p>
          </Show>
          <Show when={props.status === "cancelled" || props.status === "failed"}>
            <div class="dispatch-run-row">
              <p class="grow">{props.status === "cancelled" ? t("cancelled") : t("failed", { error: props.error ?? "" })}</p>
              <button type="button" class="button primary" onClick={() => props.onRetry()}>
                <Icon name="update" /> {t("checkAgain")}
              </button>
            </div>
          </Show>
        </div>
      </Show>

      <div class="dispatch-columns">
        <div class="dispatch-col">
          <Show when={props.answer} fallback={<Show when={running()}><p class="placeholder-text">{t("looking")}</p></Show>}>
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
        <VerdictBanner verdict={a().base.verdict} reasons={a().base.reasons} detail={t("asItStands", { margin: margin(a().base.margin), limit: limitWord(a().base.binding) })} compact />
      </Show>
      <Show when={a().needed && a().base.reasons.length > 0}>
        <ul class="reasons">
          <For each={a().base.reasons}>{(r: Reason) => (
            <li>
              <Figures text={words.reasonLine(r)} />
            </li>
          )}</For>
        </ul>
      </Show>
      <Show when={a().needed} fallback={<StartsAlready answer={a()} units={props.units} />}>
        <section class="panel" aria-labelledby="options-h">
          <h2 id="options-h">{t("options")}</h2>
          <p class="muted">{t(a().control === "helper" ? "optionsHelper" : "optionsRemote", { unit: a().helper.label })}</p>
          <Show when={a().options.length > 0} fallback={<NothingWorks answer={a()} units={props.units} />}>
            <ol class="option-cards">
              <For each={a().options}>{(o, k) => <OptionCard option={o} rank={k() + 1} units={props.units} canTry={props.canTry} onTry={props.onTry} />}</For>
            </ol>
          </Show>
          <Show when={!a().complete}>
            <p class="muted">{t("capReached")}</p>
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
        <VerdictIcon verdict="starts" size={32} /> {t("startsAlready")}
      </h2>
      <p>
        <Figures
          text={t("startsAlreadyLine", {
            margin: margin(b().margin),
            limit: limitWord(b().binding),
            force: show("force", b().peakCouplerForceN, props.units),
            target: b().timeToTargetS !== null ? t("targetAfter", { time: duration(b().timeToTargetS!) }) : "",
          })}
        />
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
            <span class="visually-hidden">{t("optionNumber", { number: props.rank })}</span>
            {t("add", { what: optionHeadline(o()) })}
          </h3>
          <p class="option-verdict">
            <VerdictIcon verdict={o().verdict} size={28} />
            <span>{words.verdict(o().verdict)}</span>
            <span class="muted">{t("withThisHelp", { margin: margin(o().margin) })}</span>
          </p>
        </div>
      </div>
      <dl class="figures option-figures">
        <div>
          <dt>{t("peakPull")}</dt>
          <dd>{f(o().peakCouplerForceN)}</dd>
        </div>
        <div>
          <dt>{t("peakPush")}</dt>
          <dd>
            {f(o().peakCompressionN)}
            <Show when={o().couplings > 0 && o().peakCompressionN > 0}>
              <span class="muted">{t("atCoupling", { number: o().peakCompressionAt + 1, of: o().couplings })}</span>
            </Show>
          </dd>
        </div>
        <div>
          <dt>{t("timeToTarget")}</dt>
          <dd>{o().timeToTargetS === null ? t("notReached") : duration(o().timeToTargetS!)}</dd>
        </div>
        <Show when={(o().effortSplit ?? []).length > 1}>
          <div>
            <dt>{t("effortSplit")}</dt>
            <dd data-testid="effort-split">{o().effortSplit.map((g) => t("effortPart", { name: splitWords(g.place), share: percentOf(g.share, 0), notch: g.notch })).join(" · ")}</dd>
          </div>
        </Show>
      </dl>
      <p class="option-note">
        <Figures text={assistanceNoteText(tr, appQuantities(props.units), o().note)} />
      </p>
      <div class="option-actions">
        <button type="button" class="button" disabled={!props.canTry} onClick={() => props.onTry(o())}>
          <Icon name="add" /> {t("planWithHelp")}
        </button>
        <span class="muted">{t("addsUnits", { count: o().units, where: o().added.map((x) => `${tr.num(x.count, 0)} ${placeWords(x.position)}`).join(", ") })}</span>
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
      const key = x.reasons.length > 0 ? x.reasons.map((r) => words.reason(r)).reduce((a, b) => t("and", { a, b })) : words.verdictInline(x.verdict);
      m.set(key, (m.get(key) ?? 0) + 1);
    }
    return [...m.entries()];
  };
  return (
    <div class="nothing-works">
      <p class="nothing-title">
        <VerdictIcon verdict="needs-assistance" size={28} /> {t("nothing")}
      </p>
      <Show when={groups().length > 0}>
        <p class="muted">{t("ruledOut", { count: a().rejected.length, why: groups().map(([why, n]) => t("ruledOutBy", { why, n })).join(", ") })}</p>
      </Show>
      <Show
        when={a().divide}
        fallback={<p>{t("notEvenShort")}</p>}
      >
        {(d) => (
          <div class="divide-card">
            <h3>{t("divideHeading")}</h3>
            <p class="divide-line">
              <Figures text={divideLine(d(), props.units)} />
            </p>
            <Show when={d().verdict}>
              {(v) => (
                <p>
                  {t("firstPart")} <VerdictIcon verdict={v()} size={22} /> {words.verdictInline(v())}
                  {d().peakCouplerForceN !== null ? t("firstPartForce", { force: show("force", d().peakCouplerForceN!, props.units) }) : ""}.
                </p>
              )}
            </Show>
            <p class="muted">{t("standClear")}</p>
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
          {r.verdict !== "starts" ? ` (${words.reason(r.limitedBy)})` : ""}
        </span>
        <Show when={isCurrent(rail, sand)}>
          <span class="visually-hidden">{t("thisTrainsConditions")}</span>
        </Show>
      </td>
    );
  };
  return (
    <section class="panel" aria-labelledby="margins-h">
      <h2 id="margins-h">{t("margins")}</h2>
      <Show when={props.rows} fallback={<p class="placeholder-text">{props.running ? t("planningAll") : "–"}</p>}>
        {(rows) => (
          <>
            <Chart
              title={t("chartTitle")}
              caption={t("chartCaption", { top: MARGIN_AXIS_TOP })}
              spec={marginChart(rows())}
              palette={props.palette}
              empty={t("chartEmpty")}
              height={260}
            />
            <RailSandTable class="dispatch-table margins-table" caption={t("tableCaption")} cell={cell} />
          </>
        )}
      </Show>
    </section>
  );
}
