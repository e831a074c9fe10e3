/**
 * Which location note the Start review place is opened for: set by the note's "Start review" button,
 * kept on the device so a reload of the review place stays with its note.
 */
import { createSignal } from "solid-js";
import { read, safeLocalStorage, write } from "./createSettings.js";

const KEY = "taut.review.note";
const storage = safeLocalStorage();
const [target, setTarget] = createSignal<string | null>(read(storage, KEY) ?? null);

/** The note id the review place shows, or null. */
export const reviewTarget = target;

export function setReviewTarget(id: string): void {
  setTarget(id);
  write(storage, KEY, id);
}
