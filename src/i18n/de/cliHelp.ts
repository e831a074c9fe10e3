/** German: each command's summary and --help (see en/cliHelp.ts and glossary.de.md); option names stay as they are. */
import type { cliHelp } from "../en/cliHelp.js";
import { translation } from "../messages.js";

export const cliHelpDe = translation<typeof cliHelp.en>()({
  planSummary: "Anfahrplan für einen Zug: Ergebnis, Widerstand, Kraftschluss, Schritte, Zusatzlok",
  planHelp: `Berechnet, ob die Loks den Zug an diesem Ort anfahren können, und wie.
Lautet das Ergebnis nicht „fährt an“, sucht es auch eine Zusatzlok: eine oder zwei weitere Loks der
Bauart der führenden Lok (oder --helper) an der Spitze, am Schluss oder im Zug, jede Möglichkeit mit der
Dynamik des Planers geprüft; Möglichkeiten, mit denen der Zug anfährt, stehen die günstigste zuerst.
Hilft keine, nennt es den größten vorderen Zugteil, der anfährt (Zug teilen). Damit \`plan\` bei wenigen
Sekunden bleibt, ist die Suche hier auf {budget} Planerläufe für die Möglichkeiten ({fullPlans} davon vollständig
nachgeprüft) und {divide} für das Teilen begrenzt; die Ausgabe sagt, wenn die Grenze die Suche abschnitt.

FALL.json ist eine Anfahrfall-Datei (taut/start-case@1); "-" liest sie von der Standardeingabe.

Abweichungen (was sich von Abfahrt zu Abfahrt ändert; die Falldatei bleibt, wie sie ist):
  --rail R            Schienenzustand: {rails}
  --sand, --no-sand   Sanden ein oder aus
  --mass T            Anhängelast, Tonnen
  --grade PROMILLE    Neigung unter dem ganzen Zug, Promille (positiv: steigt voraus); ein Fall auf einem
                      Streckenprofil oder einer Ortsnotiz wird zu gleichmäßiger Neigung mit dem engsten
                      Bogen des Profils unter dem Zug und seinem freien Weg voraus

Optionen:
  --json              den Plan als JSON statt als Tabelle: dieselben Werte, jedes Feld mit seiner
                      Einheit benannt (trailingMass_t, peakCouplerForce_kN, ...), für Skripte
  --demo              den eingebauten Beispielfall statt einer Datei verwenden
  --notes DATEI       Ortsnotizen (eine Notiz taut/location@1 oder ein Bündel taut/notes-bundle@2), die
                      "location" des Falls per id benennen kann; mehrfach angebbar
  --location NOTIZ    an dieser Ortsnotiz statt am eigenen Ort des Falls anfahren
  --helper ID         Lokprofil, das die Zusatzlok-Möglichkeiten anfügen (Vorgabe: das der führenden Lok)
  --helper-control C  wie im Zug oder am Schluss angefügte Loks gefahren werden: remote (eigene
                      Fahrstufe vom führenden Führerstand aus; Vorgabe) oder helper (eigener
                      Triebfahrzeugführer, per Funk abgestimmt)
  --no-assistance     keine Zusatzlok suchen
  --conditions        auch Ergebnis und Reserven für jeden Schienenzustand, ohne und mit Sanden
                      (12 Pläne mehr: einige Sekunden)`,
  checkSummary: "Abfahrten im Stapel prüfen: Ergebnis, Reserve, größte Last, günstigste Zusatzlok",
  checkHelp: `Prüft viele Abfahrten auf einmal: je eine Zeile mit dem Ergebnis, seinen Gründen, der Reserve
(zulässig ÷ Bedarf) der Grenze, die bindet, den größten Anhängelasten, die anfahren und die mindestens
Grenzfall sind (dieselben Werte wie \`taut plan\`), und der günstigsten Zusatzlok, mit der er anfährt
(eine oder zwei weitere Loks der Bauart der führenden Lok, oder --helper; hilft keine und braucht der Zug
Hilfe, wird er in höchstens drei Teile geteilt).

Eingabe:
  CSV   eine Kopfzeile mit den Spalten id,case,rail,sand (und wahlweise location); \`case\` ist eine
        Anfahrfall-Datei relativ zur CSV (in ihrem Ordner oder darunter), \`rail\` und \`sand\` (yes/no)
        ersetzen ihre Bedingungen, \`location\` (die id einer Ortsnotiz) ihren Ort. Leere Zellen
        behalten die Werte des Falls.
  JSON  eine Liste von Anfahrfällen ({jsonList}), jeder mit einer wahlweisen "id".
Der Ort eines Falls kann eine Ortsnotiz per id benennen (eingebaut oder aus --notes).

Eine Zeile, die sich nicht lesen lässt, wird mit ihrer Zeilennummer (CSV, die Kopfzeile ist Zeile 1)
oder ihrem Index (JSON, ab 0) gemeldet; die übrigen Zeilen werden trotzdem beantwortet. Gleiche
Abfahrten werden einmal berechnet.

Optionen:
  --sort risk    die gefährdetsten zuerst, wie der Bildschirm Abfahrten: Zusatzlok nötig, dann
                 Grenzfall, dann fährt an, jeweils nach Reserve (kleinste zuerst), unbeantwortete
                 Zeilen zuletzt; Gleichstand in Dateireihenfolge. --sort file (Vorgabe) behält sie.
  --json         Zeilen als JSON: {json}
  --csv          Zeilen als CSV
  --notes DATEI  Ortsnotizen (eine Notiz taut/location@1 oder ein Bündel taut/notes-bundle@2); mehrfach
  --helper ID    Lokprofil, das die Zusatzlok-Möglichkeiten anfügen (Vorgabe: das der führenden Lok
                 jedes Zuges)
  --jobs N       Worker-Threads (Vorgabe: die verfügbaren Kerne, hier {jobs}; 1 rechnet in diesem Thread)
  --shard K/N    nur jede N-te Abfahrt der Datei beantworten, ab der K-ten (K = 1…N): N Jobs eines
                 Job-Arrays teilen einen Tag auf Rechner auf; ihre CSV-Ausgaben danach zusammenfügen
                 (README: Splitting a day among machines)
  --quiet        keine Fortschrittszeilen auf stderr
  --allow-outside
                 auch Falldateien außerhalb des Ordners der CSV lesen (sonst nur dieser Ordner und die
                 Ordner darunter)

Die Zusatzlok-Suche jeder Abfahrt ist auf {budget} Planerläufe für die Möglichkeiten und {divide} für das
Teilen des Zuges begrenzt; \`taut plan\` auf den Fall nennt jede Möglichkeit, mit der er anfährt.

Exit-Codes: 0, wenn jede Zeile beantwortet wurde; 2, wenn Zeilen fehlerhafte Eingaben waren (sie werden
aufgeführt, die übrigen trotzdem beantwortet) oder die Datei selbst nicht lesbar ist; 1, wenn die
Rechnung an einer Zeile scheiterte.`,
  tableSummary: "Lasttafel eines Ortes: größte Anhängelast, die anfährt, je Schienenzustand, ohne und mit Sanden",
  tableHelp: `Die größte Anhängelast, die die Loks an einem Ort anfahren, für jeden Schienenzustand, ohne und mit
Sanden. Jeder Wert ist eine Intervallhalbierung über das Ergebnis des Anfahrplaners (unterhalb der
statischen Grenze): ein Zug knapp leichter als der Wert fährt an, einer knapp schwerer nicht. Zwölf
Lastsuchen in parallelen Worker-Threads: einige Sekunden.

ORT.json ist eine Ortsnotiz (taut/location@1) oder ein Bündel (taut/notes-bundle@2) mit
--note ID; eine eingebaute Notiz kann statt einer Datei mit ihrer id genannt werden.

Der Zug der Tafel: der Referenzzug der Notiz — derselbe, den die Karte der Ortsnotizen in der App
verwendet — oder, wenn die Notiz keinen nennt, die erste Zugvorlage ({firstTrain}); --loco und --count
ersetzen seine Loks. Jede Zugoption (--wagons, --wagon-type, --slack, --limit) macht daraus einen Zug
aus --wagons Wagen der Bauart --wagon-type (Vorgabe {wagons} × {wagonType}) mit Rollenlagern.

Optionen:
  --note ID          welche Notiz eines Bündels
  --loco ID          Lokprofil an der Spitze (Vorgabe: das des Referenzzuges; nötig mit Zugoptionen)
  --count N          wie viele davon (Vorgabe: die des Referenzzuges, oder 1)
  --wagons N         Wagen im Zug (Vorgabe {wagons})
  --wagon-type ID    Wagenbauart (Vorgabe {wagonType})
  --slack MM         freies Kupplungsspiel je Kupplung (Vorgabe: das der Wagenbauart)
  --limit KN         zulässige Kupplungskraft, 100 bis 5000 (Vorgabe 970 kN Mittelpufferkupplung,
                     850 kN Schraubenkupplung)
  --temperature C    Lufttemperatur (Vorgabe {temperature} °C, oder die des Referenzzuges)
  --target-kmh V     Geschwindigkeit, die das Anfahren erreichen muss (Vorgabe {target} km/h, höchstens
                     die zulässige Geschwindigkeit der Notiz)
  --jobs N           Worker-Threads (Vorgabe: die verfügbaren Kerne; 1 rechnet in diesem Thread)
  --quiet            keine Fortschrittszeilen auf stderr
  --json | --csv     maschinenlesbare Ausgabe`,
  simulateSummary: "eine gegebene Fahrstufenfolge durch das Zugdynamik-Modell rechnen",
  simulateHelp: `Fährt die angegebenen Fahrstufen (Fahrstufe@Sekunden) und meldet, wann sich das letzte Fahrzeug bewegt,
die Kupplungskräfte entlang des Zuges, die Geschwindigkeiten der Spielaufnahme, das Schleudern und die
Endgeschwindigkeit und den Weg. Ein Lauf, in dem die Räder schleudern, beginnt mit einer WARNUNG (und
\`warnings\` im JSON): niedrigere Fahrstufen oder spätere Schritte versuchen.
Die Bremsen lösen, wie der Plan sie löst: das Lösen der Zugbremse beginnt bei 0 s und läuft nach hinten
(im Gefälle, das die Lokbremse nicht halten kann, stufenweise); die Lokbremse hält bis --release-at
(Vorgabe: der Zeitpunkt des Plans, und mindestens 3 s nach der ersten Fahrstufe).
Ohne --duration läuft die Rechnung, bis das Ziel des Falls erreicht ist, und sagt, warum sie vorher
endete: die Zeitgrenze ({cap} s), Liegenbleiben oder Schleudern im Stillstand.

Optionen:
  --sequence S           Fahrstufe@Sekunden, durch Kommas getrennt (nötig)
  --duration S           genau S Sekunden rechnen
  --release-at S         wann die Lokbremse gelöst wird, s
  --brake-released       die Zugbremse ist bei 0 s schon gelöst (die Lokbremse hält dann bis 3 s nach
                         der ersten Fahrstufe, sofern --release-at nichts anderes sagt)
  --adhesion-quantile Q  angenommener Kraftschluss: 0.5 Median (Vorgabe), 0.1 die schlechtesten 10 %
  --json                 Ausgabe als JSON
  --series               mit --json auch die ausgedünnte Zeitreihe`,
  reviewSummary: "eine aufgezeichnete Anfahrt (GPX oder CSV) neben den Plan legen und die beobachteten Faktoren anpassen",
  reviewHelp: `Legt eine aufgezeichnete Anfahrt ab dem Anfahrzeitpunkt (die Geschwindigkeit bleibt erstmals 5 s über
2 km/h) über den Plan des Falls und passt durch erneutes Rechnen des Dynamikmodells den Faktor auf die
Anhängelast an, der sie wiedergibt („verhielt sich, als wäre er 12 % schwerer“), mit einem 95-%-Intervall.
Mit aufgezeichneter Fahrstufe passt es auch die Zugkraft der Loks an und sagt, wann die Aufzeichnung
beides nicht trennen kann; mit Fahrstufe und Strom findet es Schleudern (der Strom fällt, während die
Fahrstufe bleibt). Danach plant es mit den angepassten Werten neu: würde sich das Ergebnis ändern?

AUFZEICHNUNG: ein GPX-1.1-Track (Zeit und Position; Geschwindigkeit aus den Positionen oder die mit den
Punkten aufgezeichnete) oder ein CSV-Protokoll mit der Kopfzeile time_s,speed_kmh[,notch][,current_A][,distance_m].

Optionen:
  --json     Ausgabe als JSON (die angepassten Faktoren heißen massFactor und effortFactor, jeder mit
             low und high)
  --series   mit --json auch Plan, Aufzeichnung und angepassten Lauf im Sekundentakt`,
  notesSummary: "Ortsnotizen aus anderen Dateien: from-railml (ein Abschnitt einer railML-2.x-Strecke)",
  notesHelp: `from-railml: eine Ortsnotiz aus einer railML-2.2–2.5-Infrastrukturdatei. Die gradientChanges und
radiusChanges der Gleise werden über ihre Verbindungen trackBegin / trackEnd verfolgt, --behind Meter
hinter der Spitze des stehenden Zuges und --ahead Meter vor ihr, und aneinandergereiht: Kilometrierung 0
am hinteren Ende des Abschnitts, Steigungen in Fahrtrichtung positiv, Halbmesser 0 für gerade.
Signale, die für den Zug gelten, Weichen, Bahnübergänge, Tunnel, Brücken und Bahnsteigkanten im
Abschnitt werden zu den Gefahrenstellen der Notiz; das niedrigste vMax vor der Spitze zu ihrer
zulässigen Geschwindigkeit.

Optionen:
  --at POS           wo die Zugspitze steht: eine Streckenposition in Metern (railML absPos), eine pos
                     auf dem mit --track genannten Gleis, oder Name, id oder Kürzel einer Betriebsstelle
  --direction D      up: zu steigender pos des Gleises der Spitze (railML dir="up"); down: die Gegenrichtung
  --behind M         Meter Strecke hinter der Spitze (Vorgabe {behind}; mindestens die Zuglänge)
  --ahead M          Meter Strecke vor der Spitze (Vorgabe {ahead}); der freie Weg der Notiz
  --track ID         das Gleis, auf dem die Spitze steht (nötig, wo eine Streckenposition auf
                     mehreren Gleisen liegt)
  --name TEXT        Name der Notiz (Vorgabe: die Betriebsstelle oder Gleis und Position)
  --id ID            id der Notiz (Vorgabe: aus dem Namen gebildet)
  --initials XX      Kürzel für den ersten Revisionseintrag der Notiz (Vorgabe: railML)
  --no-hazards       die Gefahrenstellen weglassen
  --out DATEI        die Notiz in DATEI schreiben
  --json             die Notiz (taut/location@1) auf die Standardausgabe schreiben

railML-3-Dateien werden erkannt und abgelehnt. XML-Entity-Deklarationen werden abgelehnt, nie ausgewertet.`,
  langOption: "die Sprache des Textes: en Englisch, hu Ungarisch, de Deutsch (Vorgabe: nach LC_ALL, LC_MESSAGES oder LANG); JSON und CSV sind in jeder Sprache gleich",
  metaFile: "DATEI",
  metaCase: "FALL",
  metaDepartures: "ABFAHRTEN",
  metaLocation: "ORT",
  metaRecording: "AUFZEICHNUNG",
  metaText: "TEXT",
  metaPermille: "PROMILLE",
  metaNoteId: "NOTIZ",
});
