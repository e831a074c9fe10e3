/**
 * Messages between the Location notes screen and its railML import worker. The file crosses as a Blob
 * (no copy of its bytes); the parsed line stays in the worker, and only its summary and each stretch asked
 * for come back, as plain data.
 */
import type { RailmlSummary, StretchRequest, StretchResult } from "../../../../profiles/railml/index.js";

export type RailmlRequest = { type: "read"; id: number; file: Blob } | { type: "stretch"; id: number; request: StretchRequest };

export type RailmlReply =
  | { type: "progress"; id: number; fraction: number }
  | { type: "read"; id: number; summary: RailmlSummary }
  | { type: "stretch"; id: number; result: StretchResult }
  | { type: "error"; id: number; message: string };
