/** Notes files: reading one note or a bundle, export and import round trips, refusals that change nothing, conflicts. */
import { describe, expect, it, vi } from "vitest";
import { latestRevision, makeNotesBundle, readNotesText } from "../../src/profiles/notes.js";
import type { ImportConflict } from "../../src/notes/merge.js";
import type { NotesStore } from "../../src/notes/store.js";
import { demos, freshStore, sampleNote } from "./helpers.js";

/** Everything a library holds, as comparable data. */
async function snapshot(store: NotesStore) {
  const { notes, problems } = await store.list();
  return { notes: notes.map((s) => ({ origin: s.origin, savedAt: s.savedAt, note: s.note })), problems };
}

const neverAsked = () => {
  throw new Error("no conflict was expected");
};

describe("reading a notes file", () => {
  it("reads a bundle and a single note", () => {
    const b = makeNotesBundle([sampleNote()], new Date("2026-06-01T12:00:00Z"));
    const r = readNotesText(JSON.stringify(b));
    expect(r).toEqual({ ok: true, kind: "bundle", notes: [sampleNote()], reviews: [], exported: "2026-06-01T12:00:00.000Z" });
    const one = readNotesText(JSON.stringify(sampleNote()));
    expect(one).toEqual({ ok: true, kind: "note", notes: [sampleNote()], reviews: [] });
  });

  it("refuses a bundle repeating an id", () => {
    const r = readNotesText(JSON.stringify(makeNotesBundle([sampleNote(), sampleNote({ name: "Same id again (test)" })])));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues).toEqual([
      { path: "notes[1].id", message: 'repeats the id of note 1 ("brackenfold-up-main"); ids must be unique in a bundle', reader: { code: "noteIdRepeated", figures: { first: 1, id: "brackenfold-up-main" } } },
    ]);
  });

  it("gives a refused bundle a headline naming the bad note by number and name", () => {
    const b = makeNotesBundle([sampleNote(), sampleNote({ id: "two", name: "Second (test)", segments: [{ from_m: 0, length_m: 100, gradient_permille: 1, curveRadius_m: 40 }] })]);
    const r = readNotesText(JSON.stringify(b));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.message).toBe('The bundle holds 2 notes; note 2 ("Second (test)") is not valid, so none was imported.');
    expect(r.issues.map(({ path, message, code }) => ({ path, message, code }))).toEqual([{ path: "notes[1].segments[0].curveRadius_m", message: "must be 0 (straight) or at least 80 m (got 40)", code: "straightOrRadius" }]);
  });

  it("names the schema of a foreign file and of a file with none", () => {
    const foreign = readNotesText(JSON.stringify({ schema: "taut/start-case@1" }));
    expect(foreign.ok === false && foreign.message).toBe("This is a \"taut/start-case@1\" file, not location notes (taut/notes-bundle@2 or taut/location@1). Nothing was changed.");
    const none = readNotesText(JSON.stringify([1, 2, 3]));
    expect(none.ok === false && none.message).toContain('it has no "schema" field');
    const empty = readNotesText("   ");
    expect(empty.ok === false && empty.message).toBe("The file is empty.");
  });
});

