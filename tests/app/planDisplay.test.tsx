/**
 * What Start plan shows around its plan: no plan (and no Cab steps) while the inputs break a rule; the
 * portrait Plan tab marked for a plan being updated or withdrawn; a compact verdict line (word, margin,
 * binding limit); and every figure with its basis, rounded as `taut plan` rounds it.
 */
import { fireEvent, render, screen, waitFor } from "@solidjs/testing-library";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it, onTestFinished } from "vitest";
import { PALETTES } from "../../src/app/charts/palette.js";
import { effortChart, totalAdhesionN } from "../../src/app/charts/effortSpeed.js";
import { CabStepsView } from "../../src/app/screens/CabSteps/View.js";
import StartPlan from "../../src/app/screens/StartPlan/index.js";
import { bindingLimit, ResultView, VerdictSummary } from "../../src/app/screens/StartPlan/ResultView.js";
import { renderPlan } from "../../src/cli/render/plan.js";
import { planStart } from "../../src/core/planner/index.js";
import type { PlanResult } from "../../src/core/planner/types.js";
import { planReport } from "../../src/profiles/report.js";
import { demoCase, fixturePlan } from "./fixtures.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { renderWithApp } from "./harness.js";

const massInput = () => document.querySelector<HTMLInputElement>('input[name="train.trailingMass_t"]')!;

describe("invalid inputs", () => {
  it("say so where the verdict stands and withdraw the last plan and its Cab steps", async () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    await waitFor(() => expect(document.querySelector(".verdict:not(.stale)")).not.toBeNull(), { timeout: 15_000 });
    expect(screen.getByRole("button", { name: /Open Cab steps/ })).toBeTruthy();
    fireEvent.input(massInput(), { target: { value: "-100" } });
    expect(harness.state.run.status()).toBe("invalid");
    const noPlan = document.querySelector("[data-no-plan]")!;
    expect(noPlan.textContent).toContain("No plan: fix the inputs");
    expect(noPlan.textContent).toContain("Trailing mass must be from 5 to 60,000 t (got −100 t)");
    expect(document.querySelector(".verdict")).toBeNull();
    expect(document.querySelectorAll(".step-card")).toHaveLength(0);
    expect(screen.queryByRole("button", { name: /Open Cab steps/ })).toBeNull();
    expect(document.body.textContent).not.toContain("updating…");
    // The portrait Plan tab says there is no plan, and its button leads to the field.
    expect(screen.getByRole("tab", { name: /Plan/ }).textContent).toContain("no plan: fix inputs");
    fireEvent.click(screen.getByRole("button", { name: /Go to the inputs/ }));
    expect(document.querySelector(".start-plan")!.getAttribute("data-pane")).toBe("inputs");
    // A valid value brings a plan back.
    fireEvent.input(massInput(), { target: { value: "1400" } });
    await waitFor(() => expect(document.querySelector(".verdict:not(.stale)")).not.toBeNull(), { timeout: 15_000 });
    expect(document.querySelector("[data-no-plan]")).toBeNull();
  });

  it("Cab steps shows no steps of the withdrawn plan", () => {
    render(() => (
      <CabStepsView
        result={fixturePlan()}
        current={false}
        invalid
        index={0}
        onIndex={() => undefined}
        units="metric"
        slipThreshold={0.1}
        stepSeconds={0}
        wakeLock="on"
        slipOpen={false}
        onSlip={() => undefined}
        onClose={() => undefined}
      />
    ));
    expect(document.querySelector(".cab-notch-value")).toBeNull();
    expect(screen.getByRole("alert").textContent).toMatch(/No plan: the inputs on Start plan break a rule/);
  });
});

describe("the portrait Plan tab", () => {
  it("carries the verdict, marked 'updating…' while it is for the previous inputs, and plainly once current", async () => {
    renderWithApp(() => <StartPlan />);
    await waitFor(() => expect(document.querySelector(".verdict:not(.stale)")).not.toBeNull(), { timeout: 15_000 });
    const tab = document.querySelector("#tab-plan")!;
    expect(tab.classList.contains("stale")).toBe(false);
    fireEvent.input(massInput(), { target: { value: "1450" } });
    expect(tab.classList.contains("stale")).toBe(true);
    expect(tab.textContent).toMatch(/updating…/);
    await waitFor(() => expect(tab.classList.contains("stale")).toBe(false), { timeout: 15_000 });
    expect(tab.textContent).not.toMatch(/updating/);
  });
});

