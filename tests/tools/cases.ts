/**
 * Start cases built directly in the core's SI types, for reference and property tests that need to
 * control every input (no files, no library). Values here are test inputs, not defaults of the program.
 */
import {
  DEFAULT_SETTINGS,
  RAIL_CONDITIONS,
  uniformTrack,
  type AdhesionTable,
  type LocoGroup,
  type LocomotiveSpec,
  type StartCase,
  type WagonSpec,
} from "../../src/core/index.js";

/** A plain locomotive with one notch; override any field. */
export function testLoco(over: Partial<LocomotiveSpec> = {}): LocomotiveSpec {
  return {
    id: "test-loco",
    label: "Test locomotive (not a real class)",
    massKg: 84_000,
    adhesiveMassKg: 84_000,
    lengthM: 16,
    axles: 4,
    railPowerW: 1e9,
    notchPower: [1],
    notchStartingEffort: [1],
    startingTractiveEffortN: 300_000,
    continuousTractiveEffortN: 200_000,
    continuousSpeedMps: 5,
    maxSpeedMps: 30,
    sanders: true,
    adhesionUtilisation: 0.85,
    rotatingMassFraction: 0.15,
    frontalAreaM2: 10,
    ...over,
  };
}

/** A four-axle bogie wagon; override any field. */
export function testWagon(over: Partial<WagonSpec> = {}): WagonSpec {
  return { id: "test-wagon", label: "Test wagon", axles: 4, lengthM: 15, frontalAreaM2: 8.2, coupling: "knuckle", ...over };
}

/** The same adhesion for every rail condition: μ so high and σ so small that adhesion never limits. */
export function ampleAdhesion(mu = 10, sigmaLn = 0.01): AdhesionTable {
  return Object.fromEntries(RAIL_CONDITIONS.map((r) => [r, { median: mu, sanded: mu, sigmaLn }])) as AdhesionTable;
}

export interface UniformCaseInput {
  locos?: LocoGroup[];
  trailingMassKg?: number;
  wagons?: number;
  wagon?: WagonSpec;
  gradePermille?: number;
  curveRadiusM?: number;
  adhesion?: AdhesionTable;
  couplerLimitN?: number;
  clearAheadM?: number;
}

/** A train standing on uniform track (same grade and curve under every vehicle). */
export function uniformCase(i: UniformCaseInput = {}): StartCase {
  const wagons = i.wagons ?? 40;
  const wagon = i.wagon ?? testWagon();
  return {
    locomotives: i.locos ?? [{ spec: testLoco(), count: 1, position: "head" }],
    train: {
      trailingMassKg: i.trailingMassKg ?? 2_000_000,
      wagons,
      lengthM: wagons * wagon.lengthM,
      couplerSlackM: 0.05,
      bearing: "roller",
      couplerLimitN: i.couplerLimitN ?? 970_000,
      coupling: wagon.coupling,
      wagon,
      slackState: "from-profile",
    },
    location: { track: uniformTrack(i.gradePermille ?? 0, i.curveRadiusM ?? 0), frontAtM: 0, clearAheadM: i.clearAheadM ?? 1000 },
    conditions: { rail: "dry", sand: false, temperatureC: 10 },
    target: { kind: "speed", speedMps: 5 },
    adhesion: i.adhesion ?? ampleAdhesion(),
    settings: DEFAULT_SETTINGS,
  };
}
