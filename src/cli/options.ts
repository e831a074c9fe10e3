/** Option helpers shared by several commands: --jobs, --helper and the progress lines on stderr. */
import type { LocomotiveSpec } from "../core/physics/types.js";
import type { UnitControl } from "../core/train/types.js";
import type { Library } from "../profiles/library.js";
import type { CheckProgress } from "./batch/checkDepartures.js";
import { defaultPoolSize } from "./batch/pool.js";
import type { Output } from "./command.js";
import { errorWords, InputError } from "./errors.js";
import { quoted } from "../profiles/text.js";
import { cliTr } from "./lang.js";

/** The locomotive profile named by --helper, or undefined for the lead unit's. */
export function helperSpec(lib: Library, id: string | undefined): LocomotiveSpec | undefined {
  if (id === undefined) return undefined;
  const found = lib.locomotives.get(id);
  if (!found) throw new InputError(errorWords()("helperUnknown", { id: quoted(id), list: [...lib.locomotives.keys()].join(", ") }));
  return found.spec;
}

/** --helper-control remote|helper: how units the assistance options add mid-train or at the rear are driven (default remote). */
export function helperControl(v: string | undefined): UnitControl | undefined {
  if (v === undefined) return undefined;
  if (v === "remote" || v === "helper") return v;
  throw new InputError(errorWords()("helperControl", { value: quoted(v) }));
}

/** --jobs N: a whole number from 1 to 64; default the available cores. */
export function jobsOption(v: string | undefined): number {
  if (v === undefined) return defaultPoolSize();
  const n = Number(v);
  if (!Number.isInteger(n) || n < 1 || n > 64) throw new InputError(errorWords()("jobs", { value: quoted(v) }));
  return n;
}

/** Progress lines on stderr: at each tenth of the way, and at most every two seconds otherwise. */
export function progressReporter(io: Output, what: string): (p: CheckProgress) => void {
  const t0 = performance.now();
  let lastTenth = 0;
  let lastAt = t0;
  return ({ done, total }) => {
    const now = performance.now();
    const tenth = Math.floor((10 * done) / total);
    if (done < total && tenth === lastTenth && now - lastAt < 2000) return;
    if (done === total && total === 0) return;
    lastTenth = tenth;
    lastAt = now;
    // The figures as the language writes them (a decimal comma in hu and de); English as it always printed.
    io.err(`taut: ${errorWords()("progress", { done: String(done), total: String(total), what, percent: String(Math.round((100 * done) / total)), time: cliTr().num((now - t0) / 1000, 1) })}`);
  };
}
