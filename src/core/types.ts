/**
 * The core's typed, SI-valued view of a start case. Files use units in their field names
 * (mass_t, force_kN); `src/profiles` converts them into these shapes once, at the boundary.
 */

export const RAIL_CONDITIONS = ["dry", "damp", "wet", "frost", "leaves", "greasy"] as const;
export type RailCondition = (typeof RAIL_CONDITIONS)[number];

export type Bearing = "roller" | "plain";
export type CouplingKind = "knuckle" | "screw";
export type SlackState = "bunched" | "stretched" | "from-profile";
export type Verdict = "starts" | "marginal" | "needs-assistance";
export type Reason = "adhesion" | "power" | "coupler" | "distance";

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
}

/** One wagon type (all wagons of a train share it). */
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
}

export type LocoPosition = "head" | "rear" | { afterWagon: number };

export interface LocoGroup {
  spec: LocomotiveSpec;
  count: number;
  position: LocoPosition;
}

export interface TrainSpec {
  trailingMassKg: number;
  wagons: number;
  /** Length of the trailing load (wagons only), m. */
  lengthM: number;
  /** Free slack per coupling, m. */
  couplerSlackM: number;
  bearing: Bearing;
  /** Working limit of the weakest coupling, N. */
  couplerLimitN: number;
  coupling: CouplingKind;
  wagon: WagonSpec;
  slackState: SlackState;
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

export interface Location {
  track: TrackProfile;
  /** Chainage of the front of the standing train, m. */
  frontAtM: number;
  /** Distance clear ahead of the front, m. */
  clearAheadM: number;
}

export interface Conditions {
  rail: RailCondition;
  sand: boolean;
  temperatureC: number;
}

export type Target = { kind: "speed"; speedMps: number } | { kind: "distance"; distanceM: number };

/** Settings that shape verdicts and plans; defaults in `DEFAULT_SETTINGS`. */
export interface Settings {
  /** Peak coupler force must stay ≤ working limit ÷ this factor. */
  couplerSafetyFactor: number;
  /** Highest acceptable slip risk of any step (probability 0..1). */
  slipRiskThreshold: number;
  /** Locomotive speed to keep while the slack comes out, m/s (common practice: about 1 mph). */
  stretchSpeedMps: number;
}

export const DEFAULT_SETTINGS: Settings = {
  // [M] a working limit ÷ 1.2 leaves room for the scatter the model does not capture (uneven slack, gear wear).
  couplerSafetyFactor: 1.2,
  slipRiskThreshold: 0.1,
  // Common practice: about 1 mph until the whole train moves (NAVFAC P-301).
  stretchSpeedMps: 0.44704,
};

export interface StartCase {
  locomotives: readonly LocoGroup[];
  train: TrainSpec;
  location: Location;
  conditions: Conditions;
  target: Target;
  adhesion: AdhesionTable;
  settings: Settings;
}
