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
import type { SensitivityChange, SensitivityInput, SensitivityRow } from "./types.js";

export type { SensitivityChange, SensitivityInput, SensitivityRow } from "./types.js";

/** The nudges: +10 % trailing mass, −10 % adhesion, +1 ‰ gradient everywhere, +25 mm slack per coupling. */
export const SENSITIVITY_NUDGES = {
  mass: { code: "mass", fraction: 0.1 },
  adhesion: { code: "adhesion", fraction: -0.1 },
  grade: { code: "grade", gradient: 0.001 },
  slack: { code: "slack", perCouplingM: 0.025 },
} as const satisfies { [K in SensitivityInput]: Extract<SensitivityChange, { code: K }> };

export function sensitivity(c: StartCase): SensitivityRow[] {
  const base = staticCheck(c);
  const n = SENSITIVITY_NUDGES;
  const nudged: Array<[SensitivityInput, SensitivityChange, StartCase]> = [
    ["mass", n.mass, { ...c, train: { ...c.train, trailingMassKg: c.train.trailingMassKg * (1 + n.mass.fraction) } }],
    ["adhesion", n.adhesion, { ...c, adhesion: scaleAdhesion(c.adhesion, 1 + n.adhesion.fraction) }],
    [
      "grade",
      n.grade,
      { ...c, location: { ...c.location, track: { segments: c.location.track.segments.map((s) => ({ ...s, gradePermille: s.gradePermille + n.grade.gradient * 1000 })) } } },
    ],
    ["slack", n.slack, { ...c, train: { ...c.train, couplerSlackM: c.train.couplerSlackM + n.slack.perCouplingM } }],
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
