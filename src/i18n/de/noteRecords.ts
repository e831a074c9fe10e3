/** German: the notes library's messages about its records (see en/noteRecords.ts, glossary.de.md). */
import type { noteRecords } from "../en/noteRecords.js";
import { translation } from "../messages.js";

export const noteRecordsDe = translation<typeof noteRecords.en>()({
  damaged: 'Die gespeicherte Notiz "{key}" ist beschädigt und wurde übersprungen: {why}',
  notObject: "der Eintrag ist kein Objekt",
  olderFormat: "sie liegt im älteren Format vor; öffnen Sie die App erneut, um sie zu übernehmen",
  olderNotCarried: "sie liegt in einem älteren Format vor, das nicht übernommen werden konnte ({why})",
  migrationNotObject: "kein Objekt",
  badOrigin: "ihre Herkunft ist {origin}, nicht eine von {origins}",
  badSavedAt: "ihr Speicherzeitpunkt fehlt oder ist kein Datum",
  wrongKey: 'sie ist unter "{key}" gespeichert, aber die Notiz darin nennt "{id}"',
  hazardNotText: "Gefahrenstelle {number} war kein Text und wurde weggelassen.",
  seasonUnknown: "Der übliche Schienenzustand für {season} wurde weggelassen: keine Jahreszeit (spring, summer, autumn, winter).",
  railUnknown: "Der übliche Schienenzustand ({season}: {word}) wurde weggelassen: nicht einer von {rails}.",
  closedUpgrade: "Die Notizsammlung wurde von einem anderen Tab oder Fenster von Taut aktualisiert. Laden Sie diese Seite neu, um weiterzuarbeiten; Ihre nicht gespeicherte Bearbeitung bleibt erhalten.",
  closedTerminated: "Der Browser hat die Notizsammlung geschlossen. Laden Sie diese Seite neu, um weiterzuarbeiten; Ihre nicht gespeicherte Bearbeitung bleibt erhalten.",
  noChoice: 'für die Notiz "{id}" im Konflikt wurde nichts gewählt',
});
