/**
 * Several units and mixed trains in the app (issue 12): the draft keeps each locomotive group's control and
 * the train's wagon groups through the case file and storage; step cards show every group's notch; Cab steps
 * can be shown for the head driver or for a helper's driver.
 */
import { fireEvent, render, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import { CabStepsView } from "../../src/app/screens/CabSteps/View.js";
import { ResultView } from "../../src/app/screens/StartPlan/ResultView.js";
import { PALETTES } from "../../src/app/charts/palette.js";
import { draftFromFile, draftToFile, storedDraft } from "../../src/app/state/caseDraft.js";
import { parseStartCase, parseStartCaseFile } from "../../src/profiles/parse.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import type { PlanResult, PlanStep } from "../../src/core/planner/types.js";
import StartPlan from "../../src/app/screens/StartPlan/index.js";
import { demoCase, FIXTURE_STEPS, fixturePlan } from "./fixtures.js";
import { renderWithApp } from "./harness.js";

const mixedFile = {
  schema: "taut/start-case@1",
  locomotives: [
    { profile: "illustrative-6axle-3000", count: 1, position: "head" },
    { profile: "illustrative-6axle-3000", count: 2, position: "rear", control: "helper" },
  ],
  train: {
    groups: [
      { wagons: 12, wagonType: "bogie-hopper-empty", mass_t: 288 },
      { wagons: 20, wagonType: "bogie-hopper-loaded", mass_t: 2000 },
    ],
    couplerSlack_mm: 50,
    bearing: "roller",
    couplerLimit_kN: 970,
  },
  location: { gradient_permille: 5, curveRadius_m: 0, clearAhead_m: 800 },
  conditions: { rail: "dry", sand: true, temperature_C: 10 },
  target: { speed_kmh: 15 },
};

describe("the draft with unit control and wagon groups", () => {
  it("a case file's controls and groups come back whole from the draft, and the case still resolves", () => {
    const f = parseStartCaseFile(mixedFile);
    if (!f.ok) throw new Error("fixture invalid");
    const d = draftFromFile(f.value);
    expect(d.locomotives[1]!.control).toBe("helper");
    expect(d.train.groups).toHaveLength(2);
    const out = draftToFile(d) as { locomotives: Array<{ control?: string }>; train: Record<string, unknown> };
    expect(out.locomotives[1]!.control).toBe("helper");
    expect(out.locomotives[0]!.control).toBeUndefined();
    expect(out.train.groups).toEqual(mixedFile.train.groups);
    // The groups replace the whole-train figures (derived from them).
    expect(out.train.trailingMass_t).toBeUndefined();
    expect(out.train.wagons).toBeUndefined();
    const r = parseStartCase(out, builtinLibrary());
    expect(r.ok && r.value.train.wagons).toBe(32);
  });

  it("a stored draft from before (no control, no groups) is still usable; a control word not known is not", () => {
    const f = parseStartCaseFile(mixedFile);
    if (!f.ok) throw new Error("fixture invalid");
    const d = JSON.parse(JSON.stringify(draftFromFile(f.value)));
    const old = { ...d, locomotives: d.locomotives.map(({ control: _c, ...l }: Record<string, unknown>) => l), train: { ...d.train, groups: undefined } };
    expect(storedDraft(old).ok).toBe(true);
    const bad = { ...d, locomotives: [{ ...d.locomotives[0], control: "sideways" }] };
    const r = storedDraft(bad);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.reason).toMatch(/locomotives\[0\]\.control/);
  });
});

/** The fixture's steps with a head group and a rear helper group; the helper follows in step 3. */
function groupedPlan(): PlanResult {
  const steps: PlanStep[] = FIXTURE_STEPS.map((s, k) => ({
    ...s,
    groups: [
      { place: { at: "head", helper: false }, control: "with-head", notch: s.notch, effortShare: 0.6 },
      {
        place: { at: "rear", helper: true },
        control: "helper",
        notch: Math.max(0, s.notch - 1),
        effortShare: 0.4,
        ...(k === 2 ? { coordination: { headNotch: 3, place: { at: "rear", helper: true }, act: "take", notch: 2, followS: 3, stretch: false } } : {}),
      },
    ],
  }));
  return fixturePlan({ steps });
}

