/** Hungarian: a mixed train's wagon groups on Start plan (loaded with their form) (see en/groups.ts). */
import type { groups } from "../en/groups.js";
import { translation } from "../messages.js";

export const groupsHu = translation<typeof groups.en>()({
  wagonGroups: "Kocsicsoportok, a vonat elejétől",
  groupMass: "A csoport tömege",
  addWagonGroup: "Kocsicsoport hozzáadása",
  totals: { one: "Összesen: {count} kocsi, {mass}", other: "Összesen: {count} kocsi, {mass}" },
  totalsLength: ", {length} hosszú",
  totalsNote: ". A legnagyobb tömeg adatai minden csoport önsúly feletti rakományát arányosan növelik.",
});
