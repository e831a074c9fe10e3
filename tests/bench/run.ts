/**
 * `npm run bench`: prints the speed and size figures the issues set targets for, and at the end each target
 * of issue 14 with its figure and ratio. Figures, not assertions — this machine is shared and noisy; compare
 * ratios within one run.
 *   --quick   skip the slow comparison with the general-purpose integrator; 100 all-different departures
 *             instead of 500 (the figure is scaled); the assistance search on 24 departures instead of 60; the pool's
 *             order of work on 40 departures instead of 100; the mass searches' tail and the floor of a verified
 *             departure on 30 departures instead of 100
 */
import { availableParallelism, loadavg } from "node:os";
import { benchDynamics } from "./dynamics.js";
import { benchPlanner } from "./planner.js";
import { run as benchStartup } from "./startup.js";
import { run as benchBatch } from "./batch.js";
import { benchBatchPool } from "./batchPool.js";
import { benchAssistance } from "./assistance.js";
import { benchMassJudgements, benchVerifiedFloor } from "./massJudgements.js";
import { run as benchBundle } from "./bundle.js";
import { run as benchFirstPlan } from "./firstPlan.js";
import { run as benchNotesLibrary } from "./notesLibrary.js";
import { benchReview } from "./review.js";
import { printTargets } from "./util.js";

const quick = process.argv.includes("--quick");
console.log(`Taut benchmarks — Node ${process.version}, ${availableParallelism()} cores, load ${loadavg().map((x) => x.toFixed(1)).join(" ")}, ${new Date().toISOString()}`);
benchDynamics({ compare: !quick });
benchPlanner();
benchReview();
benchStartup();
benchBatch();
benchBatchPool(quick ? 40 : 100);
benchMassJudgements(quick ? 16 : 40);
benchVerifiedFloor(quick ? 30 : 100);
benchAssistance(quick ? 24 : 60);
await benchBundle();
await benchFirstPlan();
await benchNotesLibrary();
printTargets();
