/**
 * The physics' typed, SI-valued view of one vehicle and what it stands on: rail conditions and their
 * adhesion, the locomotive and wagon specs, the track profile. `src/profiles` converts files into these.
 */

export const RAIL_CONDITIONS = ["dry", "damp", "wet", "frost", "leaves", "greasy"] as const;
export type RailCondition = (typeof RAIL_CONDITIONS)[number];

export type Bearing = "roller" | "plain";
export type CouplingKind = "knuckle" | "screw";

/** Adhesion of one rail condition: median at standstill without and with sand, and spread σ of ln μ. */
export interface AdhesionCondition {
  median: number;
  sanded: number;
  sigmaLn: number;
}
export type AdhesionTable = Record<RailCondition, AdhesionCondition>;

/** A diesel-electric locomotive, SI values (see INTERFACE.md for the file form). */
export interface LocomotiveSpec {
  id: string;
  label: string;
  massKg: number;
  adhesiveMassKg: number;
  lengthM: number;
  axles: number;
  railPowerW: number;
  /** Fraction of rail power in notch n (index n-1). */
  notchPower: readonly number[];
  /** Fraction of the starting tractive effort (current limit) in notch n (index n-1). */
  notchStartingEffort: readonly number[];
  startingTractiveEffortN: number;
  continuousTractiveEffortN: number;
  continuousSpeedMps: number;
  maxSpeedMps: number;
  sanders: boolean;
  /** Fraction of the adhesive weight usable before the most unloaded axle slips (weight transfer). */
  adhesionUtilisation: number;
  /** Rotating-mass allowance γ: effective mass = m·(1+γ). */
  rotatingMassFraction: number;
  frontalAreaM2: number;
  /** Optional override of the breakaway resistance, N per kN of weight (‰). */
  startingResistancePermille?: number;
  /** What the locomotive (independent) brake holds, N; default 15 % of the unit's weight (`locoBrakeHoldingN`). */
  locoBrakeHoldingN?: number;
}

/** One wagon type (a train of one type, or one group of a mixed train). */
export interface WagonSpec {
  id: string;
  label: string;
  axles: number;
  lengthM: number;
  frontalAreaM2: number;
  coupling: CouplingKind;
  /** Rotating-mass allowance γ; when absent it follows the axle load (Webb §120). */
  rotatingMassFraction?: number;
  /** Davis velocity coefficient b (lb per short ton per mph); default 0.045 for freight cars. */
  davisB?: number;
  /** Davis air coefficient K (lb per ft² per mph²); default 0.0005. */
  davisK?: number;
  /** Optional override of the breakaway resistance, N per kN of weight (‰). */
  startingResistancePermille?: number;
  /** Mass of the empty wagon, kg, where known: a mixed train's largest-mass search scales the load above it. */
  tareKg?: number;
}

/** A piece of track with constant gradient and curvature; chainage grows in the direction of travel. */
export interface TrackSegment {
  startM: number;
  lengthM: number;
  /** Rise per thousand along the direction of travel (negative falls). */
  gradePermille: number;
  /** Curve radius, m; 0 means straight. */
  curveRadiusM: number;
}

export interface TrackProfile {
  segments: readonly TrackSegment[];
}

export interface Conditions {
  rail: RailCondition;
  sand: boolean;
  temperatureC: number;
}
