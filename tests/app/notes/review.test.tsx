/**
 * The Start review place (issue 17), reached from a location note's card: a CSV recording of a start 15 %
 * heavier than Start plan's case, made with `taut simulate`'s own function at the note's location, is read,
 * reviewed ("heavier than planned", mass factor near 1.15), kept with the note, listed with its observed
 * factor, and a broken file is refused with its line named and nothing kept.
 */
import "fake-indexeddb/auto";
import { fireEvent, screen, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import StartReview from "../../../src/app/screens/StartReview/index.js";
import { setReviewTarget } from "../../../src/app/state/reviewTarget.js";
import { planSequence, planStart, scaledCase } from "../../../src/core/index.js";
import { deviceNotesStore } from "../../../src/notes/index.js";
import { builtinLocations } from "../../../src/profiles/builtin.js";
import { locationFromNote } from "../../../src/profiles/convert.js";
import { csvText, simulatedStart } from "../../tools/recordings.js";
import { quickTablePool, renderWithApp } from "../harness.js";

describe("Start review place", () => {
  it("reviews a recording against Start plan's case at the note's location and keeps it with the note", async () => {
    const note = builtinLocations[0]!;
    setReviewTarget(note.id);
    const r = renderWithApp(() => <StartReview />, { pool: quickTablePool() });
    await waitFor(() => expect(screen.getByLabelText("Recording file")).toBeTruthy(), { timeout: 10_000 });
    const checked = r.harness.state.draft.checked();
    if (!checked.ok) throw new Error("the default case is not valid");
    const c = { ...checked.value, location: locationFromNote(note) };
    const plan = planStart(c, { skipMassSearch: true, skipVerification: true });
    const run = simulatedStart(scaledCase(c, { massFactor: 1.15, effortFactor: 1 }), planSequence(plan), { extraS: 10 });

    // A broken file first: refused, its line named, nothing to keep.
    fireEvent.change(screen.getByLabelText("Recording file"), { target: { files: [new File(["time_s,speed_kmh\n0,0\n1,fast\n"], "broken.csv")] } });
    await waitFor(() => expect(screen.getByRole("alert").textContent).toMatch(/broken\.csv: line 3: speed_kmh must be a number/), { timeout: 10_000 });
    expect(screen.queryByRole("button", { name: "Keep with this note" })).toBeNull();

    fireEvent.change(screen.getByLabelText("Recording file"), { target: { files: [new File([csvText(run)], "start.csv")] } });
    await waitFor(() => expect(screen.getByText(/heavier than planned: mass factor 1\.1\d/)).toBeTruthy(), { timeout: 30_000 });
    fireEvent.click(screen.getByRole("button", { name: "Keep with this note" }));
    await waitFor(() => expect(screen.getByText(/Observed mass factor 1\.1\d: the median of 1 review/)).toBeTruthy(), { timeout: 10_000 });
    const kept = await (await deviceNotesStore()).reviews(note.id);
    expect(kept).toHaveLength(1);
    expect(Math.abs(kept[0]!.massFactor.value - 1.15)).toBeLessThanOrEqual(0.05);
    expect(kept[0]!.thumbnail.time_s.length).toBeGreaterThan(5);

    // The note's load table beside the same masses with the observed factor applied, labelled observed.
    fireEvent.click(screen.getByRole("button", { name: "Load table with the observed factor" }));
    await waitFor(() => expect(document.querySelectorAll(".review-table tbody tr").length).toBeGreaterThan(0), { timeout: 30_000 });
    const f = kept[0]!.massFactor.value;
    for (const tr of document.querySelectorAll(".review-table tbody tr")) {
      const [, , model, observed] = [...tr.querySelectorAll("td")].map((td) => td.textContent ?? "");
      if (model === "none") continue;
      expect(observed).toMatch(/\(observed\)$/);
      // A train starting as if f times heavier: the masses on paper that start are the model's ÷ f.
      // (Thousands are grouped on screen: "1,400".)
      const tonnes = (x: string) => Number.parseInt(x.replace(/,/g, ""), 10);
      expect(Math.abs(tonnes(observed!) - tonnes(model!) / f)).toBeLessThanOrEqual(1);
    }
  }, 60_000);

  it("is reached from a note's card, and has no tab of its own", async () => {
    const note = builtinLocations[1]!;
    renderWithApp(undefined, { pool: quickTablePool() });
    expect(screen.queryByRole("link", { name: "Start review" })).toBeNull();
    fireEvent.click(screen.getByRole("link", { name: "Location notes" }));
    fireEvent.click(await screen.findByRole("button", { name: `Card of ${note.name}` }, { timeout: 10_000 }));
    fireEvent.click(await screen.findByRole("button", { name: "Start review" }, { timeout: 10_000 }));
    await waitFor(() => expect(location.hash).toBe("#/start-review"));
    expect(await screen.findByRole("heading", { name: `Start review: ${note.name}` }, { timeout: 10_000 })).toBeTruthy();
  }, 60_000);
});
