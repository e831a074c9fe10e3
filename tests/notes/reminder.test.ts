/** Keeping the notes safe: the export reminder after 30 days, and the request for persistent storage. */
import { describe, expect, it } from "vitest";
import { exportReminder, requestPersistentStorage } from "../../src/notes/reminder.js";
import { demos, freshStore, sampleNote } from "./helpers.js";

const day = 86_400_000;
const t0 = new Date("2026-06-01T09:00:00Z");
const later = (days: number) => new Date(t0.getTime() + days * day);

describe("exportReminder", () => {
  it("is due for own notes never exported, not for demo notes alone", () => {
    expect(exportReminder(undefined, t0, true)).toEqual({ due: true });
    expect(exportReminder(undefined, t0, false)).toEqual({ due: false });
  });
  it("is due only when the last export is more than 30 days old", () => {
    expect(exportReminder(t0.toISOString(), later(30), true)).toEqual({ due: false, lastExport: t0.toISOString(), daysSince: 30 });
    expect(exportReminder(t0.toISOString(), new Date(later(30).getTime() + 60_000), true).due).toBe(true);
    expect(exportReminder(t0.toISOString(), later(45), false).due).toBe(false);
  });
});

describe("the store's last export", () => {
  it("is remembered when the whole library is exported, not for a single note, and drives the reminder", async () => {
    let clock = t0;
    const { store } = await freshStore({ demos, now: () => clock });
    expect(await store.lastExport()).toBeUndefined();
    expect((await store.exportReminder()).due).toBe(false); // only demo notes so far
    await store.put(sampleNote());
    expect((await store.exportReminder()).due).toBe(true);

    await store.exportBundle(["brackenfold-up-main"]);
    expect(await store.lastExport()).toBeUndefined();

    const b = await store.exportBundle();
    expect(b.exported).toBe(t0.toISOString());
    expect(await store.lastExport()).toBe(t0.toISOString());
    expect((await store.exportReminder()).due).toBe(false);

    clock = later(31);
    expect(await store.exportReminder()).toEqual({ due: true, lastExport: t0.toISOString(), daysSince: 31 });
    store.close();
  });
});

describe("requestPersistentStorage", () => {
  it("asks the browser once when not yet persisted, and reports the answer", async () => {
    let asked = 0;
    const granting = { persisted: async () => false, persist: async () => (++asked, true) };
    expect(await requestPersistentStorage(granting)).toBe("persisted");
    expect(asked).toBe(1);
    expect(await requestPersistentStorage({ persisted: async () => false, persist: async () => false })).toBe("not-granted");
  });
  it("does not ask again when storage is already persistent", async () => {
    let asked = 0;
    expect(await requestPersistentStorage({ persisted: async () => true, persist: async () => (++asked, true) })).toBe("persisted");
    expect(asked).toBe(0);
  });
  it("copes with no storage manager or one that throws", async () => {
    expect(await requestPersistentStorage(undefined)).toBe("unavailable");
    expect(await requestPersistentStorage({})).toBe("unavailable");
    expect(await requestPersistentStorage({ persist: () => Promise.reject(new Error("denied by policy")) })).toBe("unavailable");
  });
});
