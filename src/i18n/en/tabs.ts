/**
 * The words on the tab bar: a screen's name, shortened where the full name would not fit a tab at the
 * smallest width the app supports (600 CSS px in portrait, seven tabs of about 86 px) in large bold type.
 * The screen's full name (shell's screen names) stays the heading in the top bar. "\u00AD" is a soft
 * hyphen: the only place a label may break inside a word, set at a real syllable or compound boundary
 * (the tab's CSS allows no other break inside a word). A word needs one only where it is wider than a
 * tab at 600 px, and only in a one-word label: lines are filled greedily, so a soft hyphen in a label of two
 * words would break the second word where the space between them would do (tests/e2e/layout.test.ts).
 */
import { namespace } from "../messages.js";

export const tabs = namespace("tabs", {
  startPlan: "Start plan",
  cabSteps: "Cab steps",
  assistanceCheck: "Assis\u00ADtance",
  departures: "De\u00ADpar\u00ADtures",
  loadTable: "Load table",
  locationNotes: "Location notes",
  settings: "Settings",
});
