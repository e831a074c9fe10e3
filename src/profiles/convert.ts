/**
 * From validated files (units in field names) to the core's SI types. The only place file values
 * are converted; the core trusts what it receives.
 */
import { DEFAULT_LOCO_FRONTAL_AREA_M2, DEFAULT_WAGON_FRONTAL_AREA_M2 } from "../core/physics/davisDefaults.js";
import { kmhToMps, kNToN, tonnesToKg } from "../core/physics/units.js";
import type { AdhesionTable, LocomotiveSpec, TrackProfile, WagonSpec } from "../core/physics/types.js";
import type { Location } from "../core/train/types.js";
import type { LocationNoteFile, LocomotiveFile, RailConditionsFile, SegmentFile, WagonFile } from "./schemas.js";

/** Adhesion utilisation of bogie DC locomotives when pulling [M], PHYSICS.md §2. */
export const DEFAULT_ADHESION_UTILISATION = 0.85;
/** Rotating-mass allowance of a diesel-electric locomotive (geared traction motors) [M]. */
export const DEFAULT_LOCO_ROTATING_FRACTION = 0.15;

export function locomotiveFromFile(f: LocomotiveFile): LocomotiveSpec {
  const spec: LocomotiveSpec = {
    id: f.id,
    label: f.label,
    massKg: tonnesToKg(f.mass_t),
    adhesiveMassKg: tonnesToKg(f.adhesiveMass_t),
    lengthM: f.length_m,
    // Without a count, assume axle loads near 20 t.
    axles: f.axles ?? Math.max(4, Math.round(f.adhesiveMass_t / 20)),
    railPowerW: f.railPower_kW * 1000,
    notchPower: [...f.notchPower],
    notchStartingEffort: [...f.notchStartingEffort],
    startingTractiveEffortN: kNToN(f.startingTractiveEffort_kN),
    continuousTractiveEffortN: kNToN(f.continuousTractiveEffort_kN),
    continuousSpeedMps: kmhToMps(f.continuousSpeed_kmh),
    maxSpeedMps: kmhToMps(f.maxSpeed_kmh),
    sanders: f.sanders,
    adhesionUtilisation: f.adhesionUtilisation ?? DEFAULT_ADHESION_UTILISATION,
    rotatingMassFraction: f.rotatingMassFraction ?? DEFAULT_LOCO_ROTATING_FRACTION,
    frontalAreaM2: f.frontalArea_m2 ?? DEFAULT_LOCO_FRONTAL_AREA_M2,
  };
  if (f.startingResistance_permille !== undefined) spec.startingResistancePermille = f.startingResistance_permille;
  if (f.locomotiveBrakeHolding_kN !== undefined) spec.locoBrakeHoldingN = kNToN(f.locomotiveBrakeHolding_kN);
  return spec;
}

export interface WagonType extends WagonSpec {
  defaultSlackM: number;
  tareKg: number;
  maxGrossKg: number;
}

export function wagonFromFile(f: WagonFile): WagonType {
  const w: WagonType = {
    id: f.id,
    label: f.label,
    axles: f.axles,
    lengthM: f.length_m,
    frontalAreaM2: f.frontalArea_m2,
    coupling: f.coupling,
    defaultSlackM: f.defaultSlack_mm / 1000,
    tareKg: tonnesToKg(f.tare_t),
    maxGrossKg: tonnesToKg(f.maxGross_t),
  };
  if (f.rotatingMassFraction !== undefined) w.rotatingMassFraction = f.rotatingMassFraction;
  if (f.davisB !== undefined) w.davisB = f.davisB;
  if (f.davisK !== undefined) w.davisK = f.davisK;
  if (f.startingResistance_permille !== undefined) w.startingResistancePermille = f.startingResistance_permille;
  return w;
}

/** A plain four-axle bogie wagon for trains that name no wagon type. */
export function genericWagon(coupling: "knuckle" | "screw", lengthM: number): WagonSpec {
  return { id: "generic-bogie", label: "Bogie wagon", axles: 4, lengthM, frontalAreaM2: DEFAULT_WAGON_FRONTAL_AREA_M2, coupling };
}

export function adhesionFromFile(f: RailConditionsFile): AdhesionTable {
  const c = f.conditions;
  const pick = (e: { median: number; sanded: number; sigmaLn: number }) => ({ median: e.median, sanded: e.sanded, sigmaLn: e.sigmaLn });
  return { dry: pick(c.dry), damp: pick(c.damp), wet: pick(c.wet), frost: pick(c.frost), leaves: pick(c.leaves), greasy: pick(c.greasy) };
}

export function trackFromSegments(segs: readonly SegmentFile[]): TrackProfile {
  return {
    segments: segs.map((s) => ({ startM: s.from_m, lengthM: s.length_m, gradePermille: s.gradient_permille, curveRadiusM: s.curveRadius_m })),
  };
}

export function locationFromNote(n: Pick<LocationNoteFile, "segments" | "frontAt_m" | "clearAhead_m">): Location {
  return { track: trackFromSegments(n.segments), frontAtM: n.frontAt_m, clearAheadM: n.clearAhead_m };
}
