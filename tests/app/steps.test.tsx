/** Step cards, Cab steps (one step at a time, Back/Next, clock) and the If wheels slip card. */
import { fireEvent, render, screen, waitFor } from "@solidjs/testing-library";
import { createSignal } from "solid-js";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CabStepsView } from "../../src/app/screens/CabSteps/View.js";
import { createStepClock } from "../../src/app/screens/CabSteps/index.js";
import { ResultView } from "../../src/app/screens/StartPlan/ResultView.js";
import { PALETTES } from "../../src/app/charts/palette.js";
import { show, type UnitSystem } from "../../src/app/format.js";
import type { PlanResult } from "../../src/core/planner/types.js";
import { demoCase, FIXTURE_STEPS, fixturePlan } from "./fixtures.js";

function resultView(result: PlanResult | null, units: UnitSystem = "metric") {
  return render(() => (
    <ResultView
      status="done"
      progress={1}
      result={result}
      current
      error={null}
      startCase={demoCase()}
      units={units}
      palette={PALETTES.day}
      illustrative
      onOpenCab={() => undefined}
      onRetry={() => undefined}
    />
  ));
}

describe("step cards", () => {
  it("renders one numbered card per step with the notch large and the fields a driver reads", () => {
    resultView(fixturePlan());
    const cards = [...document.querySelectorAll(".step-card")];
    expect(cards).toHaveLength(FIXTURE_STEPS.length);
    expect(cards.map((c) => c.querySelector(".notch-value")?.textContent)).toEqual(["0", "1", "3", "5", "8"]);
    expect(cards.map((c) => c.querySelector(".step-number")?.textContent)).toEqual(["Step 1", "Step 2", "Step 3", "Step 4", "Step 5"]);
    const third = cards[2]!;
    expect(third.querySelector(".step-advance strong")?.textContent).toBe("Advance at 5.0 km/h");
    expect(third.querySelector(".step-advance")?.textContent).toBe("Advance at 5.0 km/h (about 6 s in this step)");
    expect(third.textContent).toContain("4 %"); // slip risk, whole percent as the why line and `taut plan` give it
    expect(third.textContent).not.toContain("4.0 %");
    expect(third.textContent).toContain("Slip keeps returningdrop to notch 2"); // fallback, after holding
    expect(cards[1]!.querySelector(".step-advance strong")?.textContent).toBe("Advance after 8.0 m of locomotive travel");
    const t = demoCase().target;
    const target = t.kind === "speed" ? show("speed", t.speedMps, "metric") : `${show("distance", t.distanceM, "metric")} travelled`;
    expect(cards[4]!.querySelector(".step-advance strong")?.textContent).toBe(`Hold until ${target}`);
    expect(cards[4]!.querySelector(".step-advance")?.textContent).toBe(`Hold until ${target} (about 40 s in this step)`);
    // Step 4's 14 % slip risk is over the 10 % threshold and says so; its coupler force is over the limit ÷ 1.2.
    expect(cards[3]!.textContent).toContain("above your 10 %");
    expect(cards[3]!.querySelectorAll(".alert")).toHaveLength(2);
  });

  it("a risk just over the threshold that rounds to it says 'just above', not a figure above itself", () => {
    // 10.04 % against a 10 % threshold: the card shows whole percent as everywhere else (10 %), so "10 % — above
    // your 10 %" would contradict itself. 14 % on step 4 stays plainly above.
    const steps = FIXTURE_STEPS.map((st, k) => (k === 2 ? { ...st, slipRisk: 0.1004 } : st));
    resultView(fixturePlan({ steps }));
    const cards = [...document.querySelectorAll(".step-card")];
    expect(cards[2]!.textContent).toContain("10 % — just above your 10 %");
    expect(cards[2]!.querySelector(".alert")).not.toBeNull();
    expect(cards[3]!.textContent).toContain("14 % — above your 10 %");
    expect(cards[3]!.textContent).not.toContain("just above");
  });

  it("shows every figure in US units when asked", () => {
    resultView(fixturePlan(), "us");
    const third = document.querySelectorAll(".step-card")[2]!;
    expect(third.querySelector(".step-advance strong")?.textContent).toBe("Advance at 3.1 mph");
    expect(third.textContent).toContain(`${(144_400 / 4448.2216152605).toFixed(1)} klbf`);
    expect(document.body.textContent).toContain("short tons");
  });

  it("draws the speed and coupler charts only when the plan has series, and says so otherwise", async () => {
    resultView(fixturePlan());
    // The charts' code comes in a chunk of its own, after the verdict (components/planCharts.ts).
    await waitFor(() => expect(document.querySelector('[data-chart="Speed and notch"]')?.getAttribute("data-empty")).toBe("no"), { timeout: 15_000 });
    expect(document.querySelector('[data-chart="Peak coupler force along the train"]')?.getAttribute("data-empty")).toBe("no");
    expect(document.querySelector('[data-chart="Tractive effort and adhesion"]')?.getAttribute("data-empty")).toBe("no");
  });

  it("has a clear empty state when the plan carries no steps or series", async () => {
    const empty = new Float64Array(0);
    resultView(fixturePlan({ steps: [], couplerPeaksN: empty, series: { timeS: empty, speedMps: empty, notch: empty, locoTravelM: empty, maxTensionN: empty } }));
    expect(document.querySelector("[data-empty-steps]")?.textContent).toMatch(/No notch steps/);
    await waitFor(() => expect(document.querySelector('[data-chart="Speed and notch"]')?.getAttribute("data-empty")).toBe("yes"), { timeout: 15_000 });
    expect(screen.getByText(/No time series in this plan/)).toBeTruthy();
    expect(document.querySelector('[data-chart="Peak coupler force along the train"]')?.getAttribute("data-empty")).toBe("yes");
    // The effort chart needs only the case, so it is drawn anyway.
    expect(document.querySelector('[data-chart="Tractive effort and adhesion"]')?.getAttribute("data-empty")).toBe("no");
  });
});

