/** Assistance check: option cards, the "starts already" and "nothing works" states, margins, units, progress and cancel, planning an option. */
import { fireEvent, screen, waitFor, within } from "@solidjs/testing-library";
import { beforeEach, describe, expect, it } from "vitest";
import AssistanceCheck from "../../../src/app/screens/AssistanceCheck/index.js";
import { forgetAssistanceChecks } from "../../../src/app/screens/AssistanceCheck/createAssistanceCheck.js";
import { marginChart } from "../../../src/app/screens/AssistanceCheck/marginChart.js";
import { divideLine } from "../../../src/app/screens/shared/words.js";
import type { AssistanceAnswer, AssistanceOptionData } from "../../../src/worker/protocol.js";
import { renderWithApp } from "../harness.js";
import { fakePool, marginRows, ok } from "./fakes.js";

const rear: AssistanceOptionData = {
  added: [{ count: 1, position: "rear" }],
  units: 1,
  verdict: "starts",
  reasons: [],
  margin: 1.42,
  peakCouplerForceN: 412_000,
  peakCompressionN: 188_000,
  peakCompressionAt: 25,
  couplings: 29,
  headCompressionN: 40_000,
  timeToTargetS: 93,
  note: { code: "pushing", added: [{ count: 1, position: "rear" }], control: "with-head", where: "rear", peakN: 188_000, coupling: 26, couplings: 29, rear: true }, effortSplit: [],
};
const split: AssistanceOptionData = {
  ...rear,
  added: [
    { count: 1, position: { afterWagon: 9 } },
    { count: 1, position: "rear" },
  ],
  units: 2,
  margin: 2.1,
  peakCouplerForceN: 301_000,
  timeToTargetS: 70,
  note: { code: "all-at-head" }, effortSplit: [],
};

function answer(p: Partial<AssistanceAnswer> = {}): AssistanceAnswer {
  return {
    base: { verdict: "needs-assistance", reasons: ["adhesion"], margin: 0.93, binding: "adhesion", startKind: "power", margins: { brake: 99, adhesion: 0.93, power: 2, coupler: 3, distance: 4 }, peakCouplerForceN: 500_000, timeToTargetS: null },
    needed: true,
    helper: { id: "illustrative-6axle-3000", label: "Illustrative helper unit" },
    options: [rear, split],
    rejected: [{ added: [{ count: 1, position: "head" }], units: 1, verdict: "marginal", reasons: ["coupler"], by: "planner" }],
    divide: null,
    plannerRuns: 9,
    complete: true,
    ...p,
  };
}

beforeEach(() => forgetAssistanceChecks());

const cards = () => [...document.querySelectorAll(".option-card")] as HTMLElement[];

