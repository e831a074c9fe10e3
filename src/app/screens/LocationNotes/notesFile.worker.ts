/**
 * Reading a notes file off the page's thread: the text, the JSON and the check of every note (a library
 * of ten thousand notes is tens of megabytes and seconds of checking). Messages: a file (Blob) in, the
 * `readNotesText` result out.
 */
import { readNotesText, type NotesFileResult } from "../../../profiles/notes.js";

export interface NotesFileRequest {
  id: number;
  file: Blob;
}
export interface NotesFileReply {
  id: number;
  result: NotesFileResult;
}

interface Scope {
  onmessage: ((ev: MessageEvent<NotesFileRequest>) => void) | null;
  postMessage(m: NotesFileReply): void;
}
const scope = self as unknown as Scope;

scope.onmessage = (ev) => {
  const { id, file } = ev.data;
  file.text().then(
    (text) => scope.postMessage({ id, result: readNotesText(text) }),
    (e: unknown) => scope.postMessage({ id, result: { ok: false, message: `The file could not be read (${e instanceof Error ? e.message : String(e)}). Nothing was changed.`, issues: [] } }),
  );
};
