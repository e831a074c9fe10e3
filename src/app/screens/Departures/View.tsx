/**
 * Departures (view): load a day's departures, follow the check, read the rows by risk (needs assistance
 * first, then marginal, each by margin) or in the file's order, show only one verdict, open a row's train in
 * Start plan or Assistance check, see the bad rows with their lines, export CSV. In portrait each row is a
 * compact card (a day of twelve trains is under two screens). Props in, JSX out.
 */
import { For, Show, type JSX } from "solid-js";
import type { Verdict } from "../../../core/planner/outcome.js";
import { RAIL_CONDITIONS, type RailCondition } from "../../../core/physics/types.js";
import { Icon } from "../../components/Icon.js";
import { SegmentedButtons } from "../../components/SegmentedButtons.js";
import { VerdictIcon } from "../../components/VerdictBanner.js";
import { words } from "../../words.js";
import { margin, show, showAtMost, type UnitSystem } from "../../format.js";
import { Cautions } from "../shared/Cautions.js";
import { departures } from "../../../i18n/en/departures.js";
import { compact } from "../../../i18n/en/compact.js";
import { tr } from "../../i18n.js";
import { kept, rich } from "../shared/rich.js";
import { divideLine, limitWord, optionHeadline } from "../shared/words.js";
import type { RunState } from "./createDeparturesRun.js";
import type { DepartureRow, DeparturesSummary } from "./rows.js";
import { rowErrorText } from "./rowErrors.js";
import { Figures } from "../../components/Figures.js";

const t = tr.ns(departures);
const tc = tr.ns(compact);

export interface LoadedFile {
  name: string;
  kind: "json" | "csv";
  /** Case files the CSV names that were not picked. */
  missing: string[];
  /** Picked files the CSV does not name. */
  unused: string[];
}

/** Which rows are shown: all, or one verdict. */
export type DeparturesFilter = "all" | Verdict;
/** Most at risk first, or the file's order. */
export type DeparturesSort = "risk" | "file";

export interface DeparturesViewProps {
  file: LoadedFile | null;
  /** Why the picked files could not be read. */
  problem: string | null;
  reading: boolean;
  state: RunState;
  /** The answered and waiting rows, by risk (bad rows separately). */
  rows: DepartureRow[];
  bad: DepartureRow[];
  summary: DeparturesSummary;
  progress: number;
  units: UnitSystem;
  onPick: (files: File[]) => void;
  onAddCases: (files: File[]) => void;
  onDemo: () => void;
  onCancel: () => void;
  onRestart: () => void;
  onExport: () => void;
  filter?: DeparturesFilter;
  onFilter?: (f: DeparturesFilter) => void;
  sort?: DeparturesSort;
  onSort?: (s: DeparturesSort) => void;
  /** Open a row's train in Start plan ("plan") or in Assistance check ("assistance"). */
  onOpen?: (row: DepartureRow, where: "plan" | "assistance") => void;
}

