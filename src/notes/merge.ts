/**
 * Merging notes from a file into the library: which notes are new, which are the same as ours, and
 * which share an id with ours but carry another revision (a conflict the user settles: keep mine,
 * take theirs, or keep both, the imported copy then getting a new id). A note whose id is that of a
 * damaged record is a conflict too: the record may be hours of work that only needs putting right, so
 * it is never replaced without asking. Pure: no storage here.
 */
import { canonicalNote, latestRevision } from "../profiles/notes.js";
import type { LocationNoteFile } from "../profiles/schemas.js";
import { noteRecordEnglish, type RecordWhy } from "../profiles/noteRecordText.js";

export type ConflictChoice = "mine" | "theirs" | "both";

/** An imported note whose id is already in the library with different content, or is a damaged record's. */
export interface ImportConflict {
  id: string;
  /** Our note; absent when the id is a damaged record's (`damaged` then says why it could not be read). */
  mine?: LocationNoteFile;
  damaged?: string;
  /** Why, as a code (the app writes it in the language on screen), when the library gave it. */
  damagedWhy?: RecordWhy;
  theirs: LocationNoteFile;
  /** True when both carry the same latest revision entry yet differ (edited without a revision). */
  sameRevision: boolean;
}

/** What importing a set of notes would do, before any choice is made. */
export interface MergePreview {
  added: LocationNoteFile[];
  unchanged: LocationNoteFile[];
  conflicts: ImportConflict[];
}

/** The writes an import makes once every conflict has a choice. */
export interface MergeWrites {
  put: LocationNoteFile[];
  summary: { added: string[]; replaced: string[]; keptMine: string[]; copies: Array<{ from: string; to: string }>; unchanged: string[]; repaired: string[] };
}

/**
 * Compare incoming notes with the library (`mine` by id; `damaged`: why each unreadable record, by key, in
 * English, or with its code beside it).
 */
export function previewMerge(incoming: readonly LocationNoteFile[], mine: ReadonlyMap<string, LocationNoteFile>, damaged: ReadonlyMap<string, string | { message: string; why: RecordWhy }>): MergePreview {
  const out: MergePreview = { added: [], unchanged: [], conflicts: [] };
  for (const theirs of incoming) {
    const ours = mine.get(theirs.id);
    if (!ours) {
      const why = damaged.get(theirs.id);
      if (typeof why === "string") out.conflicts.push({ id: theirs.id, damaged: why, theirs, sameRevision: false });
      else if (why !== undefined) out.conflicts.push({ id: theirs.id, damaged: why.message, damagedWhy: why.why, theirs, sameRevision: false });
      else out.added.push(theirs);
      continue;
    }
    if (canonicalNote(ours) === canonicalNote(theirs)) {
      out.unchanged.push(theirs);
      continue;
    }
    const a = latestRevision(ours);
    const b = latestRevision(theirs);
    out.conflicts.push({ id: theirs.id, mine: ours, theirs, sameRevision: a.date === b.date && a.initials === b.initials && a.change === b.change });
  }
  return out;
}

/**
 * The writes for a preview and the user's choices. Throws a RangeError when a conflict has no choice:
 * the caller must settle all of them (or cancel) before anything is written.
 */
export function mergeWrites(preview: MergePreview, choices: Readonly<Record<string, ConflictChoice>>, takenIds: ReadonlySet<string>): MergeWrites {
  const taken = new Set(takenIds);
  for (const n of preview.added) taken.add(n.id);
  const w: MergeWrites = {
    put: [...preview.added],
    summary: {
      added: preview.added.map((n) => n.id),
      replaced: [],
      keptMine: [],
      copies: [],
      unchanged: preview.unchanged.map((n) => n.id),
      repaired: [],
    },
  };
  for (const c of preview.conflicts) {
    const choice = choices[c.id];
    if (choice === undefined) throw new RangeError(noteRecordEnglish.noChoice(c.id));
    if (choice === "mine") w.summary.keptMine.push(c.id);
    else if (choice === "theirs") {
      w.put.push(c.theirs);
      (c.mine ? w.summary.replaced : w.summary.repaired).push(c.id);
    } else {
      const copy = importedCopy(c.theirs, taken);
      taken.add(copy.id);
      w.put.push(copy);
      w.summary.copies.push({ from: c.id, to: copy.id });
    }
  }
  return w;
}

const ID_MAX = 80;
const NAME_MAX = 120;

/** The imported note under a new, unused id, its name marked as the imported copy. */
export function importedCopy(n: LocationNoteFile, taken: ReadonlySet<string>): LocationNoteFile {
  let k = 1;
  let id: string;
  do {
    const suffix = k === 1 ? "-imported" : `-imported-${k}`;
    id = `${n.id.slice(0, ID_MAX - suffix.length)}${suffix}`;
    k++;
  } while (taken.has(id));
  const mark = " (imported copy)";
  const name = n.name.endsWith(mark) ? n.name : `${n.name.slice(0, NAME_MAX - mark.length)}${mark}`;
  return { ...n, id, name };
}
