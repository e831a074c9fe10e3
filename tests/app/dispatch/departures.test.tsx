/**
 * Departures: a JSON day and a CSV day with its case files, rows sorted by risk, a bad row shown with its
 * place while the others are answered, progress and cancel, the CSV export, units.
 */
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import Departures from "../../../src/app/screens/Departures/index.js";
import { CHECK_CSV_HEADER } from "../../../src/profiles/csv.js";
import type { StartCase } from "../../../src/core/train/types.js";
import type { CheckAnswer } from "../../../src/worker/protocol.js";
import { memoryStorage, renderWithApp } from "../harness.js";
import { fakePool, ok } from "./fakes.js";
import { appLang, setAppLanguage } from "../../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../../src/app/state/createSettings.js";
import { departures } from "../../../src/i18n/en/departures.js";
import { de } from "../../../src/i18n/de/index.js";
import { deLater } from "../../../src/i18n/de/later.js";
import { hu } from "../../../src/i18n/hu/index.js";
import { huLater } from "../../../src/i18n/hu/later.js";
import { createTranslator } from "../../../src/i18n/translator.js";
import { wordsDe } from "../../../src/i18n/de/words.js";
import { wordsHu } from "../../../src/i18n/hu/words.js";

const read = (p: string) => readFileSync(join(process.cwd(), "profiles", p), "utf8");
const demoDay = JSON.parse(read("departures/demo-day.json")) as Array<Record<string, unknown>>;

/** A fixed answer by rail condition (the fake worker's "physics"). */
function answerFor(c: StartCase): CheckAnswer {
  const base = { reasons: ["adhesion" as const], margins: { brake: 99, adhesion: 1, power: 2, coupler: 2, distance: 3 }, peakCouplerForceN: 400_000, timeToTargetS: 80, helper: { id: "illustrative-6axle-3000", label: "Illustrative helper" }, searchCapped: false };
  const divide = { wagons: 8, trailingMassKg: 293_400, lengthM: 110, remainingWagons: 20, remainingMassKg: 806_600, trips: 4, maxParts: 3, verdict: "starts" as const, peakCouplerForceN: 150_000, timeToTargetS: 50 };
  const option = (added: CheckAnswer["assistance"] extends infer T ? (T extends { added: infer A } ? A : never) : never) => ({
    added,
    units: added.reduce((s, a) => s + a.count, 0),
    verdict: "starts" as const,
    reasons: [],
    margin: 1.5,
    peakCouplerForceN: 301_234,
    peakCompressionN: 120_000,
    peakCompressionAt: 20,
    couplings: 29,
    headCompressionN: 10_000,
    timeToTargetS: 70,
    note: { code: "all-at-head" as const }, effortSplit: [],
  });
  switch (c.conditions.rail) {
    case "leaves":
      return { ...base, verdict: "needs-assistance", margin: 0.44, binding: "adhesion", startKind: "power", maxStartableMassKg: 0, largestMarginalMassKg: 0, assistance: null, divide };
    case "wet":
      return { ...base, verdict: "needs-assistance", margin: 0.98, binding: "adhesion", startKind: "power", maxStartableMassKg: 460_700, largestMarginalMassKg: 460_700, assistance: option([{ count: 1, position: { afterWagon: 9 } }, { count: 1, position: "rear" }]), divide: null };
    case "frost":
      return { ...base, verdict: "marginal", margin: 0.88, binding: "adhesion", startKind: "power", maxStartableMassKg: 78_900, largestMarginalMassKg: 78_900, assistance: null, divide };
    case "damp":
      return { ...base, verdict: "marginal", margin: 1.07, binding: "adhesion", startKind: "power", maxStartableMassKg: 709_200, largestMarginalMassKg: 709_200, assistance: option([{ count: 1, position: "rear" }]), divide: null };
    default:
      return { ...base, reasons: [], verdict: "starts", margin: 1.74, binding: "adhesion", startKind: "power", maxStartableMassKg: 1_466_300, largestMarginalMassKg: 1_466_300, assistance: null, divide: null };
  }
}

