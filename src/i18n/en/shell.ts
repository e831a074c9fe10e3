/** The app's frame and its shared parts: screen names, top bar, offline state, verdict words, fields, notices. */
import { namespace } from "../messages.js";

export const shell = namespace("shell", {
  // Screen names (NAMING.md "Our names").
  screenStartPlan: "Start plan",
  screenCabSteps: "Cab steps",
  screenAssistanceCheck: "Assistance check",
  screenDepartures: "Departures",
  screenLoadTable: "Load table",
  screenLocationNotes: "Location notes",
  screenStartReview: "Start review",
  screenSettings: "Settings",
  screensNav: "Screens",
  loading: "Loading…",
  movingTitle: "The train is moving",
  movingText: "Taut is for planning and briefing before departure, so its controls are hidden while the device reports movement{speed}. They come back once it has been still for 10 seconds.",
  movingSpeed: " ({speed})",

  // Offline state, in the top bar.
  onlineOnly: "Online only",
  offlineSaved: "Offline — working from the saved copy",
  offline: "Offline",
  readyOffline: "Ready offline",
  savingOffline: "Saving for offline use…",
  deviceOnline: "The device reports a network connection",
  deviceOffline: "The device reports no network connection",
  serverAnswered: "The server answered at {time}",
  serverSilent: "No answer from the server at {time}",
  updateTitle: "A new version of Taut is ready",
  updateText: "Update now (the page reloads; your inputs are kept), or later — the current version keeps working offline.",
  updateNow: "Update now",
  updateLater: "Later",

  // The stamp on a printed screen.
  printIncomplete: "Incomplete — wait for {what}.",
  printIncompleteText: " Printed while figures were still being worked out: do not use this copy.",
  printStamp: "Taut {version} · {screen} · printed {at}",
  printFingerprint: " · inputs fingerprint {fingerprint}",
  printAdvisory: " · advisory only",

  // Stored inputs that could not be used; a screen that failed.
  setAsideTitle: "Your last Start plan inputs could not be read",
  setAsideText: " ({reason}), so the demo case is open. They are kept on this device: export them to look at them or to send them with a report.",
  setAsideExport: "Export the set-aside inputs",
  ok: "OK",
  screenFailedTitle: "This screen could not be drawn",
  screenFailedText: " ({error}). Your location notes are not affected. If it happens again, set the stored Start plan inputs aside (they are kept for export) and reload.",
  tryAgain: "Try again",
  setAsideReload: "Set the inputs aside and reload",

  // Fields.
  fixInputs: { one: "Fix this input to get a plan", other: "Fix these {count} inputs to get a plan" },
  fieldLess: "{label}: less",
  fieldMore: "{label}: more",
  fieldIssue: "{label} {issue}",
  on: "On",
  off: "Off",
  shortTons: "short tons",

  // Charts.
  chartUnsupported: "This browser cannot draw charts here; the figures above and the legend below still hold.",
  chartLabel: "{title}. {caption}",
});