describe("Assistance check", () => {
  it("shows each option as a large card: what and where, verdict word and shape, pull, push, time, what to watch", async () => {
    const pool = fakePool({ assistance: () => ok(answer()), conditionMargins: () => ok(marginRows()) });
    renderWithApp(() => <AssistanceCheck />, { pool });
    await waitFor(() => expect(cards()).toHaveLength(2));
    const [first, second] = cards() as [HTMLElement, HTMLElement];
    expect(within(first).getByRole("heading").textContent).toBe("Option 1: Add 1 more unit at the rear");
    expect(within(second).getByRole("heading").textContent).toBe("Option 2: Add 2 more units: 1 after wagon 9, 1 at the rear");
    expect(first.querySelector(".option-verdict")!.textContent).toContain("Starts");
    expect(first.querySelector(".option-verdict svg")!.getAttribute("data-shape")).toBe("circle");
    const figures = first.querySelector(".option-figures")!.textContent!;
    expect(figures).toContain("Peak pull412 kN");
    expect(figures).toContain("Peak push188 kN at coupling 26 of 29");
    expect(figures).toContain("Time to the target1 min 33 s");
    expect(first.textContent).toContain("Peak compression 188 kN near the rear");
    // The case as it stands, and why.
    expect(document.querySelector("[data-verdict]")!.getAttribute("data-verdict")).toBe("needs-assistance");
    // The case the workers were asked about is the Start plan's.
    expect(pool.calls.map((c) => c.kind).sort()).toEqual(["assistance", "conditionMargins"]);
    // Cautions on the screen.
    expect(screen.getAllByText(/Advisory only/).length).toBeGreaterThan(0);
  });

  it("converts every figure to US customary units", async () => {
    const pool = fakePool({ assistance: () => ok(answer()), conditionMargins: () => ok(marginRows()) });
    const { harness } = renderWithApp(() => <AssistanceCheck />, { pool });
    harness.state.settings.update({ units: "us" });
    await waitFor(() => expect(cards()).toHaveLength(2));
    const text = cards()[0]!.textContent!;
    expect(text).toContain("92.6 klbf"); // 412 kN
    expect(text).not.toMatch(/\d kN/);
    expect(text).toContain("Peak compression 42.3 klbf"); // the note's figure, localised
  });

  it("says plainly when the train starts already, with no cards", async () => {
    const starts = answer({ needed: false, options: [], rejected: [], base: { verdict: "starts", reasons: [], margin: 1.74, binding: "adhesion", startKind: "power", margins: { brake: 99, adhesion: 1.74, power: 3, coupler: 2, distance: 4 }, peakCouplerForceN: 247_000, timeToTargetS: 202 } });
    renderWithApp(() => <AssistanceCheck />, { pool: fakePool({ assistance: () => ok(starts), conditionMargins: () => ok(marginRows()) }) });
    await screen.findByText("Starts already: no assistance needed");
    expect(cards()).toHaveLength(0);
    expect(document.querySelector(".starts-already")!.textContent).toContain("3 min 22 s");
  });

  it("offers dividing the train when no option works, with what ruled the placements out", async () => {
    const none = answer({
      options: [],
      divide: { wagons: 8, trailingMassKg: 293_000, lengthM: 120, remainingWagons: 22, remainingMassKg: 807_000, trips: 4, maxParts: 3, verdict: "starts", peakCouplerForceN: 180_000, timeToTargetS: 60 },
    });
    renderWithApp(() => <AssistanceCheck />, { pool: fakePool({ assistance: () => ok(none), conditionMargins: () => ok(marginRows()) }) });
    await screen.findByText(/No option with one or two more units makes this train start/);
    expect(screen.getByText(/1 placement tried; ruled out by coupler \(1\)/)).toBeTruthy();
    expect(document.querySelector(".divide-line")!.textContent).toBe(
      "Divide the train: take the first 8 wagons (293 t), then the remaining 22 wagons (807 t) — about 4 trips. Hardly practical: think of other locomotives, or another time or place.",
    );
  });

  it("names dividing in two as it is, without calling it impractical", () => {
    const line = divideLine({ wagons: 15, trailingMassKg: 1_300_000, lengthM: 210, remainingWagons: 13, remainingMassKg: 1_100_000, trips: 2, maxParts: 3, verdict: "starts", peakCouplerForceN: 1, timeToTargetS: 1 }, "us");
    expect(line).toBe("Divide the train: take the first 15 wagons (1,433 short tons), then the remaining 13 wagons (1,213 short tons) — about 2 trips.");
  });

  it("tabulates the margins per rail condition and outlines this train's forecast", async () => {
    const { harness } = renderWithApp(() => <AssistanceCheck />, { pool: fakePool({ assistance: () => ok(answer()), conditionMargins: () => ok(marginRows()) }) });
    await waitFor(() => expect(document.querySelectorAll(".margins-table tbody td")).toHaveLength(12));
    const d = harness.state.draft.draft.conditions;
    const current = document.querySelector(".margins-table td.current")!;
    const row = current.closest("tr")!;
    expect(row.querySelector("th")!.textContent!.toLowerCase()).toBe(d.rail);
    expect([...row.querySelectorAll("td")].indexOf(current as HTMLTableCellElement)).toBe(d.sand ? 1 : 0);
    const leaves = [...document.querySelectorAll(".margins-table tbody tr")].find((r) => r.querySelector("th")!.textContent === "Leaves")!;
    expect(leaves.textContent).toContain("× 0.30");
    expect(leaves.textContent).toContain("Needs assistance (adhesion)");
    expect(leaves.querySelector("svg")!.getAttribute("data-shape")).toBe("square");
  });

  it("draws the margins as bars per rail condition, words on the axis, cut at × 3", () => {
    const rows = marginRows().map((r) => (r.rail === "dry" && r.sand ? { ...r, margin: 99 } : r));
    const spec = marginChart(rows)!;
    expect(spec.x.labels).toEqual(["Dry", "Damp", "Wet", "Frost", "Leaves", "Greasy"]);
    expect(spec.y.max).toBe(3);
    const sand = spec.series.find((s) => s.id === "sand")!;
    // Four corners per bar; the dry bar with sand is cut at the axis top.
    expect(sand.points).toHaveLength(24);
    expect(Math.max(...sand.points.map((p) => p.y))).toBe(3);
    const damp = spec.series.find((s) => s.id === "no-sand")!.points.slice(4, 8).map((p) => p.y);
    expect(damp).toEqual([0, 0.9, 0.9, 0]);
    expect(spec.series.find((s) => s.id === "one")!.points.every((p) => p.y === 1)).toBe(true);
  });

  it("shows progress, cancels both requests, and checks again on demand", async () => {
    const pool = fakePool({});
    renderWithApp(() => <AssistanceCheck />, { pool });
    await waitFor(() => expect(pool.calls).toHaveLength(2));
    expect(screen.getByRole("progressbar", { name: "Checking" })).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Cancel" }));
    expect(pool.calls.every((c) => c.opts.signal?.aborted)).toBe(true);
    await screen.findByText("Check cancelled.");
    fireEvent.click(screen.getByRole("button", { name: "Check again" }));
    await waitFor(() => expect(pool.calls).toHaveLength(4));
    pool.calls[2]!.release(ok(marginRows()));
    pool.calls[3]!.release(ok(answer()));
    await waitFor(() => expect(cards()).toHaveLength(2));
    await waitFor(() => expect(screen.queryByRole("progressbar")).toBeNull());
  });

  it("puts an option into the Start plan's case and goes there", async () => {
    const { harness } = renderWithApp(() => <AssistanceCheck />, { pool: fakePool({ assistance: () => ok(answer()), conditionMargins: () => ok(marginRows()) }) });
    await waitFor(() => expect(cards()).toHaveLength(2));
    const before = harness.state.draft.draft.locomotives.length;
    fireEvent.click(within(cards()[1]!).getByRole("button", { name: /Plan with this help/ }));
    const added = harness.state.draft.draft.locomotives.slice(before);
    expect(added).toEqual([
      // Mid-train and rear units as the search added them: remote, their own notch.
      { profile: "illustrative-6axle-3000", count: 1, position: "after", afterWagon: 9, control: "remote" },
      { profile: "illustrative-6axle-3000", count: 1, position: "rear", afterWagon: expect.any(Number), control: "remote" },
    ]);
    expect(harness.state.nav.screen()).toBe("start-plan");
    expect(harness.state.draft.checked().ok).toBe(true);
  });

  it("asks the Start plan to fix its inputs when the case breaks a rule, and asks the workers nothing", async () => {
    const pool = fakePool({});
    const { harness } = renderWithApp(() => <AssistanceCheck />, { pool });
    harness.state.draft.set("train", "trailingMass_t", -5);
    await screen.findByText(/breaks a rule, so it cannot be checked/);
    await waitFor(() => expect(pool.calls.every((c) => c.opts.signal?.aborted)).toBe(true));
  });
});

describe("the unit the options add", () => {
  it("the dispatcher chooses its profile and how mid-train and rear units are driven; the search is asked again with them", async () => {
    const pool = fakePool({ assistance: () => ok(answer()), conditionMargins: () => ok(marginRows()) });
    renderWithApp(() => <AssistanceCheck />, { pool });
    await waitFor(() => expect(cards()).toHaveLength(2));
    const first = pool.calls.filter((c) => c.kind === "assistance").length;
    const select = screen.getByLabelText("Unit to add") as HTMLSelectElement;
    fireEvent.change(select, { target: { value: "illustrative-4axle-1100" } });
    fireEvent.click(screen.getByRole("radio", { name: /Helper \(own driver\)/ }));
    await waitFor(() => expect(pool.calls.filter((c) => c.kind === "assistance").length).toBeGreaterThan(first));
    const last = pool.calls.filter((c) => c.kind === "assistance").pop()!;
    expect((last.opts as { helper?: { id: string } }).helper?.id).toBe("illustrative-4axle-1100");
    expect((last.opts as { control?: string }).control).toBe("helper");
  });
});
