/**
 * Reading a notes file off the page's thread: the text, the JSON and the check of every note (a library
 * of ten thousand notes is tens of megabytes and seconds of checking). Messages: a file (Blob) in, the
 * `readNotesText` result out.
 */
import { readNotesText, refused, type NotesFileResult } from "../../../profiles/notes.js";
import type { LocationNoteFile } from "../../../profiles/schemas.js";

export interface NotesFileRequest {
  id: number;
  file: Blob;
}
/**
 * The notes come back a few hundred at a time (`part`), then the result without them (`done`): the page
 * takes each part in as a short task instead of one long one for a whole library.
 */
export type NotesFileReply = { id: number; kind: "part"; notes: LocationNoteFile[] } | { id: number; kind: "done"; result: NotesFileResult };

/** Notes per part. */
const PART = 500;

interface Scope {
  onmessage: ((ev: MessageEvent<NotesFileRequest>) => void) | null;
  postMessage(m: NotesFileReply): void;
}
const scope = self as unknown as Scope;

scope.onmessage = (ev) => {
  const { id, file } = ev.data;
  file.text().then(
    (text) => {
      const result = readNotesText(text);
      if (!result.ok) return scope.postMessage({ id, kind: "done", result });
      for (let k = 0; k < result.notes.length; k += PART) scope.postMessage({ id, kind: "part", notes: result.notes.slice(k, k + PART) });
      scope.postMessage({ id, kind: "done", result: { ...result, notes: [] } });
    },
    (e: unknown) =>
      scope.postMessage({ id, kind: "done", result: refused({ code: "notesUnreadable", figures: { why: e instanceof Error ? e.message : String(e) } }, true, []) }),
  );
};
