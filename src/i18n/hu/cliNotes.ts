/** Hungarian: `taut notes` (see en/cliNotes.ts and glossary.hu.md). */
import type { cliNotes } from "../en/cliNotes.js";
import { translation } from "../messages.js";

export const cliNotesHu = translation<typeof cliNotes.en>()({
  from: "Forrás: {file} (railML {version}): {stretch}",
  stretch: "{behind} m a vonat eleje mögött és {ahead} m előtte ({front}), {tracks}: {names}.",
  tracks: { one: "{count} vágányon", other: "{count} vágányon" },
  colFrom: "kezdet m",
  colLength: "hossz m",
  colGradient: "lejtviszony ‰",
  colRadius: "ívsugár m",
  straight: "egyenes",
  frontAt: "A vonat eleje {front} m-nél; előtte {ahead} m{limit}.",
  speedLimit: "; sebességkorlát {speed} km/h",
  hazards: "Veszélyforrások:",
  written: "Kiírva ide: {file}.",
  howToKeep: "A --json kiírja a jegyzetet, a --out FÁJL fájlba menti.",
  subcommandNeeded: "alparancs szükséges",
  subcommandUnknown: "ismeretlen alparancs: {name}",
  fileNeeded: "railML-fájl szükséges",
  oneFile: "egyszerre egy railML-fájl (kapott: {count})",
  directionNeeded: "--direction: up vagy down szükséges",
  directionGot: "--direction: up vagy down szükséges (kapott érték: {value})",
  atNeeded: "--at: meg kell adni, hol áll a vonat eleje (vonalbeli helyzet méterben, vagy szolgálati hely)",
  metresFromZero: "{option}: 0 és 100000 közötti méter szükséges (kapott érték: {value})",
  metresAboveZero: "{option}: 0-nál több, legfeljebb 100000 méter szükséges (kapott érték: {value})",
  notValidNote: "{file}: a szakaszból nem lesz érvényes helyszíni jegyzet",
  cannotWrite: "--out: a(z) {file} nem írható ({code})",
});
