/**
 * What a limit of the decision checked (decision.ts), as a code with its figures in SI, and the band within
 * which exceeding it is marginal. Apart from lines.ts so that outcome.ts can name them without an import
 * circle; the words are in src/i18n/{en,hu,de}/reasons.ts.
 */

/** A vehicle of the train: a wagon with its number and mass, a locomotive unit by its number, else its place. */
export type VehicleRef = { kind: "wagon"; number: number; massKg: number } | { kind: "unit"; number: number } | { kind: "vehicle"; number: number };

/** What a limit checked, with its figures. */
export type LimitWhat =
  | { code: "gravity" }
  | { code: "adhesion-path"; quantile: number; availableN: number; needN: number; speedMps: number; travelM: number }
  | { code: "power-path"; availableN: number; needN: number; speedMps: number; travelM: number }
  | { code: "hold-rising"; locoBrakeN: number; powerN: number; pullN: number }
  | { code: "hold-falling"; trainBrakeN: number; locoBrakeN: number; pullN: number }
  | { code: "coupler-tension"; peakN: number; limitN: number; factor: number }
  | { code: "coupler-compression"; peakN: number; limitN: number; factor: number }
  | { code: "wheel-climb"; ratio: number; vehicle: VehicleRef; forceN: number; radiusM: number; allowance: number; nadal: number; nadalMargin: number }
  | { code: "wheel-climb-none" }
  /** `power`: travel to the running notch (else to the whole train moving); `orTarget`: a distance target. */
  | { code: "distance"; travelM: number; power: boolean; orTarget: boolean; clearM: number }
  | { code: "target-reached"; afterS: number }
  | { code: "target-not-reached"; share: number };

/** The band within which a limit exceeded is marginal. */
export type BandWhat =
  | { code: "rail-quantile"; quantile: number }
  | { code: "no-reserve" }
  | { code: "no-reserve-bound" }
  | { code: "working-limit" }
  | { code: "stretch-within-clear" }
  | { code: "nadal-itself" };

