// Entry of a batch worker thread: registers the TypeScript loader (as src/cli/taut.mjs does), then loads the worker.
import { register } from "tsx/esm/api";

register();
await import("./workerMain.ts");
