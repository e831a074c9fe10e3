/** Hungarian: Start plan's charts (see en/chart.ts, glossary.hu.md). */
import type { chart } from "../en/chart.js";
import { translation } from "../messages.js";

export const chartHu = translation<typeof chart.en>()({
  speed: "Sebesség ({unit})",
  notch: "Fokozat",
  notchRight: "Fokozat (jobb oldali skála)",
  timeFromPower: "Idő a vonóerő felvételétől (s)",
  peakTension: "Legnagyobb húzóerő ({unit})",
  allowedShort: "Megengedett: határ ÷ {factor} ({unit})",
  workingLimit: "Üzemi határ ({unit})",
  couplingAxis: "Kapcsolás, az elejétől (1) a vonat végéig",
  force: "Erő ({unit})",
  peakEach: "Legnagyobb húzóerő minden kapcsolásban",
  allowedLong: "Megengedett: {force} (határ ÷ biztonsági tényező {factor}), ezt tartja a terv",
  limitLong: "A vonókészülék üzemi határa: {force}",
  bandLow: "{rail}: perdülési kockázat {risk}",
  bandHigh: "{rail}: perdülési kockázat 50 %",
  notchN: "{n}. fokozat",
  stepN: "{n}. lépés",
  stepMark: "L{n}",
  needed: "Induló ellenállás",
  notchesLegend: "1–{n}. fokozat, jobb oldalt számozva",
  band: "{rail}{sand}{chosen}",
  withSand: " homokolással",
  chosen: " (kiválasztott)",
  stepsLegend: "L1, L2…: a terv minden lépése ott, ahol a legtöbb tapadást használja (a kártyája szerinti érték)",
  neededLegend: "Induló ellenállás (álló helyzetben)",
  effort: "Vonóerő ({unit})",
});
