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
import { divideLine, limitWord, optionHeadline, REASON_SHORT } from "../shared/words.js";
import type { RunState } from "./createDeparturesRun.js";
import type { DepartureRow, DeparturesSummary } from "./rows.js";

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
        <Icon name="info" size={22} /> Advisory only: operating rules, local instructions and the locomotive's own instructions prevail. Decisions on assistance, dividing
        a train or reducing the load belong to those your railway's rules name.
      </p>

      <section class="panel" aria-labelledby="load-h">
        <h2 id="load-h">Load a day's departures</h2>
        <div class="file-actions">
          <button type="button" class="button primary big" disabled={props.reading} onClick={() => pick.click()}>
            <Icon name="departures" /> Choose files…
          </button>
          <input
            ref={pick}
            class="visually-hidden"
            type="file"
            multiple
            accept=".csv,.json,text/csv,application/json"
            aria-label="Departures file, and the case files a CSV names"
            tabIndex={-1}
            onChange={(e) => {
              const list = files(e);
              if (list.length > 0) props.onPick(list);
            }}
          />
          <button type="button" class="button big" disabled={props.reading} onClick={() => props.onDemo()}>
            Demo day (illustrative)
          </button>
        </div>
        <ul class="formats">
          <li>
            <strong>JSON:</strong> a list of start cases, each with an optional <code>id</code> — the same file <code>taut check</code> reads.
          </li>
          <li>
            <strong>CSV:</strong> columns <code>id,case,rail,sand</code>; <code>case</code> names a start-case file (or a built-in demo case by its id), <code>rail</code> and <code>sand</code> override its
            conditions. A browser cannot open those files by their path, so <strong>pick the case files together with the CSV</strong> (select several at once): they are
            matched by file name.
          </li>
          <li>A location may be a saved location note's id: the notes on this device are used.</li>
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
                    <Icon name="close" /> Cancel
                  </button>
                </Show>
                <Show when={props.state === "cancelled"}>
                  <button type="button" class="button" onClick={() => props.onRestart()}>
                    <Icon name="update" /> Check again
                  </button>
                </Show>
                <button type="button" class="button" disabled={props.state !== "done"} onClick={() => props.onExport()}>
                  <Icon name="ready" /> Export CSV
                </button>
              </div>
            </div>
            <Show when={f().missing.length > 0}>
              <div class="problem" role="alert">
                <p>
                  Case files named in the CSV but not picked: <strong>{f().missing.join(", ")}</strong>. Their rows are not answered.
                </p>
                <button type="button" class="button" onClick={() => more.click()}>
                  <Icon name="add" /> Add case files…
                </button>
                <input
                  ref={more}
                  class="visually-hidden"
                  type="file"
                  multiple
                  accept=".json,application/json"
                  aria-label="Case files the CSV names"
                  tabIndex={-1}
                  onChange={(e) => {
                    const list = files(e);
                    if (list.length > 0) props.onAddCases(list);
                  }}
                />
              </div>
            </Show>
            <Show when={f().unused.length > 0}>
              <p class="muted">Not used (the file does not name them): {f().unused.join(", ")}.</p>
            </Show>
            <div aria-live="polite">
              <Show when={running()}>
                <div class="dispatch-run-row">
                  <div class="progress grow" role="progressbar" aria-label="Checking departures" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(props.progress * 100)}>
                    <span style={{ width: `${Math.max(4, props.progress * 100)}%` }} />
                  </div>
                  <span>
                    {props.summary.answered} of {props.summary.checkable} answered
                  </span>
                </div>
              </Show>
              <Show when={props.state === "cancelled"}>
                <p>
                  Cancelled: {props.summary.answered} of {props.summary.checkable} answered.
                </p>
              </Show>
              <p class="summary-chips">
                <span>
                  <VerdictIcon verdict="needs-assistance" size={22} /> {props.summary.needsAssistance} need assistance
                </span>
                <span>
                  <VerdictIcon verdict="marginal" size={22} /> {props.summary.marginal} marginal
                </span>
                <span>
                  <VerdictIcon verdict="starts" size={22} /> {props.summary.starts} start
                </span>
                <Show when={props.summary.bad > 0}>
                  <span class="alert-text">{props.summary.bad} not answered</span>
                </Show>
              </p>
            </div>
            <Show when={props.state === "done"}>
              <p class="muted">The CSV has the command line's columns and units (t, kN, s), rows in the file's order.</p>
            </Show>
          </section>
        )}
      </Show>

      <Show when={props.bad.length > 0}>
        <section class="bad-rows" aria-labelledby="bad-h" role="alert">
          <h2 id="bad-h">Rows not answered ({props.bad.length})</h2>
          <ul>
            <For each={props.bad}>{(x) => <li>{x.error}</li>}</For>
          </ul>
          <p>The other rows are answered as usual.</p>
        </section>
      </Show>

      <Show when={props.summary.checkable > 0 && (props.rows.length > 0 || (props.filter ?? "all") !== "all")}>
        <div class="departures-controls">
          <SegmentedButtons
            name="departures-filter"
            label="Show"
            value={props.filter ?? "all"}
            onChange={(f) => props.onFilter?.(f)}
            options={[
              { value: "all", label: `All (${props.summary.checkable})` },
              { value: "needs-assistance", label: `Needs assistance (${props.summary.needsAssistance})` },
              { value: "marginal", label: `Marginal (${props.summary.marginal})` },
              { value: "starts", label: `Starts (${props.summary.starts})` },
            ]}
          />
          <SegmentedButtons
            name="departures-sort"
            label="Order"
            value={props.sort ?? "risk"}
            onChange={(v) => props.onSort?.(v)}
            options={[
              { value: "risk", label: "Most at risk first" },
              { value: "file", label: "File order" },
            ]}
          />
        </div>
        <Show when={props.rows.length === 0}>
          <p class="placeholder-text">No departure has that verdict.</p>
        </Show>
      </Show>

      <Show when={props.rows.length > 0}>
        <table class="dispatch-table departures-table">
          <caption>
            {(props.sort ?? "risk") === "risk"
              ? "Most at risk first: needs assistance, then marginal, each by margin (smallest first), then those that start."
              : "In the file's order."}{" "}
            Open a train to see its full plan or its assistance options.
          </caption>
          <thead>
            <tr>
              <th scope="col">Departure</th>
              <th scope="col">Verdict</th>
              <th scope="col">Why</th>
              <th scope="col" class="num">
                Margin
              </th>
              <th scope="col" class="num">
                Largest mass that starts
              </th>
              <th scope="col">Cheapest assistance</th>
              <th scope="col">Open</th>
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
    [x().where, x().rail ? `${((RAIL_CONDITIONS as readonly string[]).includes(x().rail!) ? words.rail(x().rail as RailCondition) : x().rail)}${x().sand ? ", sand" : ", no sand"}` : "", x().trailingMassKg !== undefined ? show("mass", x().trailingMassKg!, props.units) : ""]
      .filter((s) => s !== "")
      .join(" · ");
  const remedy = (): JSX.Element => {
    const r = a();
    if (!r) return "";
    if (r.verdict === "starts") return "—";
    if (r.assistance)
      return (
        <>
          Add {optionHeadline(r.assistance)}
          <span class="row-sub">{r.helper.label}</span>
        </>
      );
    if (r.divide) return divideLine(r.divide, props.units);
    return "None found with one or two more units";
  };
  return (
    <tr classList={{ pending: !a() }} data-row={x().id} data-verdict={a()?.verdict ?? "pending"}>
      <td data-label="Departure" class="dep">
        <span class="row-id">{x().id}</span>
        <span class="row-sub">{sub()}</span>
      </td>
      <td data-label="Verdict" class="verdict-td">
        <Show when={a()} fallback={<span>waiting…</span>}>
          {(r) => (
            <span class={`verdict-cell verdict-${r().verdict}`}>
              <VerdictIcon verdict={r().verdict} size={26} />
              {words.verdict(r().verdict)}
            </span>
          )}
        </Show>
      </td>
      <td data-label="Why" class="why">{a() ? (a()!.reasons.length > 0 ? a()!.reasons.map((r) => REASON_SHORT[r]).join(", ") : "—") : ""}</td>
      <td data-label="Margin" data-short="margin" class="num">
        {a() ? `${margin(a()!.margin)} (${limitWord(a()!.binding)})` : ""}
      </td>
      <td data-label="Largest mass that starts" data-short="largest" class="num">
        {a() ? (a()!.maxStartableMassKg >= 1000 ? showAtMost("mass", a()!.maxStartableMassKg, props.units) : "none") : ""}
      </td>
      <td data-label="Cheapest assistance" class="remedy">
        {remedy()}
      </td>
      <td data-label="Open" class="open">
        <Show when={x().file !== undefined && props.onOpen}>
          <div class="open-buttons">
            <button type="button" class="button" aria-label={`Open ${x().id} in Start plan`} onClick={() => props.onOpen?.(x(), "plan")}>
              <Icon name="plan" size={20} /> Plan
            </button>
            <button type="button" class="button" aria-label={`Open ${x().id} in Assistance check`} onClick={() => props.onOpen?.(x(), "assistance")}>
              <Icon name="assist" size={20} /> Assistance
            </button>
          </div>
        </Show>
      </td>
    </tr>
  );
}
