/**
 * What the file readers say about a file they refuse, and the refusal of a case beyond the work cap: a
 * notes file or bundle (profiles/notes.ts), a note's reference train (profiles/referenceTrain.ts), a
 * departures file (profiles/departures.ts, profiles/csv.ts) and a plan's work (core/planner/workCap.ts).
 * Each message is a code with its figures (src/i18n/renderReaders.ts writes it); the English here is the
 * one source of the English messages, which the command line prints byte for byte as before. Ids, file
 * kinds and schema names are quoted as the file gives them, in every language; {open} and {close} are an
 * object's braces.
 */
import { namespace } from "../messages.js";

export const readers = namespace("readers", {
  // A plan's work beyond the cap ({steps}, {cap}: "5.0 × 10^8"; {step}: "4.2 ns"; {lightest}: "1 g").
  workCap:
    "one plan of this train would take {steps} vehicle-steps ({vehicles} vehicles at a {step} step, which the lightest vehicle, {lightest}, sets), more than the {cap} a plan may take: check the masses",
  withoutEnd: "without end",
  // A notes file refused as a whole (headlines).
  nothingChanged: "Nothing was changed.",
  notesUnreadable: "The file could not be read ({why}).",
  notesEmpty: "The file is empty.",
  notesCutShort: "The file is not complete JSON: it may have been cut short while copying or downloading.",
  noteNotValid: "The location note {name} is not valid.",
  noteWithoutName: "without a name",
  notesNoSchema: 'This is not a Taut notes file: it has no "schema" field naming {bundle} or {note}.',
  notesOtherKind: "This is a {kind} file, not location notes ({bundle} or {note}).",
  bundleNotValid: "The notes bundle is not valid.",
  bundleHolds: { one: "The bundle holds {count} note", other: "The bundle holds {count} notes" },
  bundleBad: { one: "{named} is not valid, so none was imported.", other: "{named} are not valid, so none was imported." },
  bundleNote: "note {number}",
  bundleNoteNamed: "note {number} ({name})",
  // A notes file's fields.
  noteIdRepeated: 'repeats the id of note {first} ("{id}"); ids must be unique in a bundle',
  reviewNoteMissing: 'names the note "{id}", which is not in the bundle',
  reviewIdRepeated: 'repeats the id of another review ("{id}")',
  notesSchema: 'must be "{bundle}" or "{note}"',
  notesSchemaGot: 'must be "{bundle}" or "{note}" (got {kind})',
  // A note's reference train.
  unknownTrain: 'names no known train ("{id}"; known: {known})',
  referenceUnusable: "{id}: the reference train cannot be used",
  // A departures file refused as a whole.
  departuresNotValid: "not a valid file",
  departuresJsonList: "a departures file in JSON is a list of start cases ([ {open}...{close}, {open}...{close} ])",
  csvEmpty: 'the file is empty (a header line "id,case,rail,sand" is needed)',
  csvNoCase: {
    one: 'line {line}: the header must name the columns id,case,rail,sand (its {count} column include no "case")',
    other: 'line {line}: the header must name the columns id,case,rail,sand (its {count} columns include no "case")',
  },
  csvUnclosed: "line {line}: a quoted field is not closed",
  // A departures file's rows.
  rowLine: "line {line}",
  caseNeeded: "a start-case file is needed",
  sandYesNo: "must be yes or no (true/false, 1/0) (got {value})",
  caseOtherKind: "this is a {kind} file; a start case (taut/start-case@1) is needed",
  caseOutside: "is outside the folder of the departures file ({folder}); case files are read from that folder and the folders below it (--allow-outside reads others)",
  caseNotPicked: "not among the picked files: pick {file} together with {departures}",
  // The device's notes library refusing an import or a review.
  importNoteInvalid: "Note {number} is not valid ({path}: {problem}); nothing was imported.",
  importIdTwice: 'The id "{id}" appears twice in the file; nothing was imported.',
  importFailed: "{why}; nothing was imported.",
  importRefused: "The device refused to save the notes ({why}); nothing was imported.",
  reviewInvalid: "The review is not valid ({path}: {problem}); nothing was saved.",
  reviewNoNote: 'There is no note "{id}" to keep the review beside; nothing was saved.',
});

/** A reader's message code: a key above. */
export type ReaderCode = keyof typeof readers.en;
