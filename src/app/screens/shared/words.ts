/**
 * Words for the dispatcher's screens (Assistance check, Departures, Load table): rail conditions, where
 * added units go, an assistance option and a divided train in a line. Pure; figures in the user's units.
 */
import type { LocoPosition } from "../../../core/train/types.js";
import type { LimitName } from "../../../core/planner/outcome.js";
import { words } from "../../words.js";
import type { AssistanceOptionData, DivideData } from "../../../worker/protocol.js";
import { show, type UnitSystem } from "../../format.js";
import { dispatch } from "../../../i18n/en/dispatch.js";
import { tr } from "../../i18n.js";

const t = tr.ns(dispatch);

/** The binding limit in words, for beside a margin: "(adhesion)", "(coupler tension)". */
export function limitWord(binding: LimitName | undefined): string {
  return binding ? words.limit(binding) : "";
}

/** "at the head", "at the rear", "after wagon 14". */
export function placeWords(p: LocoPosition): string {
  return typeof p === "string" ? (p === "head" ? t("atHead") : t("atRear")) : t("afterWagon", { wagon: p.afterWagon });
}

const unitsWord = (n: number) => t("moreUnits", { count: n });

/** What an option adds, in a line: "1 more unit at the rear", "2 more units: 1 after wagon 9, 1 at the rear". */
export function optionHeadline(o: Pick<AssistanceOptionData, "added" | "units">): string {
  const n = o.added.reduce((s, a) => s + a.count, 0);
  if (o.added.length === 1) return `${unitsWord(n)} ${placeWords(o.added[0]!.position)}`;
  return `${unitsWord(n)}: ${o.added.map((a) => `${a.count} ${placeWords(a.position)}`).join(", ")}`;
}

/** A place in English, as files (CSV) carry it whatever the language on screen. */
function placeWordsEn(p: LocoPosition): string {
  return typeof p === "string" ? `at the ${p}` : `after wagon ${p.afterWagon}`;
}

/** The option as the command line writes it (in English: it goes into the departures CSV): "1 × id at the rear", "2 × id (1 after wagon 9, 1 at the rear)". */
export function optionLineText(o: Pick<AssistanceOptionData, "added">, profileId: string): string {
  const n = o.added.reduce((s, a) => s + a.count, 0);
  if (o.added.length === 1) return `${n} × ${profileId} ${placeWordsEn(o.added[0]!.position)}`;
  return `${n} × ${profileId} (${o.added.map((a) => `${a.count} ${placeWordsEn(a.position)}`).join(", ")})`;
}

/** More trips than this and dividing is named as hardly practical (the core offers no more than the case's maxDividedParts). */
export const PRACTICAL_TRIPS = 3;

/** The divided train in a line, in the user's units. */
export function divideLine(d: DivideData, units: UnitSystem): string {
  const wagons = (n: number) => t("wagons", { count: n });
  const line = t("divide", { first: wagons(d.wagons), firstMass: show("mass", d.trailingMassKg, units), rest: wagons(d.remainingWagons), restMass: show("mass", d.remainingMassKg, units), trips: d.trips });
  return d.trips > PRACTICAL_TRIPS ? line + t("hardlyPractical") : line;
}