describe("the compact verdict line", () => {
  it("gives the word, the margin and the binding limit", () => {
    const p = fixturePlan({ verdict: "marginal", margin: 1.046, binding: "adhesion", margins: { adhesion: 1.046, power: 1.8, coupler: 2.4, distance: 5, brake: 99 } });
    render(() => <VerdictSummary result={p} stale={false} shown />);
    const line = document.querySelector(".verdict-summary")!;
    expect(line.classList.contains("shown")).toBe(true);
    expect(line.querySelector(".summary-word")!.textContent).toBe("Marginal");
    expect(line.querySelector(".summary-margin")!.textContent).toBe("margin × 1.05");
    expect(line.querySelector(".summary-limit")!.textContent).toBe("adhesion");
  });
  it("names the limit the plan names (the one its margin is of)", () => {
    const p = { ...fixturePlan(), binding: "coupler-tension" } as PlanResult;
    expect(bindingLimit(p)).toBe("coupler tension");
    expect(bindingLimit(fixturePlan({ binding: "brake-holding" }))).toBe("brake holding");
  });
});

describe("figures with their basis, as the command line rounds them", () => {
  const c = demoCase();
  // The real plan for the demo case; the largest mass set so that rounding down and rounding off differ.
  const p: PlanResult = { ...planStart(c, { skipMassSearch: true }), maxStartableMassKg: 1_466_700 };
  const cli = renderPlan(planReport(c, p));

  function rendered() {
    render(() => (
      <ResultView status="done" progress={1} result={p} current error={null} startCase={c} units="metric" palette={PALETTES.day} illustrative={false} onOpenCab={() => undefined} onRetry={() => undefined} />
    ));
    const figure = (dt: RegExp) => [...document.querySelectorAll(".figures.wide div")].find((d) => dt.test(d.querySelector("dt")!.textContent!))!.querySelector("dd")!;
    return { figure };
  }

  it("key figures read as `taut plan` prints them", () => {
    const { figure } = rendered();
    // The resistance at start, named as such on both (the limits' "needed" adds the slowest acceptable acceleration).
    const needed = /against a resistance at start of (\d+) kN/.exec(cli)![1];
    expect(cli).toContain(`Resistance at start: ${needed} kN`);
    const rails = /→ (\d+) kN/.exec(cli)![1];
    const mass = /starts up to (\d+) t/.exec(cli)![1];
    const peak = /peak coupler force (\d+) kN/.exec(cli)![1];
    expect(figure(/^Resistance at start/).firstChild!.textContent).toBe(`${needed} kN`);
    expect(figure(/^Rails give/).firstChild!.textContent).toBe(`${rails} kN`);
    expect(figure(/^Largest trailing mass/).textContent).toBe(`${Number(mass).toLocaleString("en-GB")} t`);
    expect(mass).toBe("1466");
    expect(figure(/^Peak coupler force/).firstChild!.textContent).toBe(`${peak} kN`);
  });

  it("the verdict shows the train's own mass beside the largest masses, as `taut plan` prints them", () => {
    rendered();
    const [, train, starts] = /this train (\d+) t · starts up to (\d+) t/.exec(cli)!;
    // The demo's 1,400 t from its case file; the largest startable mass as set above, rounded down.
    expect(train).toBe("1400");
    expect(starts).toBe("1466");
    const line = document.querySelector("[data-masses]")!.textContent!;
    expect(line).toBe(`This train ${Number(train).toLocaleString("en-GB")} t · starts up to ${Number(starts).toLocaleString("en-GB")} t`);
  });

  it("the coupler figure names its allowance and the limit it comes from", () => {
    const { figure } = rendered();
    const limit = c.train.couplerLimitN / 1000;
    const allowed = Math.round(limit / c.settings.couplerSafetyFactor);
    expect(figure(/^Peak coupler force/).querySelector("[data-coupler-basis]")!.textContent).toBe(`of ${allowed} kN allowed (limit ${limit} kN ÷ ${c.settings.couplerSafetyFactor})`);
    // The same allowance the steps' why lines name.
    expect(cli).toContain(`of ${allowed} kN allowed`);
  });

  it("each step card's figures are the CLI table's, and adhesion used names the speed and effort it is read at", () => {
    rendered();
    const rows = cli.split("\n").filter((l) => /^\d+\s+(prepare|stretch|build|accelerate)\s/.test(l));
    const cards = [...document.querySelectorAll(".step-card")];
    expect(cards).toHaveLength(rows.length);
    cards.forEach((card, i) => {
      const cells = rows[i]!.trim().split(/\s{2,}/);
      const fig = (name: string) => [...card.querySelectorAll(".figures div")].find((d) => d.querySelector("dt")!.textContent === name)!.querySelector("dd")!;
      expect(fig("Tractive effort").firstChild!.textContent, `step ${i + 1}`).toBe(`${cells[5]} kN`);
      const [use, at] = cells[6]!.split(" @");
      expect(fig("Adhesion used").firstChild!.textContent, `step ${i + 1}`).toBe(use!.replace("%", " %"));
      expect(fig("Adhesion used").querySelector(".basis")!.textContent, `step ${i + 1}`).toMatch(new RegExp(`^highest, at ${at!.replace(".", "\\.")} km/h \\(\\d+ kN\\)$`));
      expect(fig("Peak coupler force").firstChild!.textContent).toBe(`${cells[8]} kN`);
      // Slip risk: whole percent on the card, in the table and in the step's why line.
      expect(fig("Slip risk").firstChild!.textContent, `step ${i + 1}`).toBe(cells[7]!.replace(" *", "").replace("<1%", "< 1%").replace(/%$/, " %"));
    });
  });

  it("the effort chart marks each step where its card reads adhesion used: effort ÷ the chart's median band there", () => {
    const marks = p.steps.map((st, i) => ({ number: i + 1, speedMps: st.adhesionUseAt.speedMps, effortN: st.adhesionUseAt.tractiveEffortN }));
    const spec = effortChart(c, "metric", p.static.requiredN, marks);
    p.steps.forEach((st, i) => {
      if (st.adhesionUseAt.tractiveEffortN <= 0) return;
      const mark = spec.series.find((s) => s.id === `step-${i + 1}`)!;
      expect(mark.points[0]!.y).toBeCloseTo(st.adhesionUseAt.tractiveEffortN / 1000, 9);
      // One locomotive: the worst unit's use is the whole set's effort over the median adhesion (PHYSICS.md §2).
      const median = totalAdhesionN(c, c.conditions.rail, st.adhesionUseAt.speedMps, 0.5);
      expect(st.adhesionUseAt.tractiveEffortN / median, `step ${i + 1}`).toBeCloseTo(st.adhesionUse, 3);
    });
  });
});

