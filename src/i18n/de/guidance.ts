/** German: the If wheels slip card, its headline and a helper's call (see en/guidance.ts and glossary.de.md). */
import type { guidance } from "../en/guidance.js";
import { translation } from "../messages.js";

export const guidanceDe = translation<typeof guidance.en>()({
  driverHoldNotch: "Die Fahrstufe halten, während der Schutz eingreift: nicht aufschalten und bei einem einzelnen Schleudern nicht abschalten.",
  driverKeepSanding: "Weiter sanden.",
  driverSandNow: "Jetzt sanden.",
  driverNoSandersEase: "Diese Lok hat keine Sandstreueinrichtung: bereit sein, früher zurückzuschalten.",
  driverDropFallback: "Kehrt das Schleudern immer wieder, auf die Rückfallstufe dieses Schritts zurückschalten: eine niedrigere Fahrstufe, die haftet, zieht oft besser als eine höhere, die dauernd schleudert.",
  driverWaitSettle: "Warten, bis das Schleudern aufhört und der Strom sich beruhigt hat, bevor weitergeschaltet wird — dann Stufe für Stufe, langsamer als geplant.",
  driverNoSpin: "Im Stillstand die Räder nie schleudern lassen: das brennt Schiene und Räder an. Abschalten und neu anfahren.",
  driverStopSandingPoints: "Vor Weichen und Kreuzungen das Sanden beenden; Sand kann Gleisstromkreise isolieren.",
  protectionSandsItself: "Auf so ausgerüsteten Loks sandet er selbsttätig.",
  protectionNoSandersOnlyPower: "Diese Lok hat keine Sandstreueinrichtung: ihr Schutz kann nur die Zugkraft verringern.",
  protectionCutsPower: "Er nimmt die Zugkraft (Erregung) scharf zurück, umso mehr, je stärker die Räder schleudern — der Strommesser fällt, und die schleudernde Achse verlangsamt auf Zuggeschwindigkeit.",
  protectionReapplies: "Dann schaltet er rasch wieder auf und pendelt sich nahe dem Punkt ein, an dem das Schleudern begann; wiederkehrendes Schleudern wird jedes Mal erneut abgefangen — dann eine Fahrstufe zurückschalten.",
  stallGradeSecure: "Bleibt der Zug in der Steigung liegen: Zugbremse und Lokbremse anlegen und den Zug vor allem anderen sichern.",
  stallGradeSuspectBrake: "Eine nicht gelöste Bremse im Zug vermuten; den Hauptluftleitungsdruck am Zugschluss oder den Luftdurchfluss prüfen.",
  stallGradeRestart: "Ab dem Vorbereitungsschritt neu anfahren: Haltestufe gegen die Lokbremse, Zugbremse lösen, Zugkraft geben, während sie löst, Lokbremse lösen.",
  stallGradeNoBunching: "In der Steigung den Zug nicht zusammendrücken, um Anlauf zu nehmen: der Schluss kann zurückrollen und den Zug zerreißen.",
  stallAskAssistance: "Fährt er dann noch nicht an, eine Zusatzlok anfordern oder das Teilen des Zuges erwägen, wie Ihre Regeln es verlangen.",
  stallLevelShutOff: "Bleibt der Zug liegen: abschalten, bremsen und den Strom abfallen lassen.",
  stallLevelSuspectBrake: "Eine nicht gelöste Bremse im Zug vermuten.",
  stallLevelRestart: "Ab dem Vorbereitungsschritt neu anfahren und den Zug mit der niedrigsten Fahrstufe strecken, die ihn bewegt.",
  headNoPower: "In diesem Schritt keine Zugkraft.",
  headHold: "Fahrstufe {notch} halten, während der Schutz eingreift.",
  headHoldSand: "Fahrstufe {notch} halten, während der Schutz eingreift, und sanden.",
  headTakePower: "Schleudern die Räder beim Aufschalten, diese Fahrstufe halten, während der Schutz eingreift.",
  headTakePowerSand: "Schleudern die Räder beim Aufschalten, diese Fahrstufe halten, während der Schutz eingreift, und sanden.",
  headShutOff: "Schleudert weiter in Fahrstufe {notch}: abschalten, Strom abfallen lassen und neu anfahren.",
  headDrop: "Schleudert weiter: zurück auf Fahrstufe {notch}.",
});
