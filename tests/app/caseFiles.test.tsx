/**
 * Start plan's quick fill and case files. The three quick fills recreate the demo case files of
 * profiles/cases whole (read here from the files themselves, as `taut plan FILE` reads them); a case saved
 * from the app is a start case the command line's reader resolves to the case on screen; a case opened from
 * a file — with a track profile the app has no note for — plans that same case.
 */
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import StartPlan from "../../src/app/screens/StartPlan/index.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { renderWithApp } from "./harness.js";

const dir = join(process.cwd(), "profiles", "cases");
const caseFiles = readdirSync(dir)
  .filter((f) => f.endsWith(".json"))
  .map((f) => JSON.parse(readFileSync(join(dir, f), "utf8")) as Record<string, unknown> & { id: string });

/** The case the command line resolves from a start-case object, without the settings (the app's are its own). */
function resolved(json: Record<string, unknown>) {
  const { settings: _s, ...rest } = json;
  const r = parseStartCase(rest, builtinLibrary());
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

let saved: string[];
beforeEach(() => {
  saved = [];
  URL.createObjectURL = vi.fn((b: Blob) => {
    void b.text().then((t) => saved.push(t));
    return "blob:test";
  }) as typeof URL.createObjectURL;
  URL.revokeObjectURL = vi.fn();
});
afterEach(() => vi.restoreAllMocks());

describe("quick fill", () => {
  it("has one button per demo case file, and each recreates its file whole: train, place, rail and target", () => {
    expect(caseFiles).toHaveLength(4);
    const { harness } = renderWithApp(() => <StartPlan />);
    const buttons = [...document.querySelectorAll<HTMLButtonElement>('[data-quick="cases"] button')];
    expect(buttons.map((b) => b.dataset.case).sort()).toEqual(caseFiles.map((c) => c.id).sort());
    // Each one in turn, starting from another, so nothing of the previous case survives.
    for (const file of [...caseFiles, caseFiles[0]!]) {
      fireEvent.click(document.querySelector(`[data-case="${file.id}"]`)!);
      const json = harness.state.draft.caseJson();
      expect(resolved(json), file.id).toEqual(resolved(file));
      for (const k of ["id", "label", "location", "conditions", "target", "locomotives"]) expect(json[k], `${file.id} ${k}`).toEqual(file[k]);
      expect(json.train).toMatchObject(file.train as object);
      expect(harness.state.draft.edited()).toBe(false);
    }
  });

  it("a train preset fills the train only, keeping place, rail and target", () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    const before = harness.state.draft.caseJson();
    fireEvent.click(document.querySelector('[data-train="ore-5200"]')!);
    const after = harness.state.draft.caseJson();
    expect(after.location).toEqual(before.location);
    expect(after.conditions).toEqual(before.conditions);
    expect(after.target).toEqual(before.target);
    expect((after.train as { trailingMass_t: number }).trailingMass_t).toBe(5200);
  });
});

describe("case files", () => {
  it("saves the case on screen as a start case the command line's reader resolves to the same case", async () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    fireEvent.click(document.querySelector('[data-case="demo-ore-lantern"]')!);
    fireEvent.click(screen.getByRole("button", { name: /Save case file/ }));
    await waitFor(() => expect(saved).toHaveLength(1));
    const file = JSON.parse(saved[0]!) as Record<string, unknown>;
    expect(file.schema).toBe("taut/start-case@1");
    const r = parseStartCase(file, builtinLibrary());
    expect(r.ok).toBe(true);
    const onScreen = harness.state.draft.checked();
    expect(r.ok && onScreen.ok && r.value).toEqual(onScreen.ok && onScreen.value);
    // The settings of the app go with it, so `taut plan` plans with the same safety settings.
    expect(file.settings).toEqual({ couplerSafetyFactor: 1.2, slipRiskThreshold: 0.1, marginalSlipRisk: 0.25 });
  });

  it("opens a case with a track profile and plans it as the file says", async () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    const caseWithProfile = {
      schema: "taut/start-case@1",
      id: "sag-start",
      label: "Test case on a sag",
      locomotives: [{ profile: "illustrative-6axle-1800", count: 1, position: "head" }],
      train: { trailingMass_t: 900, wagons: 15, length_m: 210, couplerSlack_mm: 60, bearing: "roller", couplerLimit_kN: 850 },
      location: {
        segments: [
          { from_m: 0, length_m: 200, gradient_permille: -6, curveRadius_m: 0 },
          { from_m: 200, length_m: 300, gradient_permille: 5, curveRadius_m: 500 },
        ],
        frontAt_m: 320,
        clearAhead_m: 150,
      },
      conditions: { rail: "wet", sand: true, temperature_C: 3 },
      target: { distance_m: 120 },
      settings: { couplerSafetyFactor: 1.5, slipRiskThreshold: 0.05 },
    };
    const input = screen.getByLabelText("Start-case file to open") as HTMLInputElement;
    fireEvent.change(input, { target: { files: [new File([JSON.stringify(caseWithProfile)], "sag-start.json")] } });
    await screen.findByText("Opened sag-start.json.");
    const d = harness.state.draft.draft;
    expect(d.locationMode).toBe("profile");
    const json = harness.state.draft.caseJson();
    expect(json.location).toEqual(caseWithProfile.location);
    expect(resolved(json)).toEqual(resolved(caseWithProfile));
    // The file's own safety settings give way to the app's, and it says so.
    expect(screen.getByText(/The file's safety settings .* are replaced by this app's/)).toBeTruthy();
    expect(screen.getByRole("radio", { name: "Case file's profile" }).getAttribute("aria-checked")).toBe("true");
  });

  it("refuses a file that is not a valid start case, saying what it breaks, and changes nothing", async () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    const before = harness.state.draft.caseJson();
    const bad = readFileSync(join(process.cwd(), "tests/fixtures/in/invalid/negative-mass.json"), "utf8");
    fireEvent.change(screen.getByLabelText("Start-case file to open"), { target: { files: [new File([bad], "negative-mass.json")] } });
    await screen.findByText(/negative-mass\.json is not a valid start case\. Nothing was changed\./);
    expect(screen.getByText(/What the file breaks/).closest(".problem")!.textContent).toMatch(/Trailing mass|trailingMass_t/);
    expect(harness.state.draft.caseJson()).toEqual(before);
    const loco = readFileSync(join(process.cwd(), "profiles/locomotives/illustrative-6axle-1800.json"), "utf8");
    fireEvent.change(screen.getByLabelText("Start-case file to open"), { target: { files: [new File([loco], "loco.json")] } });
    await screen.findByText(/loco\.json is a taut\/locomotive@1 file; a start case \(taut\/start-case@1\) is needed here/);
  });
});
