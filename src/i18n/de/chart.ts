/** German: Start plan's charts (see en/chart.ts, glossary.de.md). */
import type { chart } from "../en/chart.js";
import { translation } from "../messages.js";

export const chartDe = translation<typeof chart.en>()({
  speed: "Geschwindigkeit ({unit})",
  notch: "Fahrstufe",
  notchRight: "Fahrstufe (rechte Skala)",
  timeFromPower: "Zeit ab Aufschalten (s)",
  peakTension: "Höchste Zugkraft in der Kupplung ({unit})",
  allowedShort: "Zulässig: Grenze ÷ {factor} ({unit})",
  workingLimit: "Betriebsgrenze ({unit})",
  couplingAxis: "Kupplung, von der Spitze (1) bis zum Schluss",
  force: "Kraft ({unit})",
  peakEach: "Höchste Zugkraft in jeder Kupplung",
  allowedLong: "Zulässig: {force} (Grenze ÷ Sicherheitsfaktor {factor}), daran hält sich der Plan",
  limitLong: "Betriebsgrenze der Kupplung: {force}",
  bandLow: "{rail}: Schleuderrisiko {risk}",
  bandHigh: "{rail}: Schleuderrisiko 50 %",
  notchN: "Fahrstufe {n}",
  stepN: "Schritt {n}",
  stepMark: "S{n}",
  needed: "Widerstand beim Anfahren",
  notchesLegend: "Fahrstufen 1–{n}, rechts nummeriert",
  band: "{rail}{sand}{chosen}",
  withSand: " mit Sanden",
  chosen: " (gewählt)",
  stepsLegend: "S1, S2…: jeder Planschritt dort, wo er den meisten Kraftschluss nutzt (Wert seiner Karte)",
  neededLegend: "Widerstand beim Anfahren (im Stillstand)",
  effort: "Zugkraft ({unit})",
});
