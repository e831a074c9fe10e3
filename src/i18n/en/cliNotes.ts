/** `taut notes`: what from-railml prints, and its option errors (see commands/notes.ts). */
import { namespace } from "../messages.js";

export const cliNotes = namespace("cliNotes", {
  from: "From {file} (railML {version}): {stretch}",
  stretch: "{behind} m behind and {ahead} m ahead of the front ({front}), over {tracks}: {names}.",
  tracks: { one: "{count} track", other: "{count} tracks" },
  colFrom: "from m",
  colLength: "length m",
  colGradient: "gradient ‰",
  colRadius: "radius m",
  straight: "straight",
  frontAt: "Front at {front} m; {ahead} m ahead{limit}.",
  speedLimit: "; speed limit {speed} km/h",
  hazards: "Hazards:",
  written: "Written to {file}.",
  howToKeep: "Add --json to print the note, or --out FILE to write it.",
  // Errors in the options.
  subcommandNeeded: "a subcommand is needed",
  subcommandUnknown: "unknown subcommand {name}",
  fileNeeded: "a railML file is needed",
  oneFile: "one railML file at a time (got {count})",
  directionNeeded: "--direction: up or down is needed",
  directionGot: "--direction: up or down is needed (got {value})",
  atNeeded: "--at: where the front of the train stands is needed (a line position in metres, or an operational point)",
  metresFromZero: "{option}: metres from 0 to 100000 are needed (got {value})",
  metresAboveZero: "{option}: metres from more than 0 to 100000 are needed (got {value})",
  notValidNote: "{file}: the stretch does not make a valid location note",
  cannotWrite: "--out: {file} cannot be written ({code})",
});
