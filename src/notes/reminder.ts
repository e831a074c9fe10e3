/**
 * Keeping the trainer's work safe: the reminder to export a copy, and the request for persistent
 * storage (so the browser does not clear the notes when the device runs short of space).
 */

/** Days after the last export before the reminder shows. */
export const EXPORT_REMINDER_DAYS = 30;
const DAY_MS = 86_400_000;

export interface ExportReminder {
  due: boolean;
  /** ISO date-time of the last export of the whole library, if any. */
  lastExport?: string;
  /** Whole days since the last export. */
  daysSince?: number;
}

/**
 * Whether to remind the user to export: they have notes of their own (not just the demo notes) and
 * have never exported, or last exported more than `EXPORT_REMINDER_DAYS` days ago.
 */
export function exportReminder(lastExport: string | undefined, now: Date, hasOwnNotes: boolean): ExportReminder {
  if (lastExport === undefined) return { due: hasOwnNotes };
  const t = Date.parse(lastExport);
  if (Number.isNaN(t)) return { due: hasOwnNotes };
  const daysSince = Math.floor((now.getTime() - t) / DAY_MS);
  return { due: hasOwnNotes && now.getTime() - t > EXPORT_REMINDER_DAYS * DAY_MS, lastExport, daysSince };
}

export type PersistResult = "persisted" | "not-granted" | "unavailable";

/** The part of the browser's StorageManager used here. */
export interface PersistCapable {
  persisted?: () => Promise<boolean>;
  persist?: () => Promise<boolean>;
}

/** Ask the browser to keep this site's storage unless the user clears it; never throws. */
export async function requestPersistentStorage(storage: PersistCapable | undefined = globalThis.navigator?.storage): Promise<PersistResult> {
  if (!storage || typeof storage.persist !== "function") return "unavailable";
  try {
    if (typeof storage.persisted === "function" && (await storage.persisted())) return "persisted";
    return (await storage.persist()) ? "persisted" : "not-granted";
  } catch {
    return "unavailable";
  }
}