describe("group notches in the steps", () => {
  it("each step card shows every group's notch under the head's, and a helper's coordination", () => {
    render(() => (
      <ResultView status="done" progress={1} result={groupedPlan()} current error={null} startCase={demoCase()} units="metric" palette={PALETTES.day} illustrative onOpenCab={() => undefined} onRetry={() => undefined} />
    ));
    const cards = [...document.querySelectorAll(".step-card")];
    expect(cards[2]!.querySelector(".notch-groups")?.textContent).toBe("head 3 · rear helper 2");
    expect(cards[2]!.querySelector(".step-coordination")?.textContent).toMatch(/calls the rear helper by radio/);
    expect(cards[1]!.querySelector(".step-coordination")).toBeNull();
  });

  it("Cab steps: the head driver's notch by default; the helper's driver sees the helper's notch and what to do", () => {
    render(() => (
      <CabStepsView
        result={groupedPlan()}
        current
        index={2}
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
    expect(document.querySelector(".cab-notch-value")?.textContent).toBe("3");
    expect(screen.getByTestId("cab-group-notches").textContent).toBe("head 3 · rear helper 2");
    // A group's name starts the button with a capital, as "Head driver" does.
    fireEvent.click(screen.getByRole("button", { name: "Rear helper driver" }));
    expect(document.querySelector(".cab-notch-value")?.textContent).toBe("2");
    expect(document.querySelector(".cab-notch-label")?.textContent).toBe("Notch, rear helper");
    expect(screen.getByTestId("helper-line").textContent).toMatch(/takes notch 2 about 3 s later/);
    fireEvent.click(screen.getByRole("button", { name: "Head driver" }));
    expect(document.querySelector(".cab-notch-value")?.textContent).toBe("3");
  });
});

describe("entering wagon groups in the train section", () => {
  it("turns the train into groups, takes a second group, and the case carries them (then removing both returns to one mass)", async () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    const before = harness.state.draft.draft.train;
    fireEvent.click(document.querySelector('[data-action="add-wagon-group"]')!);
    expect(harness.state.draft.draft.train.groups).toEqual([{ wagons: before.wagons, wagonType: before.wagonType || "bogie-hopper-loaded", mass_t: before.trailingMass_t }]);
    // The wagon-groups form is a chunk of its own: wait for it before its second group.
    await waitFor(() => expect(document.querySelector('.wagon-groups [data-action="add-wagon-group"]')).not.toBeNull(), { timeout: 20_000 });
    fireEvent.click(document.querySelector('[data-action="add-wagon-group"]')!);
    const mass = (await screen.findAllByLabelText(/^Mass of the group/, { selector: "input" }, { timeout: 20_000 }))[1] as HTMLInputElement;
    fireEvent.input(mass, { target: { value: "300" } });
    const json = harness.state.draft.caseJson() as { train: { groups: Array<{ wagons: number; mass_t: number }> } };
    expect(json.train.groups).toHaveLength(2);
    expect(json.train.groups[1]).toMatchObject({ wagons: 10, mass_t: 300 });
    expect(harness.state.draft.checked().ok).toBe(true);
    expect(screen.getByTestId("group-totals").textContent).toContain(`${before.wagons + 10} wagons`);
    for (let k = 0; k < 2; k++) fireEvent.click(screen.getAllByRole("button", { name: /Remove this group/ }).filter((b) => b.closest(".wagon-groups"))[0]!);
    expect(harness.state.draft.draft.train.groups).toBeUndefined();
    expect(harness.state.draft.draft.train.trailingMass_t).toBe(300);
  }, 60_000);
});
