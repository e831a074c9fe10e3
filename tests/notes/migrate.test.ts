/** Migration of the notes database from schema version 1 (nested profile, one revision stamp) to version 2. */
import { openDB } from "idb";
import { describe, expect, it } from "vitest";
import { migrateV1Record, NOTES_DB_VERSION, V1_CARRIED_OVER, type NoteRecordV1 } from "../../src/notes/migrations.js";
import { openNotesStore } from "../../src/notes/store.js";
import { demos, freshName } from "./helpers.js";

const v1Note: NoteRecordV1 = {
  id: "harrowby-goods-loop",
  title: "Harrowby goods loop (test)",
  line: "Test line",
  direction: "Down",
  profile: {
    segments: [
      { start_m: 0, length_m: 700, grade_permille: -3, radius_m: 0 },
      { start_m: 700, length_m: 900, grade_permille: 6, radius_m: 350 },
    ],
    front_m: 1300,
    clear_m: 400,
  },
  speedLimit_kmh: 25,
  hazards: ["Level crossing 250 m ahead", "  "],
  rail: { winter: "frost", autumn: "leaves" },
  practice: "Sag under the train: keep the power low.",
  revised: "2025-11-20",
  by: "MK",
};

/** Create a database exactly as version 1 did, with the given records. */
async function makeV1Database(name: string, records: unknown[]): Promise<void> {
  const db = await openDB(name, 1, {
    upgrade(d) {
      d.createObjectStore("notes", { keyPath: "id" });
    },
  });
  for (const r of records) await db.put("notes", r);
  db.close();
}

describe("migrateV1Record", () => {
  it("maps every version-1 field onto the location note", () => {
    const m = migrateV1Record(v1Note);
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    expect(m.record).toEqual({
      id: "harrowby-goods-loop",
      origin: "mine",
      savedAt: "2025-11-20T00:00:00.000Z",
      rev: 1,
      note: {
        schema: "taut/location@1",
        id: "harrowby-goods-loop",
        name: "Harrowby goods loop (test)",
        line: "Test line",
        direction: "Down",
        segments: [
          { from_m: 0, length_m: 700, gradient_permille: -3, curveRadius_m: 0 },
          { from_m: 700, length_m: 900, gradient_permille: 6, curveRadius_m: 350 },
        ],
        frontAt_m: 1300,
        clearAhead_m: 400,
        speedLimit_kmh: 25,
        hazards: [{ kind: "other", note: "Level crossing 250 m ahead" }],
        seasons: [
          { season: "autumn", rail: "leaves" },
          { season: "winter", rail: "frost" },
        ],
        practice: "Sag under the train: keep the power low.",
        revisions: [{ date: "2025-11-20", initials: "MK", change: V1_CARRIED_OVER }],
      },
    });
  });

  it("carries over what is valid and flags the rest: an unknown season or rail word does not lose the note", () => {
    const m = migrateV1Record({ ...v1Note, rail: { winter: "snowy", autumn: "leaves", monsoon: "wet" }, hazards: ["Points ahead", 42] });
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    expect(m.record.note.seasons).toEqual([{ season: "autumn", rail: "leaves" }]);
    expect(m.record.note.hazards).toEqual([{ kind: "other", note: "Points ahead" }]);
    expect(m.record.flags).toEqual([
      "Hazard 2 was not text and was left out.",
      'The usual rail in winter, "snowy", was left out: not one of dry, damp, wet, frost, leaves, greasy.',
      'The usual rail for "monsoon" was left out: not a season (spring, summer, autumn, winter).',
    ]);
  });

  it("a record it still cannot carry over gives the reason, the note as far as it goes, and the flags", () => {
    const steep = { ...v1Note, rail: { winter: "snowy" }, profile: { ...v1Note.profile, segments: [{ start_m: 0, length_m: 1600, grade_permille: 90, radius_m: 0 }] } };
    const m = migrateV1Record(steep);
    expect(m.ok).toBe(false);
    if (m.ok) return;
    expect(m.message).toBe("segments[0].gradient_permille: must be from -60 to 60 ‰ (got 90)");
    expect(m.partial).toMatchObject({ id: "harrowby-goods-loop", name: "Harrowby goods loop (test)", segments: [{ from_m: 0, length_m: 1600, gradient_permille: 90, curveRadius_m: 0 }] });
    expect(m.flags).toHaveLength(1);
    expect(migrateV1Record(null)).toEqual({ ok: false, message: "not an object", why: { code: "migrationNotObject" }, partial: {}, flags: [], flagCodes: [] });
  });
});

describe("opening a version-1 database", () => {
  it("upgrades it to the current version, carrying every good note over and reporting the one it could not", async () => {
    const name = freshName();
    const damaged = { ...v1Note, id: "broken-one", title: "", revised: "last week" };
    await makeV1Database(name, [v1Note, { ...v1Note, id: "demo-one", title: "Old demo (illustrative)", demo: true }, damaged]);
    const store = await openNotesStore({ name, demos });
    const { notes, problems } = await store.list();
    expect(notes.map((s) => s.note.id).sort()).toEqual(["demo-one", "harrowby-goods-loop"]);
    // The demo notes of this version are not pushed into a library that already existed.
    expect(notes.some((s) => demos.some((d) => d.id === s.note.id))).toBe(false);
    expect(notes.find((s) => s.note.id === "demo-one")!.origin).toBe("demo");
    expect(notes.find((s) => s.note.id === "demo-one")!.note.illustrative).toBe(true);
    // The reason is kept, and what could be carried over is offered for the editor.
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({
      key: "broken-one",
      rawKey: "broken-one",
      message: 'The saved note "broken-one" is damaged and was skipped: it is in an older format that could not be carried over (name: must not be empty; revisions[0].date: must be a date as YYYY-MM-DD (got "last week"))',
      rescue: { note: { id: "broken-one", practice: v1Note.practice }, flags: [] },
    });
    store.close();

    const db = await openDB(name);
    expect(db.version).toBe(NOTES_DB_VERSION);
    expect([...db.objectStoreNames].sort()).toEqual(["meta", "notes", "reviews"]);
    db.close();
  });

  it("an upgraded library works as usual: edit, export", async () => {
    const name = freshName();
    await makeV1Database(name, [v1Note]);
    const store = await openNotesStore({ name, demos: [] });
    const got = await store.get("harrowby-goods-loop");
    expect(got.status).toBe("ok");
    if (got.status !== "ok") return;
    const edited = { ...got.saved.note, clearAhead_m: 420, revisions: [...got.saved.note.revisions, { date: "2026-01-05", initials: "MK", change: "Re-measured." }] };
    expect((await store.put(edited)).ok).toBe(true);
    const bundle = await store.exportBundle();
    expect(bundle.notes.map((n) => [n.id, n.clearAhead_m, n.revisions.length])).toEqual([["harrowby-goods-loop", 420, 2]]);
    store.close();
  });
});
