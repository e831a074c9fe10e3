/**
 * `npm run bench`: prints the speed and size figures the issues set targets for. Figures, not assertions —
 * this machine is shared and noisy; compare ratios within one run.
 *   --quick   skip the slow comparison with the general-purpose integrator
 */
import { existsSync } from "node:fs";
import { benchDynamics } from "./dynamics.js";
import { benchPlanner } from "./planner.js";

const quick = process.argv.includes("--quick");
console.log(`Taut benchmarks — Node ${process.version}, ${new Date().toISOString()}`);
benchDynamics({ compare: !quick });
benchPlanner();
const extras = ["./batch.ts", "./bundle.ts"];
for (const file of extras) {
  if (existsSync(new URL(file, import.meta.url))) {
    const mod = (await import(file)) as { run?: () => Promise<void> | void };
    if (mod.run) await mod.run();
  }
}
