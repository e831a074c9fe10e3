/** Settings: safety settings explained, validated where typed, applied to the case; reset to defaults. */
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import Settings from "../../src/app/screens/Settings/index.js";
import { STANDARD_CAUTIONS } from "../../src/core/planner/cautions.js";
import { renderWithApp } from "./harness.js";

const field = (label: RegExp) => screen.getByLabelText(label, { selector: "input" }) as HTMLInputElement;

describe("Settings", () => {
  it("explains the defaults and shows the cautions and sources", () => {
    renderWithApp(() => <Settings />);
    expect(screen.getByText(/Default 1\.2: it leaves room/)).toBeTruthy();
    expect(screen.getByText(/Default 10 %: real adhesion scatters/)).toBeTruthy();
    expect(STANDARD_CAUTIONS.length).toBe(4);
    expect(screen.getByText(/^Advisory only\. Operating rules, timetables/)).toBeTruthy();
    expect(screen.getByText(/^Decisions on assistance, dividing the train/)).toBeTruthy();
    expect(screen.getByText(/^Adhesion is statistical/)).toBeTruthy();
    expect(screen.getByText(/^Plan and brief before departure/)).toBeTruthy();
    expect(screen.getByText(/Curtius and A\. Kniffler/)).toBeTruthy();
  });

  it("applies a typed safety factor to the case, refuses one out of range at the field, and resets", async () => {
    const { harness } = renderWithApp(() => <Settings />);
    const f = field(/^Coupler safety factor/);
    fireEvent.input(f, { target: { value: "1.5" } });
    expect(harness.state.settings.settings().couplerSafetyFactor).toBe(1.5);
    expect(harness.state.draft.caseJson().settings).toMatchObject({ couplerSafetyFactor: 1.5 });
    fireEvent.input(f, { target: { value: "7" } });
    expect(f.closest(".field")?.querySelector(".field-issue")?.textContent).toBe("Coupler safety factor must be between 1 and 3; the last good value still applies");
    expect(harness.state.settings.settings().couplerSafetyFactor).toBe(1.5);
    const t = field(/^Slip-risk threshold/);
    fireEvent.input(t, { target: { value: "5" } });
    expect(harness.state.settings.settings().slipRiskThreshold).toBeCloseTo(0.05, 12);
    fireEvent.click(screen.getByRole("button", { name: /Back to the defaults/ }));
    await waitFor(() => expect(f.value).toBe("1.20"));
    expect(t.value).toBe("10");
    expect(harness.state.settings.settings()).toMatchObject({ couplerSafetyFactor: 1.2, slipRiskThreshold: 0.1 });
    expect(f.closest(".field")?.querySelector(".field-issue")).toBeNull();
  });
});