export function DeparturesView(props: DeparturesViewProps): JSX.Element {
  let pick!: HTMLInputElement;
  let more!: HTMLInputElement;
  const files = (e: Event & { currentTarget: HTMLInputElement }) => {
    const list = [...(e.currentTarget.files ?? [])];
    e.currentTarget.value = "";
    return list;
  };
  const running = () => props.state === "running";
  return (
    <div class="dispatch departures">
      <p class="advisory">
        <Icon name="info" size={22} /> {t("advisory")}
      </p>

      <section class="panel" aria-labelledby="load-h">
        <h2 id="load-h">{t("loadHeading")}</h2>
        <div class="file-actions">
          <button type="button" class="button primary big" disabled={props.reading} onClick={() => pick.click()}>
            <Icon name="departures" /> {t("chooseFiles")}
          </button>
          <input
            ref={pick}
            class="visually-hidden"
            type="file"
            multiple
            accept=".csv,.json,text/csv,application/json"
            aria-label={t("pickLabel")}
            tabIndex={-1}
            onChange={(e) => {
              const list = files(e);
              if (list.length > 0) props.onPick(list);
            }}
          />
          <button type="button" class="button big" disabled={props.reading} onClick={() => props.onDemo()}>
            {t("demoDay")}
          </button>
        </div>
        <ul class="formats">
          <li>
            <strong>JSON:</strong> {rich(t("formatJson", kept("id", "command")), { id: <code>id</code>, command: <code>taut check</code> })}
          </li>
          <li>
            <strong>CSV:</strong>{" "}
            {rich(t("formatCsv", kept("columns", "case", "rail", "sand", "pickTogether")), { columns: <code>id,case,rail,sand</code>, case: <code>case</code>, rail: <code>rail</code>, sand: <code>sand</code>, pickTogether: <strong>{t("pickTogether")}</strong> })}
          </li>
          <li>{t("formatNotes")}</li>
        </ul>
      </section>

      <Show when={props.problem}>
        <p class="problem" role="alert">
          {props.problem}
        </p>
      </Show>

      <Show when={props.file}>
        {(f) => (
          <section class="panel" aria-labelledby="run-h">
            <div class="panel-head">
              <h2 id="run-h">{f().name}</h2>
              <div class="file-actions">
                <Show when={running()}>
                  <button type="button" class="button" onClick={() => props.onCancel()}>
                    <Icon name="close" /> {t("cancel")}
                  </button>
                </Show>
                <Show when={props.state === "cancelled"}>
                  <button type="button" class="button" onClick={() => props.onRestart()}>
                    <Icon name="update" /> {t("checkAgain")}
                  </button>
                </Show>
                <button type="button" class="button" disabled={props.state !== "done"} onClick={() => props.onExport()}>
                  <Icon name="ready" /> {t("exportCsv")}
                </button>
              </div>
            </div>
            <Show when={f().missing.length > 0}>
              <div class="problem" role="alert">
                <p>{rich(t("missing", kept("files")), { files: <strong>{f().missing.join(", ")}</strong> })}</p>
                <button type="button" class="button" onClick={() => more.click()}>
                  <Icon name="add" /> {t("addCases")}
                </button>
                <input
                  ref={more}
                  class="visually-hidden"
                  type="file"
                  multiple
                  accept=".json,application/json"
                  aria-label={t("addCasesLabel")}
                  tabIndex={-1}
                  onChange={(e) => {
                    const list = files(e);
                    if (list.length > 0) props.onAddCases(list);
                  }}
                />
              </div>
            </Show>
            <Show when={f().unused.length > 0}>
              <p class="muted">{t("unused", { files: f().unused.join(", ") })}</p>
            </Show>
            <div aria-live="polite">
              <Show when={running()}>
                <div class="dispatch-run-row">
                  <div class="progress grow" role="progressbar" aria-label={t("checking")} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(props.progress * 100)}>
                    <span style={{ width: `${Math.max(4, props.progress * 100)}%` }} />
                  </div>
                  <span>{t("answered", { answered: props.summary.answered, checkable: props.summary.checkable })}</span>
                </div>
              </Show>
              <Show when={props.state === "cancelled"}>
                <p>{t("cancelled", { answered: props.summary.answered, checkable: props.summary.checkable })}</p>
              </Show>
              <p class="summary-chips">
                <span>
                  <VerdictIcon verdict="needs-assistance" size={22} /> {t("needAssistance", { count: props.summary.needsAssistance })}
                </span>
                <span>
                  <VerdictIcon verdict="marginal" size={22} /> {t("marginal", { count: props.summary.marginal })}
                </span>
                <span>
                  <VerdictIcon verdict="starts" size={22} /> {t("start", { count: props.summary.starts })}
                </span>
                <Show when={props.summary.bad > 0}>
                  <span class="alert-text">{t("notAnswered", { count: props.summary.bad })}</span>
                </Show>
              </p>
            </div>
            <Show when={props.state === "done"}>
              <p class="muted">{t("csvNote")}</p>
            </Show>
          </section>
        )}
      </Show>

      <Show when={props.bad.length > 0}>
        <section class="bad-rows" aria-labelledby="bad-h" role="alert">
          <h2 id="bad-h">{t("badHeading", { count: props.bad.length })}</h2>
          <ul>
            <For each={props.bad}>{(x) => <li>{rowErrorText(tr, x)}</li>}</For>
          </ul>
          <p>{t("badRest")}</p>
        </section>
      </Show>

      <Show when={props.summary.checkable > 0 && (props.rows.length > 0 || (props.filter ?? "all") !== "all")}>
        <div class="departures-controls">
          <SegmentedButtons
            name="departures-filter"
            label={t("show")}
            value={props.filter ?? "all"}
            onChange={(f) => props.onFilter?.(f)}
            options={[
              { value: "all", label: t("all", { count: props.summary.checkable }) },
              { value: "needs-assistance", label: t("filterNeedsAssistance", { count: props.summary.needsAssistance }) },
              { value: "marginal", label: t("filterMarginal", { count: props.summary.marginal }) },
              { value: "starts", label: t("filterStarts", { count: props.summary.starts }) },
            ]}
          />
          <SegmentedButtons
            name="departures-sort"
            label={t("order")}
            value={props.sort ?? "risk"}
            onChange={(v) => props.onSort?.(v)}
            options={[
              { value: "risk", label: t("riskFirst") },
              { value: "file", label: t("fileOrder") },
            ]}
          />
        </div>
        <Show when={props.rows.length === 0}>
          <p class="placeholder-text">{t("noneWithVerdict")}</p>
        </Show>
      </Show>

      <Show when={props.rows.length > 0}>
        <table class="dispatch-table departures-table">
          <caption>
            {(props.sort ?? "risk") === "risk"
              ? t("captionRisk")
              : t("captionFile")}{" "}
            {t("captionOpen")}
          </caption>
          <thead>
            <tr>
              <th scope="col">{t("colDeparture")}</th>
              <th scope="col">{t("colVerdict")}</th>
              <th scope="col">{t("colWhy")}</th>
              <th scope="col" class="num">
                {t("colMargin")}
              </th>
              <th scope="col" class="num">
                {t("colLargest")}
              </th>
              <th scope="col">{t("colAssistance")}</th>
              <th scope="col">{t("colOpen")}</th>
            </tr>
          </thead>
          <tbody>
            <For each={props.rows}>{(x) => <Row row={x} units={props.units} {...(props.onOpen ? { onOpen: props.onOpen } : {})} />}</For>
          </tbody>
        </table>
      </Show>

      <Cautions />
    </div>
  );
}

