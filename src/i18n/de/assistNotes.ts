/** German: an assistance option's note (see en/assistNotes.ts and glossary.de.md). */
import type { assistNotes } from "../en/assistNotes.js";
import { translation } from "../messages.js";

export const assistNotesDe = translation<typeof assistNotes.en>()({
  noteAllAtHead: "Alle Zugkraft an der Spitze: die vorderen Kupplungen tragen den Zug des ganzen Zuges.",
  noteUnitsMany: "Die zusätzlichen Loks ({list}) arbeiten {control}.",
  noteUnitOne: "Die zusätzliche Lok {place} arbeitet {control}.",
  noteUnitsSame: "Die {count} zusätzlichen Loks {place} arbeiten {control}.",
  noteCountAt: "{count} {place}",
  atHead: "an der Spitze",
  atRear: "am Schluss",
  atAfterWagon: "nach Wagen {wagon}",
  controlWithHead: "im Gleichtakt mit der Spitze (gleiche Fahrstufe)",
  controlRemote: "als ferngesteuerte Lok (eigene Fahrstufe, vom Führerstand an der Spitze gestellt)",
  controlHelper: "als Schiebelok (eigener Triebfahrzeugführer; jeder Fahrstufenwechsel per Funk von der Spitze angesagt)",
  notePeak: "Höchste Druckkraft {peak} {where} (Kupplung {coupling} von {couplings}).",
  nearHead: "nahe der Spitze",
  midTrain: "in Zugmitte",
  nearRear: "nahe dem Schluss",
  noteShoving: "Nachschieben erhöht die Druckkraft vor den schiebenden Loks: in Bögen auf Querkräfte achten, besonders mit leichten Wagen nahe der Spitze.",
});
