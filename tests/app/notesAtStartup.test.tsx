/**
 * The Start plan's location picker lists the notes saved on this device from the start, without the
 * Location notes screen ever being opened: the app loads the notes store after its first render.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import StartPlan from "../../src/app/screens/StartPlan/index.js";
import { deviceNotesStore } from "../../src/notes/index.js";
import { builtinLocations } from "../../src/profiles/builtin.js";
import { renderWithApp } from "./harness.js";

const names = () => [...document.querySelectorAll(".note-choice .note-name")].map((e) => e.textContent ?? "");

describe("saved notes at start-up", () => {
  it("lists a note saved on this device in the Start plan's picker, and plans with it", async () => {
    const store = await deviceNotesStore();
    const own = { ...builtinLocations[0]!, id: "quarry-siding-east", name: "Quarry siding east", illustrative: false, clearAhead_m: 432 };
    const put = await store.put(own);
    expect(put.ok).toBe(true);
    // Nothing from the Location notes screen has been loaded: the app picks the store up by itself.
    const { harness } = renderWithApp(() => <StartPlan />);
    await waitFor(() => expect(names().some((n) => n.startsWith("Quarry siding east"))).toBe(true), { timeout: 10_000 });
    fireEvent.click(screen.getByRole("radio", { name: /Quarry siding east/ }));
    const c = harness.state.draft.checked();
    expect(c.ok).toBe(true);
    if (c.ok) expect(c.value.location.clearAheadM).toBe(432);
  });
});
