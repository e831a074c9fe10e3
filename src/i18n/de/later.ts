/**
 * The German words of the screens opened later (Departures, Location notes and its editor's checks): a
 * chunk of their own, loaded with the first of those screens, so the catalog loaded before the first plan
 * stays small.
 */
import type { Catalog } from "../messages.js";
import { departuresDe } from "./departures.js";
import { noteChecksDe } from "./noteChecks.js";
import { notesDe } from "./notes.js";
import { compactDe } from "./compact.js";
import { sketchDe } from "./sketch.js";
import { departureErrorsDe } from "./departureErrors.js";
import { noteRecordsDe } from "./noteRecords.js";

export const deLater: Catalog = { departures: departuresDe, notes: notesDe, noteChecks: noteChecksDe, compact: compactDe, sketch: sketchDe, departureErrors: departureErrorsDe, noteRecords: noteRecordsDe };
