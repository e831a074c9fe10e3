/** Hungarian: an assistance option's note (see en/assistNotes.ts and glossary.hu.md). */
import type { assistNotes } from "../en/assistNotes.js";
import { translation } from "../messages.js";

export const assistNotesHu = translation<typeof assistNotes.en>()({
  noteAllAtHead: "Minden vonóerő elöl: a vonat elején levő kapcsolások viszik az egész vonat húzóerejét.",
  noteUnitsMany: "A hozzáadott mozdonyok ({list}) így dolgoznak: {control}.",
  noteUnitOne: "A hozzáadott mozdony ({place}) így dolgozik: {control}.",
  noteUnitsSame: "A(z) {count} hozzáadott mozdony ({place}) így dolgozik: {control}.",
  noteCountAt: "{count} {place}",
  atHead: "elöl",
  atRear: "hátul",
  atAfterWagon: "a(z) {wagon}. kocsi után",
  controlWithHead: "együtt az elöl levővel (ugyanaz a fokozat)",
  controlRemote: "távvezérelt vontatóként (saját fokozat, az elöl levő vezetőállásból állítva)",
  controlHelper: "tolómozdonyként (saját mozdonyvezetővel; minden fokozatváltást rádión jeleznek az elöl levő mozdonyról)",
  notePeak: "Legnagyobb nyomóerő {peak} {where} ({coupling}. kapcsolás a(z) {couplings} közül).",
  nearHead: "a vonat elején",
  midTrain: "a vonat közepén",
  nearRear: "a vonat végén",
  noteShoving: "A hátulról tolás megnöveli a nyomóerőt a toló mozdonyok előtt: ívekben figyeljen az oldalirányú erőkre, különösen ha könnyű kocsik vannak a vonat elején.",
});
