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
  // {rail}: the condition's code as the table gives it; {median}, {sanded}: adhesion coefficients.
  railCondition: 'Rail condition "{rail}" (median μ {median}, {sanded} with sand): {source}',
});
