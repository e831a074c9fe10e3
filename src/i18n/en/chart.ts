/** Start plan's charts: legends, series and axis titles (the chart titles and captions are the plan's). */
import { namespace } from "../messages.js";

export const chart = namespace("chart", {
  // Speed and notch against time.
  speed: "Speed ({unit})",
  notch: "Notch",
  notchRight: "Notch (right scale)",
  timeFromPower: "Time from taking power (s)",
  // Coupler force along the train.
  peakTension: "Peak tension ({unit})",
  allowedShort: "Allowed: limit ÷ {factor} ({unit})",
  workingLimit: "Working limit ({unit})",
  couplingAxis: "Coupling, from the head (1) to the tail",
  force: "Force ({unit})",
  peakEach: "Peak tension in each coupling",
  allowedLong: "Allowed: {force} (limit ÷ safety factor {factor}), what the plan keeps to",
  limitLong: "Coupler working limit: {force}",
  // Tractive effort against speed.
  bandLow: "{rail}: slip risk {risk}",
  bandHigh: "{rail}: slip risk 50 %",
  notchN: "Notch {n}",
  stepN: "Step {n}",
  stepMark: "S{n}",
  needed: "Resistance at start",
  notchesLegend: "Notches 1–{n}, numbered at the right",
  band: "{rail}{sand}{chosen}",
  withSand: " with sand",
  chosen: " (chosen)",
  stepsLegend: "S1, S2…: each plan step where it uses the most adhesion (its card's figure)",
  neededLegend: "Resistance at start (at standstill)",
  effort: "Tractive effort ({unit})",
});
