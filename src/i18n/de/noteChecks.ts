/** German: the Location notes editor's checks (see en/noteChecks.ts, glossary.de.md). */
import type { noteChecks } from "../en/noteChecks.js";
import { translation } from "../messages.js";

export const noteChecksDe = translation<typeof noteChecks.en>()({
  nameMissing: "Dem Ort einen Namen geben: er steht über der Karte und in den Ortsauswahlen.",
  noSegments: "Mindestens einen Gleisabschnitt anlegen.",
  segStart: "Abschnitt {n}: angeben, wo er beginnt.",
  segLength: "Abschnitt {n}: seine Länge angeben.",
  segLengthPositive: "Abschnitt {n}: die Länge muss größer als {zero} sein.",
  segGradient: "Abschnitt {n}: eine Neigung angeben (0 für ebenes Gleis).",
  segGradientSteep: "Abschnitt {n}: eine Neigung von {grade} liegt jenseits von ±{max}, steiler als Adhäsionsbahnen gebaut werden. Zahl und Vorzeichen prüfen.",
  segRadius: "Abschnitt {n}: einen Bogenhalbmesser angeben, oder 0 für gerades Gleis.",
  segRadiusTight: "Abschnitt {n}: ein Halbmesser von {radius} liegt unter {min}. Für gerades Gleis 0 eingeben.",
  segGap: "Lücke von {gap} zwischen Abschnitt {k} (endet bei {end}) und Abschnitt {next} (beginnt bei {start}). „{join}“ verwenden oder den Beginn berichtigen.",
  segOverlap: "Abschnitt {next} überlappt Abschnitt {k} um {overlap} (Abschnitt {k} endet bei {end}, Abschnitt {next} beginnt bei {start}). „{join}“ verwenden oder den Beginn berichtigen.",
  frontMissing: "Angeben, wo die Zugspitze steht.",
  frontBeyond: "Die Zugspitze (bei {front}) liegt hinter dem Ende des Längsprofils ({end}). Das Gleis voraus ergänzen oder die Spitze zurücksetzen.",
  frontBefore: "Die Zugspitze (bei {front}) liegt vor dem Beginn des Längsprofils ({start}).",
  trainNotFit:
    "Der Referenzzug ({length} mit seinen Lokomotiven) passt nicht: sein Ende stünde bei {rear}, {short} vor dem Beginn des Längsprofils bei {start}. Das Gleis hinter dem Zug ergänzen oder die Spitze vorziehen.",
  profileEnds: "Das Längsprofil endet {ahead} vor der Zugspitze, aber {clear} sind frei voraus: das Gleis voraus ergänzen (bis dahin gilt die letzte Neigung als fortgesetzt).",
  clearMissing: "Die freie Strecke vor der Zugspitze angeben (0 oder mehr).",
  speedLimit: "Die Höchstgeschwindigkeit muss größer als 0 sein oder leer bleiben.",
  hazardNote: "Gefahrenstelle {n}: sagen, was sie ist.",
  revisionDate: "Das Datum der Änderung muss ein Datum sein (JJJJ-MM-TT).",
  initialsMissing: "Ihr Kürzel zum Änderungseintrag hinzufügen.",
  initialsLong: "Kürzel: höchstens 8 Zeichen.",
  changeMissing: "In wenigen Worten sagen, was sich mit dieser Änderung geändert hat.",
  schema: "{path}: {message}",
});
