/** German: `taut notes` (see en/cliNotes.ts and glossary.de.md). */
import type { cliNotes } from "../en/cliNotes.js";
import { translation } from "../messages.js";

export const cliNotesDe = translation<typeof cliNotes.en>()({
  from: "Aus {file} (railML {version}): {stretch}",
  stretch: "{behind} m hinter und {ahead} m vor der Zugspitze ({front}), über {tracks}: {names}.",
  tracks: { one: "{count} Gleis", other: "{count} Gleise" },
  colFrom: "ab m",
  colLength: "Länge m",
  colGradient: "Neigung ‰",
  colRadius: "Halbmesser m",
  straight: "gerade",
  frontAt: "Zugspitze bei {front} m; {ahead} m voraus{limit}.",
  speedLimit: "; zulässige Geschwindigkeit {speed} km/h",
  hazards: "Gefahrenstellen:",
  written: "Geschrieben nach {file}.",
  howToKeep: "Mit --json wird die Notiz ausgegeben, mit --out DATEI in eine Datei geschrieben.",
  subcommandNeeded: "ein Unterbefehl wird gebraucht",
  subcommandUnknown: "unbekannter Unterbefehl {name}",
  fileNeeded: "eine railML-Datei wird gebraucht",
  oneFile: "eine railML-Datei auf einmal (erhalten: {count})",
  directionNeeded: "--direction: up oder down wird gebraucht",
  directionGot: "--direction: up oder down wird gebraucht (erhalten: {value})",
  atNeeded: "--at: wo die Zugspitze steht, wird gebraucht (eine Streckenposition in Metern oder eine Betriebsstelle)",
  metresFromZero: "{option}: Meter von 0 bis 100000 werden gebraucht (erhalten: {value})",
  metresAboveZero: "{option}: Meter über 0 bis 100000 werden gebraucht (erhalten: {value})",
  notValidNote: "{file}: der Abschnitt ergibt keine gültige Ortsnotiz",
  cannotWrite: "--out: {file} lässt sich nicht schreiben ({code})",
});
