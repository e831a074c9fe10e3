/**
 * Words for the dispatcher's screens (Assistance check, Departures, Load table): rail conditions, where
 * added units go, an assistance option and a divided train in a line. Pure; figures in the user's units.
 */
import type { LocoPosition } from "../../../core/train/types.js";
import type { LimitName, Reason } from "../../../core/planner/outcome.js";
import { words } from "../../words.js";
import type { AssistanceOptionData, DivideData } from "../../../worker/protocol.js";
import { show, type UnitSystem } from "../../format.js";

export const REASON_SHORT: Record<Reason, string> = { adhesion: "adhesion", power: "power", coupler: "coupler", distance: "distance", brake: "brake" };

/** The binding limit in words, for beside a margin: "(adhesion)", "(coupler tension)". */
export function limitWord(binding: LimitName | undefined): string {
  return binding ? words.limit(binding) : "";
}

/** "at the head", "at the rear", "after wagon 14". */
export function placeWords(p: LocoPosition): string {
  return typeof p === "string" ? `at the ${p}` : `after wagon ${p.afterWagon}`;
}

const unitsWord = (n: number) => `${n} more unit${n === 1 ? "" : "s"}`;

/** What an option adds, in a line: "1 more unit at the rear", "2 more units: 1 after wagon 9, 1 at the rear". */
export function optionHeadline(o: Pick<AssistanceOptionData, "added" | "units">): string {
  const n = o.added.reduce((s, a) => s + a.count, 0);
  if (o.added.length === 1) return `${unitsWord(n)} ${placeWords(o.added[0]!.position)}`;
  return `${unitsWord(n)}: ${o.added.map((a) => `${a.count} ${placeWords(a.position)}`).join(", ")}`;
}

/** The option as the command line writes it: "1 × id at the rear", "2 × id (1 after wagon 9, 1 at the rear)". */
export function optionLineText(o: Pick<AssistanceOptionData, "added">, profileId: string): string {
  const n = o.added.reduce((s, a) => s + a.count, 0);
  if (o.added.length === 1) return `${n} × ${profileId} ${placeWords(o.added[0]!.position)}`;
  return `${n} × ${profileId} (${o.added.map((a) => `${a.count} ${placeWords(a.position)}`).join(", ")})`;
}

/** More trips than this and dividing is named as hardly practical (the core offers no more than the case's maxDividedParts). */
export const PRACTICAL_TRIPS = 3;

/** The divided train in a line, in the user's units. */
export function divideLine(d: DivideData, units: UnitSystem): string {
  const wagons = (n: number) => `${n} wagon${n === 1 ? "" : "s"}`;
  const line = `Divide the train: take the first ${wagons(d.wagons)} (${show("mass", d.trailingMassKg, units)}), then the remaining ${wagons(d.remainingWagons)} (${show("mass", d.remainingMassKg, units)}) — about ${d.trips} trips.`;
  return d.trips > PRACTICAL_TRIPS ? `${line} Hardly practical: think of other locomotives, or another time or place.` : line;
}
