/**
 * Writes the illustrative demo recording shipped in profiles/recordings/: the aggregate demo case's train
 * made 12 % heavier than its papers say, driven by the plan's own steps through `taut simulate`'s function,
 * resampled at 1 Hz and written as GPX with ±2 m noise. Invented data, for trying Start review only.
 * Run: node_modules/.bin/tsx tests/tools/demo-recording.ts
 */
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { planSequence, planStart, scaledCase } from "../../src/core/index.js";
import { builtinCaseJson, builtinLibrary } from "../../src/profiles/builtin.js";
import { parseStartCase } from "../../src/profiles/parse.js";
import { gpxText, simulatedStart } from "./recordings.js";

const json = builtinCaseJson.find((j) => (j as { id: string }).id === "demo-aggregate-ashvale");
const parsed = parseStartCase(json, builtinLibrary());
if (!parsed.ok) throw new Error("demo case invalid");
const planned = parsed.value;
const seq = planSequence(planStart(planned, { skipMassSearch: true, skipVerification: true }));
const power = seq.find((e) => e.notch > 0)!.atS;
const run = simulatedStart(scaledCase(planned, { massFactor: 1.12, effortFactor: 1 }), seq, { fromS: Math.max(0, power - 20), extraS: 15 });
const out = fileURLToPath(new URL("../../profiles/recordings/demo-aggregate-ashvale-heavier.gpx", import.meta.url));
writeFileSync(out, gpxText(run, { noiseM: 2, seed: 7, startIso: "2026-11-03T05:40:00Z" }).replace("synthetic start (illustrative)", "Illustrative recorded start: aggregate demo train, 12 % heavier than planned (invented data)"));
console.log(`wrote ${out}: ${run.timeS.length} points`);
