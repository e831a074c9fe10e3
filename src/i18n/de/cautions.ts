/** German: the cautions (see en/cautions.ts and glossary.de.md). */
import type { cautions } from "../en/cautions.js";
import { translation } from "../messages.js";

export const cautionsDe = translation<typeof cautions.en>()({
  advisory: "Nur zur Orientierung. Betriebsvorschriften, Fahrpläne, besondere und örtliche Anweisungen, die Bedienungsanleitung der Lok und das Urteil des Triebfahrzeugführers gehen immer vor. Taut erlaubt niemals eine Fahrt.",
  decisions: "Über Zusatzloks, das Teilen des Zuges oder eine geringere Last entscheiden die, die die Regeln Ihrer Bahn nennen.",
  statistical: "Der Kraftschluss ist statistisch, und jede Zahl hier ist eine Schätzung mit großer Unsicherheit: die Reserven lesen, nicht eine einzelne „sichere“ Zahl.",
  brief: "Vor der Abfahrt planen und einweisen. Die Gerätenutzung im Führerstand folgt den örtlichen Regeln; während der Fahrt braucht hier nichts eine Eingabe.",
  fallingGrade: "In diesem Gefälle setzt sich der Zug in Bewegung, sobald seine Bremsen lösen: die Anfahrt mit den Bremsen steuern, nicht mit Zugkraft.",
  locoBrakeCannotHold:
    "Die Lokbremse allein hält diesen Zug hier nicht: ein schwerer Zug im Gefälle wird mit der Zugbremse gehalten. Die Zugbremse nur dort stufenweise lösen, wo sie stufenweise lösbar ist; eine Bremse, die einmal gelöst vollständig löst (einlösig), lässt sich so nicht lösen: die örtlichen Anweisungen für das Anfahren in diesem Gefälle befolgen.",
  sandPoints: "Nicht über Weichen oder Kreuzungen sanden; starkes Sanden kann Gleisstromkreise isolieren. Die Sandkästen vor der Abfahrt prüfen.",
  risingGrade: "Steigung: mit der Lokbremse in einer niedrigen Fahrstufe halten, während die Zugbremse löst; nicht anfahren, indem der Zug zuerst zusammengedrückt wird.",
  sharpCurve: "Enger Bogen unter oder vor dem Zug: Zugkraft Stufe für Stufe aufschalten; ein plötzlicher Ruck kann leichte Wagen von der Innenschiene heben.",
  protectionActs: {
    one: "In einem Schritt verlangt die Fahrstufe mehr, als die Schiene hergeben kann: der Schleuderschutz greift voraussichtlich ein (er nimmt die Zugkraft auf das zurück, was die Schiene hergibt, und schaltet wieder auf). Dort wiederholtes Schleudern erwarten; die Fahrstufe halten und sanden, solange er arbeitet, und nur zurückschalten, wenn das Schleudern immer wiederkommt.",
    other: "In {count} Schritten verlangt die Fahrstufe mehr, als die Schiene hergeben kann: der Schleuderschutz greift voraussichtlich ein (er nimmt die Zugkraft auf das zurück, was die Schiene hergibt, und schaltet wieder auf). Dort wiederholtes Schleudern erwarten; die Fahrstufe halten und sanden, solange er arbeitet, und nur zurückschalten, wenn das Schleudern immer wiederkommt.",
  },
  protectionStandstill: " Im Stillstand die Räder nie durchdrehen lassen: das brennt Schiene und Räder aus.",
  heating: "Der Plan hält den Fahrmotorstrom bei niedriger Geschwindigkeit bis zu {time} s über dem Dauerwert: innerhalb der Kurzzeitwerte der Lok bleiben und keine Zugkraft auf einen stehenden Zug halten.",
});
