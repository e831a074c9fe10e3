import { builtinLibrary, builtinCaseJson } from "../src/profiles/builtin.ts";
import { parseStartCase, formatIssues } from "../src/profiles/index.ts";
import { staticCheck } from "../src/core/index.ts";
const lib = builtinLibrary();
for (const j of builtinCaseJson) {
  const r = parseStartCase(j, lib);
  if (!r.ok) { console.log(formatIssues(r.issues)); continue; }
  const s = staticCheck(r.value);
  console.log((j as any).id, s.verdict, s.reasons, JSON.stringify(s.resistance, (k,v)=> typeof v==='number'? Math.round(v/100)/10: v), "req", (s.requiredN/1000).toFixed(1), "avail", (s.availableN/1000).toFixed(1), "risk", s.slipRiskAtStart.toFixed(3), "peakT", (s.peakTensionN/1000).toFixed(0), "stretch", s.stretchTravelM.toFixed(2), JSON.stringify(s.margins));
}
import { largestStartableMassKg } from "../src/core/index.ts";
for (const j of builtinCaseJson) { const r = parseStartCase(j, lib); if (!r.ok) continue;
 const t0=performance.now(); const m = largestStartableMassKg(r.value, (c)=> staticCheck(c).verdict==='starts'); console.log((j as any).id, "max t", (m/1000).toFixed(1), (performance.now()-t0).toFixed(1),"ms"); }
