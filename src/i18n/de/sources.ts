/** German: where the numbers come from, as Settings lists it (see en/sources.ts, glossary.de.md). */
import type { sources } from "../en/sources.js";
import { translation } from "../messages.js";

export const sourcesDe = translation<typeof sources.en>()({
  adhesionSpeed: "Kraftschluss über der Geschwindigkeit: {work}",
  adhesionStatistics: "Kraftschluss als statistisches Problem: {work}",
  runningResistance: "Laufwiderstand: {work}",
  curveResistance: "Bogenwiderstand: die {formula}-Formel, abgeglichen mit der Regel je Grad aus der US-Praxis.",
  startingResistance: "Anfahrwiderstand: {work}",
  traction: "Dieselelektrische Traktion: {work}",
  trainDynamics: "Längsdynamik des Zuges: {work}",
  railCondition: 'Schienenzustand "{rail}" (Median μ {median}, mit Sand {sanded}): {source}',
});
