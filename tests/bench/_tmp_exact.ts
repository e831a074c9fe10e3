import { isDeepStrictEqual } from "node:util";
import { planStart } from "../../src/core/planner/index.js";
import { setActiveOnlyStepping } from "../../src/core/dynamics/dynamics.js";
import { seededDepartures } from "../tools/departures.js";
import { longTrainCase } from "./dynamics.js";
import { fortyWagonCase } from "./planner.js";
let bad = 0;
const cases = [...seededDepartures(40, 200), longTrainCase(), fortyWagonCase()];
for (const c of cases) {
  setActiveOnlyStepping(false);
  const a = planStart(c, process.argv.includes("--mass") ? {} : { skipMassSearch: true });
  setActiveOnlyStepping(true);
  const b = planStart(c, process.argv.includes("--mass") ? {} : { skipMassSearch: true });
  if (!isDeepStrictEqual(a, b)) { bad++; console.log("DIFF", c.train.wagons); }
}
console.log("cases", cases.length, "differ", bad);
