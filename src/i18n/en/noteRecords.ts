/**
 * What the notes library on the device says about its records (src/notes): a saved note that is damaged and
 * skipped, and why; what carrying a note over from the older format left out; the library closed under the
 * page. Codes with figures (src/profiles/noteRecordText.ts writes them); the English here is the one source
 * of the English messages the library has always carried. Keys, ids, origins, seasons and rail words are
 * quoted as the record holds them, in every language.
 */
import { namespace } from "../messages.js";

export const noteRecords = namespace("noteRecords", {
  damaged: 'The saved note "{key}" is damaged and was skipped: {why}',
  notObject: "the record is not an object",
  olderFormat: "it is in the older format; reopen the app to carry it over",
  olderNotCarried: "it is in an older format that could not be carried over ({why})",
  // Why a record of the older format could not be carried over (the note's own issues otherwise).
  migrationNotObject: "not an object",
  badOrigin: "its origin is {origin}, not one of {origins}",
  badSavedAt: "its save time is missing or not a date",
  wrongKey: 'it is stored under "{key}" but the note inside says "{id}"',
  // What carrying a note over left out, for the trainer to look at.
  hazardNotText: "Hazard {number} was not text and was left out.",
  seasonUnknown: "The usual rail for {season} was left out: not a season (spring, summer, autumn, winter).",
  railUnknown: "The usual rail in {season}, {word}, was left out: not one of {rails}.",
  // The library closed under the page.
  closedUpgrade: "The notes library was upgraded by another tab or window of Taut. Reload this page to go on working; your unsaved edit is kept.",
  closedTerminated: "The browser closed the notes library. Reload this page to go on working; your unsaved edit is kept.",
  // An import whose conflicts were not all settled (the screen always settles them).
  noChoice: 'no choice made for the conflicting note "{id}"',
});
