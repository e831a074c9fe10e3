/**
 * The trainer's notes are hours of work: two tabs editing one note, an import over a damaged record, a
 * record under a numeric key, a database upgraded by another tab, and a large library read again and
 * again. Each test opens the store as the app does (fake-indexeddb), sometimes twice, as two tabs would.
 */
import { openDB } from "idb";
import { describe, expect, it } from "vitest";
import { NotesClosedError, openNotesStore } from "../../src/notes/store.js";
import { freshStore, sampleNote, writeRaw } from "./helpers.js";

const edited = (change: string, over: Parameters<typeof sampleNote>[0] = {}) =>
  sampleNote({ ...over, revisions: [...sampleNote().revisions, { date: "2026-04-02", initials: "JQ", change }] });

describe("two tabs editing one note", () => {
  it("the second save finds the first and writes nothing until the trainer chooses", async () => {
    const { store: a, name } = await freshStore();
    const first = await a.put(sampleNote());
    expect(first.ok && first.saved.rev).toBe(1);
    const b = await openNotesStore({ name, demos: [] });
    // Both tabs open the note at write 1.
    const opened = await b.get("brackenfold-up-main");
    expect(opened.status === "ok" && opened.saved.rev).toBe(1);
    const saveA = await a.put(edited("Tab A: signal moved.", { clearAhead_m: 450 }), "mine", { rev: 1 });
    expect(saveA.ok && saveA.saved.rev).toBe(2);
    const saveB = await b.put(edited("Tab B: hazard added.", { clearAhead_m: 520 }), "mine", { rev: 1 });
    expect(saveB.ok).toBe(false);
    if (saveB.ok) return;
    expect(saveB.issues).toEqual([]);
    expect(saveB.conflict?.theirs?.note.clearAhead_m).toBe(450);
    expect(saveB.conflict?.theirs?.rev).toBe(2);
    // Tab A's edit and its revision entry are still there.
    const now = await a.get("brackenfold-up-main");
    expect(now.status === "ok" && now.saved.note.revisions.at(-1)!.change).toBe("Tab A: signal moved.");
    // "Keep mine" writes over it, knowingly.
    const keepMine = await b.put(edited("Tab B: hazard added.", { clearAhead_m: 520 }), "mine", "replace");
    expect(keepMine.ok && keepMine.saved.rev).toBe(3);
    a.close();
    b.close();
  });

  it("a note removed in another tab, and a new note whose id another tab took, are conflicts too", async () => {
    const { store: a, name } = await freshStore();
    await a.put(sampleNote());
    const b = await openNotesStore({ name, demos: [] });
    expect(await a.delete("brackenfold-up-main")).toBe(true);
    const gone = await b.put(edited("Edited after removal."), "mine", { rev: 1 });
    expect(!gone.ok && gone.conflict).toEqual({ id: "brackenfold-up-main" });
    await a.put(sampleNote({ id: "fresh-note", name: "Fresh (test)" }), "mine", "new");
    const taken = await b.put(sampleNote({ id: "fresh-note", name: "Also fresh (test)" }), "mine", "new");
    expect(!taken.ok && taken.conflict?.theirs?.note.name).toBe("Fresh (test)");
    a.close();
    b.close();
  });
});

