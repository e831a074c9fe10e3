/** Start plan inputs: a bad value shows the rule at its field; units convert what is shown and typed. */
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import { QuantityField } from "../../src/app/components/QuantityField.js";
import StartPlan from "../../src/app/screens/StartPlan/index.js";
import { createSignal } from "solid-js";
import { render } from "@solidjs/testing-library";
import type { UnitSystem } from "../../src/app/format.js";
import { builtinTrains } from "../../src/profiles/builtin.js";
import { demoCaseFile } from "../../src/app/state/createCaseDraft.js";
import { renderWithApp } from "./harness.js";

const demo = demoCaseFile();

const input = (label: RegExp) => screen.getByLabelText(label, { selector: "input" }) as HTMLInputElement;
const fieldOf = (el: HTMLElement) => el.closest(".field") as HTMLElement;

describe("Start plan inputs", () => {
  it("opens with the demo case and its plan", async () => {
    renderWithApp(() => <StartPlan />);
    expect(input(/^Trailing mass/).value).toBe(String(demo.train.trailingMass_t));
    expect(screen.getByText(demo.label!)).toBeTruthy();
    await waitFor(() => expect(document.querySelector("[data-verdict]")).not.toBeNull(), { timeout: 10_000 });
  });

  it("shows the broken rule at the field, in the user's units, and never plans the bad case", async () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    const mass = input(/^Trailing mass/);
    fireEvent.input(mass, { target: { value: "-5" } });
    const issue = fieldOf(mass).querySelector(".field-issue");
    expect(issue?.textContent).toBe("Trailing mass must be from 5 to 60,000 t (got −5 t)");
    expect(mass.getAttribute("aria-invalid")).toBe("true");
    expect(harness.state.draft.checked().ok).toBe(false);
    // The summary names the field too.
    expect(screen.getByText(/Fix this input to get a plan/)).toBeTruthy();
    expect(harness.state.run.status()).toBe("invalid");

    harness.state.settings.update({ units: "us" });
    await waitFor(() => expect(fieldOf(mass).querySelector(".field-issue")?.textContent).toBe("Trailing mass must be from 5.51 to 66,139 short tons (got −6 short tons)"));

    fireEvent.input(mass, { target: { value: "1653.47" } });
    expect(fieldOf(mass).querySelector(".field-issue")).toBeNull();
    expect(harness.state.draft.checked().ok).toBe(true);
  });

  it("says a word is not a number", () => {
    renderWithApp(() => <StartPlan />);
    const slack = input(/^Free slack per coupling/);
    fireEvent.input(slack, { target: { value: "lots" } });
    expect(fieldOf(slack).querySelector(".field-issue")?.textContent).toBe("Free slack per coupling must be a number");
  });

  it("puts a slack beyond the schema's limit at the slack field, in inches for US units", () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    harness.state.settings.update({ units: "us" });
    const slack = input(/^Free slack per coupling/);
    fireEvent.input(slack, { target: { value: "10" } });
    expect(fieldOf(slack).querySelector(".field-issue")?.textContent).toBe("Free slack per coupling must be from 0 to 7.87 in (got 10 in)");
    expect(harness.state.draft.draft.train.couplerSlack_mm).toBeCloseTo(254, 9);
  });

  it("shows the issue of the chosen alternative: a quick-entry gradient, a distance target, a mid-train position", async () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    fireEvent.click(screen.getByRole("radio", { name: /Quick entry/ }));
    const grade = input(/^Gradient under the train/);
    fireEvent.input(grade, { target: { value: "75" } });
    expect(fieldOf(grade).querySelector(".field-issue")?.textContent).toBe("Gradient under the train (rising +) must be from −60 to 60 ‰ (got 75 ‰)");

    fireEvent.click(screen.getByRole("radio", { name: "A distance cleared" }));
    const dist = input(/^Target distance/);
    fireEvent.input(dist, { target: { value: "0" } });
    expect(fieldOf(dist).querySelector(".field-issue")?.textContent).toBe("Target distance must be greater than 0 m (got 0 m)");
    expect(harness.state.draft.issues().map((i) => i.path).sort()).toEqual(["location.gradient_permille", "target.distance_m"]);

    fireEvent.click(screen.getByRole("radio", { name: "Mid-train" }));
    const after = input(/^After wagon/);
    fireEvent.input(after, { target: { value: "45" } });
    fireEvent.input(grade, { target: { value: "8" } });
    fireEvent.input(dist, { target: { value: "500" } });
    await waitFor(() => expect(fieldOf(after).querySelector(".field-issue")?.textContent).toBe(`After wagon must be less than the number of wagons (${demo.train.wagons}) (got 45)`));
  });

  it("fills a train from a preset with one tap", () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    for (const preset of builtinTrains) {
      fireEvent.click(screen.getByRole("button", { name: preset.label }));
      expect(input(/^Trailing mass/).value).toBe(String(preset.train.trailingMass_t));
      expect(input(/^Wagons/).value).toBe(String(preset.train.wagons));
      const first = preset.locomotives[0]!;
      expect(harness.state.draft.draft.locomotives[0]).toMatchObject({ profile: first.profile, count: first.count });
    }
  });

  it("steps the mass by 50 t, or by 50 short tons in US units", () => {
    const { harness } = renderWithApp(() => <StartPlan />);
    const mass = input(/^Trailing mass/);
    fireEvent.input(mass, { target: { value: "1520" } });
    fireEvent.click(screen.getByRole("button", { name: "Trailing mass: more" }));
    expect(harness.state.draft.draft.train.trailingMass_t).toBe(1550); // snaps to the 50 t grid
    fireEvent.click(screen.getByRole("button", { name: "Trailing mass: less" }));
    expect(harness.state.draft.draft.train.trailingMass_t).toBe(1500);
    harness.state.settings.update({ units: "us" });
    // 1500 t = 1653.5 short tons, shown "1653"; a step up snaps to 1700 short tons.
    fireEvent.click(screen.getByRole("button", { name: "Trailing mass: more" }));
    expect(harness.state.draft.draft.train.trailingMass_t).toBeCloseTo((1700 * 907.18474) / 1000, 9);
  });
});

describe("QuantityField", () => {
  function setup(units: UnitSystem) {
    const [u, setU] = createSignal<UnitSystem>(units);
    const [v, setV] = createSignal(2000);
    const seen: number[] = [];
    render(() => (
      <QuantityField
        label="Mass"
        measure="mass"
        fileUnit="t"
        value={v()}
        onValue={(x) => {
          seen.push(x);
          setV(x);
        }}
        units={u()}
        step={50}
      />
    ));
    return { setU, setV, seen, el: screen.getByLabelText(/^Mass/, { selector: "input" }) as HTMLInputElement };
  }

  it("converts both ways: shows 2000 t as 2205 short tons, and typed short tons become tonnes", async () => {
    const f = setup("metric");
    expect(f.el.value).toBe("2000");
    f.setU("us");
    await waitFor(() => expect(f.el.value).toBe("2205"));
    fireEvent.input(f.el, { target: { value: "2204.6226" } });
    expect(f.seen.at(-1)).toBeCloseTo(2000, 4);
    // The user's text stays as typed while the value is theirs.
    expect(f.el.value).toBe("2204.6226");
    f.setU("metric");
    await waitFor(() => expect(f.el.value).toBe("2000"));
  });

  it("rewrites the text when the value changes from elsewhere", async () => {
    const f = setup("metric");
    f.setV(1234);
    await waitFor(() => expect(f.el.value).toBe("1234"));
  });
});
