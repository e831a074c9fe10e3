/**
 * The Hungarian words of the screens opened later (Departures, Location notes and its editor's checks): a
 * chunk of their own, loaded with the first of those screens, so the catalog loaded before the first plan
 * stays small.
 */
import type { Catalog } from "../messages.js";
import { departuresHu } from "./departures.js";
import { noteChecksHu } from "./noteChecks.js";
import { notesHu } from "./notes.js";
import { compactHu } from "./compact.js";
import { sketchHu } from "./sketch.js";
import { departureErrorsHu } from "./departureErrors.js";
import { noteRecordsHu } from "./noteRecords.js";

export const huLater: Catalog = { departures: departuresHu, notes: notesHu, noteChecks: noteChecksHu, compact: compactHu, sketch: sketchHu, departureErrors: departureErrorsHu, noteRecords: noteRecordsHu };
