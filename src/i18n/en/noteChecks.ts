/**
 * The Location notes editor's checks (app/screens/LocationNotes/validate.ts): each a code with its figures,
 * already in the user's units. `{join}` is the name of the "Join segments" button, filled in from the
 * notes catalog so the advice names the button as it reads.
 */
import { namespace } from "../messages.js";

export const noteChecks = namespace("noteChecks", {
  nameMissing: "Give the place a name: it heads the card and the location pickers.",
  noSegments: "Add at least one segment of track.",
  segStart: "Segment {n}: enter where it starts.",
  segLength: "Segment {n}: enter its length.",
  segLengthPositive: "Segment {n}: the length must be more than {zero}.",
  segGradient: "Segment {n}: enter a gradient (0 for level track).",
  segGradientSteep: "Segment {n}: a gradient of {grade} is beyond ±{max}, steeper than adhesion railways are built. Check the figure and its sign.",
  segRadius: "Segment {n}: enter a curve radius, or 0 for straight track.",
  segRadiusTight: "Segment {n}: a radius of {radius} is below {min}. Enter 0 for straight track.",
  segGap: 'Gap of {gap} between segment {k} (ends at {end}) and segment {next} (starts at {start}). Use "{join}" or correct the start.',
  segOverlap: 'Segment {next} overlaps segment {k} by {overlap} (segment {k} ends at {end}, segment {next} starts at {start}). Use "{join}" or correct the start.',
  frontMissing: "Enter where the front of the train stands.",
  frontBeyond: "The front of the train (at {front}) is beyond the end of the profile ({end}). Add the track ahead or move the front back.",
  frontBefore: "The front of the train (at {front}) is before the profile begins ({start}).",
  trainNotFit:
    "The reference train ({length} with its locomotives) does not fit: its rear would stand at {rear}, {short} before the profile begins at {start}. Add the track behind the train, or move the front forward.",
  profileEnds: "The profile ends {ahead} ahead of the front, but {clear} are clear ahead: add the track ahead (until then the last gradient is taken to continue).",
  clearMissing: "Enter the distance clear ahead of the front (0 or more).",
  speedLimit: "The speed limit must be more than 0, or left empty.",
  hazardNote: "Hazard {n}: say what it is.",
  revisionDate: "The revision date must be a date (YYYY-MM-DD).",
  initialsMissing: "Add your initials to the revision entry.",
  initialsLong: "Initials: 8 characters at most.",
  changeMissing: "Say in a few words what changed in this revision.",
  schema: "{path}: {message}",
});

/** A check's code: a key above. */
export type NoteCheckCode = keyof typeof noteChecks.en;