describe("Cab steps", () => {
  function cab(result: PlanResult | null) {
    const [index, setIndex] = createSignal(0);
    const [slip, setSlip] = createSignal(false);
    const closed = vi.fn();
    render(() => (
      <CabStepsView
        result={result}
        current
        index={index()}
        onIndex={(i) => setIndex(Math.max(0, Math.min((result?.steps.length ?? 1) - 1, i)))}
        units="metric"
        target={{ kind: "speed", speedMps: 20 / 3.6 }}
        slipThreshold={0.1}
        stepSeconds={75}
        wakeLock="on"
        slipOpen={slip()}
        onSlip={setSlip}
        onClose={closed}
      />
    ));
    return { index, closed };
  }

  it("shows one step at a time and moves with Next and Back", () => {
    const { index } = cab(fixturePlan());
    const notch = () => document.querySelector(".cab-notch-value")?.textContent;
    expect(notch()).toBe("0");
    expect(screen.getByRole("button", { name: /Back/ }).hasAttribute("disabled")).toBe(true);
    fireEvent.click(screen.getByRole("button", { name: /Next/ }));
    expect(index()).toBe(1);
    expect(notch()).toBe("1");
    expect(document.querySelector(".cab-count")?.textContent).toBe("Step 2 of 5 · Stretch");
    fireEvent.click(screen.getByRole("button", { name: /Next/ }));
    fireEvent.click(screen.getByRole("button", { name: /Back/ }));
    expect(notch()).toBe("1");
    expect(document.querySelectorAll(".cab-notch-value")).toHaveLength(1);
    expect(screen.getByText("1:15")).toBeTruthy();
    expect(screen.getByText("Screen stays on")).toBeTruthy();
  });

  it("ends with Done, which leaves the cab view", () => {
    const { closed } = cab(fixturePlan());
    for (let i = 0; i < FIXTURE_STEPS.length - 1; i++) fireEvent.click(screen.getByRole("button", { name: /Next/ }));
    expect(document.querySelector(".cab-notch-value")?.textContent).toBe("8");
    fireEvent.click(screen.getByRole("button", { name: /Done/ }));
    expect(closed).toHaveBeenCalledOnce();
  });

  it("opens If wheels slip in one tap from every step: hold first, the fallback only if the slip keeps returning", () => {
    cab(fixturePlan());
    for (let i = 0; i < FIXTURE_STEPS.length; i++) {
      const st = FIXTURE_STEPS[i]!;
      fireEvent.click(screen.getByRole("button", { name: /If wheels slip/ }));
      const dialog = screen.getByRole("dialog", { name: /If wheels slip/ });
      const hold = dialog.querySelector(".slip-hold")!.textContent!;
      const then = dialog.querySelector(".slip-then")!.textContent!;
      if (st.notch === 0) expect(hold).toMatch(/No power in this step/);
      else expect(hold).toMatch(new RegExp(`Hold notch ${st.notch} while the protection acts`));
      // The headline never says to drop to a notch and to hold it at once.
      if (st.notch > 0 && st.fallbackNotch < st.notch) {
        expect(then).toMatch(/^2\s*Still slipping: drop to notch/);
        expect(dialog.querySelector(".fallback-notch")?.textContent).toBe(String(st.fallbackNotch));
      } else expect(dialog.querySelector(".fallback-notch")).toBeNull();
      // What you do comes before what the locomotive does.
      const titles = [...dialog.querySelectorAll(".slip-list h3")].map((h) => h.textContent);
      expect(titles).toEqual(["What you do, in order", "Why you hold: what the locomotive does", "If the train stalls"]);
      expect(dialog.textContent).toContain("Hold the notch while the protection acts");
      expect(dialog.textContent).toContain("secure the train before anything else");
      expect(dialog.textContent).toContain("It sands the rails by itself");
      fireEvent.click(screen.getByRole("button", { name: /Close/ }));
      expect(screen.queryByRole("dialog")).toBeNull();
      if (i < FIXTURE_STEPS.length - 1) fireEvent.click(screen.getByRole("button", { name: /Next/ }));
    }
  });

  it("closes the slip card with Escape, or the large button at its foot", () => {
    cab(fixturePlan());
    fireEvent.click(screen.getByRole("button", { name: /If wheels slip/ }));
    fireEvent.keyDown(document, { key: "Escape" });
    expect(screen.queryByRole("dialog")).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: /If wheels slip/ }));
    fireEvent.click(screen.getByRole("button", { name: /Back to the step/ }));
    expect(screen.queryByRole("dialog")).toBeNull();
  });

  it("gives each step's slip risk as its step card does (whole percent: 9.9 % read 10 % on the card and in the why line)", () => {
    // The demo aggregate train's last step has a slip risk of 0.0994: the card and `taut plan` say 10 %.
    const steps = FIXTURE_STEPS.map((s, i) => (i === 2 ? { ...s, slipRisk: 0.0994 } : i === 1 ? { ...s, slipRisk: 1e-9 } : s));
    const plan = fixturePlan({ steps });
    const cards = (() => {
      const r = resultView(plan);
      const out = [...document.querySelectorAll(".step-card")].map((c) => [...c.querySelectorAll(".figures > div")].find((d) => d.querySelector("dt")?.textContent === "Slip risk")?.querySelector("dd")?.textContent?.split(" — ")[0]);
      r.unmount();
      return out;
    })();
    expect(cards[2]).toBe("10 %");
    expect(cards[1]).toBe("< 1 %");
    cab(plan);
    const cabRisk = () => [...document.querySelectorAll(".cab-figures > div")].find((d) => d.querySelector("dt")?.textContent === "Slip risk")?.querySelector("dd")?.textContent;
    steps.forEach((_, i) => {
      expect(cabRisk(), `step ${i + 1}`).toBe(cards[i]);
      if (i < steps.length - 1) fireEvent.click(screen.getByRole("button", { name: /Next/ }));
    });
  });

  it("says so when there is no plan, or no steps", () => {
    cab(null);
    expect(screen.getByText(/There is no plan yet/)).toBeTruthy();
    expect(screen.queryByRole("button", { name: /If wheels slip/ })).toBeNull();
  });
});

describe("step clock", () => {
  afterEach(() => vi.useRealTimers());
  it("counts from when the step began and restarts on a new step", () => {
    vi.useFakeTimers();
    let now = 0;
    const [step, setStep] = createSignal(0);
    let seconds!: () => number;
    render(() => {
      seconds = createStepClock(step, () => now);
      return <span>{seconds()}</span>;
    });
    now = 4_000;
    vi.advanceTimersByTime(500);
    expect(seconds()).toBe(4);
    setStep(1);
    now = 5_500;
    vi.advanceTimersByTime(500);
    expect(seconds()).toBe(1.5);
  });
});
