/**
 * The Hungarian words of the command line's commands beyond the plan (simulate, notes, every --help, the
 * errors about options and files, what the railML reader says): read by the command line only (src/cli/lang.ts), never by the app.
 */
import type { Catalog } from "../messages.js";
import { cliErrorsHu } from "./cliErrors.js";
import { cliHelpHu } from "./cliHelp.js";
import { cliNotesHu } from "./cliNotes.js";
import { cliSimulateHu } from "./cliSimulate.js";
import { railmlTextHu } from "./railmlText.js";

export const huCliCommands: Catalog = { cliSimulate: cliSimulateHu, cliNotes: cliNotesHu, cliHelp: cliHelpHu, cliErrors: cliErrorsHu, railmlText: railmlTextHu };
