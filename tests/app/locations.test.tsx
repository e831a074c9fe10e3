/** The location picker's source: the built-in notes today, swappable for the device's notes store. */
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { afterEach, describe, expect, it } from "vitest";
import { builtinLocationSource, setLocationSource, type LocationChoice } from "../../src/app/locations.js";
import StartPlan from "../../src/app/screens/StartPlan/index.js";
import { builtinLocations } from "../../src/profiles/builtin.js";
import { renderWithApp } from "./harness.js";

afterEach(() => setLocationSource(builtinLocationSource));

const names = () => [...document.querySelectorAll(".note-choice .note-name")].map((e) => e.textContent);

describe("location picker", () => {
  it("lists the built-in demo notes by default", async () => {
    renderWithApp(() => <StartPlan />);
    await waitFor(() => expect(names()).toEqual(builtinLocations.map((n) => n.name)));
  });

  it("lists a device note from a swapped-in source, and plans with it (resolved on this side, not by the worker)", async () => {
    const own = { ...builtinLocations[0]!, id: "my-own-loop", name: "My own loop", illustrative: false, clearAhead_m: 321 };
    const source = (): LocationChoice[] => [{ id: own.id, name: own.name, note: own, origin: "device" }];
    setLocationSource(source);
    const { harness } = renderWithApp(() => <StartPlan />);
    await waitFor(() => expect(names()).toEqual(["My own loop"]));
    fireEvent.click(screen.getByRole("radio", { name: /My own loop/ }));
    const c = harness.state.draft.checked();
    expect(c.ok).toBe(true);
    if (c.ok) expect(c.value.location.clearAheadM).toBe(321);
    expect(harness.state.draft.caseJson().location).toBe("my-own-loop");
  });

  it("says when the saved notes cannot be read, and keeps the built-in ones", async () => {
    setLocationSource(() => Promise.reject(new Error("storage refused")));
    renderWithApp(() => <StartPlan />);
    await waitFor(() => expect(screen.getByText(/The saved notes could not be read \(storage refused\)/)).toBeTruthy());
    expect(names()).toEqual(builtinLocations.map((n) => n.name));
  });
});
