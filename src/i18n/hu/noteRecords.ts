/** Hungarian: the notes library's messages about its records (see en/noteRecords.ts, glossary.hu.md). */
import type { noteRecords } from "../en/noteRecords.js";
import { translation } from "../messages.js";

export const noteRecordsHu = translation<typeof noteRecords.en>()({
  damaged: 'A(z) "{key}" mentett jegyzet sérült, ezért kimaradt: {why}',
  notObject: "a rekord nem objektum",
  olderFormat: "a régebbi formátumban van; nyissa meg újra az alkalmazást az átvételhez",
  olderNotCarried: "régebbi formátumban van, és nem lehetett átvenni ({why})",
  migrationNotObject: "nem objektum",
  badOrigin: "az eredete {origin}, nem a következők egyike: {origins}",
  badSavedAt: "a mentés ideje hiányzik, vagy nem dátum",
  wrongKey: 'a(z) "{key}" kulcson van tárolva, de a benne levő jegyzet szerint "{id}"',
  hazardNotText: "A(z) {number}. veszélyforrás nem szöveg volt, ezért kimaradt.",
  seasonUnknown: "A(z) {season} szokásos sínállapota kimaradt: nem évszak (spring, summer, autumn, winter).",
  railUnknown: "A szokásos sínállapot ({season}: {word}) kimaradt: nem a következők egyike: {rails}.",
  closedUpgrade: "A jegyzetgyűjteményt a Taut egy másik lapja vagy ablaka frissítette. A további munkához töltse újra ezt az oldalt; a nem mentett szerkesztés megmarad.",
  closedTerminated: "A böngésző bezárta a jegyzetgyűjteményt. A további munkához töltse újra ezt az oldalt; a nem mentett szerkesztés megmarad.",
  noChoice: 'nincs döntés az ütköző "{id}" jegyzetről',
});