describe("damaged records", () => {
  it("an import whose note id is a damaged record's asks, and the record can be exported raw first", async () => {
    const { store, name } = await freshStore();
    const raw = { id: "brackenfold-up-main", origin: "mine", savedAt: "2026-05-01T10:00:00.000Z", note: { ...sampleNote(), name: "" }, extra: "hours of work" };
    await writeRaw(name, raw);
    expect(await store.rawRecord("brackenfold-up-main")).toEqual(raw);
    const asked: string[] = [];
    const keep = await store.importBundle([sampleNote()], (c) => {
      asked.push(...c.map((x) => `${x.id}: ${x.mine ? "note" : x.damaged}`));
      return { "brackenfold-up-main": "mine" };
    });
    expect(asked).toEqual(['brackenfold-up-main: The saved note "brackenfold-up-main" is damaged and was skipped: name: must not be empty']);
    expect(keep.status === "applied" && keep.summary.keptMine).toEqual(["brackenfold-up-main"]);
    expect(await store.rawRecord("brackenfold-up-main")).toEqual(raw);
    const replace = await store.importBundle([sampleNote()], () => ({ "brackenfold-up-main": "theirs" }));
    expect(replace.status === "applied" && replace.summary.repaired).toEqual(["brackenfold-up-main"]);
    expect((await store.get("brackenfold-up-main")).status).toBe("ok");
    store.close();
  });

  it("a record under a numeric key is reported with that key and can be removed", async () => {
    const { store, name } = await freshStore();
    await writeRaw(name, { id: 5, origin: "mine", savedAt: "2026-05-01T10:00:00.000Z", note: sampleNote() });
    const { problems } = await store.list();
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ key: "5", rawKey: 5 });
    // The text "5" is another key: removing by it removes nothing.
    expect(await store.delete("5")).toBe(false);
    expect(await store.delete(problems[0]!.rawKey)).toBe(true);
    expect((await store.list()).problems).toEqual([]);
    store.close();
  });
});

describe("another tab upgrades the database", () => {
  it("the store is told, says so on the next call and never fails with 'the connection is closing'", async () => {
    const { name } = await freshStore();
    const closed: string[] = [];
    const store = await openNotesStore({ name, demos: [], onClosed: (r) => closed.push(r) });
    await store.put(sampleNote());
    // A newer version of the app in another tab opens the database at a higher version.
    const newer = await openDB(name, 99, { upgrade: () => undefined });
    expect(closed).toEqual(["upgrade"]);
    expect(store.closed()).toBe("upgrade");
    await expect(store.put(edited("After the upgrade."))).rejects.toBeInstanceOf(NotesClosedError);
    await expect(store.list()).rejects.toThrow(/upgraded by another tab or window of Taut\. Reload this page/);
    newer.close();
  });
});

describe("a large library", () => {
  it("is read once per page: another tab's write is seen, our own writes update what was read", async () => {
    const { store, name } = await freshStore();
    const notes = Array.from({ length: 300 }, (_, k) => sampleNote({ id: `bulk-${k}`, name: `Bulk ${String(k).padStart(3, "0")} (test)` }));
    const r = await store.importBundle(notes, () => null, { validated: true });
    expect(r.status === "applied" && r.summary.added).toHaveLength(300);
    expect((await store.list()).notes).toHaveLength(300);
    // Our own save shows at once, in name order.
    await store.put(sampleNote({ id: "aaa-first", name: "Aaa first (test)" }), "mine", "new");
    expect((await store.list()).notes[0]!.note.id).toBe("aaa-first");
    // Another tab saves a note: its write is counted, so this tab reads the library again and sees it.
    const other = await openNotesStore({ name, demos: [] });
    await other.put(sampleNote({ id: "bulk-7", name: "Renamed in the other tab (test)" }), "mine", { rev: 1 });
    expect((await store.list()).notes.find((s) => s.note.id === "bulk-7")!.note.name).toBe("Renamed in the other tab (test)");
    // A record damaged behind the store's back (written raw, then counted as any write is) is checked afresh, not trusted.
    await writeRaw(name, { id: "bulk-8", origin: "mine", savedAt: "2026-06-01T00:00:00.000Z", rev: 9, note: { ...sampleNote({ id: "bulk-8" }), name: "" } });
    const db = await openDB(name);
    await db.put("meta", String(Number((await db.get("meta", "changes")) ?? "0") + 1), "changes");
    db.close();
    const again = await store.list();
    expect(again.notes).toHaveLength(300);
    expect(again.problems.map((p) => p.key)).toEqual(["bulk-8"]);
    // Two reads asked at once are served by one.
    const [a, b] = await Promise.all([store.list(), store.list()]);
    expect(a.notes.map((s) => s.note.id)).toEqual(b.notes.map((s) => s.note.id));
    other.close();
    store.close();
  });
});
