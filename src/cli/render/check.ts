/** Readable and CSV forms of a departures check. */
import type { DepartureRow } from "../batch/checkDepartures.js";
import { CHECK_CSV_HEADER } from "../../profiles/csv.js";
import { csv, marginNum, num, textTable } from "../table.js";
import { divideLine, optionLine } from "./assistance.js";
import { cliTr, cliWords } from "../lang.js";
import { cli } from "../../i18n/en/cli.js";
import { readers } from "../../i18n/en/readers.js";
import { cautionText } from "../../i18n/render.js";
import type { Caution } from "../../core/planner/cautions.js";
import { RAIL_CONDITIONS, type RailCondition } from "../../core/physics/types.js";
import { wrap } from "./wrap.js";
import { printable } from "../../profiles/text.js";
import { departureProblemText } from "../../profiles/departures.js";
import { cliErrors } from "../../i18n/en/cliErrors.js";

/** The remedy of a row in a few words: the cheapest option, or dividing the train. */
export function remedyText(r: DepartureRow): string {
  if (r.verdict === undefined || r.verdict === "starts") return "";
  if (r.assistance) return optionLine(r.assistance);
  if (r.divide) return divideLine(r.divide);
  const t = cliTr().ns(cli);
  if (r.maxStartableMass_t !== undefined && r.maxStartableMass_t > 0) return t("lessLoad", { mass: num(r.maxStartableMass_t) });
  return t("noneFound");
}

/** "1263 / 1650": the largest startable and at-least-marginal masses; "none" when not even a light train starts. */
export function massesText(r: DepartureRow): string {
  const t = (x: number | undefined) => (x === undefined ? "" : x > 0 ? num(x) : cliTr().ns(cli)("none"));
  const m = r.largestMarginalMass_t;
  return m !== undefined && m !== r.maxStartableMass_t ? `${t(r.maxStartableMass_t)} / ${t(m)}` : t(r.maxStartableMass_t);
}

/** A row's error in this run's language, from the codes beside it (English: the row's `error` itself). */
export function rowErrorText(r: DepartureRow): string {
  const tr = cliTr();
  const p = r.problem;
  if (tr.lang === "en" || p === undefined) return r.error ?? "";
  if (p.kind === "input") return departureProblemText(tr, p.problem);
  const t = tr.ns(cliErrors);
  const at = p.line !== undefined ? tr.ns(readers)("rowLine", { line: p.line }) : `[${p.index ?? 0}]`;
  return p.kind === "internal" ? t("rowInternal", { where: at, message: p.message }) : t("rowUnread", { where: at });
}

function where(r: DepartureRow): string {
  return r.line !== undefined ? cliTr().ns(cli)("rowLine", { line: r.line }) : r.index !== undefined ? `[${r.index}]` : "";
}

export interface CheckSummary {
  departures: number;
  starts: number;
  marginal: number;
  needsAssistance: number;
  badRows: number;
  internalErrors: number;
}

export function summarise(rows: readonly DepartureRow[]): CheckSummary {
  const count = (f: (r: DepartureRow) => boolean) => rows.filter(f).length;
  return {
    departures: rows.length,
    starts: count((r) => r.verdict === "starts"),
    marginal: count((r) => r.verdict === "marginal"),
    needsAssistance: count((r) => r.verdict === "needs-assistance"),
    badRows: count((r) => r.errorKind === "input"),
    internalErrors: count((r) => r.errorKind === "internal"),
  };
}

export function renderCheck(rows: readonly DepartureRow[], cautions: readonly Caution[]): string {
  const t = cliTr().ns(cli);
  const w = cliWords();
  const lines: string[] = [];
  const good = rows.filter((r) => !r.error);
  // A table with no row would be a header over nothing: say so in a sentence instead.
  if (good.length === 0) lines.push(t("noneAnswered"));
  else lines.push(
    textTable(
      [t("colId"), t("colRow"), t("colRail"), t("colSand"), t("colMassT"), t("colVerdict"), t("colWhy"), t("colMargin"), t("colLargest"), t("colCheapest")],
      good.map((r) => [
        printable(r.id),
        where(r),
        r.rail !== undefined && (RAIL_CONDITIONS as readonly string[]).includes(r.rail) ? w.railInline(r.rail as RailCondition) : (r.rail ?? ""),
        r.sand ? t("yes") : t("no"),
        num(r.trailingMass_t),
        cliWords().verdictInline(r.verdict!),
        (r.reasons ?? []).map((x) => w.reason(x)).join(", ") || "—",
        `${marginNum(r.margin)}${r.binding ? ` (${cliWords().limit(r.binding)})` : ""}`,
        massesText(r),
        remedyText(r) || "—",
      ]),
    ),
  );
  const bad = rows.filter((r) => r.error);
  if (bad.length > 0) {
    lines.push("");
    lines.push(t("notAnswered", { count: bad.length }));
    for (const r of bad) lines.push(...wrap(`  - ${printable(rowErrorText(r))}`, 110, "    "));
  }
  const s = summarise(rows);
  lines.push("");
  lines.push(
    t("summary", { departures: s.departures, starts: s.starts, marginal: s.marginal, assist: s.needsAssistance }) +
      (s.badRows ? t("summaryBad", { count: s.badRows }) : "") +
      (s.internalErrors ? t("summaryFailed", { count: s.internalErrors }) : "") +
      ".",
  );
  lines.push(t("checkMarginNote"));
  if (rows.some((r) => r.searchCapped)) lines.push(t("checkCapped"));
  lines.push("");
  lines.push(t("cautions"));
  for (const c of cautions) lines.push(...wrap(`  - ${cautionText(cliTr(), c)}`, 100, "    "));
  return lines.join("\n");
}


export function checkCsv(rows: readonly DepartureRow[]): string {
  return csv(
    CHECK_CSV_HEADER,
    rows.map((r) => [
      r.id,
      r.line,
      r.index,
      r.rail,
      r.sand,
      r.trailingMass_t,
      r.verdict,
      r.reasons?.join(";"),
      r.margin,
      r.maxStartableMass_t,
      r.peakCouplerForce_kN,
      r.timeToTarget_s,
      r.assistance ? optionLine(r.assistance, true) : "",
      r.assistance?.verdict,
      r.assistance?.peakCouplerForce_kN,
      r.divide?.firstPart.wagons,
      r.divide?.firstPart.trailingMass_t,
      r.error,
      r.binding,
      r.largestMarginalMass_t,
    ]),
  );
}
