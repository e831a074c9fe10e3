/** The notes store on fake-indexeddb: create, edit, delete, demo notes, damaged records. */
import { describe, expect, it } from "vitest";
import { openNotesStore } from "../../src/notes/store.js";
import { demos, freshName, freshStore, sampleNote, writeRaw } from "./helpers.js";

describe("notes store: create, edit, delete", () => {
  it("saves a new note and reads it back validated", async () => {
    const { store } = await freshStore();
    const r = await store.put(sampleNote());
    expect(r.ok).toBe(true);
    const got = await store.get("brackenfold-up-main");
    expect(got.status).toBe("ok");
    if (got.status !== "ok") return;
    expect(got.saved.note).toEqual(sampleNote());
    expect(got.saved.origin).toBe("mine");
    expect((await store.list()).notes.map((s) => s.note.id)).toEqual(["brackenfold-up-main"]);
    store.close();
  });

  it("an edit replaces the note under the same id, and the change survives reopening", async () => {
    const { store, name } = await freshStore();
    await store.put(sampleNote());
    const edited = sampleNote({
      clearAhead_m: 450,
      revisions: [...sampleNote().revisions, { date: "2026-04-02", initials: "JQ", change: "Signal moved 50 m back." }],
    });
    expect((await store.put(edited)).ok).toBe(true);
    store.close();
    const again = await openNotesStore({ name, demos: [] });
    const { notes, problems } = await again.list();
    expect(problems).toEqual([]);
    expect(notes).toHaveLength(1);
    expect(notes[0]!.note.clearAhead_m).toBe(450);
    expect(notes[0]!.note.revisions).toHaveLength(2);
    again.close();
  });

  it("refuses an invalid note with field issues and writes nothing", async () => {
    const { store } = await freshStore();
    const bad = sampleNote({ segments: [{ from_m: 0, length_m: 500, gradient_permille: 75, curveRadius_m: 0 }] });
    const r = await store.put(bad);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues.map(({ path, message }) => ({ path, message }))).toContainEqual({ path: "segments[0].gradient_permille", message: "must be from -60 to 60 ‰ (got 75)" });
    expect((await store.list()).notes).toEqual([]);
    store.close();
  });

  it("deletes a note; deleting a missing one says so", async () => {
    const { store } = await freshStore();
    await store.put(sampleNote());
    await store.put(sampleNote({ id: "second-note", name: "Another place (test)" }));
    expect(await store.delete("brackenfold-up-main")).toBe(true);
    expect(await store.delete("brackenfold-up-main")).toBe(false);
    expect((await store.get("brackenfold-up-main")).status).toBe("missing");
    expect((await store.list()).notes.map((s) => s.note.id)).toEqual(["second-note"]);
    store.close();
  });

  it("lists notes sorted by name", async () => {
    const { store } = await freshStore();
    await store.put(sampleNote({ id: "z-id", name: "Alder sidings (test)" }));
    await store.put(sampleNote({ id: "a-id", name: "Pellow junction (test)" }));
    expect((await store.list()).notes.map((s) => s.note.name)).toEqual(["Alder sidings (test)", "Pellow junction (test)"]);
    store.close();
  });
});

describe("notes store: demo notes", () => {
  it("adds the demo notes on first open, labelled illustrative", async () => {
    const { store } = await freshStore({ demos });
    const { notes } = await store.list();
    expect(notes.map((s) => s.note.id).sort()).toEqual(demos.map((d) => d.id).sort());
    expect(notes.every((s) => s.origin === "demo" && s.note.illustrative === true)).toBe(true);
    store.close();
  });

  it("remembers a removed demo note: it does not come back on the next open, until restored", async () => {
    const name = freshName();
    const first = await openNotesStore({ name, demos });
    await first.delete(demos[0]!.id);
    first.close();
    const second = await openNotesStore({ name, demos });
    expect((await second.list()).notes.map((s) => s.note.id)).not.toContain(demos[0]!.id);
    expect(await second.restoreDemos()).toBe(1);
    expect((await second.list()).notes.map((s) => s.note.id)).toContain(demos[0]!.id);
    expect(await second.restoreDemos()).toBe(0);
    second.close();
  });

  it("editing a demo note makes it the user's own", async () => {
    const { store } = await freshStore({ demos });
    const d = demos[1]!;
    await store.put({ ...d, practice: `${d.practice} Extra line.` });
    const got = await store.get(d.id);
    expect(got.status === "ok" && got.saved.origin).toBe("mine");
    store.close();
  });
});

describe("notes store: damaged records", () => {
  it("skips a damaged record with a report naming it and the field, and still lists the good ones", async () => {
    const { store, name } = await freshStore();
    await store.put(sampleNote());
    const bad = { id: "half-written", origin: "mine", savedAt: "2026-05-01T10:00:00.000Z", note: { ...sampleNote({ id: "half-written" }), segments: [{ from_m: 0, length_m: -3, gradient_permille: 2, curveRadius_m: 0 }] } };
    await writeRaw(name, bad);
    await writeRaw(name, { id: "not-a-note", hello: "world" });
    const { notes, problems } = await store.list();
    expect(notes.map((s) => s.note.id)).toEqual(["brackenfold-up-main"]);
    expect(problems).toHaveLength(2);
    const half = problems.find((p) => p.key === "half-written")!;
    expect(half.message).toContain('The saved note "half-written" is damaged and was skipped');
    expect(half.message).toContain("segments[0].length_m: must be from 1 to 100000 m (got -3)");
    expect(problems.find((p) => p.key === "not-a-note")!.message).toContain("origin");
    const got = await store.get("half-written");
    expect(got.status).toBe("damaged");
    // A damaged record can be removed.
    expect(await store.delete("half-written")).toBe(true);
    expect((await store.list()).problems.map((p) => p.key)).toEqual(["not-a-note"]);
    store.close();
  });

  it("reports a record whose note id differs from its key", async () => {
    const { store, name } = await freshStore();
    await writeRaw(name, { id: "key-a", origin: "mine", savedAt: "2026-05-01T10:00:00.000Z", note: sampleNote({ id: "key-b" }) });
    const { notes, problems } = await store.list();
    expect(notes).toEqual([]);
    expect(problems[0]!.message).toContain('stored under "key-a" but the note inside says "key-b"');
    store.close();
  });
});
