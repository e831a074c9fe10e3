/**
 * The shapes of a consist — its vehicles, couplings and control groups — apart from the code that builds
 * one (consist.ts), so that the lumped consist (lumped.ts), which consist.ts builds inside its scope, can name
 * them without an import circle.
 */
import type { CouplingSpec } from "../physics/coupling.js";
import type { DavisCoefficients } from "../physics/resistance.js";
import type { LocoPosition, UnitControl } from "./types.js";
import type { LocomotiveSpec, WagonSpec } from "../physics/types.js";

export interface Vehicle {
  kind: "locomotive" | "wagon";
  /** Head-to-tail index. */
  index: number;
  massKg: number;
  /** Mass including the rotating-mass allowance, kg. */
  effectiveMassKg: number;
  lengthM: number;
  axles: number;
  davis: DavisCoefficients;
  /** Resistance to be overcome at rest (breakaway), N; never below the Davis constant term. */
  breakawayN: number;
  /** The locomotive's profile, for powered vehicles. */
  loco?: LocomotiveSpec;
  /** Chainage of the vehicle's centre when standing, m. */
  centreChainageM: number;
  /** Wagons: the number from the head (1-based) and the type. */
  wagonNumber?: number;
  wagon?: WagonSpec;
}

/**
 * Units whose notch is set together: the head's (its units and every `with-head` unit) and each
 * `remote` or `helper` entry of the case on its own.
 */
export interface ControlGroup {
  control: UnitControl;
  position: LocoPosition;
  /** Indices into the powered units (`locoIndices`) of the units in the group. */
  units: number[];
}

export interface Consist {
  vehicles: Vehicle[];
  /** couplings[j] joins vehicles j and j+1. */
  couplings: CouplingSpec[];
  /** Indices of powered vehicles. */
  locoIndices: number[];
  /** Overall length, m. */
  lengthM: number;
  /** Mean wagon mass, kg. */
  wagonMassKg: number;
  /** Control groups; the first is the head's (its notch is the plan's notch). */
  controlGroups: ControlGroup[];
  /** The control group of each powered unit. */
  unitGroup: number[];
}