/** Five departures of the demo day with other rails, and a broken one in the middle (index 2). */
function dayFile(): File {
  const pick = (id: string, rail: string, newId: string) => ({ ...demoDay.find((d) => d.id === id)!, id: newId, conditions: { rail, sand: false, temperature_C: 12 } });
  const list = [
    pick("agg-0930", "dry", "d-dry"),
    pick("agg-0930", "wet", "d-wet"),
    { ...demoDay[0]!, id: "d-broken", train: { ...(demoDay[0]!.train as object), trailingMass_t: -10 } },
    pick("agg-0930", "leaves", "d-leaves"),
    pick("agg-0930", "damp", "d-damp"),
    pick("ore-2120", "frost", "d-frost"),
  ];
  return new File([JSON.stringify(list)], "day.json", { type: "application/json" });
}

/** Wait until every row is answered (the export is enabled); generous, as the machine may be busy. */
const answered = () => waitFor(() => expect(screen.getByRole("button", { name: /Export CSV/ }).hasAttribute("disabled")).toBe(false), { timeout: 15_000 });
const picker = () => screen.getByLabelText("Departures file, and the case files a CSV names") as HTMLInputElement;
const ids = () => [...document.querySelectorAll(".departures-table tbody tr")].map((r) => r.getAttribute("data-row"));

let saved: string[];
beforeEach(() => {
  saved = [];
  // The export goes through a Blob URL; keep the text.
  URL.createObjectURL = vi.fn((b: Blob) => {
    void b.text().then((t) => saved.push(t));
    return "blob:test";
  }) as typeof URL.createObjectURL;
  URL.revokeObjectURL = vi.fn();
});
afterEach(() => vi.restoreAllMocks());

