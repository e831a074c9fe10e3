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
  railCondition: "Schienenzustand: {rail} (Median μ {median}, mit Sand {sanded}): {source}",
  railNoteMemory: "Aus dem Gedächtnis [M].",
  railNoteDry: "Aus dem Gedächtnis [M]; der trockene Median stimmt mit {authors} μ(0) = {mu} überein ({work}).",
  railNoteDamp: "Aus dem Gedächtnis [M]; Tau, Nieselregen und beginnender Regen sind schlechter als starker Regen ({work}).",
  railNoteWet: "Aus dem Gedächtnis [M]; nass ≈ {factor} × trocken ({work}).",
  railNoteLeaves: "Aus dem Gedächtnis [M]; Laubschichten senken den Reibwert etwa auf ein Viertel ({work}).",
});
