/**
 * Read a notes file for import in a worker (notesFile.worker.ts), so the page stays responsive while a
 * large bundle is parsed and checked; where workers are not available (tests in jsdom) the same reader
 * runs here.
 */
import { readNotesText, type NotesFileResult } from "../../../profiles/notes.js";
import type { LocationNoteFile } from "../../../profiles/schemas.js";
import type { NotesFileReply, NotesFileRequest } from "./notesFile.worker.js";

/** Something with the text of a file: a File or Blob in the browser. */
export interface TextSource {
  text(): Promise<string>;
}

export async function readNotesFile(file: TextSource): Promise<NotesFileResult> {
  if (typeof Worker === "undefined" || !(file instanceof Blob)) return readNotesText(await file.text());
  let worker: Worker | undefined;
  try {
    const w = new Worker(new URL("./notesFile.worker.ts", import.meta.url), { type: "module", name: "taut-notes-file" });
    worker = w;
    return await new Promise<NotesFileResult>((resolve, reject) => {
      const notes: LocationNoteFile[] = [];
      w.onmessage = (ev: MessageEvent<NotesFileReply>) => {
        const m = ev.data;
        if (m.kind === "part") notes.push(...m.notes);
        else resolve(m.result.ok ? { ...m.result, notes } : m.result);
      };
      w.onerror = (ev) => reject(new Error(ev.message || "the file reader stopped"));
      w.postMessage({ id: 1, file } satisfies NotesFileRequest);
    });
  } catch {
    // The worker could not start or stopped: read the file here, slower but the same.
    return readNotesText(await file.text());
  } finally {
    worker?.terminate();
  }
}