function Row(props: { row: DepartureRow; units: UnitSystem; onOpen?: (row: DepartureRow, where: "plan" | "assistance") => void }): JSX.Element {
  const x = () => props.row;
  const a = () => x().answer;
  const sub = () =>
    [x().line !== undefined ? tc("fileLine", { line: String(x().line) }) : x().where, x().rail ? `${((RAIL_CONDITIONS as readonly string[]).includes(x().rail!) ? words.rail(x().rail as RailCondition) : x().rail)}${x().sand ? `, ${t("sand")}` : `, ${t("noSand")}`}` : "", x().trailingMassKg !== undefined ? show("mass", x().trailingMassKg!, props.units) : ""]
      .filter((s) => s !== "")
      .join(" · ");
  const remedy = (): JSX.Element => {
    const r = a();
    if (!r) return "";
    if (r.verdict === "starts") return "—";
    if (r.assistance)
      return (
        <>
          {t("add", { option: optionHeadline(r.assistance) })}
          <span class="row-sub">{r.helper.label}</span>
        </>
      );
    if (r.divide) return divideLine(r.divide, props.units);
    return t("noAssistance");
  };
  return (
    <tr classList={{ pending: !a() }} data-row={x().id} data-verdict={a()?.verdict ?? "pending"}>
      <td data-label={t("colDeparture")} class="dep">
        <span class="row-id">{x().id}</span>
        <span class="row-sub"><Figures text={sub()} /></span>
      </td>
      <td data-label={t("colVerdict")} class="verdict-td">
        <Show when={a()} fallback={<span>{t("waiting")}</span>}>
          {(r) => (
            <span class={`verdict-cell verdict-${r().verdict}`}>
              <VerdictIcon verdict={r().verdict} size={26} />
              {words.verdict(r().verdict)}
            </span>
          )}
        </Show>
      </td>
      <td data-label={t("colWhy")} class="why">{a() ? (a()!.reasons.length > 0 ? a()!.reasons.map((r) => words.reason(r)).join(", ") : "—") : ""}</td>
      <td data-label={t("colMargin")} data-short="margin" data-word={tc("margin")} class="num">
        {a() ? `${margin(a()!.margin)} (${limitWord(a()!.binding)})` : ""}
      </td>
      <td data-label={t("colLargest")} data-short="largest" data-word={tc("largest")} class="num">
        {a() ? (a()!.maxStartableMassKg >= 1000 ? showAtMost("mass", a()!.maxStartableMassKg, props.units) : t("none")) : ""}
      </td>
      <td data-label={t("colAssistance")} class="remedy">
        {remedy()}
      </td>
      <td data-label={t("colOpen")} class="open">
        <Show when={x().file !== undefined && props.onOpen}>
          <div class="open-buttons">
            <button type="button" class="button" aria-label={t("openPlanLabel", { id: x().id })} onClick={() => props.onOpen?.(x(), "plan")}>
              <Icon name="plan" size={20} /> {t("openPlan")}
            </button>
            <button type="button" class="button" aria-label={t("openAssistanceLabel", { id: x().id })} onClick={() => props.onOpen?.(x(), "assistance")}>
              <Icon name="assist" size={20} /> {t("openAssistance")}
            </button>
          </div>
        </Show>
      </td>
    </tr>
  );
}
