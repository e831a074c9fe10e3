/**
 * Sensitivity: which input moves the start's margin most. Each input is nudged by a step a driver or
 * dispatcher would recognise as a plausible error or change, and the margin of the limits known before any
 * dynamics (adhesion and power along the start, brake holding: decision.ts) is compared with the case's own.
 */
import { staticCheck } from "./staticCheck.js";
import { quasiStaticLimits } from "./decision.js";
import { marginalBound, plannerContext } from "./context.js";
import type { AdhesionTable } from "../physics/types.js";
import type { StartCase } from "../train/types.js";
import type { SensitivityInput, SensitivityRow } from "./types.js";

export type { SensitivityInput, SensitivityRow } from "./types.js";

/** Nudges: +10 % trailing mass, −10 % adhesion, +1 ‰ gradient everywhere, +25 mm slack per coupling. */
export function sensitivity(c: StartCase): SensitivityRow[] {
  const base = staticCheck(c);
  const nudged: Array<[SensitivityInput, string, StartCase]> = [
    ["mass", "+10 % trailing mass", { ...c, train: { ...c.train, trailingMassKg: c.train.trailingMassKg * 1.1 } }],
    ["adhesion", "−10 % adhesion", { ...c, adhesion: scaleAdhesion(c.adhesion, 0.9) }],
    [
      "grade",
      "+1 ‰ gradient",
      { ...c, location: { ...c.location, track: { segments: c.location.track.segments.map((s) => ({ ...s, gradePermille: s.gradePermille + 1 })) } } },
    ],
    ["slack", "+25 mm slack per coupling", { ...c, train: { ...c.train, couplerSlackM: c.train.couplerSlackM + 0.025 } }],
  ];
  const before = quasiStaticMargin(c);
  const rows = nudged.map(([input, change, x]) => {
    const s = staticCheck(x);
    return { input, change, marginBefore: before, marginAfter: quasiStaticMargin(x), stretchTravelChangeM: s.stretchTravelM - base.stretchTravelM };
  });
  return rows.sort((a, b) => Math.abs(b.marginAfter - b.marginBefore) - Math.abs(a.marginAfter - a.marginBefore));
}

function scaleAdhesion(t: AdhesionTable, f: number): AdhesionTable {
  const out = {} as AdhesionTable;
  for (const [k, v] of Object.entries(t) as Array<[keyof AdhesionTable, AdhesionTable[keyof AdhesionTable]]>) out[k] = { ...v, median: v.median * f, sanded: v.sanded * f };
  return out;
}

/** The smallest margin of the limits known before any dynamics, on the rail at the slip-risk threshold. */
export function quasiStaticMargin(c: StartCase): number {
  return Math.min(...quasiStaticLimits(plannerContext(c), marginalBound(c.settings)).limits.map((l) => l.margin));
}