describe("the margins list marks the binding limit without an alarm where it is met", () => {
  // The app's own style sheet, so that the colour a row is drawn in is the one a driver sees (day theme).
  const sheet = readFileSync(join(process.cwd(), "src/app/styles.css"), "utf8");
  function rows(p: PlanResult) {
    const style = document.createElement("style");
    style.textContent = sheet;
    document.head.append(style);
    onTestFinished(() => style.remove());
    render(() => (
      <ResultView status="done" progress={1} result={p} current error={null} startCase={demoCase()} units="metric" palette={PALETTES.day} illustrative={false} onOpenCab={() => undefined} onRetry={() => undefined} />
    ));
    return [...document.querySelectorAll(".margins li")].map((li) => ({ name: li.querySelector(".margin-name")!.textContent, limiting: li.classList.contains("limiting"), short: li.classList.contains("short"), colour: getComputedStyle(li.querySelector(".margin-name")!).color, weight: getComputedStyle(li.querySelector(".margin-name")!).fontWeight }));
  }

  it("a train that starts: its binding limit bold, not red (a red × 1.40 beside a green Starts read as an alarm)", () => {
    const p = planStart(demoCase(), { skipMassSearch: true });
    expect(p.verdict).toBe("starts");
    const r = rows(p);
    expect(r.filter((x) => x.limiting)).toHaveLength(1);
    const [binding, ...others] = [...r.filter((x) => x.limiting), ...r.filter((x) => !x.limiting)];
    // Bold, in the colour of the other rows (jsdom gives the cascaded value: the theme variable's name).
    expect(binding!.weight).toBe("700");
    expect(binding!.colour).not.toBe("var(--alert)");
    for (const o of others) expect(binding!.colour).toBe(o.colour);
  });

  it("a row for each kind of limit the plan judged, as `taut plan` lists them (a train that never moved has no distance row)", () => {
    const parsed = parseStartCase(JSON.parse(readFileSync(join(process.cwd(), "profiles/cases/demo-goods-cinderfield.json"), "utf8")), builtinLibrary());
    if (!parsed.ok) throw new Error("demo case");
    const p = planStart(parsed.value, { skipMassSearch: true });
    // The covered-goods demo on its leaf-fall rail does not move: its plan judges adhesion, power and the couplers.
    expect(p.limits.map((l) => l.name)).toEqual(["adhesion", "power", "coupler-tension", "coupler-compression"]);
    expect(p.margins.distance).toBe(99);
    expect(rows(p).map((x) => x.name)).toEqual(["Adhesion", "Power", "Coupler"]);
    // The aggregate demo judges distance and brake holding too.
    expect(rows(planStart(demoCase(), { skipMassSearch: true })).map((x) => x.name)).toContain("Distance");
  });

  it("a train that needs assistance: its binding limit, below × 1, red as its bar", () => {
    const base = planStart(demoCase(), { skipMassSearch: true });
    const p: PlanResult = { ...base, verdict: "needs-assistance", margin: 0.8, margins: { ...base.margins, adhesion: 0.8 }, binding: "adhesion" };
    const r = rows(p);
    expect(r.filter((x) => x.short).map((x) => x.name)).toEqual(["Adhesion"]);
    expect(r.find((x) => x.limiting)!.colour).toBe("var(--alert)");
    expect(r.filter((x) => !x.limiting).map((x) => x.colour)).not.toContain("var(--alert)");
  });
});
