/**
 * The German words of the command line's commands beyond the plan (simulate, notes, every --help, the
 * errors about options and files, what the railML reader says): read by the command line only (src/cli/lang.ts), never by the app.
 */
import type { Catalog } from "../messages.js";
import { cliErrorsDe } from "./cliErrors.js";
import { cliHelpDe } from "./cliHelp.js";
import { cliNotesDe } from "./cliNotes.js";
import { cliSimulateDe } from "./cliSimulate.js";
import { railmlTextDe } from "./railmlText.js";

export const deCliCommands: Catalog = { cliSimulate: cliSimulateDe, cliNotes: cliNotesDe, cliHelp: cliHelpDe, cliErrors: cliErrorsDe, railmlText: railmlTextDe };