describe("export and import", () => {
  it("a valid bundle round-trips identically: export, clear, import, export", async () => {
    const { store } = await freshStore({ demos });
    await store.put(sampleNote());
    const before = await store.exportBundle(undefined, new Date("2026-06-01T12:00:00Z"));
    expect(before.notes).toHaveLength(demos.length + 1);
    const text = JSON.stringify(before, null, 2);
    await store.clear();
    expect((await store.list()).notes).toEqual([]);

    const read = readNotesText(text);
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    const outcome = await store.importBundle(read.notes, neverAsked);
    expect(outcome.status).toBe("applied");
    if (outcome.status !== "applied") return;
    expect(outcome.summary.added.sort()).toEqual(before.notes.map((n) => n.id).sort());

    const after = await store.exportBundle(undefined, new Date("2026-06-01T12:00:00Z"));
    expect(JSON.stringify(after, null, 2)).toBe(text);
    expect((await store.list()).notes.every((s) => s.origin === "imported")).toBe(true);
    store.close();
  });

  it("importing the same notes again changes nothing and asks nothing", async () => {
    const { store } = await freshStore();
    await store.put(sampleNote());
    const bundle = await store.exportBundle();
    const before = await snapshot(store);
    const outcome = await store.importBundle(bundle.notes, neverAsked);
    expect(outcome).toEqual({ status: "applied", summary: { added: [], replaced: [], keptMine: [], copies: [], unchanged: ["brackenfold-up-main"], repaired: [] } });
    expect(await snapshot(store)).toEqual(before);
    store.close();
  });

  for (const [what, text, expected] of [
    ["a truncated file", () => JSON.stringify(makeNotesBundle([sampleNote({ id: "new-one" })])).slice(0, 180), "The file is not complete JSON: it may have been cut short while copying or downloading. Nothing was changed."],
    ["a file of another kind", () => JSON.stringify({ schema: "taut/locomotive@1", id: "x" }), "This is a \"taut/locomotive@1\" file, not location notes (taut/notes-bundle@2 or taut/location@1). Nothing was changed."],
    [
      "a bundle with one bad note",
      () => JSON.stringify(makeNotesBundle([sampleNote({ id: "new-one" }), sampleNote({ id: "new-two", name: "Bad one (test)", clearAhead_m: -5 })])),
      'The bundle holds 2 notes; note 2 ("Bad one (test)") is not valid, so none was imported.',
    ],
  ] as const) {
    it(`${what} leaves the library unchanged and gives its message`, async () => {
      const { store } = await freshStore({ demos });
      await store.put(sampleNote());
      const before = await snapshot(store);
      const r = readNotesText(text());
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.message).toBe(expected);
      expect(r.issues.length).toBeGreaterThan(0);
      expect(await snapshot(store)).toEqual(before);
      store.close();
    });
  }

  it("importBundle itself refuses an invalid note handed to it and writes nothing", async () => {
    const { store } = await freshStore();
    const before = await snapshot(store);
    const bad = { ...sampleNote({ id: "ok-one" }) };
    const worse = { ...sampleNote({ id: "bad-one" }), revisions: [] };
    const outcome = await store.importBundle([bad, worse], neverAsked);
    expect(outcome).toEqual({
      status: "failed",
      message: "Note 2 is not valid (revisions: must have at least 1 item); nothing was imported.",
      coded: { code: "importNoteInvalid", figures: { number: 2, path: "revisions", problem: "must have at least 1 item" } },
      // The field issue itself, for the screen to write in its language.
      issue: { path: "revisions", message: "must have at least 1 item", code: "minItems", figures: { count: 1 } },
    });
    expect(await snapshot(store)).toEqual(before);
    store.close();
  });

  it("applies an import in one transaction: a write that fails part-way leaves nothing behind", async () => {
    const { store } = await freshStore();
    await store.put(sampleNote());
    const before = await snapshot(store);
    const notes = [1, 2, 3, 4].map((k) => sampleNote({ id: `incoming-${k}`, name: `Incoming ${k} (test)` }));
    const proto = globalThis.IDBObjectStore.prototype;
    const realPut = proto.put;
    let calls = 0;
    const spy = vi.spyOn(proto, "put").mockImplementation(function (this: IDBObjectStore, ...args: Parameters<IDBObjectStore["put"]>) {
      calls++;
      if (calls === 3) throw new DOMException("The quota has been exceeded.", "QuotaExceededError");
      return realPut.apply(this, args);
    });
    try {
      const outcome = await store.importBundle(notes, neverAsked);
      expect(outcome.status).toBe("failed");
      expect(outcome.status === "failed" && outcome.message).toContain("nothing was imported");
    } finally {
      spy.mockRestore();
    }
    expect(calls).toBe(3);
    expect(await snapshot(store)).toEqual(before);
    store.close();
  });
});

