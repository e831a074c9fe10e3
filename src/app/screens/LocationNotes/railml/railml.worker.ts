/** The railML import worker: reads a railML file off the page's thread and answers stretches of it (handler.ts). */
import { createRailmlHandler } from "./handler.js";
import type { RailmlReply, RailmlRequest } from "./protocol.js";

interface Scope {
  onmessage: ((ev: MessageEvent<RailmlRequest>) => void) | null;
  postMessage(m: RailmlReply): void;
}

const scope = self as unknown as Scope;
const handle = createRailmlHandler((r) => scope.postMessage(r));
scope.onmessage = (ev) => void handle(ev.data);
