/**
 * The core's typed, SI-valued view of a start case. Files use units in their field names
 * (mass_t, force_kN); `src/profiles` converts them into these shapes once, at the boundary.
 */

import type { AdhesionTable, Bearing, Conditions, CouplingKind, LocomotiveSpec, TrackProfile, WagonSpec } from "../physics/types.js";

export type SlackState = "bunched" | "stretched" | "from-profile";
export type LocoPosition = "head" | "rear" | { afterWagon: number };

/**
 * How a group of units is driven: `with-head` in multiple with the head (the head's notch), `remote`
 * (distributed power: its own notch, set from the head cab) or `helper` (its own driver, coordinated by
 * radio or signal).
 */
export type UnitControl = "with-head" | "remote" | "helper";
export const UNIT_CONTROLS: readonly UnitControl[] = ["with-head", "remote", "helper"];

export interface LocoGroup {
  spec: LocomotiveSpec;
  count: number;
  position: LocoPosition;
  /** Default: `with-head` at the head, `remote` mid-train and at the rear (`controlOf`). */
  control?: UnitControl;
}

/** The control of a group of units, its default filled in. */
export function controlOf(g: LocoGroup): UnitControl {
  return g.control ?? (g.position === "head" ? "with-head" : "remote");
}

/** Wagons of one type and one load in a mixed train, in order from the head. */
export interface WagonGroup {
  wagons: number;
  wagon: WagonSpec;
  /** The group's total mass, kg. */
  massKg: number;
}

export interface TrainSpec {
  /**
   * Trailing mass, kg. With `groups` it is their sum as given; a different figure (the largest-mass search,
   * a sensitivity nudge) scales the load above tare of every group in proportion (`groupMassesKg`).
   */
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
  /** The wagon type (with `groups`: the first group's). */
  wagon: WagonSpec;
  slackState: SlackState;
  /** A mixed train: wagon groups in order from the head (wagons and length are then their sums). */
  groups?: readonly WagonGroup[];
  /** Working limit of the weakest coupling in buff (compression), N; default the working limit in draft. */
  couplerBuffLimitN?: number;
}

export interface Location {
  track: TrackProfile;
  /** Chainage of the front of the standing train, m. */
  frontAtM: number;
  /** Distance clear ahead of the front, m. */
  clearAheadM: number;
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
  /**
   * Highest slip risk of the needed effort that still counts as "marginal" rather than "needs assistance"
   * (probability, at least the threshold): a start that only works if the rail is no worse than this
   * quantile of its condition is marginal.
   */
  marginalSlipRisk: number;
  /** Most parts a train may be divided into when dividing is offered (a practical number of trips). */
  maxDividedParts: number;
}

export const DEFAULT_SETTINGS: Settings = {
  // [M] a working limit ÷ 1.2 leaves room for the scatter the model does not capture (uneven slack, gear wear).
  couplerSafetyFactor: 1.2,
  slipRiskThreshold: 0.1,
  // Common practice: about 1 mph until the whole train moves (NAVFAC P-301).
  stretchSpeedMps: 0.44704,
  // [M] One start in four failing is as far as "marginal" goes: beyond that the train needs help. A briefing
  // can cover a thin margin; it cannot cover odds worse than that.
  marginalSlipRisk: 0.25,
  // Common practice: dividing ("doubling") means coming back for the rest; more than three trips is no
  // longer a practical way to move the train.
  maxDividedParts: 3,
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
