/** The Start review worker: a recording read and reviewed off the page's thread (seconds for a long train). */
import type { StartCase } from "../../../core/train/types.js";
import { runReview, type ReviewOutcome } from "./runReview.js";

export interface ReviewRequest {
  c: StartCase;
  fileName: string;
  text: string;
}

interface Scope {
  onmessage: ((ev: MessageEvent<ReviewRequest>) => void) | null;
  postMessage(m: ReviewOutcome): void;
}
const scope = self as unknown as Scope;

scope.onmessage = (ev) => {
  const { c, fileName, text } = ev.data;
  scope.postMessage(runReview(c, fileName, text));
};
