/** The words of an answer: whether a train starts, which limits decide it, and how it is started. */
import type { BandWhat, LimitWhat } from "./limitLines.js";

export type Verdict = "starts" | "marginal" | "needs-assistance";
/** The reason a limit reports under: adhesion, power (and time to target), coupler, distance, brake (holding). */
export type Reason = "adhesion" | "power" | "coupler" | "distance" | "brake";
/** How the train gets moving: by power, or by gravity once its brakes are eased (a falling grade). */
export type StartKind = "power" | "gravity";

/** The limits a start is judged against (decision.ts). */
export type LimitName = "adhesion" | "power" | "brake-holding" | "coupler-tension" | "coupler-compression" | "wheel-climb" | "distance" | "time-to-target";
export type LimitLevel = "within" | "soft" | "over";

/** The reason word each limit reports under (the verdict's reasons). */
export const LIMIT_REASON: Record<LimitName, Reason> = {
  adhesion: "adhesion",
  power: "power",
  "brake-holding": "brake",
  "coupler-tension": "coupler",
  "coupler-compression": "coupler",
  "wheel-climb": "coupler",
  distance: "distance",
  "time-to-target": "power",
};

/** A limit in a few words, as printed beside a margin ("margin 0.93 (adhesion)"). */
export const LIMIT_WORDS: Record<LimitName, string> = {
  adhesion: "adhesion",
  power: "power",
  "brake-holding": "brake holding",
  "coupler-tension": "coupler tension",
  "coupler-compression": "coupler compression",
  "wheel-climb": "wheel climb",
  distance: "distance",
  "time-to-target": "time to target",
};

/** One named check of a demand against its allowance. */
export interface LimitCheck {
  name: LimitName;
  reason: Reason;
  /** Unit of demand and allowance: force (N), distance (m), time (s) or a ratio (L/V). */
  unit: "N" | "m" | "s" | "ratio";
  demand: number;
  allowance: number;
  /** allowance ÷ demand (capped at 99; 99 when nothing is demanded). */
  margin: number;
  /** "within" ⇔ margin ≥ 1; "soft" when exceeded but inside its band; "over" otherwise. */
  level: LimitLevel;
  /** The band within which exceeding the allowance is marginal: soft ⇔ band.allowance ≥ band.demand. */
  band: { demand: number; allowance: number; what: BandWhat } | null;
  /** Where or what, as a code with its figures (lines.ts). */
  what: LimitWhat;
}