describe("Departures", () => {
  it("answers every good row, sorts by risk (needs assistance, then marginal, by margin), and lists the bad row with its place", async () => {
    const pool = fakePool({ check: (c) => ok(answerFor(c)) });
    renderWithApp(() => <Departures />, { pool });
    fireEvent.change(picker(), { target: { files: [dayFile()] } });
    await answered();
    expect(ids()).toEqual(["d-leaves", "d-wet", "d-frost", "d-damp", "d-dry"]);
    const bad = document.querySelector(".bad-rows")!;
    expect(bad.textContent).toContain("Rows not answered (1)");
    expect(bad.textContent).toMatch(/\[2\] \(d-broken\): .*trailingMass_t/);
    expect(pool.calls.filter((c) => c.kind === "check")).toHaveLength(5);
    const chips = document.querySelector(".summary-chips")!.textContent!;
    expect(chips).toContain("2 need assistance");
    expect(chips).toContain("2 marginal");
    expect(chips).toContain("1 start");
    expect(chips).toContain("1 not answered");
    // A row reads: verdict word with its shape, reasons, margin, largest mass, cheapest assistance.
    const wet = document.querySelector('tr[data-row="d-wet"]')!;
    expect(wet.querySelector(".verdict-cell")!.textContent).toBe("Needs assistance");
    expect(wet.querySelector(".verdict-cell svg")!.getAttribute("data-shape")).toBe("square");
    expect(wet.textContent).toContain("adhesion");
    expect(wet.textContent).toContain("× 0.98");
    // 460.7 t: the largest mass that starts is rounded down, as `taut check` gives whole tonnes (460).
    expect(wet.textContent).toContain("460 t");
    expect(wet.textContent).toContain("Add 2 more units: 1 after wagon 9, 1 at the rear");
    const leaves = document.querySelector('tr[data-row="d-leaves"]')!;
    expect(leaves.textContent).toContain("none");
    expect(leaves.textContent).toContain("Divide the train: take the first 8 wagons (293 t)");
    expect(document.querySelector('tr[data-row="d-dry"]')!.textContent).toContain("Starts");
  });

  it("shows one verdict at a time, keeps the file's order on request, and counts each verdict", async () => {
    renderWithApp(() => <Departures />, { pool: fakePool({ check: (c) => ok(answerFor(c)) }) });
    fireEvent.change(picker(), { target: { files: [dayFile()] } });
    await answered();
    const filter = screen.getByRole("radiogroup", { name: "Show" });
    expect([...filter.querySelectorAll("[role=radio]")].map((b) => b.textContent)).toEqual(["All (5)", "Needs assistance (2)", "Marginal (2)", "Starts (1)"]);
    fireEvent.click(screen.getByRole("radio", { name: "Marginal (2)" }));
    expect(ids()).toEqual(["d-frost", "d-damp"]);
    fireEvent.click(screen.getByRole("radio", { name: "Starts (1)" }));
    expect(ids()).toEqual(["d-dry"]);
    fireEvent.click(screen.getByRole("radio", { name: "All (5)" }));
    fireEvent.click(screen.getByRole("radio", { name: "File order" }));
    expect(ids()).toEqual(["d-dry", "d-wet", "d-leaves", "d-damp", "d-frost"]);
    expect(document.querySelector(".departures-table caption")!.textContent).toMatch(/^In the file's order/);
    fireEvent.click(screen.getByRole("radio", { name: "Most at risk first" }));
    expect(ids()).toEqual(["d-leaves", "d-wet", "d-frost", "d-damp", "d-dry"]);
  });

  it("opens a row's train in Start plan or Assistance check, as the case being edited", async () => {
    const { harness } = renderWithApp(() => <Departures />, { pool: fakePool({ check: (c) => ok(answerFor(c)) }) });
    fireEvent.change(picker(), { target: { files: [dayFile()] } });
    await answered();
    fireEvent.click(screen.getByRole("button", { name: "Open d-wet in Start plan" }));
    expect(harness.state.nav.screen()).toBe("start-plan");
    const d = harness.state.draft.draft;
    expect(d.conditions.rail).toBe("wet");
    expect(d.id).toBe("d-wet");
    expect(d.label).toMatch(/^d-wet: /);
    // The draft plans exactly the departure the row answered.
    const c = harness.state.draft.checked();
    expect(c.ok && c.value.train.trailingMassKg).toBe(1_400_000);
    fireEvent.click(screen.getByRole("button", { name: "Open d-frost in Assistance check" }));
    expect(harness.state.nav.screen()).toBe("assistance-check");
    expect(harness.state.draft.draft.conditions.rail).toBe("frost");
    expect(harness.state.draft.draft.train.trailingMass_t).toBe(5200);
  });

  it("exports the command line's CSV: its columns and units, rows in file order, the bad row with its error", async () => {
    renderWithApp(() => <Departures />, { pool: fakePool({ check: (c) => ok(answerFor(c)) }) });
    fireEvent.change(picker(), { target: { files: [dayFile()] } });
    const exportButton = await screen.findByRole("button", { name: /Export CSV/ });
    await waitFor(() => expect(exportButton.hasAttribute("disabled")).toBe(false));
    fireEvent.click(exportButton);
    await waitFor(() => expect(saved).toHaveLength(1));
    const lines = saved[0]!.trimEnd().split("\n");
    expect(lines[0]).toBe(CHECK_CSV_HEADER.join(","));
    expect(lines.slice(1).map((l) => l.split(",")[0])).toEqual(["d-dry", "d-wet", "d-broken", "d-leaves", "d-damp", "d-frost"]);
    expect(lines[2]).toBe('d-wet,,1,wet,false,1400,needs-assistance,adhesion,0.98,460,400,80,"2 × illustrative-6axle-3000 (1 after wagon 9, 1 at the rear)",starts,301.2,,,,adhesion,460');
    expect(lines[4]).toBe("d-leaves,,3,leaves,false,1400,needs-assistance,adhesion,0.44,0,400,80,,,,8,293,,adhesion,0");
    expect(lines[3]).toMatch(/^d-broken,,2,,,,,,,,,,,,,,,\[2\] \(d-broken\): train\.trailingMass_t: .*$/);
  });

  it("reads a CSV day with the case files picked alongside, matched by file name; a missing one is named and can be added", async () => {
    const pool = fakePool({ check: (c) => ok(answerFor(c)) });
    renderWithApp(() => <Departures />, { pool });
    // The demo day with its cases named as files beside it (the shipped CSV names them by built-in id).
    const byFile = read("departures/demo-day.csv").replace(/,(demo-[a-z-]+),/g, ",../cases/$1.json,");
    const csv = new File([byFile], "demo-day.csv", { type: "text/csv" });
    const cases = ["demo-aggregate-ashvale", "demo-ore-lantern", "demo-goods-cinderfield"].map((n) => new File([read(`cases/${n}.json`)], `${n}.json`));
    fireEvent.change(picker(), { target: { files: [csv, cases[0], cases[1]] } });
    await screen.findByText(/Case files named in the CSV but not picked/);
    expect(document.querySelector(".problem")!.textContent).toContain("demo-goods-cinderfield.json");
    await waitFor(() => expect(document.querySelector(".bad-rows")?.textContent).toContain("Rows not answered (4)"));
    expect(document.querySelector(".bad-rows")!.textContent).toContain("line 4: ../cases/demo-goods-cinderfield.json: not among the picked files: pick demo-goods-cinderfield.json together with demo-day.csv");
    expect(ids()).toHaveLength(8);
    fireEvent.change(screen.getByLabelText("Case files the CSV names"), { target: { files: [cases[2]] } });
    await waitFor(() => expect(ids()).toHaveLength(12));
    expect(document.querySelector(".bad-rows")).toBeNull();
    // The CSV's rail and sand override the case's own: agg-0610 is damp and sanded.
    const damp = pool.calls.find((c) => c.kind === "check" && c.startCase.train.trailingMassKg === 1_400_000 && c.startCase.conditions.rail === "damp");
    expect(damp?.startCase.conditions.sand).toBe(true);
  });

  it("checks the built-in demo day with one tap", async () => {
    const pool = fakePool({ check: (c) => ok(answerFor(c)) });
    renderWithApp(() => <Departures />, { pool });
    fireEvent.click(screen.getByRole("button", { name: "Demo day (illustrative)" }));
    await waitFor(() => expect(ids()).toHaveLength(demoDay.length));
    expect(document.querySelector("#run-h")!.textContent).toBe("demo-day.json");
    expect(new Set(ids())).toEqual(new Set(demoDay.map((d) => d.id)));
  });

  it("refuses files without a departures file, with a message, and checks nothing", async () => {
    const pool = fakePool({});
    renderWithApp(() => <Departures />, { pool });
    fireEvent.change(picker(), { target: { files: [new File([read("cases/demo-ore-lantern.json")], "demo-ore-lantern.json")] } });
    await screen.findByText(/no departures file among demo-ore-lantern\.json/);
    expect(pool.calls).toHaveLength(0);
  });

  it("shows progress, and Cancel stops every request", async () => {
    const pool = fakePool({});
    renderWithApp(() => <Departures />, { pool });
    fireEvent.change(picker(), { target: { files: [dayFile()] } });
    await waitFor(() => expect(pool.calls).toHaveLength(5));
    expect(screen.getByRole("progressbar", { name: "Checking departures" })).toBeTruthy();
    expect(screen.getByText("0 of 5 answered")).toBeTruthy();
    pool.calls[0]!.release(ok(answerFor(pool.calls[0]!.startCase)));
    await screen.findByText("1 of 5 answered");
    fireEvent.click(screen.getByRole("button", { name: "Cancel" }));
    expect(pool.calls.slice(1).every((c) => c.opts.signal?.aborted)).toBe(true);
    await screen.findByText(/Cancelled: 1 of 5 answered/);
    expect(document.querySelectorAll('.departures-table tr[data-verdict="pending"]')).toHaveLength(4);
  });

  it("checks identical departures once, and shows masses in short tons with US units", async () => {
    const pool = fakePool({ check: (c) => ok(answerFor(c)) });
    const { harness } = renderWithApp(() => <Departures />, { pool });
    harness.state.settings.update({ units: "us" });
    const same = { ...demoDay[3]!, conditions: { rail: "damp", sand: false, temperature_C: 12 } };
    fireEvent.change(picker(), { target: { files: [new File([JSON.stringify([{ ...same, id: "a" }, { ...same, id: "b" }])], "twins.json")] } });
    await waitFor(() => expect(ids()).toEqual(["a", "b"]));
    await waitFor(() => expect(document.querySelectorAll('tr[data-verdict="marginal"]')).toHaveLength(2));
    expect(pool.calls).toHaveLength(1);
    const text = document.querySelector(".departures-table")!.textContent!;
    expect(text).toContain("781 short tons"); // 709.2 t = 781.8 short tons, rounded down
    expect(text).toContain("1,543 short tons"); // the train's 1,400 t
    expect(text).not.toMatch(/\d t\b/);
  });

  it("reads in German and Hungarian: headings, filters, counts and verdict words from the language's catalog, the same figures", async () => {
    for (const [lang, catalog, w, decimal] of [["de", { ...de, ...deLater }, wordsDe, ","], ["hu", { ...hu, ...huLater }, wordsHu, ","]] as const) {
      const d = createTranslator(lang, catalog).ns(departures);
      expect(d("loadHeading")).not.toBe(departures.en.loadHeading);
      // The language as Settings names it (the app applies it once its catalog has loaded).
      const storage = memoryStorage();
      storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
      try {
        const { unmount } = renderWithApp(() => <Departures />, { storage, pool: fakePool({ check: (c) => ok(answerFor(c)) }) });
        await waitFor(() => expect(appLang()).toBe(lang));
        fireEvent.change(screen.getByLabelText(d("pickLabel")), { target: { files: [dayFile()] } });
        await waitFor(() => expect(screen.getByRole("button", { name: new RegExp(d("exportCsv")) }).hasAttribute("disabled")).toBe(false), { timeout: 15_000 });
        expect(screen.getByRole("heading", { level: 2, name: d("loadHeading") })).toBeTruthy();
        const heads = [...document.querySelectorAll(".departures-table thead th")].map((th) => th.textContent!.trim());
        expect(heads).toEqual([d("colDeparture"), d("colVerdict"), d("colWhy"), d("colMargin"), d("colLargest"), d("colAssistance"), d("colOpen")]);
        const filter = screen.getByRole("radiogroup", { name: d("show") });
        expect([...filter.querySelectorAll("[role=radio]")].map((b) => b.textContent)).toEqual([d("all", { count: 5 }), d("filterNeedsAssistance", { count: 2 }), d("filterMarginal", { count: 2 }), d("filterStarts", { count: 1 })]);
        const chips = document.querySelector(".summary-chips")!.textContent!;
        expect(chips).toContain(d("needAssistance", { count: 2 }));
        expect(chips).toContain(d("start", { count: 1 }));
        expect(document.querySelector(".bad-rows h2")!.textContent).toBe(d("badHeading", { count: 1 }));
        const wet = document.querySelector('tr[data-row="d-wet"]')!;
        expect(wet.querySelector(".verdict-cell")!.textContent).toBe(w.verdictNeedsAssistance);
        expect(wet.textContent).toContain(w.reasonAdhesion);
        // The same margin as in English (× 0.98), with the language's decimal sign.
        expect(wet.textContent).toContain(`× 0${decimal}98`);
        expect(wet.textContent).toContain("460 t");
        expect(screen.getByRole("button", { name: d("openPlanLabel", { id: "d-wet" }) })).toBeTruthy();
        unmount();
      } finally {
        await setAppLanguage("en");
      }
    }
  });
});
