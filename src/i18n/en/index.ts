/** Every English namespace: the one list the catalog checks walk (tests/i18n) — add a new namespace here. */
import { assist } from "./assist.js";
import { card } from "./card.js";
import { chart } from "./chart.js";
import { cautions } from "./cautions.js";
import { cli } from "./cli.js";
import { departures } from "./departures.js";
import { dispatch } from "./dispatch.js";
import { fields } from "./fields.js";
import { inputs } from "./inputs.js";
import { noteChecks } from "./noteChecks.js";
import { notes } from "./notes.js";
import { plan } from "./plan.js";
import { review } from "./review.js";
import { settings } from "./settings.js";
import { shell } from "./shell.js";
import { steps } from "./steps.js";
import { train } from "./train.js";
import { groups } from "./groups.js";
import { cab } from "./cab.js";
import { words } from "./words.js";
import { reasons } from "./reasons.js";
import { guidance } from "./guidance.js";
import { assistNotes } from "./assistNotes.js";
import { advice } from "./advice.js";
import { cliSimulate } from "./cliSimulate.js";
import { cliNotes } from "./cliNotes.js";
import { cliHelp } from "./cliHelp.js";
import { cliErrors } from "./cliErrors.js";
import { railmlText } from "./railmlText.js";
import { tabs } from "./tabs.js";
import { compact } from "./compact.js";
import { sketch } from "./sketch.js";

import { sensitivity } from "./sensitivity.js";
import { readers } from "./readers.js";
import { units } from "./units.js";

export const NAMESPACES = [shell, words, settings, card, steps, plan, inputs, dispatch, cautions, cli, departures, notes, reasons, guidance, assistNotes, advice, fields, noteChecks, train, assist, review, chart, groups, cab, cliSimulate, cliNotes, cliHelp, cliErrors, railmlText, tabs, compact, sketch, sensitivity, readers, units] as const;
