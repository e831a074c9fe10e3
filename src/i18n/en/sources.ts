/**
 * Where the numbers come from, as Settings lists it (loaded with it): each subject of the physics before its
 * published source (the works' authors, titles and journals are never translated), and each rail condition
 * of the built-in table with its figures before the table's own note on its source (data, as the file gives it).
 */
import { namespace } from "../messages.js";

export const sources = namespace("sources", {
  adhesionSpeed: "Adhesion against speed: {work}",
  adhesionStatistics: "Adhesion as a statistical problem: {work}",
  runningResistance: "Running resistance: {work}",
  curveResistance: "Curve resistance: the {formula} formula, cross-checked with the per-degree rule of US practice.",
  startingResistance: "Starting resistance: {work}",
  traction: "Diesel-electric traction: {work}",
  trainDynamics: "Longitudinal train dynamics: {work}",
  // {rail}: the condition in the language on screen; {median}, {sanded}: adhesion coefficients; {source}: the note on its source.
  railCondition: "Rail condition {rail} (median μ {median}, {sanded} with sand): {source}",
  // The built-in table's notes on its sources (profiles/conditions/rail-conditions.json, whose English they
  // are word for word: tests/app/languageSweep.test.tsx). [M] marks a figure given from memory; {work}: a
  // published work as it was published; {mu}, {factor}: figures in the language's digits.
  railNoteMemory: "From memory [M].",
  railNoteDry: "From memory [M]; dry median matches {authors} μ(0) = {mu} ({work}).",
  railNoteDamp: "From memory [M]; dew, drizzle and the onset of rain are worse than heavy rain ({work}).",
  railNoteWet: "From memory [M]; wet ≈ {factor} × dry ({work}).",
  railNoteLeaves: "From memory [M]; leaf films cut friction about fourfold ({work}).",
});
