/**
 * The shape of a stored note record (schema version 2), apart from the checks in records.ts, so that the
 * migrations can name it without importing the checks (which use the migrations).
 */
import type { LocationNoteFile } from "../profiles/schemas.js";
import type { MigrationFlag } from "../profiles/noteRecordText.js";

/** Where a saved note came from: a demo note shipped with the program, the user's own, or a file. */
export type NoteOrigin = "demo" | "mine" | "imported";

/** One note as stored (schema version 2): the note file itself plus where it came from and when it was saved. */
export interface NoteRecord {
  id: string;
  origin: NoteOrigin;
  /** When it was last written on this device, ISO 8601. */
  savedAt: string;
  /**
   * How many times the record has been written on this device (absent in records written before it was
   * kept: 0). A save says which one it started from, so an edit made in another tab meanwhile is found.
   */
  rev?: number;
  /** What a migration from the older format could not carry over, for the trainer to look at. */
  flags?: string[];
  /**
   * The same as codes with their figures (language-neutral), so the app can say them in the language on
   * screen; kept beside the English, which stays as it was written.
   */
  flagCodes?: MigrationFlag[];
  note: LocationNoteFile;
}
