/**
 * Notes bundles carry Start reviews (taut/notes-bundle@2): a note with reviews round-trips through export
 * and import, a version-1 bundle (no reviews) still imports by migration, a bundle with a broken review
 * is refused whole, and the observed factor is the median of the reviews' mass factors (the median of an
 * odd count is the middle value, of an even count the mean of the two middle values — common practice).
 */
import { openDB } from "idb";
import { describe, expect, it } from "vitest";
import { makeNotesBundle, migrateNotesBundle, observedMassFactor, readNotesText, type StartReviewFile } from "../../src/profiles/notes.js";
import { freshName, freshStore, sampleNote } from "./helpers.js";

function review(over: Partial<StartReviewFile> = {}): StartReviewFile {
  const note = sampleNote();
  return {
    id: "r-2026-11-03-1",
    location: note.id,
    date: "2026-11-03",
    rail: "wet",
    train: "Aggregate block, 24 hoppers (illustrative)",
    initials: "KV",
    massFactor: { value: 1.12, low: 1.09, high: 1.15 },
    separable: false,
    plannedVerdict: "starts",
    replannedVerdict: "marginal",
    thumbnail: { time_s: [0, 10, 20, 30], speed_kmh: [2, 6.5, 11, 15] },
    ...over,
  };
}

describe("notes bundles with reviews", () => {
  it("a note with reviews round-trips through export and import", () => {
    const reviews = [review(), review({ id: "r2", date: "2026-11-20", rail: "leaves", massFactor: { value: 1.2, low: 1.1, high: 1.3 }, effortFactor: { value: 0.93, low: 0.9, high: 0.96 } })];
    const b = makeNotesBundle([sampleNote()], new Date("2026-12-01T08:00:00Z"), reviews);
    expect(b.schema).toBe("taut/notes-bundle@2");
    const r = readNotesText(JSON.stringify(b));
    expect(r.ok && r.reviews).toEqual(reviews);
    expect(r.ok && r.notes).toEqual([sampleNote()]);
  });

  it("a version-1 bundle still imports: the same notes, no reviews, and it says it was migrated", () => {
    const v1 = { schema: "taut/notes-bundle@1", exported: "2026-06-13T08:00:00Z", notes: [sampleNote()] };
    const r = readNotesText(JSON.stringify(v1));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.notes).toEqual([sampleNote()]);
    expect(r.reviews).toEqual([]);
    expect(r.migratedFrom).toBe("taut/notes-bundle@1");
    expect(migrateNotesBundle(v1)).toEqual({ ...v1, schema: "taut/notes-bundle@2", reviews: [] });
    // A version-1 bundle cannot smuggle reviews in: the migration sets them empty.
    const r2 = readNotesText(JSON.stringify({ ...v1, reviews: [review()] }));
    expect(r2.ok && r2.reviews).toEqual([]);
  });

  it.each([
    ["a review of a note not in the bundle", { location: "elsewhere" }, /reviews\[0\]\.location/],
    ["a review without a date", { date: "3 Nov" }, /reviews\[0\]\.date/],
    ["a review with a factor that is not a number", { massFactor: { value: Number.NaN, low: 1, high: 1 } }, /reviews\[0\]\.massFactor/],
  ])("a bundle with %s is refused whole", (_name, over, path) => {
    const b = { ...makeNotesBundle([sampleNote()], new Date("2026-12-01T08:00:00Z")), reviews: [{ ...review(), ...over }] };
    const r = readNotesText(JSON.stringify(b).replace("null", "\"NaN\""));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.message).toMatch(/Nothing was changed|not valid/);
    expect(r.issues.map((i) => i.path).join(" ")).toMatch(path);
  });

  it("the observed factor is the median of the reviews' mass factors", () => {
    expect(observedMassFactor([])).toBeNull();
    const f = (v: number) => review({ massFactor: { value: v, low: v - 0.05, high: v + 0.05 } });
    expect(observedMassFactor([f(1.3), f(1.05), f(1.1)])).toEqual({ median: 1.1, reviews: 3 });
    expect(observedMassFactor([f(1.3), f(1.05), f(1.1), f(0.95)])!.median).toBeCloseTo(1.075, 12);
  });
});

describe("reviews in the notes store (database version 3)", () => {
  it("a review kept beside a note goes out with the note's export and comes back with its import", async () => {
    const { store } = await freshStore();
    expect((await store.put(sampleNote(), "mine")).ok).toBe(true);
    expect(await store.addReview(review())).toEqual({ ok: true });
    expect(await store.addReview(review({ id: "stray", location: "no-such-note" }))).toMatchObject({ ok: false });
    expect(await store.addReview({ ...review(), date: "yesterday" })).toMatchObject({ ok: false });
    const bundle = await store.exportBundle(undefined, new Date("2026-12-01T08:00:00Z"));
    expect(bundle.reviews).toEqual([review()]);
    const read = readNotesText(JSON.stringify(bundle));
    if (!read.ok) throw new Error(read.message);
    const { store: other } = await freshStore();
    const outcome = await other.importBundle(read.notes, () => null, { validated: true, reviews: read.reviews });
    expect(outcome.status).toBe("applied");
    expect(await other.reviews(sampleNote().id)).toEqual([review()]);
    expect(await other.exportBundle(undefined, new Date("2026-12-01T08:00:00Z"))).toEqual(bundle);
    expect(await other.deleteReview(review().id)).toBe(true);
    expect(await other.reviews(sampleNote().id)).toEqual([]);
  });

  it("a database of version 2 opens at version 3 with its notes as they were and no reviews", async () => {
    const name = freshName();
    const note = sampleNote();
    const v2 = await openDB(name, 2, {
      upgrade(d) {
        d.createObjectStore("notes", { keyPath: "id" });
        d.createObjectStore("meta");
      },
    });
    await v2.put("notes", { id: note.id, origin: "mine", savedAt: "2026-10-01T00:00:00.000Z", rev: 1, note });
    v2.close();
    const { store } = await freshStore({ name });
    const got = await store.get(note.id);
    expect(got.status === "ok" && got.saved.note).toEqual(note);
    expect(await store.reviews(note.id)).toEqual([]);
    store.close();
    const raw = await openDB(name);
    expect(raw.version).toBe(3);
    expect([...raw.objectStoreNames]).toEqual(expect.arrayContaining(["notes", "meta", "reviews"]));
    raw.close();
  });
});
