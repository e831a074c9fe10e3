/**
 * Messages between the Location notes screen and its railML import worker. The file crosses as a Blob
 * (no copy of its bytes); the parsed line stays in the worker, and only its summary and each stretch asked
 * for come back, as plain data; what the worker says, as codes with their values (profiles/railml/text.ts).
 */
import type { RailmlSummary, StretchRequest, StretchResult } from "../../../../profiles/railml/index.js";
import type { RailmlText } from "../../../../profiles/railml/text.js";

export type RailmlRequest = { type: "read"; id: number; file: Blob } | { type: "stretch"; id: number; request: StretchRequest };

export type RailmlReply =
  | { type: "progress"; id: number; fraction: number }
  | { type: "read"; id: number; summary: RailmlSummary }
  | { type: "stretch"; id: number; result: StretchResult }
  /** `message` in English; `text` the same as data, for the screen's language. */
  | { type: "error"; id: number; message: string; text: RailmlText };