describe("import conflicts: same id, another revision", () => {
  const theirs = sampleNote({
    clearAhead_m: 380,
    revisions: [...sampleNote().revisions, { date: "2026-05-20", initials: "RB", change: "Signal moved back 120 m." }],
  });

  async function withMine() {
    const { store } = await freshStore();
    await store.put(sampleNote());
    await store.put(sampleNote({ id: "untouched", name: "Untouched (test)" }));
    return store;
  }

  it("asks once with both versions, and 'keep mine' changes nothing of that note but adds the new ones", async () => {
    const store = await withMine();
    const asked: ImportConflict[][] = [];
    const outcome = await store.importBundle([theirs, sampleNote({ id: "fresh", name: "Fresh (test)" })], (c) => {
      asked.push(c);
      return { "brackenfold-up-main": "mine" };
    });
    expect(asked).toHaveLength(1);
    expect(asked[0]!.map((c) => c.id)).toEqual(["brackenfold-up-main"]);
    expect(latestRevision(asked[0]![0]!.mine!).change).toBe("First survey.");
    expect(latestRevision(asked[0]![0]!.theirs).change).toBe("Signal moved back 120 m.");
    expect(asked[0]![0]!.sameRevision).toBe(false);
    expect(outcome.status === "applied" && outcome.summary.keptMine).toEqual(["brackenfold-up-main"]);
    const got = await store.get("brackenfold-up-main");
    expect(got.status === "ok" && got.saved.note).toEqual(sampleNote());
    expect((await store.get("fresh")).status).toBe("ok");
    store.close();
  });

  it("'take theirs' replaces mine", async () => {
    const store = await withMine();
    const outcome = await store.importBundle([theirs], () => ({ "brackenfold-up-main": "theirs" }));
    expect(outcome.status === "applied" && outcome.summary.replaced).toEqual(["brackenfold-up-main"]);
    const got = await store.get("brackenfold-up-main");
    expect(got.status === "ok" && got.saved.note).toEqual(theirs);
    store.close();
  });

  it("'keep both' keeps mine and adds theirs under a new id, marked as the imported copy", async () => {
    const store = await withMine();
    const outcome = await store.importBundle([theirs], () => ({ "brackenfold-up-main": "both" }));
    expect(outcome.status === "applied" && outcome.summary.copies).toEqual([{ from: "brackenfold-up-main", to: "brackenfold-up-main-imported" }]);
    const mine = await store.get("brackenfold-up-main");
    expect(mine.status === "ok" && mine.saved.note).toEqual(sampleNote());
    const copy = await store.get("brackenfold-up-main-imported");
    expect(copy.status === "ok" && copy.saved.note).toEqual({ ...theirs, id: "brackenfold-up-main-imported", name: "Brackenfold, up main signal (test) (imported copy)" });
    // Keeping both a second time finds the next free id.
    const again = await store.importBundle([theirs], () => ({ "brackenfold-up-main": "both" }));
    expect(again.status === "applied" && again.summary.copies).toEqual([{ from: "brackenfold-up-main", to: "brackenfold-up-main-imported-2" }]);
    store.close();
  });

  it("cancelling at the question, or leaving a conflict unanswered, changes nothing", async () => {
    const store = await withMine();
    const before = await snapshot(store);
    const fresh = sampleNote({ id: "fresh", name: "Fresh (test)" });
    expect(await store.importBundle([theirs, fresh], () => null)).toEqual({ status: "cancelled" });
    expect(await snapshot(store)).toEqual(before);
    const unanswered = await store.importBundle([theirs, fresh], () => ({}));
    expect(unanswered).toMatchObject({ status: "failed", message: 'no choice made for the conflicting note "brackenfold-up-main"; nothing was imported.', coded: { code: "importFailed" } });
    expect(await snapshot(store)).toEqual(before);
    store.close();
  });

  it("a note edited without a new revision entry is still a conflict, flagged as such", async () => {
    const store = await withMine();
    const quiet = sampleNote({ practice: "Changed without saying so." });
    let seen: ImportConflict[] = [];
    await store.importBundle([quiet], (c) => {
      seen = c;
      return { "brackenfold-up-main": "mine" };
    });
    expect(seen.map((c) => [c.id, c.sameRevision])).toEqual([["brackenfold-up-main", true]]);
    store.close();
  });
});
