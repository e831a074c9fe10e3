/** German: a mixed train's wagon groups on Start plan (loaded with their form) (see en/groups.ts). */
import type { groups } from "../en/groups.js";
import { translation } from "../messages.js";

export const groupsDe = translation<typeof groups.en>()({
  wagonGroups: "Wagengruppen, von der Spitze an",
  groupMass: "Masse der Gruppe",
  addWagonGroup: "Wagengruppe hinzufügen",
  totals: { one: "Insgesamt: {count} Wagen, {mass}", other: "Insgesamt: {count} Wagen, {mass}" },
  totalsLength: ", {length} lang",
  totalsNote: ". Die Werte der größten Masse skalieren die Zuladung jeder Gruppe über dem Leergewicht anteilig.",
});
