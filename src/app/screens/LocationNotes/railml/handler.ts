/**
 * The railML import worker's work, over src/profiles/railml alone: read a file a slice at a time (1 MB of
 * bytes, decoded as UTF-8 across the slices) into the streaming reader, keep the line it describes, and
 * answer stretches of it. Runs in the worker; the tests run it in the page's thread.
 */
import { summarise, type RailmlModel } from "../../../../profiles/railml/model.js";
import { createRailmlReader, RailmlError } from "../../../../profiles/railml/reader.js";
import { railmlStretch } from "../../../../profiles/railml/stretch.js";
import { railmlEnglish, say, type RailmlText } from "../../../../profiles/railml/text.js";
import type { RailmlReply, RailmlRequest } from "./protocol.js";

/** Bytes read at a time. */
export const SLICE_BYTES = 1 << 20;

export function createRailmlHandler(post: (r: RailmlReply) => void): (msg: RailmlRequest) => Promise<void> {
  let model: RailmlModel | undefined;
  return async (msg) => {
    if (msg.type === "read") {
      model = undefined;
      try {
        const reader = createRailmlReader();
        const decoder = new TextDecoder("utf-8");
        const size = msg.file.size;
        for (let at = 0; at < size; at += SLICE_BYTES) {
          const bytes = new Uint8Array(await msg.file.slice(at, at + SLICE_BYTES).arrayBuffer());
          reader.write(decoder.decode(bytes, { stream: true }));
          post({ type: "progress", id: msg.id, fraction: Math.min(1, (at + bytes.length) / Math.max(1, size)) });
        }
        reader.write(decoder.decode());
        model = reader.close();
        post({ type: "read", id: msg.id, summary: summarise(model) });
      } catch (e) {
        const text = e instanceof RailmlError ? e.text : say("couldNotRead", { detail: (e as Error).message || String(e) });
        post({ type: "error", id: msg.id, message: railmlEnglish(text), text });
      }
      return;
    }
    if (!model) {
      const text: RailmlText = say("nothingRead");
      post({ type: "error", id: msg.id, message: railmlEnglish(text), text });
      return;
    }
    post({ type: "stretch", id: msg.id, result: railmlStretch(model, msg.request) });
  };
}
