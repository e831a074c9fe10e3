/**
 * Review a recording in a worker (review.worker.ts), so the page stays responsive while the start is re-run;
 * where workers are not available (tests in jsdom), or the worker cannot start, the same code runs here.
 */
import type { StartCase } from "../../../core/train/types.js";
import type { ReviewRequest } from "./review.worker.js";
import { runReview, type ReviewOutcome } from "./runReview.js";

export async function reviewInWorker(c: StartCase, fileName: string, text: string): Promise<ReviewOutcome> {
  if (typeof Worker === "undefined") return runReview(c, fileName, text);
  let worker: Worker | undefined;
  try {
    const w = new Worker(new URL("./review.worker.ts", import.meta.url), { type: "module", name: "taut-review" });
    worker = w;
    return await new Promise<ReviewOutcome>((resolve, reject) => {
      w.onmessage = (ev: MessageEvent<ReviewOutcome>) => resolve(ev.data);
      w.onerror = (ev) => reject(new Error(ev.message || "the review stopped"));
      w.postMessage({ c, fileName, text } satisfies ReviewRequest);
    });
  } catch {
    return runReview(c, fileName, text);
  } finally {
    worker?.terminate();
  }
}
